package org.streetcomb.check;

import java.util.Locale;

/** How much a finding matters to planning. */
public enum Severity {
    /** No tour that services every street and returns can exist until it is fixed. */
    BLOCKING,
    /** A tour can be planned, but it will probably be wrong or longer than it should be. */
    WARNING,
    /** Worth knowing; the plan is not affected or the planner already handles it. */
    NOTE;

    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }
}
