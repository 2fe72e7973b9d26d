package org.streetcomb.write;

import java.nio.file.Path;

/**
 * Run in a separate process by {@link AtomicFileTest}: writes one whole output in a batch, then starts a
 * second and blocks inside it until the test stops the process.
 */
public final class StoppedWriter {

    private StoppedWriter() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args[0]);
        try (AtomicFile.Batch batch = AtomicFile.batch()) {
            AtomicFile.write(folder.resolve("first.geojson"), out -> out.write('x'));
            AtomicFile.write(folder.resolve("second.geojson"), out -> {
                out.write('y');
                out.flush();
                System.out.println("writing");
                try {
                    Thread.sleep(60_000);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            });
            batch.commit();
        }
    }
}
