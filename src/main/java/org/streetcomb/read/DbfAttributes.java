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
        checkLengths(file, label);
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

    /**
     * Checks the lengths the dBase header states (bytes 4-11: record count, header length, record length)
     * against the field list and the file's real size before any record is read: a header that lies about
     * them shifts every record, and the reader then returns blank or garbled attributes without complaint.
     */
    private static void checkLengths(Path file, String label) throws IOException {
        long size = Files.size(file);
        if (size < 33) {
            throw InputError.at(label, null, "not a readable .dbf table: " + size + " bytes is too short for its header");
        }
        byte[] head;
        try (InputStream in = Files.newInputStream(file)) {
            head = in.readNBytes((int) Math.min(size, 32 + 32 * 256 + 1 + 263));
        }
        java.nio.ByteBuffer b = java.nio.ByteBuffer.wrap(head).order(java.nio.ByteOrder.LITTLE_ENDIAN);
        long records = Integer.toUnsignedLong(b.getInt(4));
        int headerLength = Short.toUnsignedInt(b.getShort(8));
        int recordLength = Short.toUnsignedInt(b.getShort(10));
        int end = 32;
        int fields = 1; // the deletion flag that starts every record
        while (end < head.length && head[end] != 0x0D) {
            if (end + 32 > head.length) {
                throw InputError.at(label, null, "not a readable .dbf table: the field list has no end mark");
            }
            fields += Byte.toUnsignedInt(head[end + 16]);
            end += 32;
        }
        if (headerLength < end + 1) {
            throw InputError.at(label, "header", "states a header of " + headerLength + " bytes, but its field list "
                    + "runs to byte " + (end + 1) + ": the header is damaged");
        }
        if (recordLength != fields) {
            throw InputError.at(label, "header", "states records of " + recordLength + " bytes, but its fields add up "
                    + "to " + fields + ": the header is damaged");
        }
        if (headerLength + records * recordLength > size) {
            throw InputError.at(label, "header", "states " + records + " records of " + recordLength + " bytes after a "
                    + headerLength + "-byte header, " + (headerLength + records * recordLength) + " bytes in all, but "
                    + "the file holds " + size + ": truncated or damaged");
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
