package org.streetcomb.coverage;

/** How much of a street was driven, against the threshold the user set for "covered". */
public enum CoverageStatus {
    /** At least the threshold share of the street was driven (in the right direction where that matters). */
    COVERED("covered"),
    /** Some of it was driven, but less than the threshold. */
    PARTLY("partly"),
    /** Less than {@link StreetCoverageAccounting#MISSED_BELOW} of it was driven. */
    MISSED("missed"),
    /** The street need not be serviced (only travelled on). */
    NOT_REQUIRED("not required"),
    /** Required by the layer, but outside what the plan asked for (cut off by one-way streets, another part, not listed). */
    LEFT_OUT("left out of the plan");

    private final String label;

    CoverageStatus(String label) {
        this.label = label;
    }

    /** The word used in outputs. */
    public String label() {
        return label;
    }
}
