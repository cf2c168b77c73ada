package org.shutline.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.shutline.analysis.Isolation;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.model.Finding;
import org.shutline.report.FindingSection;
import org.shutline.io.AtomicFiles;
import org.shutline.io.OutputPackage;
import org.shutline.io.InputException;
import org.shutline.model.Caution;
import org.shutline.model.Progress;
import org.shutline.model.ServiceClass;
import org.shutline.model.Words;
import org.shutline.plan.Plan;
import org.shutline.plan.PlanException;
import org.shutline.plan.PlanReader;
import org.shutline.report.Csv;
import org.shutline.app.AnalysisSettings;
import org.shutline.app.PlanStudy;
import org.shutline.app.Workspace;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code shutline plan NETWORK PLAN [--format text|json|csv] [--out DIR]}: evaluates
 * every step of a work plan (docs/plan-format.md) and prints a per-step table (step,
 * action, services off, meters off, critical customers off, hazards) and the hazards
 * with the action to take. Exit 0 when no step raises a critical hazard, 1 when one
 * does, 2 when the network or plan cannot be read or applied.
 */
@Command(name = "plan", mixinStandardHelpOptions = true,
    description = "Evaluate a work plan step by step: customers off gas, valves, hazards.")
public final class PlanCommand implements Callable<Integer>, WriteGuard.Writes {
    @Spec private CommandSpec spec;

    @Mixin private NetworkOptions input;

    @Parameters(index = "1", paramLabel = "PLAN", description = "the work plan (YAML)")
    private Path planFile;

    @Mixin private Formats.TextJsonCsv format;

    @Option(names = "--out", paramLabel = "DIR", description = "also write plan-steps.csv, plan-hazards.csv and plan.json into DIR")
    private Path out;

    @Mixin private SettingsOptions settings;
    @Mixin private PlanCheckOptions checks;

    @Override
    public List<Path> outputs() {
        return out == null ? List.of() : List.of(out.resolve("plan-steps.csv"), out.resolve("plan-hazards.csv"), out.resolve("plan.json"));
    }

    @Override
    public Path outputFolder() {
        return out;
    }

    @Override
    public Integer call() throws InputException, PlanException {
        PrintWriter o = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        PlanEvaluation.Result r = evaluate(input, planFile, checks.apply("plan", settings.settings()), Progress.NONE);
        String text = switch (format.format()) {
            case json -> Json.write(json(r));
            case csv -> stepsCsv(r);
            default -> text(r);
        };
        o.print(text);
        o.flush();
        if (out != null) {
            try {
                OutputPackage pkg = OutputFolder.start(out, spec, err);
                for (String[] f : new String[][] {{"plan-steps.csv", stepsCsv(r)}, {"plan-hazards.csv", hazardsCsv(r)},
                        {"plan.json", Json.write(json(r))}}) {
                    AtomicFiles.writeString(pkg.file(f[0]), f[1]);
                    pkg.add(pkg.file(f[0]));
                }
                pkg.commit();
            } catch (IOException e) {
                return NetworkInput.badInput(err, "plan: cannot write to " + out + ": " + e.getMessage());
            }
        }
        return r.hasCritical() ? 1 : 0;
    }

    /** Opens the network, reads the plan and evaluates it ({@link PlanStudy}); shared with {@code export --plan}. */
    static PlanEvaluation.Result evaluate(NetworkOptions input, Path planFile, AnalysisSettings settings, Progress progress)
            throws InputException, PlanException {
        Workspace w = input.open(settings);
        Plan plan = PlanReader.read(planFile);
        return PlanStudy.evaluate(w, plan, planFile.getFileName().toString(), settings, progress);
    }

