package org.streetcomb.tour;

import java.util.ArrayList;
import java.util.List;
import org.streetcomb.network.StreetNetwork;

/**
 * Turns a tour into driving directions: one line per run of consecutive steps on the same named street
 * with the same pass (service or deadhead) and no U-turn between them, each opened by the turn that
 * leads into it, and a last line for the arrival back at the start. Turns are classified by
 * {@link TurnKind} from the geometry and sided by the {@link TrafficSide}. O(steps).
 */
public final class Directions {

    private Directions() {
    }

    public static List<Direction> of(StreetNetwork network, EdgeBearings bearings, TrafficSide side, Tour tour) {
        List<Direction> lines = new ArrayList<>();
        int[] edges = tour.edges();
        boolean[] forward = tour.forward();
        double cumulative = 0;
        int i = 0;
        while (i < edges.length) {
            Turn turn = i == 0 ? null : Turn.between(bearings, side, edges[i - 1], forward[i - 1], edges[i], forward[i]);
            String street = network.feature(edges[i]).name();
            int j = i + 1;
            double metres = network.length(edges[i]);
            while (j < edges.length && continues(network, bearings, side, tour, j, street)) {
                metres += network.length(edges[j]);
                j++;
            }
            cumulative += metres;
            lines.add(new Direction(lines.size() + 1, instruction(turn, street), turn, street, metres, cumulative,
                    tour.service()[i], tour.entry(network, i), i, j - i));
            i = j;
        }
        lines.add(new Direction(lines.size() + 1, "Arrive back at the start", null, "", 0, cumulative, false,
                tour.start(), edges.length, 0));
        return lines;
    }

    private static boolean continues(StreetNetwork network, EdgeBearings bearings, TrafficSide side, Tour tour,
                                     int j, String street) {
        int[] edges = tour.edges();
        boolean[] forward = tour.forward();
        if (tour.service()[j] != tour.service()[j - 1]) {
            return false;
        }
        TurnKind kind = Turn.between(bearings, side, edges[j - 1], forward[j - 1], edges[j], forward[j]).kind();
        if (kind == TurnKind.U_TURN) {
            return false;
        }
        String next = network.feature(edges[j]).name();
        return street.isEmpty() ? next.isEmpty() && kind == TurnKind.CONTINUE : street.equals(next);
    }

    private static String instruction(Turn turn, String street) {
        String name = street.isEmpty() ? "the unnamed street" : street;
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
}
