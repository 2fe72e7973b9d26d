package org.streetcomb.tour;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.network.StreetNetwork;

/**
 * Turns a tour into driving directions: one line per run of consecutive steps on the same named street
 * with the same pass (service or deadhead) and no U-turn between them, each opened by the turn that
 * leads into it (or, where service starts or stops part of the way along a street, by the distance along
 * it), and a last line for the arrival back at the start or at the end of an open route. Turns are classified by
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
        double onStreet = 0;
        String previous = null;
        double previousMetres = 0;
        int i = 0;
        while (i < edges.length) {
            Turn turn = i == 0 ? null : Turn.between(bearings, side, edges[i - 1], forward[i - 1], edges[i], forward[i]);
            String street = network.feature(edges[i]).name();
            boolean passChange = turn != null && turn.kind() == TurnKind.CONTINUE && street.equals(previous);
            onStreet = passChange ? onStreet + previousMetres : 0;
            int j = i + 1;
            double metres = network.length(edges[i]);
            while (j < edges.length && continues(network, bearings, side, tour, j, street)) {
                metres += network.length(edges[j]);
                j++;
            }
            cumulative += metres;
            String instruction = passChange ? passChange(tour.service()[i], street, onStreet) : instruction(turn, street);
            lines.add(new Direction(lines.size() + 1, instruction, turn, street, metres, cumulative,
                    tour.service()[i], tour.entry(network, i), i, j - i));
            previous = street;
            previousMetres = metres;
            i = j;
        }
        int end = tour.end(network);
        lines.add(new Direction(lines.size() + 1, end == tour.start() ? "Arrive back at the start"
                : "Arrive at the end of the route", null, "", 0, cumulative, false, end, edges.length, 0));
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

    /**
     * Service starts or stops part of the way along a street (a mop-up of a missed stretch, say): the point is
     * told by the distance driven on the street since joining it, which the driver can read off the odometer.
     */
    private static String passChange(boolean service, String street, double metres) {
        String name = street.isEmpty() ? "the unnamed street" : street;
        return String.format(Locale.ROOT, service ? "Start service %.0f m along %s" : "Stop service %.0f m along %s; drive on",
                metres, name);
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
