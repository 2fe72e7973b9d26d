package org.streetcomb.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.Writer;
import org.streetcomb.SafeText;

/**
 * Everything the commands print passes through here, so control characters from input data (an escape
 * sequence in a feature id or street name) are shown as {@code \xNN} instead of acting on the terminal.
 * Written summaries and messages carry no control characters of their own besides line feeds and tabs.
 */
final class TerminalSafeWriter extends FilterWriter {

    TerminalSafeWriter(Writer out) {
        super(out);
    }

    @Override
    public void write(int c) throws IOException {
        out.write(SafeText.terminal(String.valueOf((char) c)));
    }

    @Override
    public void write(char[] text, int offset, int length) throws IOException {
        out.write(SafeText.terminal(new String(text, offset, length)));
    }

    @Override
    public void write(String text, int offset, int length) throws IOException {
        out.write(SafeText.terminal(text.substring(offset, offset + length)));
    }
}
