package org.streetcomb.quality;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.jgrapht.Graph;
import org.jgrapht.alg.cycle.ChinesePostman;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.DirectedWeightedPseudograph;
import org.streetcomb.docs.GeneratedSection;
import org.streetcomb.network.CarplibNetwork;
import org.streetcomb.network.Components;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.CarplibReader;
import org.streetcomb.read.Travel;
import org.streetcomb.solve.Augmentation;
import org.streetcomb.solve.ExactMixedReference;
import org.streetcomb.solve.GraphFixtures;
import org.streetcomb.solve.KerbMode;
import org.streetcomb.solve.PostmanProblem;
import org.streetcomb.solve.PostmanVariants;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.tour.Tour;
import org.streetcomb.tour.TourPlanner;

/**
 * Writes docs/quality.md: every benchmark instance with its reference value, our tour, the gap and the
 * solve time, and the mean and maximum gap per set. Run from the repository root:
 * {@code mvn -q -B test-compile exec:java -Dexec.mainClass=org.streetcomb.quality.QualityReport
 * -Dexec.classpathScope=test}. Not a test: the tests assert the stated gaps; this measures them.
 */
public final class QualityReport {

    private record Row(String instance, String size, double reference, double ours, double bound, double seconds,
                       String note) {
        double gap() {
            return ours / reference - 1;
        }
    }

    private final StringBuilder doc = new StringBuilder();
    private final List<String[]> summary = new ArrayList<>();

    public static void main(String[] args) throws IOException {
        QualityReport report = new QualityReport();
        report.run();
        Path out = Path.of(args.length > 0 ? args[0] : "docs/quality.md");
        Files.createDirectories(out.getParent());
        String existing = Files.exists(out) ? Files.readString(out, StandardCharsets.UTF_8)
                : "# Solution quality on benchmark instances\n\n";
        Files.writeString(out, SECTION.splice(existing, report.doc.toString()), StandardCharsets.UTF_8);
        System.out.println("written " + out);
    }

    static final GeneratedSection SECTION = new GeneratedSection("postman quality", "QualityReport");

