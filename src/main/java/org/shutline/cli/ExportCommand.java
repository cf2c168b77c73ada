package org.shutline.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.Callable;
import org.shutline.analysis.Placement;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.analysis.Zone;
import org.shutline.io.InputException;
import org.shutline.model.Caution;
import org.shutline.model.Progress;
import org.shutline.plan.PlanException;
import org.shutline.report.PageFormat;
import org.shutline.report.Paper;
import org.shutline.report.ReportBuilder;
import org.shutline.report.ReportView;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;
import picocli.CommandLine.ArgGroup;
import org.shutline.app.AnalysisSettings;
import org.shutline.app.Workspace;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code shutline export NETWORK (--plan PLAN --step N | --at X,Y | --main ID) --out DIR
 * [--paper letter|tabloid|a4|a3] [--landscape|--portrait] [--dpi 150]
 * [--formats pdf,png,svg,gpkg,geojson,csv] [--prepared-by NAME] [--radius-m 100]}:
 * writes the maps, lists and result layers of a plan step or an incident through
 * {@link ReportBuilder} (see there for the files). The isolation circle of an incident
 * at a point defaults to 100 m, the initial isolation distance of the Emergency
 * Response Guidebook (2024), Guide 115 (natural gas). Exit 0 when written, 2 for bad
 * input, a bad option, an incident point refused by {@link Locations} (farther than
 * {@code --max-distance-m} from every active main), or an output path that is an input file.
 */
@Command(name = "export", mixinStandardHelpOptions = true,
    description = "Write maps (PDF, PNG, SVG), map book, valve and customer lists and result layers of a plan step or an incident.")
public final class ExportCommand implements Callable<Integer>, WriteGuard.Writes {

    static final class Where {
        @Option(names = "--plan", paramLabel = "PLAN", description = "a work plan (YAML); with --step")
        Path plan;

        @Option(names = "--at", paramLabel = "X,Y", split = ",", converter = Locations.FiniteNumber.class,
            description = "an incident at a point in the network CRS; placed on the nearest active main")
        double[] at;

        @Option(names = "--main", paramLabel = "ID", description = "an incident on a main")
        String main;
    }

    static final class Orientation {
        @Option(names = "--landscape", description = "landscape pages (default)")
        boolean landscape;

        @Option(names = "--portrait", description = "portrait pages")
        boolean portrait;
    }

    @Spec private CommandSpec spec;

    @Mixin private NetworkOptions input;

    @ArgGroup(exclusive = true, multiplicity = "1")
    private Where where;