    /** {@code text} split at blanks into lines of at most {@code width} characters (a longer word on a line of its own). */
    static List<String> wrap(String text, int width) {
        List<String> out = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String w : text.split(" ")) {
            if (line.length() > 0 && line.length() + 1 + w.length() > width) {
                out.add(line.toString());
                line.setLength(0);
            }
            if (line.length() > 0) line.append(' ');
            line.append(w);
        }
        out.add(line.toString());
        return out;
    }

    static String hazardCodes(List<Finding> hs) {
        List<String> s = new ArrayList<>();
        for (Finding h : hs) s.add(h.code() + " (" + Words.word(h.severity()) + (h.mitigated() ? ", mitigated" : "") + ")");
        return String.join("; ", s);
    }

    private String text(PlanEvaluation.Result r) {
        Plan p = r.states().plan();
        StringBuilder sb = new StringBuilder();
        sb.append("Work plan: ").append(p.project()).append("\nNetwork: ").append(r.states().base().network().sourceName())
                .append("\nPlan file: ").append(planFile).append("\n\n");
        if (!r.recordedHazards().isEmpty()) {
            sb.append("In the network as recorded (before step 1):\n");
            sb.append(FindingSection.text(r.recordedHazards(), Integer.MAX_VALUE, "  ")).append('\n');
        }
        sb.append(String.format(Locale.ROOT, "%4s %-5s %-58s %8s %7s %8s  %s%n", "step", "phase", "action", "svc off", "mtr off", "crit off", "hazards (new at this step)"));
        for (PlanEvaluation.StepResult s : r.steps()) {
            // a long action wraps at blanks onto continuation lines under its column, never cut
            List<String> action = wrap(s.step().describe(), 58);
            sb.append(String.format(Locale.ROOT, "%4d %-5d %-58s %8d %7d %8d  %s%s%n", s.step().number(), s.step().phase() + 1, action.get(0),
                    s.servicesOff(), s.metersOff(), s.criticalOff().size(), hazardCodes(s.hazards()),
                    s.continuing().isEmpty() ? "" : (s.hazards().isEmpty() ? "" : "; ") + "(" + s.continuing().size() + " continuing)"));
            for (String more : action.subList(1, action.size())) sb.append(String.format(Locale.ROOT, "%11s%s%n", "", more));
        }
        sb.append("\nPhases:\n");
        for (PlanEvaluation.PhaseResult ph : r.phases()) {
            sb.append(String.format(Locale.ROOT, "  %d. %-40s customer-hours off gas %.1f; off at end of phase %d%n", ph.index() + 1,
                    ph.phase().name(), ph.customerHours(), ph.servicesOffAtEnd()));
        }
        boolean any = false;
        for (PlanEvaluation.StepResult s : r.steps()) {
            if (s.hazards().isEmpty() && s.notices().isEmpty() && s.suggestion() == null && s.criticalOff().isEmpty()) continue;
            if (!any) sb.append("\nFindings by step:\n");
            any = true;
            sb.append("\nStep ").append(s.step().number()).append(": ").append(s.step().describe()).append('\n');
            sb.append(FindingSection.text(s.hazards(), Integer.MAX_VALUE, "  "));
            for (String n : s.notices()) sb.append("  note: ").append(n).append('\n');
            for (PlanEvaluation.CriticalOff c : s.criticalOff()) {
                sb.append("  critical customer off: ").append(c.serviceId()).append(" ").append(c.kind())
                        .append(c.address() == null ? "" : ", " + c.address()).append('\n');
            }
            if (s.suggestion() != null) {
                sb.append("  suggested order: ").append(String.join(", ", s.suggestion().order())).append('\n');
                for (Isolation.Fallback f : s.suggestion().fallbacks()) {
                    sb.append("  if ").append(f.valveId()).append(" will not close (").append(f.why()).append("): ")
                            .append(org.shutline.report.ReportView.fallbackText(f)).append('\n');
                }
            }
        }
        long crit = r.steps().stream().flatMap(s -> s.hazards().stream()).filter(Finding::critical).count();
        int dataErrors = DataErrors.current();
        String data = dataErrors == 0 ? "" : "; the network read gave " + dataErrors
                + (dataErrors == 1 ? " data error" : " data errors") + " (see the line on stderr and `shutline check`)";
        sb.append('\n').append(crit == 0 ? "Result: no critical hazard raised by the plan" + data + " (exit " + (dataErrors == 0 ? 0 : 1) + ")."
                : "Result: " + crit + " critical hazard(s) raised by the plan" + data + " (exit 1).").append('\n');
        sb.append('\n').append(Caution.TEXT).append('\n');
        return sb.toString();
    }

    static ObjectNode json(PlanEvaluation.Result r) {
        Plan p = r.states().plan();
        ObjectNode root = Json.object();
        root.put("project", p.project());
        root.put("network", r.states().base().network().sourceName());
        root.put("critical", r.hasCritical());
        root.put("data_errors", DataErrors.current());
        ArrayNode rec = root.putArray("recorded_hazards");
        for (Finding h : r.recordedHazards()) FindingSection.json(rec, h);
        ArrayNode steps = root.putArray("steps");
        for (PlanEvaluation.StepResult s : r.steps()) {
            ObjectNode o = steps.addObject();
            o.put("step", s.step().number());
            o.put("phase", s.step().phase() + 1);
            o.put("phase_name", p.phases().get(s.step().phase()).name());
            o.put("action", s.step().describe());
            o.put("kind", s.step().action().key());
            o.put("services_off", s.servicesOff());
            o.put("meters_off", s.metersOff());
            List<String> crit = new ArrayList<>();
            for (PlanEvaluation.CriticalOff c : s.criticalOff()) crit.add(c.serviceId());
            o.set("critical_off", Json.strings(crit));
            ObjectNode byClass = o.putObject("services_off_by_class");
            for (ServiceClass c : ServiceClass.values()) byClass.put(Words.word(c), s.servicesOffByClass().getOrDefault(c, 0));
            o.set("went_off", Json.strings(s.wentOff()));
            o.set("came_back", Json.strings(s.cameBack()));
            ObjectNode feeds = o.putObject("district_feeds");
            for (Map.Entry<String, List<String>> e : new java.util.TreeMap<>(s.districtFeeds()).entrySet()) feeds.set(e.getKey(), Json.strings(e.getValue()));
            ArrayNode hz = o.putArray("hazards");
            for (Finding h : s.hazards()) FindingSection.json(hz, h);
            ArrayNode cont = o.putArray("continuing");
            for (Finding h : s.continuing()) cont.add(h.key());
            o.set("notices", Json.strings(s.notices()));
            if (s.suggestion() != null) {
                o.set("suggested_order", Json.strings(s.suggestion().order()));
                ArrayNode fb = o.putArray("fallbacks");
                for (Isolation.Fallback f : s.suggestion().fallbacks()) {
                    ObjectNode fo = fb.addObject();
                    fo.put("valve", f.valveId());
                    fo.set("then_close", Json.strings(f.thenClose()));
                    fo.put("adds_services", f.addedServices().size());
                    fo.put("adds_meters", f.addedMeters());
                    fo.put("stays_on_services", f.stayOnServices().size());
                    fo.put("text", org.shutline.report.ReportView.fallbackText(f));
                }
            }
        }
        ArrayNode phases = root.putArray("phases");
        for (PlanEvaluation.PhaseResult ph : r.phases()) {
            ObjectNode o = phases.addObject();
            o.put("phase", ph.index() + 1);
            o.put("name", ph.phase().name());
            if (ph.phase().start() != null) o.put("start", ph.phase().start().toString());
            if (ph.phase().end() != null) o.put("end", ph.phase().end().toString());
            o.put("customer_hours", Math.round(ph.customerHours() * 10) / 10.0);
            o.put("services_off_at_end", ph.servicesOffAtEnd());
        }
        root.put("caution", Caution.TEXT);
        return root;
    }

    static String stepsCsv(PlanEvaluation.Result r) {
        List<List<String>> rows = new ArrayList<>();
        for (PlanEvaluation.StepResult s : r.steps()) {
            rows.add(List.of(Integer.toString(s.step().number()), Integer.toString(s.step().phase() + 1), s.step().describe(),
                    Integer.toString(s.servicesOff()), Long.toString(s.metersOff()), Integer.toString(s.criticalOff().size()),
                    hazardCodes(s.hazards())));
        }
        return Csv.format(List.of("step", "phase", "action", "services_off", "meters_off", "critical_off", "hazards"), rows);
    }

    static String hazardsCsv(PlanEvaluation.Result r) {
        List<List<String>> rows = new ArrayList<>();
        List<Finding> all = new ArrayList<>(r.recordedHazards());
        for (PlanEvaluation.StepResult s : r.steps()) all.addAll(s.hazards());
        for (Finding h : all) {
            rows.add(List.of(Integer.toString(h.step()), h.code(), Words.word(h.severity()), String.join(" ", h.features()),
                    Double.isNaN(h.x()) ? "" : String.format(Locale.ROOT, "%.2f", h.x()), Double.isNaN(h.y()) ? "" : String.format(Locale.ROOT, "%.2f", h.y()),
                    h.message(), h.action(), h.mitigated() ? h.mitigatedBy() : ""));
        }
        return Csv.format(List.of("step", "code", "severity", "features", "x", "y", "message", "action", "mitigated_by"), rows);
    }
}
