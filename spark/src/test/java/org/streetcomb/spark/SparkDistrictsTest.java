package org.streetcomb.spark;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.streetcomb.batch.DistrictBatch;
import org.streetcomb.cli.DistrictsCommand;

/**
 * The Spark batch in Spark's local mode (two cores) against the single-machine batch on the same arguments:
 * twenty districts over the Baltimore OpenStreetMap fixture (ODbL, see NOTICE; the district polygons are
 * invented). Every file of both output folders must be the same, byte for byte, and so must the rows.
 */
class SparkDistrictsTest {

    @Test
    void sparkLocalModeWritesTheSameFilesAsOneMachine(@TempDir Path tmp) throws IOException {
        String[] common = {"fixtures/osm/baltimore.osm.pbf", "fixtures/areas/baltimore-districts.geojson",
            "--leave-out-cut-off", "-q"};
        Path single = tmp.resolve("single");
        Path cluster = tmp.resolve("spark");
        List<DistrictBatch.Row> expected = DistrictBatch.run(DistrictsCommand.request(with(common, "-o", single.toString(),
                "--threads", "2")), line -> { });
        List<DistrictBatch.Row> rows;
        SparkConf conf = new SparkConf().setMaster("local[2]").setAppName("streetcomb districts test")
                .set("spark.ui.enabled", "false").set("spark.driver.host", "127.0.0.1");
        try (JavaSparkContext spark = new JavaSparkContext(conf)) {
            rows = SparkDistricts.run(spark, with(common, "-o", cluster.toString()));
        }
        assertEquals(expected, rows);
        assertTrue(rows.size() >= 20, "at least 20 areas: " + rows.size());
        List<Path> files = files(single);
        assertEquals(files, files(cluster));
        assertTrue(files.size() > 20, "files written: " + files.size());
        for (Path file : files) {
            assertArrayEquals(Files.readAllBytes(single.resolve(file)), Files.readAllBytes(cluster.resolve(file)), file.toString());
        }
    }

    private static String[] with(String[] common, String... more) {
        return Stream.concat(Stream.of(common), Stream.of(more)).toArray(String[]::new);
    }

    private static List<Path> files(Path root) throws IOException {
        try (Stream<Path> walk = Files.walk(root)) {
            return walk.filter(Files::isRegularFile).map(root::relativize).sorted().toList();
        }
    }
}
