package org.streetcomb.mopup;

import org.streetcomb.coverage.CoverageReport;
import org.streetcomb.coverage.MissedPart;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.streetcomb.network.SplitNetwork;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.Travel;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.tour.Tour;

/**
 * The network a mop-up is planned on: each edge flagged for mop-up ({@link CoverageReport#mopUp}) is cut at
 * the ends of its missed stretches, so that each stretch becomes an edge of its own that needs a service pass
 * in the way it was missed (either way, along, or against the digitised direction), and the driven rest of
 * the edge becomes road that may be driven as deadhead but needs no service. Every other edge is kept whole
 * with no demand.
 *
 * <p>A driven stretch shorter than {@link #MERGE_GAP} between two missed stretches of the same way, or
 * between a missed stretch and the end of its edge, or a driven edge that short between missed stretches of
 * its street line, is serviced with them: the crew is not told to stop and restart service for a few metres,
 * and a driven stretch that short is within the reach of GPS noise (two standard deviations of the audit's
 * default 10 m), so it may not have been driven at all. O(edges + missed parts log missed parts).
 *
 * @param split   the cut network, with each piece's parent edge and offsets
 * @param demand  the service passes each piece needs
 */
public record MissedStretchNetwork(SplitNetwork split, ServiceDemand demand) {

    /** Driven stretches shorter than this (metres) between missed ones, or at an edge's end, are serviced with them. */
    public static final double MERGE_GAP = 20;

    public StreetNetwork network() {
        return split.network();
    }

    public static MissedStretchNetwork of(CoverageReport report) {
        StreetNetwork network = report.network();
        int m = network.edgeCount();
        List<List<MissedPart>> byEdge = new ArrayList<>(m);
        for (int e = 0; e < m; e++) {
            byEdge.add(new ArrayList<>());
        }
        for (MissedPart part : report.missed()) {
            if (report.mopUp()[part.edge()]) {
                byEdge.get(part.edge()).add(part);
            }
        }
        List<List<MissedPart>> stretches = new ArrayList<>(m);
        for (int e = 0; e < m; e++) {
            stretches.add(merged(byEdge.get(e), network.length(e)));
        }
        bridgeShortEdges(report, stretches);
        double[][] cuts = new double[m][];
        for (int e = 0; e < m; e++) {
            cuts[e] = cuts(stretches.get(e), network.length(e));
        }
        SplitNetwork split = SplitNetwork.of(network, cuts);
        int pieces = split.network().edgeCount();
        int[] along = new int[pieces];
        int[] against = new int[pieces];
        int[] either = new int[pieces];
        for (int p = 0; p < pieces; p++) {
            double middle = (split.start()[p] + split.end()[p]) / 2;
            for (MissedPart s : stretches.get(split.parent()[p])) {
                if (s.from() <= middle && middle <= s.to()) {
                    switch (s.way()) {
                        case ALONG -> along[p] = 1;
                        case AGAINST -> against[p] = 1;
                        case EITHER -> either[p] = 1;
                    }
                }
            }
        }
        return new MissedStretchNetwork(split, new ServiceDemand(along, against, either));
    }

    /** The demand on the audited network's whole edges: a pass each way in which one of an edge's stretches needs one. */
    public ServiceDemand wholeEdges() {
        int m = split.parent().length == 0 ? 0 : split.parent()[split.parent().length - 1] + 1;
        int[] along = new int[m];
        int[] against = new int[m];
        int[] either = new int[m];
        for (int p = 0; p < split.parent().length; p++) {
            int e = split.parent()[p];
            along[e] = Math.max(along[e], demand.along()[p]);
            against[e] = Math.max(against[e], demand.against()[p]);
            either[e] = Math.max(either[e], demand.either()[p]);
        }
        return new ServiceDemand(along, against, either);
    }

