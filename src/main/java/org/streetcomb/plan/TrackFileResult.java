package org.streetcomb.plan;

import java.nio.file.Path;
import org.streetcomb.read.GpxContents;

/**
 * What one GPX file gave the audit.
 *
 * @param file      the file
 * @param contents  what it held
 * @param matched   its fixes placed on streets
 * @param offNetwork its fixes with no street within the search radius
 */
public record TrackFileResult(Path file, GpxContents contents, int matched, int offNetwork) {
}
