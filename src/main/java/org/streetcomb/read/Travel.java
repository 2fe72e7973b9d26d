package org.streetcomb.read;

/** Which ways a street may be travelled, relative to the direction its line was digitised in. */
public enum Travel {
    BOTH, FORWARD, BACKWARD;

    public boolean oneWay() {
        return this != BOTH;
    }
}
