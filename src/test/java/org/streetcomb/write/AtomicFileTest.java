package org.streetcomb.write;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.util.List;
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

    @Test
    void aFailedBatchLeavesNoneOfItsOutputsAndKeepsWhatWasThere() throws IOException {
        Path kept = Files.writeString(dir.resolve("tour.geojson"), "yesterday's plan");
        try (AtomicFile.Batch batch = AtomicFile.batch()) {
            AtomicFile.write(kept, out -> out.write('x'));
            AtomicFile.write(dir.resolve("tour.gpx"), out -> out.write('y'));
            assertThrows(InputError.class, () -> AtomicFile.write(dir.resolve("tour.kml"), out -> {
                throw new IOException("disk full");
            }));
        }
        try (var files = Files.list(dir)) {
            assertEquals(List.of(kept), files.toList());
        }
        assertEquals("yesterday's plan", Files.readString(kept));
    }

    @Test
    void aCommittedBatchMovesEveryOutputIntoPlace() throws IOException {
        try (AtomicFile.Batch batch = AtomicFile.batch()) {
            AtomicFile.write(dir.resolve("tour.geojson"), out -> out.write('x'));
            assertFalse(Files.exists(dir.resolve("tour.geojson")), "moved before the batch was committed");
            batch.commit();
        }
        assertEquals("x", Files.readString(dir.resolve("tour.geojson")));
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count());
        }
    }

    @Test
    void sigtermWhileWritingLeavesNoTemporaryFile() throws Exception {
        String javaCommand = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process process = new ProcessBuilder(javaCommand, "-cp", System.getProperty("java.class.path"),
                StoppedWriter.class.getName(), dir.toString()).redirectErrorStream(true).start();
        try (var out = new java.io.BufferedReader(new java.io.InputStreamReader(process.getInputStream()))) {
            assertEquals("writing", out.readLine());
            try (var files = Files.list(dir)) {
                assertEquals(2, files.count(), "two temporary files while the second is written");
            }
            process.destroy(); // SIGTERM on Linux
            assertTrue(process.waitFor(30, java.util.concurrent.TimeUnit.SECONDS));
        } finally {
            process.destroyForcibly();
        }
        try (var files = Files.list(dir)) {
            assertEquals(List.of(), files.toList());
        }
    }
}