    /**
     * A tour of the audited network driven over the pieces: each step becomes the pieces of its edge in the
     * order driven, and a service step services only those pieces that need service in its direction.
     */
    public Tour expand(Tour tour) {
        int[] edges = new int[split.parent().length + tour.steps()];
        boolean[] forward = new boolean[edges.length];
        boolean[] service = new boolean[edges.length];
        int n = 0;
        for (int i = 0; i < tour.steps(); i++) {
            int e = tour.edges()[i];
            boolean along = tour.forward()[i];
            int first = split.firstPiece(e);
            int last = split.firstPiece(e + 1) - 1;
            for (int k = 0; k <= last - first; k++) {
                int p = along ? first + k : last - k;
                if (n == edges.length) {
                    edges = Arrays.copyOf(edges, 2 * n);
                    forward = Arrays.copyOf(forward, 2 * n);
                    service = Arrays.copyOf(service, 2 * n);
                }
                edges[n] = p;
                forward[n] = along;
                service[n] = tour.service()[i] && demand.either()[p] + (along ? demand.along()[p] : demand.against()[p]) > 0;
                n++;
            }
        }
        return new Tour(tour.start(), Arrays.copyOf(edges, n), Arrays.copyOf(forward, n), Arrays.copyOf(service, n));
    }

    /** The edge's missed parts with short driven gaps between those of the same way closed, sorted by way and start. */
    static List<MissedPart> merged(List<MissedPart> parts, double length) {
        List<MissedPart> sorted = new ArrayList<>(parts);
        sorted.sort((a, b) -> a.way() != b.way() ? a.way().compareTo(b.way()) : Double.compare(a.from(), b.from()));
        List<MissedPart> out = new ArrayList<>();
        for (MissedPart part : sorted) {
            double from = part.from() < MERGE_GAP ? 0 : part.from();
            double to = length - part.to() < MERGE_GAP ? length : part.to();
            MissedPart last = out.isEmpty() ? null : out.get(out.size() - 1);
            if (last != null && last.way() == part.way() && from - last.to() < MERGE_GAP) {
                out.set(out.size() - 1, new MissedPart(part.edge(), last.from(), Math.max(last.to(), to), part.way()));
            } else {
                out.add(new MissedPart(part.edge(), from, to, part.way()));
            }
        }
        return out;
    }

    /**
     * A driven edge shorter than {@link #MERGE_GAP} between two missed stretches of the same street line (a
     * staggered crossroads, say) is serviced with them, for the reason gaps inside an edge are. Both kerbs of
     * a two-way street are left as they are: each side has its own stretches.
     */
    private static void bridgeShortEdges(CoverageReport report, List<List<MissedPart>> stretches) {
        StreetNetwork network = report.network();
        List<MissedPart> bridges = new ArrayList<>();
        for (int e = 0; e < network.edgeCount(); e++) {
            Travel travel = network.travel(e);
            if (!stretches.get(e).isEmpty() || !network.required(e) || network.length(e) >= MERGE_GAP
                    || report.bothKerbs() && travel == Travel.BOTH) {
                continue;
            }
            MissedPart.Way way = travel == Travel.BOTH ? MissedPart.Way.EITHER
                    : travel == Travel.FORWARD ? MissedPart.Way.ALONG : MissedPart.Way.AGAINST;
            if (meets(network, stretches, e, network.from(e), way) && meets(network, stretches, e, network.to(e), way)) {
                bridges.add(new MissedPart(e, 0, network.length(e), way));
            }
        }
        for (MissedPart bridge : bridges) {
            stretches.set(bridge.edge(), List.of(bridge));
        }
    }

    /** Whether another edge of {@code edge}'s street line has a stretch of this way reaching {@code node}. */
    private static boolean meets(StreetNetwork network, List<List<MissedPart>> stretches, int edge, int node,
                                 MissedPart.Way way) {
        for (int i = network.incidenceStart(node); i < network.incidenceEnd(node); i++) {
            int f = network.incidentEdge(i);
            if (f == edge || network.featureIndex(f) != network.featureIndex(edge)) {
                continue;
            }
            for (MissedPart s : stretches.get(f)) {
                boolean reaches = node == network.from(f) && s.from() == 0 || node == network.to(f) && s.to() == network.length(f);
                if (reaches && s.way() == way) {
                    return true;
                }
            }
        }
        return false;
    }

    /** The stretches' ends inside the edge, in increasing order. */
    private static double[] cuts(List<MissedPart> stretches, double length) {
        double[] cuts = new double[2 * stretches.size()];
        int n = 0;
        for (MissedPart s : stretches) {
            if (s.from() > 0) {
                cuts[n++] = s.from();
            }
            if (s.to() < length) {
                cuts[n++] = s.to();
            }
        }
        double[] sorted = Arrays.copyOf(cuts, n);
        Arrays.sort(sorted);
        return sorted;
    }
}
