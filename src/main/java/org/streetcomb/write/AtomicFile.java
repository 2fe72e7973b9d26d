package org.streetcomb.write;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import org.streetcomb.InputError;

/**
 * Writes a file through a temporary file in the same folder that is moved into place only when complete,
 * so a failed run never leaves a half-written output behind.
 *
 * <p>Inside a {@link Batch} (a whole command run) the moves wait until {@link Batch#commit}: a run that fails
 * after writing some outputs leaves none of them, and the files already there are untouched. Every temporary
 * file not yet moved is removed on failure, and by a shutdown hook when the run is stopped (Ctrl-C, SIGTERM).
 * A SIGKILL cannot be caught; its leftovers are hidden files named {@code .NAME.PID.N.part}.
 */
public final class AtomicFile {

    /** The body of a write. */
    @FunctionalInterface
    public interface Body {
        void writeTo(OutputStream out) throws IOException;
    }

    /** Temporary files of every run in this process, removed if the process is stopped before they are moved. */
    private static final Set<Path> PENDING = ConcurrentHashMap.newKeySet();

    static {
        Runtime.getRuntime().addShutdownHook(new Thread(AtomicFile::removePending, "remove unfinished outputs"));
    }

    /** The batch of the running command; inherited by the threads it starts (districts plans areas in parallel). */
    private static final InheritableThreadLocal<Batch> CURRENT = new InheritableThreadLocal<>();

    private AtomicFile() {
    }

    /**
     * Starts a batch for this thread and the threads it starts: writes wait for {@link Batch#commit};
     * closing the batch without committing removes what it wrote.
     */
    public static Batch batch() {
        Batch batch = new Batch();
        CURRENT.set(batch);
        return batch;
    }

    /** The outputs of one run, moved into place together. */
    public static final class Batch implements AutoCloseable {
        /** Target to temporary file, in the order written. */
        private final Map<Path, Path> staged = new LinkedHashMap<>();

        private synchronized void stage(Path target, Path temporary) {
            Path earlier = staged.put(target, temporary);
            if (earlier != null) {
                delete(earlier);
            }
        }

        /** Moves every file written into place. */
        public void commit() {
            List<Map.Entry<Path, Path>> entries;
            synchronized (this) {
                entries = new ArrayList<>(staged.entrySet());
                staged.clear();
            }
            try {
                for (Map.Entry<Path, Path> e : entries) {
                    move(e.getValue(), e.getKey());
                }
            } finally {
                entries.forEach(e -> delete(e.getValue()));
            }
        }

        /** Removes what was written and not committed. */
        @Override
        public void close() {
            if (CURRENT.get() == this) {
                CURRENT.remove();
            }
            synchronized (this) {
                staged.values().forEach(AtomicFile::delete);
                staged.clear();
            }
        }
    }

    public static void write(Path target, Body body) {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        if (folder == null || !Files.isDirectory(folder)) {
            throw InputError.at(target, null, "cannot write: folder " + folder + " does not exist");
        }
        // not Files.createTempFile: it makes the file private (0600), and outputs are shared files
        Path temporary = folder.resolve("." + absolute.getFileName() + "." + ProcessHandle.current().pid() + "."
                + System.nanoTime() + ".part");
        PENDING.add(temporary);
        boolean written = false;
        try {
            try (OutputStream out = new BufferedOutputStream(
                    Files.newOutputStream(temporary, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE), 1 << 16)) {
                body.writeTo(out);
            }
            Batch batch = CURRENT.get();
            if (batch != null) {
                batch.stage(absolute, temporary);
            } else {
                move(temporary, absolute);
            }
            written = true;
        } catch (IOException e) {
            throw InputError.at(target, null, "cannot write: " + e.getMessage());
        } finally {
            if (!written) {
                delete(temporary);
            }
        }
    }

    private static void move(Path temporary, Path target) {
        try {
            Files.move(temporary, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            PENDING.remove(temporary);
        } catch (IOException e) {
            throw InputError.at(target, null, "cannot write: " + e.getMessage());
        }
    }

    private static void delete(Path temporary) {
        try {
            Files.deleteIfExists(temporary);
            PENDING.remove(temporary);
        } catch (IOException ignored) {
            // the original error is the one worth reporting
        }
    }

    private static void removePending() {
        for (Path temporary : PENDING) {
            try {
                Files.deleteIfExists(temporary);
            } catch (IOException ignored) {
                // nothing more can be done while the process stops
            }
        }
    }
}
