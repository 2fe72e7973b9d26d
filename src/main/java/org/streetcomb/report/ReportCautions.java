package org.streetcomb.report;

import java.util.List;

/** The cautions a report carries, one home for every command and the district batch. */
public final class ReportCautions {

    /** For a report with tours in it. */
    public static final List<String> PLAN = List.of(
            "A plan is advice, not an instruction: obey traffic law and road signs at all times.",
            "Never handle a phone, tablet or GPS unit while driving; stop safely first.",
            "Map data may be out of date: streets close, turn bans change and new streets appear.",
            "Local rules and the operator's own risk assessment come before this plan.");

    /** For a report with no tour in it (a health check, an audit without mop-up): checking streets on the ground is driving too. */
    public static final List<String> CHECK = List.of(
            "Map data may be out of date: streets close, one-way rules change and new streets appear.",
            "When you check streets on the ground, obey traffic law and road signs, and never handle a phone, "
                    + "tablet or GPS unit while driving.");

    private ReportCautions() {
    }
}
