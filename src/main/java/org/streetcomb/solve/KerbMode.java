package org.streetcomb.solve;

/** How many service passes a required street needs. */
public enum KerbMode {
    /** One pass per street, in any permitted direction. */
    ONE_PASS,
    /** Each two-way street once in each direction (both kerbs); each one-way street once along it. */
    BOTH_KERBS,
    /** As {@link #BOTH_KERBS}, and each one-way street twice along it (one pass per kerb). */
    BOTH_KERBS_ONE_WAY_TWICE
}
