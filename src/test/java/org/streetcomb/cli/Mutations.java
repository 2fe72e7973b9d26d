package org.streetcomb.cli;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.Random;

/**
 * Byte-level mutations of a valid file, the kinds general-purpose fuzzers apply: flipped bits, bytes set to
 * boundary values, numbers in text replaced by extreme ones, chunks inserted, deleted, repeated or moved,
 * and truncation. One to four are stacked per mutant, each drawn from the seeded random source.
 */
final class Mutations {

    /** Bytes at the edges of signed and unsigned ranges, and text that changes a parser's state. */
    private static final byte[] INTERESTING = {0, 1, 0x7f, (byte) 0x80, (byte) 0xff, '"', '<', '>', '{', '}', '[',
            ']', ',', '-', '.', 'e', '\n', '\\', '&'};
    /** Numbers written over a number in text: huge, negative, not finite, malformed. */
    private static final String[] NUMBERS = {"1e308", "-1e308", "NaN", "Infinity", "-0", "99999999999999999999",
            "2147483648", "-2147483649", "4294967296", "1.7976931348623157e309", "0x10", "1e-400", "", "-", "1..2"};

    private Mutations() {
    }

    static byte[] mutate(byte[] data, Random random) {
        byte[] result = data;
        int stacked = 1 + random.nextInt(4);
        for (int i = 0; i < stacked && result.length > 0; i++) {
            result = once(result, random);
        }
        return result;
    }

    private static byte[] once(byte[] data, Random random) {
        byte[] copy = data.clone();
        int at = random.nextInt(copy.length);
        switch (random.nextInt(8)) {
            case 0 -> {
                for (int k = 1 + random.nextInt(8); k > 0; k--) {
                    int p = random.nextInt(copy.length);
                    copy[p] ^= (byte) (1 << random.nextInt(8));
                }
                return copy;
            }
            case 1 -> {
                copy[at] = INTERESTING[random.nextInt(INTERESTING.length)];
                return copy;
            }
            case 2 -> {
                return replaceNumber(copy, at, random);
            }
            case 3 -> {
                int len = 1 + random.nextInt(Math.min(64, copy.length - at));
                return splice(copy, at, at + len, new byte[0]);
            }
            case 4 -> {
                int len = 1 + random.nextInt(Math.min(256, copy.length - at));
                byte[] chunk = java.util.Arrays.copyOfRange(copy, at, at + len);
                int times = 1 + random.nextInt(4);
                ByteArrayOutputStream repeated = new ByteArrayOutputStream();
                for (int t = 0; t < times; t++) {
                    repeated.writeBytes(chunk);
                }
                return splice(copy, at, at, repeated.toByteArray());
            }
            case 5 -> {
                byte[] noise = new byte[1 + random.nextInt(32)];
                random.nextBytes(noise);
                return splice(copy, at, at, noise);
            }
            case 6 -> {
                int from = random.nextInt(copy.length);
                int len = 1 + random.nextInt(Math.min(128, copy.length - from));
                byte[] chunk = java.util.Arrays.copyOfRange(copy, from, from + len);
                return splice(copy, at, Math.min(copy.length, at + len), chunk);
            }
            default -> {
                return java.util.Arrays.copyOf(copy, at);
            }
        }
    }

    /** Replaces the run of digits at or after {@code at} by an extreme number, as text. */
    private static byte[] replaceNumber(byte[] data, int at, Random random) {
        int start = at;
        while (start < data.length && !Character.isDigit(data[start])) {
            start++;
        }
        if (start == data.length) {
            return data;
        }
        int end = start;
        while (end < data.length && (Character.isDigit(data[end]) || data[end] == '.')) {
            end++;
        }
        return splice(data, start, end, NUMBERS[random.nextInt(NUMBERS.length)].getBytes(StandardCharsets.US_ASCII));
    }

    private static byte[] splice(byte[] data, int from, int to, byte[] insert) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(data.length + insert.length);
        out.write(data, 0, from);
        out.writeBytes(insert);
        out.write(data, to, data.length - to);
        return out.toByteArray();
    }
}
