package org.streetcomb;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Library exceptions reach the user as a line without Java class names. */
class InputErrorTest {

    @Test
    void inWordsDropsClassNames() {
        assertEquals("-1411311330", InputError.inWords(new RuntimeException("java.lang.NegativeArraySizeException: -1411311330")));
        assertEquals("blob too big", InputError.inWords(new RuntimeException("FileFormatException: blob too big\nat line 2")));
        assertEquals("the data make no sense at this point", InputError.inWords(new IllegalStateException()));
    }
}
