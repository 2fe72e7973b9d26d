package org.streetcomb.read;

import com.linuxense.javadbf.DBFCharsetHelper;
import com.linuxense.javadbf.DBFException;
import com.linuxense.javadbf.DBFReader;
import java.io.BufferedInputStream;
import java.io.Closeable;
import java.io.IOException;
import java.io.InputStream;
import java.math.BigDecimal;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import org.streetcomb.InputError;

/**
 * Streams the attribute records of a shapefile's .dbf table with javadbf, decoding text as the layer says.
 *
 * <p>The charset comes from the .cpg file when there is one; UTF-8 text that is not valid UTF-8 is then
 * an error naming the record and field. Without a .cpg, each text value is read as UTF-8 when it is valid
 * UTF-8 (exports often write UTF-8 whatever the header claims), and otherwise in the charset of the
 * header's language driver byte, falling back to ISO-8859-1; such values are counted in the report. To
 * see the raw bytes, javadbf reads text as ISO-8859-1, which maps every byte to one char.
 */
final class DbfAttributes implements Closeable {

    private final String label;
    private final DBFReader reader;
    private final String[] names;
    private final Charset declared;
    private final Charset fallback;
    private int record;

    /**
     * @param declared the charset the .cpg file states, or null when there is none
     * @param label    how errors name the file
     */
    DbfAttributes(Path file, Charset declared, String label) throws IOException {
        this.label = label;
        this.declared = declared;
        this.fallback = languageDriverCharset(file);
        InputStream in = new BufferedInputStream(Files.newInputStream(file), 1 << 16);
        try {
            this.reader = new DBFReader(in, StandardCharsets.ISO_8859_1);
        } catch (DBFException e) {
            in.close();
            throw InputError.at(label, null, "not a readable .dbf table: " + e.getMessage());
        }
        names = new String[reader.getFieldCount()];
        for (int i = 0; i < names.length; i++) {
            names[i] = decodeStrict(reader.getField(i).getName(), StandardCharsets.UTF_8, "field name " + (i + 1));
        }
    }

    int recordCount() {
        return reader.getRecordCount();
    }

    /** The next record's attributes as text (empty values left out), with {@code tally} counting fallbacks. */
    Map<String, String> next(ReadTally tally) {
        record++;
        Object[] values;
        try {
            values = reader.nextRecord();
        } catch (DBFException e) {
            throw InputError.at(label, "record " + record, "unreadable: " + e.getMessage());
        }
        if (values == null) {
            throw InputError.at(label, "record " + record, "the table ends early: it declares " + recordCount() + " records");
        }
        Map<String, String> properties = new LinkedHashMap<>();
        for (int i = 0; i < names.length; i++) {
            String text = text(values[i], names[i], tally);
            if (text != null && !text.isEmpty()) {
                properties.put(names[i], text);
            }
        }
        return properties;
    }

    private String text(Object value, String field, ReadTally tally) {
        if (value == null) {
            return null;
        }
        if (value instanceof BigDecimal number) {
            return number.stripTrailingZeros().toPlainString();
        }
        if (!(value instanceof String raw)) {
            return value.toString();
        }
        String place = "field " + field;
        if (declared != null) {
            return decodeStrict(raw, declared, place).strip();
        }
        try {
            return decode(raw, StandardCharsets.UTF_8).strip();
        } catch (CharacterCodingException notUtf8) {
            tally.note("text not valid UTF-8, read as " + fallback.name());
            return new String(raw.getBytes(StandardCharsets.ISO_8859_1), fallback).strip();
        }
    }

    private String decodeStrict(String raw, Charset charset, String place) {
        try {
            return decode(raw, charset);
        } catch (CharacterCodingException e) {
            throw InputError.at(label, (record == 0 ? "header" : "record " + record) + ", " + place,
                    "text is not valid " + charset.name() + " (the encoding the .cpg file states)");
        }
    }

    private static String decode(String raw, Charset charset) throws CharacterCodingException {
        return charset.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT)
                .decode(ByteBuffer.wrap(raw.getBytes(StandardCharsets.ISO_8859_1))).toString();
    }

    /** The charset named by the header's language driver byte (offset 29), or ISO-8859-1. */
    private static Charset languageDriverCharset(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            byte[] head = in.readNBytes(32);
            Charset charset = head.length == 32 ? DBFCharsetHelper.getCharsetByByte(head[29] & 0xff) : null;
            return charset == null ? StandardCharsets.ISO_8859_1 : charset;
        }
    }

    @Override
    public void close() throws IOException {
        reader.close();
    }
}
