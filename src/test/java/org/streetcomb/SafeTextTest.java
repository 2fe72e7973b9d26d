package org.streetcomb;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The three rules for text that travels, against the documents that state them. */
class SafeTextTest {

    @Test
    void xmlKeepsOnlyTheCharProduction() {
        // W3C XML 1.0 (fifth edition) section 2.2: #x9 | #xA | #xD | [#x20-#xD7FF] | [#xE000-#xFFFD] | [#x10000-#x10FFFF]
        assertEquals("a\tb\nc\rd", SafeText.xml("a\tb\nc\rd"));
        assertEquals("Tallow Street", SafeText.xml("Tallow\u0001 \u001bStreet\u0000"));
        assertEquals("ab", SafeText.xml("a\uFFFEb\uFFFF"));
        assertEquals("a\uD83D\uDE97b", SafeText.xml("a\uD83D\uDE97b")); // a pair: U+1F697 is allowed
        assertEquals("ab", SafeText.xml("a\uD83Db\uDE97")); // unpaired halves are not
    }

    @Test
    void csvFollowsOwaspGuidance() {
        // OWASP CSV Injection: cells starting with = + - @ tab or carriage return are prefixed with '
        assertEquals("'=1+1", SafeText.csvField("=1+1"));
        assertEquals("'+1", SafeText.csvField("+1"));
        assertEquals("'-1", SafeText.csvField("-1"));
        assertEquals("'@SUM(A1)", SafeText.csvField("@SUM(A1)"));
        assertEquals("'\tx", SafeText.csvField("\tx"));
        assertEquals("\"'\rx\"", SafeText.csvField("\rx"));
        assertEquals("\"'=HYPERLINK(\"\"a\"\",\"\"b\"\")\"", SafeText.csvField("=HYPERLINK(\"a\",\"b\")"));
        assertEquals("Quillon Road", SafeText.csvField("Quillon Road"));
    }

    @Test
    void terminalShowsControlCharacters() {
        assertEquals("id \\x1B]0;t\\x07 ok\n", SafeText.terminal("id \u001b]0;t\u0007 ok\n"));
        assertEquals("\\x9B31m", SafeText.terminal("\u009b31m"));
    }
}
