package org.streetcomb.read;

/** Who travels the tour: selects OpenStreetMap road classes and which one-way tags apply. */
public enum TravelMode {
    DRIVE, WALK
}
