package org.streetcomb;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

/**
 * Every file under a folder with the SHA-256 of its bytes (a link by its target, a pipe or device as
 * "special"): taken before and after a run, equal maps show that nothing was written, changed or removed.
 */
public final class FolderHashes {

    private FolderHashes() {
    }

    public static Map<String, String> of(Path folder) {
        Map<String, String> hashes = new TreeMap<>();
        try (Stream<Path> files = Files.walk(folder)) {
            for (Path file : (Iterable<Path>) files::iterator) {
                String name = folder.relativize(file).toString();
                if (Files.isSymbolicLink(file)) {
                    hashes.put(name, "link to " + Files.readSymbolicLink(file));
                } else if (Files.isRegularFile(file)) {
                    hashes.put(name, HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                            .digest(Files.readAllBytes(file))));
                } else if (!Files.isDirectory(file)) {
                    hashes.put(name, "special");
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
        return hashes;
    }
}