    private void run() throws IOException {
        List<String[]> values = Files.readAllLines(Path.of("fixtures/benchmarks/values.csv")).stream().skip(1)
                .map(row -> row.split(",", 7)).toList();
        doc.append("## Postman variants\n\n")
                .append("Produced by `mvn -q -B test-compile exec:java -Dexec.mainClass=org.streetcomb.quality.QualityReport ")
                .append("-Dexec.classpathScope=test` (class `src/test/java/org/streetcomb/quality/QualityReport.java`); ")
                .append("rerun it after changing a solver. Gap = ours / reference - 1. Times are wall-clock seconds of ")
                .append("the solve stage on the machine that ran it (shared 2-core box), for orientation only. ")
                .append("`bound` is the lower bound the plan reports.\n\n");
        List<Row> ucpp = new ArrayList<>();
        for (String[] f : values) {
            if (f[3].equals("UCPP_all_edges")) {
                StreetNetwork network = CarplibNetwork.of(CarplibReader.read(Path.of("fixtures/benchmarks", f[2])));
                int depot = CarplibReader.read(Path.of("fixtures/benchmarks", f[2])).depot() - 1;
                ucpp.add(solve(f[1], network, all(network), depot, Double.parseDouble(f[4]), ""));
            }
        }
        table("Undirected postman, every edge (gdb, val, egl)", "UCPP values computed (not published) by the shared "
                + "benchmark collection with networkx and a SciPy/HiGHS integer program (fixtures/benchmarks/values.csv).", ucpp);
        List<Row> urpp = new ArrayList<>();
        for (String[] f : values) {
            if (f[0].equals("egl") && f[3].equals("URPP_required_edges")) {
                var instance = CarplibReader.read(Path.of("fixtures/benchmarks", f[2]));
                StreetNetwork network = CarplibNetwork.of(instance);
                boolean[] required = new boolean[network.edgeCount()];
                for (int e = 0; e < required.length; e++) {
                    required[e] = network.required(e);
                }
                urpp.add(solve(f[1], network, required, instance.depot() - 1, Double.parseDouble(f[4]), ""));
            }
        }
        table("Undirected rural postman, required edges only (egl)", "URPP optima computed (not published) by the shared "
                + "benchmark collection with two independent integer programs.", urpp);
        StreetNetwork drpp = GraphFixtures.drpp(Path.of("fixtures/benchmarks/drpp/P80-10-1.0")).network();
        boolean[] drppRequired = new boolean[drpp.edgeCount()];
        for (int e = 0; e < drppRequired.length; e++) {
            drppRequired[e] = drpp.required(e);
        }
        table("Directed rural postman (Campos P80-10-1.0)", "Optimum 8323 computed (not published, single source) by "
                + "the shared benchmark collection with integer programs.",
                List.of(solve("P80-10-1.0", drpp, drppRequired, 0, 8323, "")));
        table("Directed postman, every arc (Campos P80-10-1.0 with all arcs required)", "Reference: JGraphT's "
                + "ChinesePostman on the same digraph (general-purpose library, independent method).",
                List.of(solve("P80-10-1.0 all arcs", drpp, all(drpp), 0, jgrapht(drpp), "")));
        List<Row> grids = new ArrayList<>();
        for (long seed = 1; seed <= 20; seed++) {
            StreetNetwork network = GraphFixtures.mixedGrid(seed, 6, 7, 0.35, 1.0).network();
            grids.add(mixed("grid 6x7 seed " + seed, network, 30));
        }
        for (long seed = 1; seed <= 5; seed++) {
            StreetNetwork network = GraphFixtures.mixedGrid(100 + seed, 12, 12, 0.35, 1.0).network();
            grids.add(mixed("grid 12x12 seed " + (100 + seed), network, 60));
        }
        table("Mixed postman, generated grids (a third of the streets one-way)", "Reference: the exact integer "
                + "circulation model solved by OR-Tools CP-SAT (`ExactMixedReference`, test scope). A reference "
                + "marked 'bound' was not proved optimal within the time limit: the gap is then to CP-SAT's best "
                + "proven bound and overstates ours.", grids);
        List<Row> osm = new ArrayList<>();
        for (String line : Files.readAllLines(Path.of("fixtures/benchmarks/mixed-osm/values.csv")).stream().skip(1).toList()) {
            String[] f = line.split(",");
            String path = MixedOsmReference.INSTANCES.stream().filter(i -> i[1].equals(f[0])).findFirst()
                    .orElseThrow()[0];
            StreetNetwork core = MixedOsmReference.network(path);
            boolean proved = f[5].equals("optimal");
            osm.add(solve(f[0], core, all(core), firstNode(core), Double.parseDouble(proved ? f[3] : f[4]),
                    proved ? "" : "bound"));
        }
        table("Mixed postman, real OpenStreetMap networks", "OpenStreetMap layers of Vienna (four windows), Monaco, "
                + "Andorra la Vella, a Baltimore window, central Helsinki and Baltimore (fixtures/benchmarks/mixed-osm "
                + "and fixtures/osm, ODbL, see NOTICE), each cut to its largest strongly connected core (`StrongCore`), "
                + "every street required once. References: fixtures/benchmarks/mixed-osm/values.csv, computed by the "
                + "integer circulation model in OR-Tools CP-SAT with the command in `MixedOsmReference` (whole "
                + "Baltimore: not proved in 600 s, so its gap is to CP-SAT's best bound and overstates ours). "
                + "`certified` = ours / our bound - 1: what the plan itself can prove.", osm);
        doc.append("### Summary\n\n| set | instances | mean gap | max gap | worst certified |\n|---|---:|---:|---:|---:|\n");
        for (String[] s : summary) {
            doc.append("| ").append(String.join(" | ", s)).append(" |\n");
        }
        doc.append("\nTargets: mixed at most 1 % mean gap on generated grids; on real networks (issue 19) mean gap at most ")
                .append("0.3 %, worst at most 1 %, certified gap at most 1 %; rural at most 2 % mean gap. Limits of these ")
                .append("sets: the egl graphs have only 1 to 3 groups of required edges, so they test the rural construction ")
                .append("lightly; the directed rural set is a single instance; the mixed references are exact on networks ")
                .append("of up to about 900 streets (whole Baltimore, 4,031, is not proved). The mixed bound is the LP ")
                .append("relaxation with odd cuts (`MixedLpBound`) where it beats the undirected and flow relaxations.\n");
    }

