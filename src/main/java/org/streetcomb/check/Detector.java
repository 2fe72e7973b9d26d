package org.streetcomb.check;

import java.util.List;

/** Finds one kind of defect. */
interface Detector {

    /** The findings, in a deterministic order (the same input gives the same list). */
    List<Finding> find(CheckInput input);
}
