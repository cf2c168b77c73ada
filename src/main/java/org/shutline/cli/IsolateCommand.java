package org.shutline.cli;

import org.shutline.model.Plural;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.shutline.analysis.IncidentResponse;
import org.shutline.analysis.Isolation;
import org.shutline.analysis.ValveOrder;
import org.shutline.analysis.Placement;
import org.shutline.analysis.Zone;
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
 * {@code shutline isolate NETWORK (--at X,Y [--system ID] | --main ID) [--format text|json]}:
 * the valves to close so that no live source reaches the zone, in operating order, the
 * fallback for each doubtful valve, services, meters and critical customers off, and
 * whether valves alone can do it. See docs/cli.md for the JSON keys.
 */
@Command(name = "isolate", mixinStandardHelpOptions = true,
    description = "Valve isolation of a point or a main: valves to close, fallbacks, customers off.")
public final class IsolateCommand implements Callable<Integer> {
    static final class Where {
        @Option(names = "--at", paramLabel = "X,Y", split = ",", arity = "1", converter = Locations.FiniteNumber.class,
            description = "a point in the network CRS; placed on the nearest active main")
        double[] at;

        @Option(names = "--main", paramLabel = "ID", description = "a main id")
        String main;
    }

    @Spec private CommandSpec spec;

    @Mixin private NetworkOptions input;

    @ArgGroup(exclusive = true, multiplicity = "1")
    private Where where;

    @Mixin private NearestMainOptions near;
    @Mixin private SettingsOptions settings;
    @Mixin private ResponseOptions response;
    @Mixin private Formats.TextJson format;

    private Locations.Located located;

