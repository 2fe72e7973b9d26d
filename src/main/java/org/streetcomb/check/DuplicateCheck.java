package org.streetcomb.check;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import java.util.Locale;
import java.util.TreeMap;
import org.locationtech.jts.algorithm.distance.DiscreteHausdorffDistance;
import org.streetcomb.network.StreetNetwork;

/**
 * Finds streets drawn twice. Noding splits overlapping lines where the overlap starts and ends, so a
 * repeated stretch becomes two edges between the same pair of nodes; two such edges are duplicates when
 * their discrete Hausdorff distance (JTS {@link DiscreteHausdorffDistance}, segments densified to a tenth)
 * is at most {@link CheckOptions#duplicate()} metres. Distinct streets between the same junctions (a
 * crescent beside a straight road) are farther apart and are not reported. Edges are grouped by their
 * node pair with one sort, O(edges log edges), and compared only within a group.
 */
public final class DuplicateCheck implements Detector {

    private static final double DENSIFY = 0.1;

    @Override
    public List<Finding> find(CheckInput input) {
        StreetNetwork network = input.network();
        int[] original = originals(input);
        // one finding per pair of features: the copy's feature first, then the original's, in layer order
        TreeMap<Long, List<Integer>> byPair = new TreeMap<>();
        long features = network.features().size();
        for (int e = 0; e < original.length; e++) {
            if (original[e] >= 0) {
                byPair.computeIfAbsent(network.featureIndex(e) * features + network.featureIndex(original[e]),
                        k -> new ArrayList<>()).add(e);
            }
        }
        List<Finding> findings = new ArrayList<>();
        for (List<Integer> group : byPair.values()) {
            int[] edges = group.stream().mapToInt(Integer::intValue).toArray();
            String id = network.feature(edges[0]).id();
            String first = network.feature(original[edges[0]]).id();
            double length = Places.length(network, edges);
            findings.add(new Finding(FindingKind.DUPLICATE, Severity.WARNING, Places.edges(network, edges),
                    Places.featureIds(network, original[edges[0]], edges[0]), length, "m",
                    String.format(Locale.ROOT, "%.1f m of feature %s repeats %s", length, id,
                            id.equals(first) ? "another part of itself" : "feature " + first)
                            + (edges.length == 1 ? "" : " in " + edges.length + " pieces"),
                    "delete the repeated part of feature " + id + ", or plan with --drop-duplicates"));
        }
        return findings;
    }

    /** The edges that repeat an edge of lower id. */
    public BitSet duplicates(CheckInput input) {
        int[] original = originals(input);
        BitSet repeats = new BitSet(original.length);
        for (int e = 0; e < original.length; e++) {
            if (original[e] >= 0) {
                repeats.set(e);
            }
        }
        return repeats;
    }

    /** For each edge, the lowest-id edge it repeats, or -1. */
    private static int[] originals(CheckInput input) {
        StreetNetwork network = input.network();
        int m = network.edgeCount();
        long[] key = new long[m];
        Integer[] order = new Integer[m];
        for (int e = 0; e < m; e++) {
            key[e] = pairKey(network, e);
            order[e] = e;
        }
        Arrays.sort(order, (x, y) -> key[x] != key[y] ? Long.compare(key[x], key[y]) : Integer.compare(x, y));
        int[] original = new int[m];
        Arrays.fill(original, -1);
        for (int i = 0; i < m; ) {
            int j = i;
            while (j < m && key[order[j]] == key[order[i]]) {
                j++;
            }
            for (int a = i; a < j; a++) {
                for (int b = a + 1; b < j; b++) {
                    int ea = order[a];
                    int eb = order[b];
                    if (original[eb] < 0 && original[ea] < 0 && DiscreteHausdorffDistance.distance(
                            input.edgeLine(ea), input.edgeLine(eb), DENSIFY) <= input.options().duplicate()) {
                        original[eb] = ea;
                    }
                }
            }
            i = j;
        }
        return original;
    }

    /** The unordered pair of end nodes as one number. */
    private static long pairKey(StreetNetwork network, int e) {
        int a = Math.min(network.from(e), network.to(e));
        int b = Math.max(network.from(e), network.to(e));
        return (long) a * network.nodeCount() + b;
    }
}
