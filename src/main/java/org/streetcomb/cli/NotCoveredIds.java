package org.streetcomb.cli;

import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.LinkedHashSet;
import java.util.Set;
import org.streetcomb.plan.Audit;
import org.streetcomb.coverage.CoverageStatus;
import org.streetcomb.coverage.StreetCoverage;
import org.streetcomb.write.AtomicFile;

/**
 * Writes the ids of the required streets an audit did not find covered, one per line in layer order, with
 * a comment line first: the file {@code plan --service-ids} reads, so the planner's every option applies to
 * a mop-up of whole streets.
 */
final class NotCoveredIds {

    private NotCoveredIds() {
    }

    static void write(Path target, Audit audit) {
        Set<String> ids = new LinkedHashSet<>();
        for (StreetCoverage street : audit.coverage().streets()) {
            if (street.status() == CoverageStatus.PARTLY || street.status() == CoverageStatus.MISSED) {
                ids.add(street.feature().id());
            }
        }
        AtomicFile.write(target, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            w.write("# streets not covered by the drive (streetcomb audit of " + audit.request().layer().getFileName() + ")\n");
            for (String id : ids) {
                w.write(id);
                w.write('\n');
            }
            w.flush();
        });
    }
}
