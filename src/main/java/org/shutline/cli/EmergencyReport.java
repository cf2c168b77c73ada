package org.shutline.cli;

import org.shutline.model.Plural;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shutline.analysis.IncidentResponse;
import org.shutline.analysis.Isolation;
import org.shutline.analysis.OverpressureShutoff;
import org.shutline.analysis.ResponseSettings;
import org.shutline.analysis.ResponseSizing;
import org.shutline.analysis.Restoration;
import org.shutline.analysis.ValveRoute;
import org.shutline.analysis.WorkPackages;
import org.shutline.model.Network;
import org.shutline.model.Service;
import org.shutline.trace.NetworkState;

/**
 * Text and JSON forms of the emergency results, shared by {@code incident} and
 * {@code cards}. The JSON keys are documented in docs/cli-emergency.md.
 */
final class EmergencyReport {
    private EmergencyReport() {}

    // ---- JSON ----

    static void leakJson(ObjectNode root, NetworkState s, IncidentResponse.Result r, GridSheets grid) {
        Isolation.Result iso = r.isolation();
        root.put("isolable", iso.isolable());
        if (!iso.isolable()) root.put("reason", iso.reason());
        root.set("stations_to_stop", Json.strings(iso.stationsToStop()));
        root.set("station_inlet_valves", Json.strings(iso.stationInletValves()));
        root.set("sources_in_region", Json.strings(iso.sourcesInRegion()));
        ArrayNode valves = root.putArray("valves_to_close");
        for (Isolation.ValveStep v : iso.valves()) {
            ObjectNode o = valves.addObject();
            o.put("order", v.order());
            o.put("valve", v.valveId());
            o.put("operable", v.operable().name().toLowerCase(Locale.ROOT));
            o.put("overdue", v.overdue());
            o.put("crew", crewOf(r.route(), v.valveId()));
            double[] xy = IncidentResponse.valveXY(s, v.valve());
            o.put("x", round(xy[0], 2));
            o.put("y", round(xy[1], 2));
            o.put("usng", grid.reference(xy[0], xy[1]));
        }
        ArrayNode fb = root.putArray("fallbacks");
        for (Isolation.Fallback f : iso.fallbacks()) fallbackJson(fb.addObject(), f);
        iso.alternative().ifPresent(a -> {
            ObjectNode o = root.putObject("alternative");
            o.set("valves", Json.strings(a.valves()));
            o.put("adds_services", a.addedServices().size());
            o.put("adds_meters", a.addedMeters());
            r.alternativeRoute().ifPresent(rt -> o.put("elapsed_minutes", round(rt.elapsedMinutes(), 1)));
        });
        root.set("valve_time", routeJson(r.route()));
        root.put("services_off", iso.serviceIdsOff().size());
        root.put("meters_off", iso.metersOff());
        root.set("critical_off", criticalJson(s.network(), r.restoration().criticalShutOff()));
        root.put("unintended_segments", iso.unintended().cardinality());
        root.set("closed_boundary_valves", Json.strings(iso.closedBoundaryValves()));
        root.put("initial_isolation_m", IncidentResponse.INITIAL_ISOLATION_M);
    }

    static void fallbackJson(ObjectNode o, Isolation.Fallback f) {
        o.put("valve", f.valveId());
        o.put("why", f.why());
        o.set("then_close", Json.strings(f.thenClose()));
        o.put("adds_services", f.addedServices().size());
        o.put("adds_meters", f.addedMeters());
        o.put("isolable", f.isolable());
    }

    static ObjectNode routeJson(ValveRoute.Result r) {
        ObjectNode o = Json.object();
        o.put("elapsed_minutes", round(r.elapsedMinutes(), 1));
        o.put("drive_m", round(r.driveMetres(), 0));
        o.set("tour", Json.strings(r.tour()));
        ArrayNode runs = o.putArray("crews");
        for (ValveRoute.CrewRun c : r.crews()) {
            ObjectNode x = runs.addObject();
            x.put("crew", c.crew());
            List<String> ids = new ArrayList<>();
            for (ValveRoute.Visit v : c.visits()) ids.add(v.valveId());
            x.set("valves", Json.strings(ids));
            x.put("drive_m", round(c.driveMetres(), 0));
            x.put("minutes", round(c.minutes(), 1));
        }
        return o;
    }