    private Row mixed(String name, StreetNetwork network, double seconds) {
        ExactMixedReference.Result exact = ExactMixedReference.solve(network,
                ServiceDemand.of(network, all(network), KerbMode.ONE_PASS), seconds);
        double reference = exact.proved() ? exact.optimum() : exact.bestBound();
        return solve(name, network, all(network), firstNode(network), reference, exact.proved() ? "" : "bound");
    }

    private static int firstNode(StreetNetwork network) {
        for (int v = 0; v < network.nodeCount(); v++) {
            if (network.degree(v) > 0) {
                return v;
            }
        }
        throw new IllegalStateException("empty network");
    }

    private static Row solve(String name, StreetNetwork network, boolean[] required, int depot, double reference,
                             String note) {
        ServiceDemand demand = ServiceDemand.of(network, required, KerbMode.ONE_PASS);
        Components components = Components.of(network);
        int[] starts = TourPlanner.starts(network, components, demand, depot, true);
        PostmanProblem problem = new PostmanProblem(network, demand, starts, depot);
        long start = System.nanoTime();
        Augmentation augmentation = PostmanVariants.solve(problem);
        double seconds = (System.nanoTime() - start) / 1e9;
        List<Tour> tours = TourPlanner.tours(problem, components, augmentation);
        double ours = tours.stream().mapToDouble(t -> t.length(network)).sum();
        int oneWay = 0;
        for (int e = 0; e < network.edgeCount(); e++) {
            oneWay += network.travel(e).oneWay() ? 1 : 0;
        }
        String size = network.edgeCount() + " edges" + (oneWay > 0 ? ", " + oneWay + " one-way" : "");
        return new Row(name, size, reference, ours, augmentation.lowerBound(), seconds, note);
    }

    private void table(String title, String reference, List<Row> rows) {
        doc.append("### ").append(title).append("\n\n").append(reference).append("\n\n")
                .append("| instance | size | reference | ours | gap | bound | certified | solve s |\n|---|---|---:|---:|---:|---:|---:|---:|\n");
        double sum = 0;
        double max = 0;
        for (Row r : rows) {
            doc.append(String.format(Locale.ROOT, "| %s | %s | %.1f%s | %.1f | %.2f %% | %.1f | %.2f %% | %.2f |%n", r.instance,
                    r.size, r.reference, r.note.isEmpty() ? "" : " (" + r.note + ")", r.ours, 100 * r.gap(), r.bound,
                    100 * (r.ours / r.bound - 1), r.seconds));
            sum += r.gap();
            max = Math.max(max, r.gap());
        }
        doc.append('\n');
        double worstCertified = rows.stream().mapToDouble(r -> r.ours / r.bound - 1).max().orElse(0);
        summary.add(new String[] {title, String.valueOf(rows.size()),
            String.format(Locale.ROOT, "%.2f %%", 100 * sum / rows.size()), String.format(Locale.ROOT, "%.2f %%", 100 * max),
            String.format(Locale.ROOT, "%.2f %%", 100 * worstCertified)});
        System.out.println(summary.get(summary.size() - 1)[0] + ": mean " + summary.get(summary.size() - 1)[2]
                + ", max " + summary.get(summary.size() - 1)[3]);
    }

    private static boolean[] all(StreetNetwork network) {
        boolean[] r = new boolean[network.edgeCount()];
        Arrays.fill(r, true);
        return r;
    }

    private static double jgrapht(StreetNetwork network) {
        Graph<Integer, DefaultWeightedEdge> g = new DirectedWeightedPseudograph<>(DefaultWeightedEdge.class);
        for (int v = 0; v < network.nodeCount(); v++) {
            if (network.degree(v) > 0) {
                g.addVertex(v);
            }
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            boolean along = network.travel(e) != Travel.BACKWARD;
            g.setEdgeWeight(g.addEdge(along ? network.from(e) : network.to(e), along ? network.to(e) : network.from(e)),
                    network.length(e));
        }
        return new ChinesePostman<Integer, DefaultWeightedEdge>().getCPPSolution(g).getWeight();
    }
}
