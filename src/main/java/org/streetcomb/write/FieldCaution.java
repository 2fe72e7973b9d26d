package org.streetcomb.write;

/** The safety caution every file meant for the field carries (GPX, KML, direction sheets). */
public final class FieldCaution {

    public static final String TEXT = "Plans are advice: obey traffic law and signs, never handle a device while "
            + "driving, follow local rules and your own risk assessment; map data may be out of date.";

    private FieldCaution() {
    }
}
