package org.shutline.plan;

import org.shutline.model.Plural;
import java.util.Locale;

/** Plain descriptions of step actions for tables and maps. */
final class StepText {
    private StepText() {}

    static String describe(StepAction a) {
        if (a instanceof StepAction.CloseValves c) return "close " + String.join(", ", c.valves());
        if (a instanceof StepAction.OpenValves o) return "open " + String.join(", ", o.valves());
        if (a instanceof StepAction.CutMain c) return "cut and cap " + c.main() + " at " + xy(c.at());
        if (a instanceof StepAction.TieIn t) return "tie in " + t.main() + " to " + t.to() + " at " + xy(t.at());
        if (a instanceof StepAction.ActivateMain m) return "activate " + m.main();
        if (a instanceof StepAction.AbandonMain m) return "abandon " + m.main();
        if (a instanceof StepAction.InstallBypass b) {
            return "install bypass " + b.id() + " " + xy(b.from()) + " to " + xy(b.to())
                    + (b.valves().isEmpty() ? "" : " with valves " + String.join(", ", b.valves()));
        }
        if (a instanceof StepAction.RemoveBypass b) return "remove bypass " + b.id();
        if (a instanceof StepAction.TransferServices t) {
            return "transfer " + (t.services().isEmpty() ? "all services" : Plural.of(t.services().size(), "service"))
                    + " from " + t.from() + " to " + t.to();
        }
        if (a instanceof StepAction.MoveTap m) {
            return "move sensing tap " + m.tap() + " to " + m.main() + (m.at() == null ? "" : " at " + xy(m.at()));
        }
        if (a instanceof StepAction.StationOut s) return "take station " + s.station() + " out of service";
        if (a instanceof StepAction.StationIn s) return "return station " + s.station() + " to service";
        if (a instanceof StepAction.Attend s) {
            return "attend station " + s.station() + (s.until() == null ? " to the end of the phase" : " until step " + s.until());
        }
        throw new IllegalArgumentException("unknown step kind " + a);
    }

    private static String xy(XY p) {
        return String.format(Locale.ROOT, "(%.1f, %.1f)", p.x(), p.y());
    }
}
