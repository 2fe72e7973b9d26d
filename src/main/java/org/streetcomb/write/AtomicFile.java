package org.streetcomb.write;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import org.streetcomb.InputError;

/**
 * Writes a file through a temporary file in the same folder that is moved into place only when complete,
 * so a failed run never leaves a half-written output behind.
 */
public final class AtomicFile {

    /** The body of a write. */
    @FunctionalInterface
    public interface Body {
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicFile() {
    }

    public static void write(Path target, Body body) {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        if (folder == null || !Files.isDirectory(folder)) {
            throw InputError.at(target, null, "cannot write: folder " + folder + " does not exist");
        }
        Path temporary = null;
        try {
            // not Files.createTempFile: it makes the file private (0600), and outputs are shared files
            temporary = folder.resolve("." + absolute.getFileName() + "." + ProcessHandle.current().pid() + "."
                    + System.nanoTime() + ".part");
            try (OutputStream out = new BufferedOutputStream(
                    Files.newOutputStream(temporary, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE), 1 << 16)) {
                body.writeTo(out);
            }
            Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            temporary = null;
        } catch (IOException e) {
            throw InputError.at(target, null, "cannot write: " + e.getMessage());
        } finally {
            if (temporary != null) {
                try {
                    Files.deleteIfExists(temporary);
                } catch (IOException ignored) {
                    // the original error is the one worth reporting
                }
            }
        }
    }
}
