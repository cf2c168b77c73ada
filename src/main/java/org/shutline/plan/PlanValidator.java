package org.shutline.plan;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.shutline.model.Feature;
import org.shutline.model.Network;

/**
 * Checks that every feature id a plan names exists in the network (or, for bypasses
 * and their valves, was installed by an earlier step and not yet removed). Returns
 * all problems at once, each a {@link PlanException} naming the file line and step;
 * an empty list means the plan's ids are sound. State-dependent problems (cutting a
 * main already abandoned) are found when the plan is applied.
 */
public final class PlanValidator {
    private PlanValidator() {}

    public static List<PlanException> validate(Plan plan, Network net, String fileName) {
        Set<String> valves = ids(net.valves());
        Set<String> mains = ids(net.mains());
        Set<String> stations = ids(net.stations());
        Set<String> taps = ids(net.taps());
        Set<String> services = ids(net.services());
        Set<String> bypasses = new HashSet<>();
        List<PlanException> out = new ArrayList<>();
        for (Step s : plan.steps()) {
            Check c = new Check(fileName, s, out);
            StepAction a = s.action();
            if (a instanceof StepAction.CloseValves cv) cv.valves().forEach(v -> c.in(valves, v, "valve"));
            else if (a instanceof StepAction.OpenValves ov) ov.valves().forEach(v -> c.in(valves, v, "valve"));
            else if (a instanceof StepAction.CutMain cm) c.in(mains, cm.main(), "main");
            else if (a instanceof StepAction.TieIn t) {
                c.in(mains, t.main(), "main");
                c.in(mains, t.to(), "main");
            } else if (a instanceof StepAction.ActivateMain m) c.in(mains, m.main(), "main");
            else if (a instanceof StepAction.AbandonMain m) c.in(mains, m.main(), "main");
            else if (a instanceof StepAction.InstallBypass b) {
                if (!bypasses.add(b.id())) c.fail("bypass " + b.id() + " is already installed");
                for (String v : b.valves()) {
                    if (!valves.add(v)) c.fail("bypass valve id " + v + " is already used by another valve");
                }
            } else if (a instanceof StepAction.RemoveBypass b) {
                if (!bypasses.remove(b.id())) c.fail("no bypass " + b.id() + " is installed at this step");
            } else if (a instanceof StepAction.TransferServices t) {
                c.in(mains, t.from(), "main");
                c.in(mains, t.to(), "main");
                t.services().forEach(v -> c.in(services, v, "service"));
            } else if (a instanceof StepAction.MoveTap m) {
                c.in(taps, m.tap(), "sensing tap");
                c.in(mains, m.main(), "main");
            } else if (a instanceof StepAction.StationOut so) c.in(stations, so.station(), "station");
            else if (a instanceof StepAction.StationIn si) c.in(stations, si.station(), "station");
            else if (a instanceof StepAction.Attend at) {
                c.in(stations, at.station(), "station");
                int last = plan.steps().size();
                if (at.until() != null && (at.until() < s.number() || at.until() > last)) {
                    c.fail("until: step " + at.until() + " is not between this step (" + s.number() + ") and the last step (" + last + ")");
                }
            }
        }
        return List.copyOf(out);
    }

    private static Set<String> ids(List<? extends Feature> fs) {
        Set<String> s = new HashSet<>();
        for (Feature f : fs) s.add(f.id());
        return s;
    }

    private record Check(String file, Step step, List<PlanException> out) {
        void in(Set<String> known, String id, String what) {
            if (!known.contains(id)) fail("no " + what + " with id '" + id + "' in the network");
        }

        void fail(String why) {
            out.add(new PlanException(file + ":" + step.line() + ": step " + step.number() + " (" + step.action().key() + "): " + why,
                    step.line()));
        }
    }
}