    static ArrayNode criticalJson(Network net, List<String> ids) {
        ArrayNode a = Json.MAPPER.createArrayNode();
        for (String id : ids) {
            Service sv = service(net, id);
            ObjectNode o = a.addObject();
            o.put("service", id);
            o.put("kind", sv == null || sv.critical() == null || sv.critical().isBlank() ? "critical" : sv.critical());
            o.put("address", sv == null ? null : sv.address());
        }
        return a;
    }

    static void overpressureJson(ObjectNode root, Network net, OverpressureShutoff.Result r) {
        root.put("system", r.systemId());
        ArrayNode feeds = root.putArray("feeds");
        for (OverpressureShutoff.Feed f : r.feeds()) {
            ObjectNode o = feeds.addObject();
            o.put("kind", f.kind());
            o.put("id", f.id());
            o.put("name", f.name());
            o.put("from_system", f.fromSystem());
            o.set("inlet_valves", Json.strings(f.inletValves()));
            if (f.upstream() != null) {
                ObjectNode u = o.putObject("upstream");
                u.put("isolable", f.upstream().isolable());
                u.set("valves_to_close", Json.strings(f.upstream().valveIds()));
                ArrayNode fb = u.putArray("fallbacks");
                for (Isolation.Fallback x : f.upstream().fallbacks()) fallbackJson(fb.addObject(), x);
                u.put("services_off", f.upstream().serviceIdsOff().size());
            }
        }
        root.put("services_at_risk", r.atRisk().cardinality());
        root.put("meters_at_risk", r.atRiskMeters());
        root.set("critical_at_risk", criticalJson(net, r.criticalAtRisk()));
        root.set("services_to_check", Json.strings(r.atRiskOrdered()));
        root.put("services_off", r.off().cardinality());
        root.put("meters_off", r.metersOff());
    }

    static ObjectNode responseJson(Restoration.Result r, ResponseSettings s) {
        ObjectNode o = Json.object();
        ResponseSizing.Result z = r.sizing();
        o.put("meters_shut_off", r.metersShutOff());
        o.put("meters_to_relight", r.metersRelight());
        o.put("services_to_relight", r.relight().cardinality());
        o.set("dead_systems", Json.strings(r.deadSystems()));
        o.put("purge", r.purge());
        o.put("shutoff_tech_hours", round(z.shutoffTechHours(), 2));
        o.put("relight_visits", round(z.relightVisits(), 1));
        o.put("relight_tech_hours", round(z.relightTechHours(), 2));
        o.put("target_hours", s.targetHours());
        o.put("relight_target_hours", s.relightTargetHours());
        o.put("shutoff_technicians_needed", z.shutoffTechs());
        o.put("shutoff_crews_needed", z.shutoffCrews());
        o.put("relight_technicians_needed", z.relightTechs());
        o.put("relight_crews_needed", z.relightCrews());
        o.put("crews", z.crews());
        o.put("shutoff_hours_with_crews", round(z.shutoffHoursWithCrews(), 2));
        o.put("relight_hours_with_crews", round(z.relightHoursWithCrews(), 2));
        ObjectNode rates = o.putObject("rates");
        rates.put("shutoffs_per_tech_hour", s.rates().shutoffsPerTechHour());
        rates.put("relights_per_tech_hour", s.rates().relightsPerTechHour());
        rates.put("second_visit_fraction", s.rates().secondVisitFraction());
        rates.put("techs_per_crew", s.rates().techsPerCrew());
        rates.put("minutes_per_valve", s.valves().minutesPerValve());
        rates.put("crew_speed_kmh", s.valves().speedKmh());
        rates.put("detour_factor", s.valves().detourFactor());
        return o;
    }

    static ArrayNode packagesJson(WorkPackages.Result w) {
        ArrayNode a = Json.MAPPER.createArrayNode();
        for (WorkPackages.Package p : w.packages()) {
            ObjectNode o = a.addObject();
            o.put("sheet", p.sheet());
            o.put("crew", p.crew());
            o.put("meters", p.meters());
            ArrayNode v = o.putArray("visits");
            for (WorkPackages.Visit x : p.visits()) {
                ObjectNode q = v.addObject();
                q.put("service", x.serviceId());
                q.put("address", x.address());
                q.put("street", x.street());
                q.put("meters", x.meters());
                if (!x.critical().isEmpty()) q.put("critical", x.critical());
            }
        }
        return a;
    }

    // ---- text ----

