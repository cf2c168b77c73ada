package org.shutline.cli;

import org.shutline.analysis.ValveDoubt;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.shutline.analysis.IncidentResponse;
import org.shutline.analysis.InstructionCheck;
import org.shutline.analysis.OverpressureShutoff;
import org.shutline.analysis.Placement;
import org.shutline.analysis.ResponseSettings;
import org.shutline.analysis.Restoration;
import org.shutline.analysis.WorkPackages;
import org.shutline.io.InputException;
import org.shutline.model.Caution;
import org.shutline.model.Network;
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
 * {@code shutline incident NETWORK --at X,Y|--main ID|--usng REF|--address TEXT [--kind leak|damage|overpressure]
 * [--system ID] [--crews N] [--target-hours H] [--format text|json]}: the fastest way to
 * stop gas at an incident and the size of the shut-off and relight work. A leak or
 * damage is isolated by valves ({@link IncidentResponse}); an over-pressure is stopped
 * at the feeds of its pressure system ({@link OverpressureShutoff}: {@code --system},
 * else the system of the pipe at the place given). Work lists are grouped by 1 km US
 * National Grid square and ordered along streets. Exit 0 done, 2 bad input (an
 * ambiguous address lists the candidates). JSON keys: docs/cli-emergency.md.
 */
@Command(name = "incident", mixinStandardHelpOptions = true,
    description = "Emergency response to a leak, damage or over-pressure: valves, crews, customers, shut-off and relight.")
public final class IncidentCommand implements Callable<Integer> {
    enum Kind { leak, damage, overpressure }

    static final class Where {
        @Option(names = "--at", paramLabel = "X,Y", split = ",", arity = "1", converter = Locations.FiniteNumber.class,
            description = "a point in the network CRS; placed on the nearest active main")
        double[] at;

        @Option(names = "--main", paramLabel = "ID", description = "a main id")
        String main;

        @Option(names = "--usng", paramLabel = "REF", description = "a US National Grid reference, e.g. \"15T VK 1234 9012\" (the centre of the cell named)")
        String usng;

        @Option(names = "--address", paramLabel = "TEXT", description = "a service address (case-insensitive)")
        String address;
    }

    @Spec private CommandSpec spec;

    @Mixin private NetworkOptions input;

    @ArgGroup(exclusive = true, multiplicity = "1")
    private Where where;

    @Option(names = "--kind", defaultValue = "leak", description = "leak, damage or overpressure (default: ${DEFAULT-VALUE})")
    private Kind kind;

    @Option(names = "--system", paramLabel = "ID", description = "pressure system: with --at or --usng the nearest main of it; for overpressure the system")
    private String system;

    @Option(names = "--max-distance-m", paramLabel = "M", defaultValue = "100", converter = Locations.PositiveMetres.class,
        description = "refuse a place farther than this from every active main, and a grid cell larger (default: ${DEFAULT-VALUE})")
    private double maxDistanceM;
    @Mixin private SettingsOptions settingsOptions;
    @Mixin private ResponseOptions responseOptions;
    @Mixin private Formats.TextJson format;

    @Override
    public Integer call() throws InputException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        AnalysisSettings s = responseOptions.apply(settingsOptions.settings());
        Workspace t = input.open(s);
        ResponseSettings settings = s.response();
        Network net = t.network();
        GridSheets grid = GridSheets.of(net.crs());
        ValveSegments segs = t.segments();
        Locations.Located place;
        try {
            place = place(net, segs, grid, err);
        } catch (Locations.Refusal e) {
            return NetworkInput.badInput(err, "incident: " + e.getMessage());
        }
        if (place == null) return 2;
        ValveDoubt.Settings options = s.isolation();
        ObjectNode root = Json.object();
        StringBuilder sb = new StringBuilder();
        root.put("kind", kind.name());
        root.put("network", net.sourceName());
        ObjectNode loc = root.putObject("location");
        loc.put("given", place.label());
        if (!Double.isNaN(place.x())) {
            loc.put("x", EmergencyReport.round(place.x(), 2));
            loc.put("y", EmergencyReport.round(place.y(), 2));
            loc.put("usng", grid.reference(place.x(), place.y()));
        }
        loc.put("main", place.placed().mainId());
        if (place.placed().systemId() != null) loc.put("main_system", place.placed().systemId());
        if (place.placed().edge() >= 0) {
            loc.put("placed_x", EmergencyReport.round(place.placed().snappedX(), 2));
            loc.put("placed_y", EmergencyReport.round(place.placed().snappedY(), 2));
            loc.put("moved_m", EmergencyReport.round(place.placed().distanceM(), 2));
        }
        sb.append("Incident: ").append(kind.name()).append(" at ").append(place.label());
        if (!Double.isNaN(place.x())) {
            String ref = grid.reference(place.x(), place.y());
            sb.append(String.format(Locale.ROOT, " (%.1f, %.1f%s)", place.x(), place.y(), ref.isEmpty() ? "" : "; USNG " + ref));
        }
        sb.append('\n').append(place.placedText()).append('\n');
        sb.append("Network: ").append(net.sourceName()).append("\n\n");
        Restoration.Result rest;
        java.util.BitSet workSet;
        if (kind == Kind.overpressure) {
            String sys = system != null ? system : IncidentResponse.systemOf(segs, place.zone());
            if (sys == null || t.topology().graph().systemIndex(sys) < 0) {
                return NetworkInput.badInput(err, "incident: " + (sys == null ? "no pressure system at the place given" : "no pressure system '" + sys + "'"));
            }
            OverpressureShutoff.Result r = OverpressureShutoff.of(segs, options, sys, settings);
            InstructionCheck.verify(segs, r, "incident --kind overpressure of " + sys + " at " + place.label());
            EmergencyReport.overpressureJson(root, net, r);
            EmergencyReport.overpressureText(sb, net, r);
            rest = r.restoration();
            workSet = r.off();
        } else {
            IncidentResponse.Result r = IncidentResponse.leak(segs, options, place.zone(), settings);
            InstructionCheck.verify(segs, r, "incident --kind " + kind.name() + " at " + place.label());
            root.put("system", r.systemId());
            EmergencyReport.leakJson(root, segs.state(), r, grid);
            EmergencyReport.leakText(sb, segs.state(), r, grid);
            rest = r.restoration();
            workSet = rest.shutOff();
        }
        WorkPackages.Result wp = WorkPackages.build(net, workSet, grid.sheetKey(), rest.sizing().crews(),
                rest.sizing().crewsComputed(), settings);
        root.set("response", EmergencyReport.responseJson(rest, settings, wp));
        root.set("work_packages", EmergencyReport.packagesJson(wp));
        root.put("caution", Caution.TEXT);
        sb.append('\n');
        EmergencyReport.responseText(sb, rest, settings, wp);
        sb.append('\n');
        EmergencyReport.packagesText(sb, wp, 8);
        sb.append('\n').append(Caution.TEXT).append('\n');
        out.print(format.format() == Formats.Format.json ? Json.write(root) : sb.toString());
        out.flush();
        return 0;
    }

    private Locations.Located place(Network net, ValveSegments segs, GridSheets grid, PrintWriter err) throws Locations.Refusal {
        Placement pl = new Placement(segs);
        if (where.at != null) return Locations.at(pl, where.at, system, maxDistanceM);
        if (where.main != null) return Locations.main(pl, where.main);
        if (where.usng != null) return Locations.usng(pl, grid, where.usng, system, maxDistanceM);
        return Locations.address(pl, net, where.address, "incident", err);
    }
}
