package org.streetcomb.cli;

import static org.streetcomb.cli.SummaryFormat.metres;

import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.streetcomb.mopup.MopUpPlanner;
import org.streetcomb.plan.Plan;

/** The mop-up tour's part of the audit summary: its length, deadhead, method, and the field files written. */
final class MopUpSection {

    private MopUpSection() {
    }

    static PlanSummary.Section nothing() {
        ObjectNode json = JsonNodeFactory.instance.objectNode();
        json.put("planned", false);
        json.put("reason", "every required street is covered");
        return new PlanSummary.Section("mop_up", json,
                List.<String[]>of(new String[] {"Mop-up", "none needed: every required street is covered"}));
    }

    static PlanSummary.Section of(Plan plan, MopUpPlanner.MopUp planned, PlanSummary.Section field, Path out) {
        ObjectNode json = JsonNodeFactory.instance.objectNode();
        json.put("planned", true);
        json.put("method", planned.augmentation().method());
        json.put("tours", plan.tours().size());
        json.put("length_m", metres(plan.tourLength()));
        json.put("service_m", metres(plan.serviceLength()));
        json.put("deadhead_m", metres(plan.deadheadLength()));
        json.put("start_node", planned.start());
        json.put("end_node", planned.end());
        json.put("open", planned.start() != planned.end());
        planned.leftOut().forEach(json.putArray("left_out")::add);
        if (out != null) {
            json.put("output", out.toString());
        }
        json.set(field.key(), field.json());
        List<String[]> lines = new ArrayList<>();
        lines.add(new String[] {"Mop-up", String.format(Locale.ROOT,
                "%.3f km in %d tour%s: service %.3f km, deadhead %.3f km, %s, ending at the depot; %s",
                plan.tourLength() / 1000, plan.tours().size(), plan.tours().size() == 1 ? "" : "s",
                plan.serviceLength() / 1000, plan.deadheadLength() / 1000,
                planned.start() == planned.end() ? "from the depot" : "from the given start",
                planned.augmentation().method())});
        for (String leftOut : planned.leftOut()) {
            lines.add(new String[] {"Warning", "mop-up: " + leftOut + "; the rest is planned"});
        }
        lines.addAll(field.lines());
        if (out != null) {
            lines.add(new String[] {"Written", out.toString()});
        }
        return new PlanSummary.Section("mop_up", json, lines);
    }

}