    static void leakText(StringBuilder sb, NetworkState s, IncidentResponse.Result r, GridSheets grid) {
        Isolation.Result iso = r.isolation();
        if (!iso.isolable()) {
            sb.append("NOT ISOLABLE BY VALVES ALONE: ").append(iso.reason()).append('\n');
            if (!iso.stationsToStop().isEmpty()) sb.append("  stop stations: ").append(String.join(", ", iso.stationsToStop())).append('\n');
            if (!iso.stationInletValves().isEmpty()) sb.append("  their inlet valves: ").append(String.join(", ", iso.stationInletValves())).append('\n');
            sb.append('\n');
        }
        sb.append("Valves to close, in operating order:\n");
        for (Isolation.ValveStep v : iso.valves()) {
            double[] xy = IncidentResponse.valveXY(s, v.valve());
            sb.append(String.format(Locale.ROOT, "  %2d. %-10s operable %-7s crew %d  %s%s%n", v.order(), v.valveId(),
                    v.operable().name().toLowerCase(Locale.ROOT), crewOf(r.route(), v.valveId()), grid.reference(xy[0], xy[1]),
                    v.overdue() ? "  past inspection interval" : ""));
        }
        if (iso.valves().isEmpty()) sb.append("  (none)\n");
        if (!iso.fallbacks().isEmpty()) {
            sb.append("If a valve will not close:\n");
            for (Isolation.Fallback f : iso.fallbacks()) fallbackText(sb, "  ", f);
        }
        iso.alternative().ifPresent(a -> sb.append("Alternative with fewer valves: ").append(String.join(", ", a.valves()))
                .append(" (adds ").append(Plural.of(a.addedServices().size(), "service")).append(", ").append(Plural.of(a.addedMeters(), "meter"))
                .append(r.alternativeRoute().map(rt -> String.format(Locale.ROOT, "; %.0f min", rt.elapsedMinutes())).orElse(""))
                .append(")\n"));
        routeText(sb, r.route());
        sb.append(String.format(Locale.ROOT, "Services off %d, meters off %d, unintended segments %d%n", iso.serviceIdsOff().size(),
                iso.metersOff(), iso.unintended().cardinality()));
        criticalText(sb, s.network(), "Critical customers off", r.restoration().criticalShutOff());
        sb.append(String.format(Locale.ROOT, "Initial isolation distance: %.0f m in all directions (ERG Guide 115)%n",
                IncidentResponse.INITIAL_ISOLATION_M));
    }

    static void fallbackText(StringBuilder sb, String indent, Isolation.Fallback f) {
        sb.append(indent).append(f.valveId()).append(" (").append(f.why()).append("): then close ")
                .append(f.thenClose().isEmpty() ? "(nothing more)" : String.join(", ", f.thenClose()))
                .append("; adds ").append(Plural.of(f.addedServices().size(), "service")).append(", ").append(Plural.of(f.addedMeters(), "meter"))
                .append(f.isolable() ? "" : "; valves alone then cannot isolate").append('\n');
    }

    static void routeText(StringBuilder sb, ValveRoute.Result r) {
        if (r.crews().isEmpty()) return;
        sb.append(String.format(Locale.ROOT, "Valve time: %.0f min with %s, %.0f m driving%n", r.elapsedMinutes(),
                Plural.of(r.crews().size(), "crew"), r.driveMetres()));
        for (ValveRoute.CrewRun c : r.crews()) {
            List<String> ids = new ArrayList<>();
            for (ValveRoute.Visit v : c.visits()) ids.add(v.valveId());
            sb.append(String.format(Locale.ROOT, "  crew %d: %s (%.0f min, %.0f m)%n", c.crew(), String.join(" -> ", ids),
                    c.minutes(), c.driveMetres()));
        }
    }

    static void criticalText(StringBuilder sb, Network net, String label, List<String> ids) {
        if (ids.isEmpty()) return;
        sb.append(label).append(":\n");
        for (String id : ids) {
            Service sv = service(net, id);
            sb.append("  ").append(id);
            if (sv != null) {
                sb.append("  ").append(sv.critical() == null || sv.critical().isBlank() ? "critical" : sv.critical());
                if (sv.address() != null) sb.append(", ").append(sv.address());
            }
            sb.append('\n');
        }
    }