    @Override
    public Integer call() throws InputException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        AnalysisSettings s = response.apply(settings.settings());
        Workspace t = input.open(s);
        ValveSegments segs = t.segments();
        Placement pl = new Placement(segs);
        try {
            located = where.main != null ? Locations.main(pl, where.main) : Locations.at(pl, where.at, near.system, near.maxDistanceM);
        } catch (Locations.Refusal e) {
            return NetworkInput.badInput(err, "isolate: " + e.getMessage());
        }
        Zone zone = located.zone();
        Isolation.Result r;
        ValveOrder.Result order;
        try {
            // the same field order as `incident` and `export` (crews computed from the 4 h target unless set)
            IncidentResponse.Result resp = IncidentResponse.leak(segs, s.isolation(), zone, s.response());
            r = resp.isolation();
            order = resp.order();
        } catch (IllegalArgumentException e) {
            return NetworkInput.badInput(err, "isolate: " + e.getMessage());
        }
        org.shutline.analysis.InstructionCheck.verify(segs, r, "isolate " + zoneText());
        out.print(format.format() == Formats.Format.json ? Json.write(json(t.network(), r, order, located.placed())) : text(t.network(), r, order));
        out.flush();
        return 0;
    }

    private String zoneText() {
        return located.label() + (where.main == null && near.system != null ? " on " + near.system : "") + "\n" + located.placedText();
    }

    static ObjectNode json(Network net, Isolation.Result r, ValveOrder.Result order, Placement.Placed placed) {
        ObjectNode root = Json.object();
        root.put("isolable", r.isolable());
        if (placed != null) {
            ObjectNode loc = root.putObject("location");
            loc.put("main", placed.mainId());
            if (placed.edge() >= 0) {
                loc.put("x", placed.x());
                loc.put("y", placed.y());
                loc.put("placed_x", EmergencyReport.round(placed.snappedX(), 2));
                loc.put("placed_y", EmergencyReport.round(placed.snappedY(), 2));
                loc.put("moved_m", EmergencyReport.round(placed.distanceM(), 2));
            }
        }
        if (!r.isolable()) root.put("reason", r.reason());
        List<String> ids = new java.util.ArrayList<>();
        for (ValveOrder.Step v : order.steps()) if (!v.stationInlet()) ids.add(v.valveId());
        root.set("valves_to_close", Json.strings(ids));
        ArrayNode fb = root.putArray("fallbacks");
        for (Isolation.Fallback f : r.fallbacks()) {
            ObjectNode o = fb.addObject();
            o.put("valve", f.valveId());
            o.put("why", f.why());
            o.set("then_close", Json.strings(f.thenClose()));
            o.put("adds_services", f.addedServices().size());
            o.put("adds_meters", f.addedMeters());
            o.set("added_service_ids", Json.strings(f.addedServices()));
            o.put("stays_on_services", f.stayOnServices().size());
            o.put("stays_on_meters", f.stayOnMeters());
            ValveOrder.Step st = order.step(f.valveId());
            if (st != null && st.fallback() != null) o.put("text", st.fallback().text());
        }
        root.put("services_off", r.serviceIdsOff().size());
        root.put("meters_off", r.metersOff());
        root.set("critical_off", Json.strings(r.criticalOff()));
        root.set("stations_to_stop", Json.strings(r.stationsToStop()));
        root.set("station_inlet_valves", Json.strings(r.stationInletValves()));
        root.set("sources_in_region", Json.strings(r.sourcesInRegion()));
        root.set("closed_boundary_valves", Json.strings(r.closedBoundaryValves()));
        root.put("unintended_segments", r.unintended().cardinality());
        r.alternative().ifPresent(a -> {
            ObjectNode o = root.putObject("alternative");
            o.set("valves", Json.strings(a.valves()));
            o.put("adds_services", a.addedServices().size());
            o.put("adds_meters", a.addedMeters());
            o.put("stays_on_services", a.stayOnServices().size());
            o.put("stays_on_meters", a.stayOnMeters());
        });
        root.set("service_ids_off", Json.strings(r.serviceIdsOff()));
        root.put("caution", Caution.TEXT);
        return root;
    }

    private String text(Network net, Isolation.Result r, ValveOrder.Result order) {
        StringBuilder sb = new StringBuilder();
        sb.append("Isolation of ").append(zoneText()).append("\nNetwork: ").append(net.sourceName()).append("\n\n");
        if (!r.isolable()) {
            sb.append("NOT ISOLABLE BY VALVES ALONE: ").append(r.reason()).append('\n');
            if (!r.stationsToStop().isEmpty()) sb.append("  stop stations: ").append(String.join(", ", r.stationsToStop())).append('\n');
            if (!r.stationInletValves().isEmpty()) sb.append("  their inlet valves: ").append(String.join(", ", r.stationInletValves())).append('\n');
            sb.append('\n');
        }
        sb.append("Valves to close, in field order (crew 1's route, then crew 2's; doubtful valves first in each):\n");
        for (ValveOrder.Step v : order.steps()) {
            sb.append(String.format(Locale.ROOT, "  %2d. %-10s crew %d  operable %-7s%s%s%n", v.order(), v.valveId(), v.crew(),
                    v.operable().name().toLowerCase(Locale.ROOT), v.overdue() ? "  past inspection interval" : "",
                    v.stationInlet() ? "  " + v.stopLabel() : ""));
            if (v.fallback() != null) sb.append("        if it will not close (").append(v.fallback().why()).append("): ")
                    .append(v.fallback().text()).append('\n');
        }
        if (order.steps().isEmpty()) sb.append("  (none)\n");
        r.alternative().ifPresent(a -> sb.append("\nAlternative with fewer valves: ").append(String.join(", ", a.valves()))
                .append(" (adds ").append(Plural.of(a.addedServices().size(), "service")).append(")\n"));
        sb.append(String.format(Locale.ROOT, "%nServices off %d, meters off %d, unintended segments %d%n", r.serviceIdsOff().size(), r.metersOff(),
                r.unintended().cardinality()));
        if (!r.criticalOff().isEmpty()) sb.append("Critical customers off: ").append(String.join(", ", r.criticalOff())).append('\n');
        if (!r.closedBoundaryValves().isEmpty()) {
            sb.append("Already closed on the boundary (not listed): ").append(String.join(", ", r.closedBoundaryValves())).append('\n');
        }
        List<String> ids = TraceCommand.first(r.serviceIdsOff(), 25);
        if (!ids.isEmpty()) sb.append("Off: ").append(String.join(", ", ids)).append('\n');
        sb.append('\n').append(Caution.TEXT).append('\n');
        return sb.toString();
    }
}
