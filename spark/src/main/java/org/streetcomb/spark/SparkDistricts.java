package org.streetcomb.spark;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.IntStream;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.streetcomb.ExitCode;
import org.streetcomb.InputError;
import org.streetcomb.batch.DistrictBatch;
import org.streetcomb.cli.DistrictsCommand;
import picocli.CommandLine;

/**
 * The districts batch ({@code streetcomb districts}) on Apache Spark, for national or multi-county runs. It
 * takes the same arguments as the command and plans with the same code: the driver parses them
 * ({@link DistrictsCommand#request}), the areas are spread over the executors, and each partition reads the
 * road layer, builds its network once and plans its areas with {@link DistrictBatch#planArea}, which writes
 * each area's folder into the output folder; the driver then collects the summary rows in the layer's order
 * and writes {@code summary.csv} and {@code index.html} with {@link DistrictBatch#finish}. The files are
 * therefore the same, byte for byte, as the single-machine batch's. On a cluster the road layer, the area
 * layer and the output folder must be paths every executor sees alike (a shared file system); see
 * docs/districts.md. {@code --threads} is ignored: Spark's executors and cores decide.
 */
public final class SparkDistricts {

    private SparkDistricts() {
    }

    public static void main(String[] args) {
        List<DistrictBatch.Row> rows;
        try (JavaSparkContext spark = new JavaSparkContext(new SparkConf().setAppName("streetcomb districts"))) {
            rows = run(spark, args);
        } catch (InputError e) {
            System.err.println("streetcomb-spark: " + e.getMessage());
            System.exit(ExitCode.BAD_INPUT);
            return;
        } catch (CommandLine.ParameterException e) {
            System.err.println("streetcomb-spark: " + e.getMessage());
            System.exit(ExitCode.USAGE);
            return;
        }
        long failed = rows.stream().filter(r -> !r.status().equals("planned")).count();
        System.out.printf(Locale.ROOT, "Areas     %d planned, %d failed (listed in summary.csv)%n", rows.size() - failed, failed);
        System.out.printf(Locale.ROOT, "Service   %.3f km in all areas%n",
                rows.stream().mapToDouble(DistrictBatch.Row::serviceKm).sum());
        System.out.println("Caution   Plans are advice: obey traffic law and signs, never handle a device while driving, "
                + "follow local rules and your own risk assessment; map data may be out of date.");
        System.exit(failed == 0 ? ExitCode.OK : ExitCode.NO_TOUR);
    }

    /** Plans every area of the batch {@code args} describe on {@code spark}; the rows in the layer's order. */
    public static List<DistrictBatch.Row> run(JavaSparkContext spark, String[] args) {
        DistrictBatch.Request request = DistrictsCommand.request(args);
        DistrictBatch.createOut(request);
        int areas = request.areas().size();
        String[] arguments = args.clone();
        List<Integer> indices = new ArrayList<>(IntStream.range(0, areas).boxed().toList());
        int slices = Math.max(1, Math.min(areas, spark.defaultParallelism()));
        List<DistrictBatch.Row> rows = new ArrayList<>(spark.parallelize(indices, slices).mapPartitions(part -> {
            // each partition parses the same arguments and builds the network once for all its areas
            DistrictBatch.Request mine = DistrictsCommand.request(arguments);
            DistrictBatch.Roads roads = null;
            List<DistrictBatch.Row> planned = new ArrayList<>();
            while (part.hasNext()) {
                int index = part.next();
                if (roads == null) {
                    roads = DistrictBatch.roads(mine);
                }
                planned.add(DistrictBatch.planArea(mine, roads, index));
            }
            return planned.iterator();
        }).collect());
        rows.sort(Comparator.comparingInt(DistrictBatch.Row::index));
        DistrictBatch.finish(request, rows);
        return rows;
    }
}
