package org.streetcomb.write;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.InputError;

/** Outputs appear whole or not at all, and as ordinary shared files (common practice). */
class AtomicFileTest {

    @TempDir
    Path dir;

    @Test
    void aFailedWriteLeavesNothingBehind() throws IOException {
        Path target = dir.resolve("out.geojson");
        assertThrows(InputError.class, () -> AtomicFile.write(target, out -> {
            out.write("{\"type\":".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full");
        }));
        try (var files = Files.list(dir)) {
            assertEquals(0, files.count());
        }
    }

    @Test
    void aWrittenFileIsReadableByOthersLikeAnyFileTheUserMakes() throws IOException {
        Path target = dir.resolve("out.geojson");
        AtomicFile.write(target, out -> out.write('x'));
        assertEquals("x", Files.readString(target));
        // the umask decides, as for any new file; a private 0600 file would be a surprise
        Path plain = Files.writeString(dir.resolve("plain.txt"), "x");
        assertEquals(Files.getPosixFilePermissions(plain), Files.getPosixFilePermissions(target));
        assertTrue(Files.getPosixFilePermissions(target).contains(PosixFilePermission.OWNER_READ));
    }
}
