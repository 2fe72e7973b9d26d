package org.streetcomb.plan;

import org.streetcomb.timing.StageClock;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.jgrapht.alg.cycle.ChinesePostman;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.WeightedPseudograph;
import org.junit.jupiter.api.Test;
import org.streetcomb.ExternalTool;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.read.ReadOptions;

/**
 * A cost field replaces geodesic length as the weight. On the Mesa streets (field Length, in feet, from
 * the data's provider) the network's total cost must be the field's sum as GDAL's ogrinfo reads it, and
 * the tour's cost must equal the optimum that JGraphT's ChinesePostman (a general-purpose reference)
 * finds on the same edges weighted by cost.
 */
class CostFieldTest {

    private static final Path MESA = Path.of("fixtures/shapefiles/mesa-az-stateplane-ft/streets.shp");

    @Test
    void toursMinimiseTheCostField() throws Exception {
        ReadOptions options = ReadOptions.DEFAULTS.withCrs("EPSG:2223").withCostField("Length");
        Plan plan = Planner.plan(new PlanRequest(MESA, null, 0.5, 500, false, options), new StageClock(StageClock.SILENT));
        StreetNetwork network = plan.network();
        assertTrue(network.hasCosts());
        StreetNetwork costs = network.weightedByCost();

        String gdal = ExternalTool.run("ogrinfo", "-ro", "-q", "-sql", "SELECT SUM(Length) AS feet FROM streets", MESA.toString());
        double feet = Double.parseDouble(gdal.replaceAll("(?s).*feet \\(Real\\) = ([0-9.]+).*", "$1"));
        assertEquals(feet, costs.totalLength(), 1e-6 * feet);

        WeightedPseudograph<Integer, DefaultWeightedEdge> graph = new WeightedPseudograph<>(DefaultWeightedEdge.class);
        for (int v = 0; v < network.nodeCount(); v++) {
            graph.addVertex(v);
        }
        for (int e = 0; e < network.edgeCount(); e++) {
            graph.setEdgeWeight(graph.addEdge(network.from(e), network.to(e)), network.cost(e));
        }
        double optimum = new ChinesePostman<Integer, DefaultWeightedEdge>().getCPPSolution(graph).getWeight();
        double tourCost = plan.tours().stream().mapToDouble(t -> t.length(costs)).sum();
        assertEquals(optimum, tourCost, 1e-6 * optimum);
        double tourMetres = plan.tourLength();
        assertTrue(tourMetres > network.totalLength(), "summaries still report metres along the tour");
    }
}
