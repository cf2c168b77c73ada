package org.shutline.analysis.hazard;

import org.shutline.model.Finding;
import java.util.ArrayList;
import java.util.List;
import org.shutline.model.Severity;
import org.shutline.model.Station;

/**
 * (b) A station with neither a monitor regulator ({@code monitor_kpa}) nor a relief
 * device ({@code relief_kpa}) recorded: nothing limits the outlet pressure if the
 * regulator fails open. Warning.
 */
public final class SecondaryProtectionCheck implements HazardCheck {
    @Override public String code() { return "no-secondary-protection"; }

    @Override public String description() {
        return "station with no monitor or relief recorded";
    }

    @Override
    public List<Finding> check(StepContext ctx) {
        List<Finding> out = new ArrayList<>();
        for (int i = 0; i < ctx.network().stations().size(); i++) {
            Station st = ctx.network().stations().get(i);
            if (!ctx.after().stationInService(i)) continue;
            if (st.monitorKpa() == null && st.reliefKpa() != null && !st.hasFullRelief()) {
                out.add(Finding.hazard(code(), Severity.WARNING, ctx.stepNumber(), List.of(st.id()), st.geometry().getX(), st.geometry().getY(),
                        "Station " + st.id() + TapOnDeadMainCheck.label(st) + " has no monitor and a relief of "
                                + (st.reliefFull() == null ? "unrecorded" : "token") + " capacity (relief_full not yes): "
                                + "it may not limit a failed-open regulator's flow into " + st.outSys() + ".",
                        "Confirm the relief's capacity against the regulator's full flow (49 CFR 192.201) and record relief_full; "
                                + "until then staff the station during work that affects its sensing."));
                continue;
            }
            if (st.hasSecondaryProtection()) continue;
            out.add(Finding.hazard(code(), Severity.WARNING, ctx.stepNumber(), List.of(st.id()), st.geometry().getX(), st.geometry().getY(),
                    "Station " + st.id() + TapOnDeadMainCheck.label(st) + " has no monitor regulator or relief device recorded: "
                            + "a regulator failure would pass inlet pressure into " + st.outSys() + ".",
                    "Confirm the station's overpressure protection in the field; until then staff it during work that affects its sensing."));
        }
        return out;
    }
}