    @Option(names = "--step", paramLabel = "N", description = "with --plan: the step to map")
    private Integer step;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "output folder")
    private Path out;

    @Option(names = "--paper", defaultValue = "letter", description = "letter, tabloid, a4 or a3 (default: ${DEFAULT-VALUE})")
    private String paper;

    @ArgGroup(exclusive = true)
    private Orientation orientation;

    @Option(names = "--dpi", defaultValue = "150", description = "PNG resolution (default: ${DEFAULT-VALUE})")
    private int dpi;

    @Option(names = "--formats", split = ",", paramLabel = "LIST", defaultValue = "pdf,png,svg,gpkg,geojson,csv",
        description = "any of pdf,png,svg,gpkg,geojson,csv (default: all)")
    private List<String> formats;

    @Option(names = "--prepared-by", paramLabel = "NAME", description = "name for the title block")
    private String preparedBy;

    @Option(names = "--radius-m", defaultValue = "100",
        description = "isolation circle radius in metres (default: ${DEFAULT-VALUE}, Emergency Response Guidebook 2024, Guide 115)")
    private double radiusM;

    @Mixin private NearestMainOptions near;
    @Mixin private SettingsOptions settings;
    @Mixin private PlanCheckOptions checks;
    @Mixin private ResponseOptions response;

    @Override
    public List<Path> outputs() {
        return ReportBuilder.targets(out);
    }

    @Override
    public Path outputFolder() {
        return out;
    }

    @Override
    public Integer call() {
        PrintWriter o = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        String bad = checkOptions();
        if (bad != null) return NetworkInput.badInput(err, bad);
        ReportBuilder.Options opts = options();
        ReportBuilder rb;
        try {
            AnalysisSettings s = response.apply(checks.apply("export", settings.settings()));
            if (where.plan != null) {
                PlanEvaluation.Result r = PlanCommand.evaluate(input, where.plan, s, Progress.NONE);
                if (step < 1 || step > r.steps().size()) {
                    return NetworkInput.badInput(err, "export: the plan has steps 1 to " + r.steps().size() + ", not " + step);
                }
                rb = ReportBuilder.of(ReportView.ofStep(r, step, s.isolation()), input.network, opts).withPlan(r, where.plan);
            } else {
                rb = ReportBuilder.of(incident(input.open(s), s), input.network, opts);
            }
        } catch (InputException | PlanException | IllegalArgumentException e) {
            return NetworkInput.badInput(err, e.getMessage());
        }
        try {
            List<Path> files = rb.write(OutputFolder.start(out, spec, err), Progress.NONE);
            for (Path f : files) o.println("wrote " + f);
            o.println(Caution.TEXT);
            o.flush();
            return 0;
        } catch (IOException e) {
            return NetworkInput.badInput(err, "export: " + e.getMessage());
        }
    }

    private String checkOptions() {
        if (where.plan != null && step == null) return "export: --plan needs --step N";
        if (where.plan == null && step != null) return "export: --step goes with --plan";
        if (where.at != null && where.at.length != 2) return "export: --at takes X,Y";
        if (Paper.parse(paper).isEmpty()) return "export: unknown paper '" + paper + "' (letter, tabloid, a4, a3)";
        if (dpi < 10 || dpi > 1200) return "export: --dpi must be 10 to 1200";
        try {
            OptionRange.RADIUS_M.check("export", radiusM);
        } catch (InputException e) {
            return e.getMessage();
        }
        for (String f : formats) {
            if (ReportBuilder.Format.parse(f).isEmpty()) return "export: unknown format '" + f + "' (pdf, png, svg, gpkg, geojson, csv)";
        }
        return null;
    }

    private ReportBuilder.Options options() {
        boolean landscape = orientation == null || !orientation.portrait;
        Set<ReportBuilder.Format> fs = EnumSet.noneOf(ReportBuilder.Format.class);
        for (String f : formats) fs.add(ReportBuilder.Format.parse(f).orElseThrow());
        return ReportBuilder.Options.defaults().withPage(new PageFormat(Paper.parse(paper).orElseThrow(), landscape))
                .withDpi(dpi).withFormats(fs).withPreparedBy(preparedBy).withMade(LocalDateTime.now().withSecond(0).withNano(0));
    }

    private ReportView incident(Workspace w, AnalysisSettings s) {
        NetworkState base = w.base();
        ValveSegments segs = w.segments();
        Placement pl = new Placement(segs);
        Locations.Located loc;
        try {
            loc = where.main != null ? Locations.main(pl, where.main) : Locations.at(pl, where.at, near.system, near.maxDistanceM);
        } catch (Locations.Refusal e) {
            throw new IllegalArgumentException("export: " + e.getMessage(), e);
        }
        Zone zone = loc.zone();
        // the same field order (crews' routes, doubtful valves first) and crews as `incident` with the same settings
        org.shutline.analysis.IncidentResponse.Result r = org.shutline.analysis.IncidentResponse.leak(segs, s.isolation(), zone,
                s.response());
        org.shutline.analysis.InstructionCheck.verify(segs, r.isolation(), "export " + loc.label());
        String subject = where.main != null ? "Incident on main " + where.main
                : String.format(Locale.ROOT, "Incident at %.1f, %.1f%s", where.at[0], where.at[1],
                    near.system == null ? "" : " (" + near.system + ")");
        double x = where.at == null ? Double.NaN : where.at[0];
        double y = where.at == null ? Double.NaN : where.at[1];
        return ReportView.ofIncident(base, r, subject, x, y, radiusM, org.shutline.analysis.GasOffExtent.DEFAULT_BUFFER_M);
    }

    private static int fail(PrintWriter err, String message) {
        return NetworkInput.badInput(err, message);
    }
}