    static void overpressureText(StringBuilder sb, Network net, OverpressureShutoff.Result r) {
        sb.append("Over-pressure of ").append(r.systemId()).append(": stop the inflow\n");
        if (r.feeds().isEmpty()) sb.append("  (no feed into this system found)\n");
        for (OverpressureShutoff.Feed f : r.feeds()) {
            if (!f.isStation()) {
                sb.append("  source ").append(f.id()).append(": shut the supply at the source\n");
                continue;
            }
            sb.append("  station ").append(f.id()).append(f.name() == null ? "" : " (" + f.name() + ")").append(" from ")
                    .append(f.fromSystem()).append(": close inlet valve ")
                    .append(f.inletValves().isEmpty() ? "(none recorded)" : String.join(", ", f.inletValves())).append('\n');
            Isolation.Result u = f.upstream();
            sb.append("    if it will not close: upstream valves ")
                    .append(u.valveIds().isEmpty() ? "(none)" : String.join(", ", u.valveIds()))
                    .append(u.isolable() ? "" : " (" + u.reason() + ")")
                    .append(", which also put off ").append(Plural.of(u.serviceIdsOff().size(), "service")).append("\n");
            for (Isolation.Fallback x : u.fallbacks()) fallbackText(sb, "      ", x);
        }
        sb.append(String.format(Locale.ROOT, "Services at risk (fed on %s): %d, meters %d; check each for damage before relight%n",
                r.systemId(), r.atRisk().cardinality(), r.atRiskMeters()));
        criticalText(sb, net, "Critical customers at risk (first)", r.criticalAtRisk());
        sb.append(String.format(Locale.ROOT, "Off gas after the shut-off: %s, %s%n", Plural.of(r.off().cardinality(), "service"),
                Plural.of(r.metersOff(), "meter")));
    }

    static void responseText(StringBuilder sb, Restoration.Result r, ResponseSettings s) {
        ResponseSizing.Result z = r.sizing();
        sb.append(String.format(Locale.ROOT, "Shut-off: %s, %.1f technician-hours; %s (%s) to finish in %.1f h; %.1f h with %s%n",
                Plural.of(r.metersShutOff(), "meter"), z.shutoffTechHours(), Plural.of(z.shutoffTechs(), "technician"),
                Plural.of(z.shutoffCrews(), "crew"), s.targetHours(), z.shutoffHoursWithCrews(), Plural.of(z.crews(), "crew")));
        sb.append(String.format(Locale.ROOT, "Relight: %s (%.0f visits with %.0f %% second visits), %.1f technician-hours; %s (%s) to finish in %.1f h; %.1f h with %s%n",
                Plural.of(r.metersRelight(), "meter"), z.relightVisits(), s.rates().secondVisitFraction() * 100, z.relightTechHours(),
                Plural.of(z.relightTechs(), "technician"), Plural.of(z.relightCrews(), "crew"), s.relightTargetHours(),
                z.relightHoursWithCrews(), Plural.of(z.crews(), "crew")));
        if (r.purge()) {
            sb.append("District(s) left dead: ").append(String.join(", ", r.deadSystems()))
                    .append(": purge the mains and relight every service of the district\n");
        }
    }

    static void packagesText(StringBuilder sb, WorkPackages.Result w, int maxPerPackage) {
        if (w.packages().isEmpty()) return;
        sb.append("Work packages (by map sheet, along streets):\n");
        for (WorkPackages.Package p : w.packages()) {
            sb.append(String.format(Locale.ROOT, "  crew %d  %-24s %4d %-8s %5d %s%n", p.crew(), p.sheet(), p.visits().size(),
                    Plural.noun(p.visits().size(), "service"), p.meters(), Plural.noun(p.meters(), "meter")));
            int n = 0;
            for (WorkPackages.Visit v : p.visits()) {
                if (n++ >= maxPerPackage) {
                    sb.append("      ... and ").append(p.visits().size() - maxPerPackage).append(" more\n");
                    break;
                }
                sb.append("      ").append(v.serviceId()).append("  ").append(v.address() == null ? "" : v.address())
                        .append(v.critical().isEmpty() ? "" : "  [" + v.critical() + "]").append('\n');
            }
        }
    }

    static int crewOf(ValveRoute.Result r, String valveId) {
        for (ValveRoute.CrewRun c : r.crews()) for (ValveRoute.Visit v : c.visits()) if (v.valveId().equals(valveId)) return c.crew();
        return 0;
    }

    static Service service(Network net, String id) {
        for (Service s : net.services()) if (s.id().equals(id)) return s;
        return null;
    }

    static double round(double v, int digits) {
        if (Double.isNaN(v) || Double.isInfinite(v)) return v;
        double f = Math.pow(10, digits);
        return Math.round(v * f) / f;
    }
}
