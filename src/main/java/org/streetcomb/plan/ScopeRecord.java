package org.streetcomb.plan;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.streetcomb.InputError;
import org.streetcomb.network.LonLat;
import org.streetcomb.solve.KerbMode;

/**
 * What a plan asked for, kept with its tour: a member {@value #MEMBER} of the tour GeoJSON's
 * FeatureCollection (RFC 7946 section 6.1 allows such foreign members; GIS readers ignore it) holding the
 * depot the plan used, whether only the depot's part was planned, whether streets cut off by one-way streets
 * were left out, the service ids file and the kerb mode, with the counts of streets serviced and left out.
 * {@code audit --plan} reads it back as a {@link PlanScope}, so the audit measures what the plan asked for
 * without the user repeating the options.
 */
public final class ScopeRecord {

    /** The FeatureCollection member that holds the record. */
    public static final String MEMBER = "streetcomb_scope";

    private ScopeRecord() {
    }

    /** The record of a plan; null for a plan scoped to an area (an audit cannot take that scope yet). */
    public static ObjectNode of(Plan plan) {
        PlanRequest request = plan.request();
        ServiceOptions service = request.service();
        ObjectNode node = JsonNodeFactory.instance.objectNode();
        node.put("layer", request.input().getFileName().toString());
        node.putArray("depot").add(plan.network().lon(plan.depot())).add(plan.network().lat(plan.depot()));
        node.put("depot_reach_m", request.maxDepotDistance());
        node.put("depot_part_only", request.depotOnly());
        node.put("leave_out_cut_off", service.leaveOutCutOff());
        if (service.serviceIds() != null) {
            node.put("service_ids", service.serviceIds().toAbsolutePath().toString());
        }
        node.put("kerbs", service.kerbs().name().toLowerCase(Locale.ROOT));
        if (service.area() != null) {
            node.put("area", service.area().label());
        }
        node.put("edges_left_out", plan.leftOut().length);
        return node;
    }

    /** The scope recorded in a tour GeoJSON written by {@code plan --out}. */
    public static PlanScope read(Path tourFile) {
        JsonNode root;
        try {
            root = new ObjectMapper().readTree(Files.newInputStream(tourFile));
        } catch (IOException | RuntimeException e) {
            throw InputError.at(tourFile, null, "is not a tour GeoJSON written by plan --out (not JSON)");
        }
        JsonNode node = root == null ? null : root.get(MEMBER);
        if (node == null || !node.isObject()) {
            throw InputError.at(tourFile, null, "holds no plan scope (member " + MEMBER + "); give the tour GeoJSON "
                    + "that plan --out wrote");
        }
        if (node.hasNonNull("area")) {
            throw InputError.at(tourFile, MEMBER, "the plan was scoped to the area '" + node.get("area").asText()
                    + "', which audit cannot take yet: give the area's streets with --service-ids");
        }
        JsonNode depot = node.get("depot");
        if (depot == null || !depot.isArray() || depot.size() != 2 || !depot.get(0).isNumber()
                || !depot.get(1).isNumber()) {
            throw InputError.at(tourFile, MEMBER, "depot is not [longitude, latitude]");
        }
        KerbMode kerbs;
        try {
            kerbs = KerbMode.valueOf(node.path("kerbs").asText("one_pass").toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw InputError.at(tourFile, MEMBER, "kerbs '" + node.path("kerbs").asText() + "' is not a kerb mode");
        }
        Path ids = node.hasNonNull("service_ids") ? Path.of(node.get("service_ids").asText()) : null;
        return new PlanScope(new LonLat(depot.get(0).asDouble(), depot.get(1).asDouble()),
                node.path("depot_reach_m").asDouble(500), node.path("depot_part_only").asBoolean(false),
                new ServiceOptions(kerbs, ids, null, node.path("leave_out_cut_off").asBoolean(false)));
    }
}
