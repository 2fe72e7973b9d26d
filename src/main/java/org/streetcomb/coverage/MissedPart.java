package org.streetcomb.coverage;

/**
 * A stretch of a required street that was not driven, in a required direction.
 *
 * @param edge  the network edge
 * @param from  offset of its start along the edge's digitised direction, metres
 * @param to    offset of its end, metres ({@code to > from})
 * @param way   which way it must still be driven
 */
public record MissedPart(int edge, double from, double to, Way way) {

    /** The direction a missed stretch must be driven in, relative to the edge's digitised direction. */
    public enum Way {
        /** Either way: a two-way street passed once. */
        EITHER("either"),
        /** Along the digitised direction. */
        ALONG("along"),
        /** Against the digitised direction. */
        AGAINST("against");

        private final String label;

        Way(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    public double length() {
        return to - from;
    }
}
