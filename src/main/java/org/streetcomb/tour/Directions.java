package org.streetcomb.tour;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.RoadFeature;

/**
 * Turns a tour into driving directions: one line per run of consecutive steps on the same street with the
 * same pass (service or deadhead) and no U-turn between them, each opened by the turn that leads into it (or,
 * where service starts or stops part of the way along a street, by the distance along it), and a last line for
 * the arrival back at the start or at the end of an open route. Steps on streets of one name merge; an unnamed
 * way merges only with the rest of the same source feature, and is told by its class and the named street it
 * leads to or comes from ({@link StreetLabel}). Turns are classified by {@link TurnKind} from the geometry and
 * sided by the {@link TrafficSide}. O(steps).
 */
public final class Directions {

    /** How many lines away an unnamed way looks for a named street to tie it to. */
    private static final int NEAR_LINES = 2;

    private Directions() {
    }

    /** One run of steps before it is worded. */
    private record Run(int first, int steps, Turn turn, RoadFeature feature, double metres, double cumulative,
                       boolean service, boolean passChange, double onStreet) {
    }

    public static List<Direction> of(StreetNetwork network, EdgeBearings bearings, TrafficSide side, Tour tour) {
        List<Run> runs = runs(network, bearings, side, tour);
        List<Direction> lines = new ArrayList<>(runs.size() + 1);
        for (int r = 0; r < runs.size(); r++) {
            Run run = runs.get(r);
            String street = label(runs, r);
            String instruction = run.passChange() ? passChange(run.service(), street, run.onStreet())
                    : instruction(run.turn(), street);
            lines.add(new Direction(lines.size() + 1, instruction, run.turn(), street, run.metres(), run.cumulative(),
                    run.service(), tour.entry(network, run.first()), run.first(), run.steps(), run.feature().id()));
        }
        int end = tour.end(network);
        double cumulative = runs.isEmpty() ? 0 : runs.get(runs.size() - 1).cumulative();
        lines.add(new Direction(lines.size() + 1, end == tour.start() ? "Arrive back at the start"
                : "Arrive at the end of the route", null, "", 0, cumulative, false, end, tour.edges().length, 0, ""));
        return lines;
    }

    private static List<Run> runs(StreetNetwork network, EdgeBearings bearings, TrafficSide side, Tour tour) {
        List<Run> runs = new ArrayList<>();
        int[] edges = tour.edges();
        boolean[] forward = tour.forward();
        double cumulative = 0;
        double onStreet = 0;
        String previous = null;
        double previousMetres = 0;
        int i = 0;
        while (i < edges.length) {
            Turn turn = i == 0 ? null : Turn.between(bearings, side, edges[i - 1], forward[i - 1], edges[i], forward[i]);
            RoadFeature feature = network.feature(edges[i]);
            String key = StreetLabel.key(feature);
            // the same street again after anything but a U-turn: service starts or stops along it (on a roundabout,
            // whose pieces meet at any angle, whatever the turn)
            boolean passChange = turn != null && key.equals(previous) && turn.kind() != TurnKind.U_TURN
                    && (turn.kind() == TurnKind.CONTINUE || turn.kind() == TurnKind.BEAR || StreetLabel.roundabout(feature));
            onStreet = passChange ? onStreet + previousMetres : 0;
            int j = i + 1;
            double metres = network.length(edges[i]);
            while (j < edges.length && continues(network, bearings, side, tour, j, key)) {
                metres += network.length(edges[j]);
                j++;
            }
            cumulative += metres;
            runs.add(new Run(i, j - i, turn, feature, metres, cumulative, tour.service()[i], passChange, onStreet));
            previous = key;
            previousMetres = metres;
            i = j;
        }
        return runs;
    }

    private static boolean continues(StreetNetwork network, EdgeBearings bearings, TrafficSide side, Tour tour,
                                     int j, String key) {
        int[] edges = tour.edges();
        boolean[] forward = tour.forward();
        if (tour.service()[j] != tour.service()[j - 1]) {
            return false;
        }
        TurnKind kind = Turn.between(bearings, side, edges[j - 1], forward[j - 1], edges[j], forward[j]).kind();
        return kind != TurnKind.U_TURN && key.equals(StreetLabel.key(network.feature(edges[j])));
    }

    /**
     * The street of run r: its name, or for an unnamed way its class tied to the nearest named street ahead
     * ("towards"), else behind ("from"), within {@link #NEAR_LINES} lines.
     */
    private static String label(List<Run> runs, int r) {
        RoadFeature feature = runs.get(r).feature();
        String label = StreetLabel.of(feature);
        if (!feature.name().isEmpty()) {
            return label;
        }
        for (int k = r + 1; k < runs.size() && k <= r + NEAR_LINES; k++) {
            String name = runs.get(k).feature().name();
            if (!name.isEmpty()) {
                return label + " towards " + name;
            }
        }
        for (int k = r - 1; k >= 0 && k >= r - NEAR_LINES; k--) {
            String name = runs.get(k).feature().name();
            if (!name.isEmpty()) {
                return label + " from " + name;
            }
        }
        return label;
    }

    /**
     * Service starts or stops part of the way along a street (a mop-up of a missed stretch, say): the point is
     * told by the distance driven on the street since joining it, which the driver can read off the odometer.
     */
    private static String passChange(boolean service, String street, double metres) {
        return String.format(Locale.ROOT, service ? "Start service %.0f m along %s" : "Stop service %.0f m along %s; drive on",
                metres, the(street));
    }

    private static String instruction(Turn turn, String street) {
        String name = the(street);
        if (turn == null) {
            return "Start on " + name;
        }
        String way = turn.angle() < 0 ? "left" : "right";
        return switch (turn.kind()) {
            case CONTINUE -> "Continue on " + name;
            case BEAR -> "Bear " + way + " onto " + name;
            case TURN -> "Turn " + way + " onto " + name;
            case SHARP -> "Turn sharp " + way + " onto " + name;
            case U_TURN -> "Make a U-turn onto " + name;
        };
    }

    /** "the unnamed service road", but a name as it is. */
    private static String the(String street) {
        return street.startsWith("unnamed ") ? "the " + street : street;
    }
}
