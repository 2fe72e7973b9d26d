package org.streetcomb.coverage;

/**
 * A stretch of a one-way street that a track drove against the street's permitted direction. It is not
 * credited as driven; it is shown so a supervisor can check the track or the one-way data.
 *
 * @param edge  the network edge (a one-way edge)
 * @param from  offset of its start along the edge's digitised direction, metres
 * @param to    offset of its end, metres ({@code to > from})
 * @param along whether it was driven along the edge's digitised direction
 */
public record WrongWayPart(int edge, double from, double to, boolean along) {

    public double length() {
        return to - from;
    }
}
