package org.streetcomb.read;

import java.nio.file.Path;
import java.util.List;

/** The road lines read from one file, with the reader's account of what it kept and skipped. */
public record RoadLayer(Path source, List<RoadFeature> features, ReadReport report) {
}
