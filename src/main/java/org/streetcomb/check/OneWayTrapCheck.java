package org.streetcomb.check;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.streetcomb.NoTourError;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.network.StrongComponents;
import org.streetcomb.network.TravelArcs;

/**
 * Finds groups of streets that one-way restrictions turn into traps. Within each connected part of the
 * network, the strongly connected components of the drivable arcs ({@link StrongComponents}) form an
 * acyclic graph; a component with no arc out of it can be entered but not left (a sink), one with no arc
 * into it can be left but not entered (a source). A part with more than one strong component has at
 * least one of each, and no closed tour can drive all its streets, so each is blocking. The largest strong
 * component of a part (by nodes, then lowest id) is taken as the main network and not reported itself:
 * the traps are the small groups around it.
 *
 * <p>Each finding covers the streets inside the trap and the one-way streets that lead into or out of
 * it, which are usually the ones whose direction is wrong. Public so the planner can explain a network
 * it cannot tour with the same message. O(nodes + edges).
 */
public final class OneWayTrapCheck implements Detector {

    @Override
    public List<Finding> find(CheckInput input) {
        return find(input.network());
    }

    public List<Finding> find(StreetNetwork network) {
        TravelArcs arcs = new TravelArcs(network);
        StrongComponents strong = StrongComponents.of(network, arcs);
        Components weak = Components.of(network);
        int k = strong.count();
        int[] nodes = new int[k];
        int[] part = new int[k];
        boolean[] hasIn = new boolean[k];
        boolean[] hasOut = new boolean[k];
        for (int v = 0; v < network.nodeCount(); v++) {
            int s = strong.of(v);
            if (s >= 0) {
                nodes[s]++;
                part[s] = weak.of(v);
            }
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            for (int arc = 2 * e; arc <= 2 * e + 1; arc++) {
                int a = strong.of(arcs.tail(arc));
                int b = strong.of(arcs.head(arc));
                if (arcs.allowed(arc) && a != b) {
                    hasOut[a] = true;
                    hasIn[b] = true;
                }
            }
        }
        int[] strongInPart = new int[weak.count()];
        int[] mainOfPart = new int[weak.count()];
        Arrays.fill(mainOfPart, -1);
        for (int s = 0; s < k; s++) {
            strongInPart[part[s]]++;
            int main = mainOfPart[part[s]];
            if (main < 0 || nodes[s] > nodes[main]) {
                mainOfPart[part[s]] = s;
            }
        }
        boolean[] trap = new boolean[k];
        for (int s = 0; s < k; s++) {
            trap[s] = strongInPart[part[s]] > 1 && s != mainOfPart[part[s]] && (!hasIn[s] || !hasOut[s]);
        }
        List<List<Integer>> inside = new ArrayList<>();
        List<List<Integer>> border = new ArrayList<>();
        for (int s = 0; s < k; s++) {
            inside.add(trap[s] ? new ArrayList<>() : null);
            border.add(trap[s] ? new ArrayList<>() : null);
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            int a = strong.of(network.from(e));
            int b = strong.of(network.to(e));
            for (int s : a == b ? new int[] {a} : new int[] {a, b}) {
                if (trap[s]) {
                    (a == b ? inside : border).get(s).add(e);
                }
            }
        }
        List<Finding> findings = new ArrayList<>();
        for (int s = 0; s < k; s++) {
            if (trap[s]) {
                findings.add(finding(network, !hasOut[s], inside.get(s), border.get(s)));
            }
        }
        return findings;
    }

    /**
     * The planner's error for streets cut off by one-way rules, with the first trap this check finds and
     * where to see them all.
     */
    public static NoTourError explain(NoTourError cutOff, StreetNetwork network, Path layer) {
        List<Finding> traps = new OneWayTrapCheck().find(network);
        if (traps.isEmpty()) {
            return cutOff;
        }
        Finding first = traps.get(0);
        return new NoTourError(String.format(Locale.ROOT, "%s. One-way trap%s: %s; %s. See every trap on a map with: "
                + "streetcomb health %s --out findings.geojson", cutOff.getMessage(),
                traps.size() == 1 ? "" : " (1 of " + traps.size() + ")", first.problem(), first.fix(), layer));
    }

    private static Finding finding(StreetNetwork network, boolean sink, List<Integer> inside, List<Integer> border) {
        int[] edges = Stream.concat(inside.stream(), border.stream()).mapToInt(Integer::intValue).sorted().toArray();
        double length = Places.length(network, edges);
        List<String> borderIds = Places.featureIds(network, border.stream().mapToInt(Integer::intValue).toArray());
        String problem = String.format(Locale.ROOT, "%d street edge%s (%.0f m) can be %s: %s",
                edges.length, edges.length == 1 ? "" : "s", length,
                sink ? "entered but not left" : "left but not entered",
                sink ? "the only ways in are one-way and none leads out" : "the only ways out are one-way and none leads in");
        String fix = "check the one-way direction of " + Places.list(borderIds, 5)
                + String.format(" (%s only lead%s %s), or add the missing way %s", borderIds.size() == 1 ? "it" : "they",
                        borderIds.size() == 1 ? "s" : "", sink ? "in" : "out", sink ? "out" : "in");
        return new Finding(FindingKind.ONE_WAY_TRAP, Severity.BLOCKING, Places.edges(network, edges),
                Places.featureIds(network, edges), length, "m", problem, fix);
    }
}
