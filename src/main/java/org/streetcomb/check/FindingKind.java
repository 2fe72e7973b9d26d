package org.streetcomb.check;

import java.util.Locale;

/** The kinds of defect the health check looks for, in the order reports list them. */
public enum FindingKind {
    /** Streets that no road joins to the largest part of the network. */
    SEPARATE_PART,
    /** Streets that one-way restrictions let a vehicle enter but not leave, or leave but not enter. */
    ONE_WAY_TRAP,
    /** Streets in the depot's part that a vehicle cannot reach from the depot, or cannot return from. */
    DEPOT_UNREACHABLE,
    /** A dead end that stops just short of another street. */
    UNDERSHOOT,
    /** A short dead-end stub just past a junction. */
    OVERSHOOT,
    /** The same street drawn twice. */
    DUPLICATE,
    /** Two lines that cross with no shared vertex: a bridge, a tunnel or a missing junction. */
    CROSSING,
    /** A line of zero or negligible length, or one that doubles back on itself. */
    DEGENERATE,
    /** Features the reader left out, with the reason. */
    DROPPED;

    /** The name used in JSON, GeoJSON and the text summary. */
    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }
}
