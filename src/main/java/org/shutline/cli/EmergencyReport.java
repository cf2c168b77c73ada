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
import org.shutline.analysis.StationStop;
import org.shutline.analysis.ResponseSettings;
import org.shutline.analysis.ResponseSizing;
import org.shutline.analysis.Restoration;
import org.shutline.analysis.ValveOrder;
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
        for (ValveOrder.Step v : r.order().steps()) {
            ObjectNode o = valves.addObject();
            o.put("order", v.order());
            o.put("valve", v.valveId());
            o.put("operable", v.operable().name().toLowerCase(Locale.ROOT));
            o.put("overdue", v.overdue());
            o.put("doubtful", v.doubtful());
            o.put("station_inlet", v.stationInlet());
            if (v.stationInlet()) o.set("stops_stations", Json.strings(v.stopsStations()));
            o.put("crew", v.crew());
            o.put("x", round(v.x(), 2));
            o.put("y", round(v.y(), 2));
            o.put("usng", grid.reference(v.x(), v.y()));
            if (v.fallback() != null) o.put("if_it_will_not_close", v.fallback().text());
        }
        ArrayNode fb = root.putArray("fallbacks");
        for (ValveOrder.Fallback f : r.order().fallbacks()) orderedFallbackJson(fb.addObject(), f);
        iso.alternative().ifPresent(a -> {
            ObjectNode o = root.putObject("alternative");
            o.set("valves", Json.strings(a.valves()));
            o.put("adds_services", a.addedServices().size());
            o.put("adds_meters", a.addedMeters());
            o.put("stays_on_services", a.stayOnServices().size());
            o.put("stays_on_meters", a.stayOnMeters());
            r.alternativeRoute().ifPresent(rt -> o.put("elapsed_minutes", round(rt.elapsedMinutes(), 1)));
        });
        root.set("valve_time", routeJson(r.route()));
        root.put("services_off", iso.serviceIdsOff().size());
        root.put("meters_off", iso.metersOff());
        root.set("critical_off", criticalJson(s.network(), r.restoration().criticalShutOff()));
        root.put("unintended_segments", iso.unintended().cardinality());
        root.set("stations_cut_off", Json.strings(r.stationsCutOff()));
        root.set("closed_boundary_valves", Json.strings(iso.closedBoundaryValves()));
        root.put("initial_isolation_m", IncidentResponse.INITIAL_ISOLATION_M);
    }

    static void orderedFallbackJson(ObjectNode o, ValveOrder.Fallback f) {
        o.put("valve", f.valveId());
        o.put("why", f.why());
        o.put("crew", f.crew());
        o.set("then_close", Json.strings(f.thenClose()));
        o.put("extra_minutes", round(f.extraMinutes(), 1));
        o.put("adds_services", f.addedServices());
        o.put("adds_meters", f.addedMeters());
        o.put("stays_on_services", f.stayOnServices());
        o.put("stays_on_meters", f.stayOnMeters());
        o.put("isolable", f.isolable());
        if (!f.isolable()) {
            o.put("reason", f.reason());
            o.set("stop_stations", Json.strings(f.stopStations()));
            o.set("station_inlet_valves", Json.strings(f.stationInletValves()));
        }
        o.put("text", f.text());
    }

    static void fallbackJson(ObjectNode o, Isolation.Fallback f) {
        o.put("valve", f.valveId());
        o.put("why", f.why());
        o.set("then_close", Json.strings(f.thenClose()));
        o.put("adds_services", f.addedServices().size());
        o.put("adds_meters", f.addedMeters());
        o.put("stays_on_services", f.stayOnServices().size());
        o.put("stays_on_meters", f.stayOnMeters());
        o.put("isolable", f.isolable());
        o.put("text", org.shutline.report.ReportView.fallbackText(f));
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
            if (f.stop() != null) {
                o.put("stoppable", f.stop().stoppable());
                o.put("by_station_valves", f.stop().byStationValves());
                o.put("stop_note", f.stop().note());
                o.set("also_stops", Json.strings(f.stop().alsoStopped()));
                o.put("other_services_off", f.stop().otherOff().cardinality());
                o.put("own_district_services", f.stop().ownDistrict().cardinality());
            }
            if (f.upstream() != null) {
                ObjectNode u = o.putObject("stop");
                u.put("isolable", f.upstream().isolable());
                u.set("valves_to_close", Json.strings(f.upstream().valveIds()));
                ArrayNode fb = u.putArray("fallbacks");
                for (Isolation.Fallback x : f.fallbacks()) fallbackJson(fb.addObject(), x);
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
        return responseJson(r, s, null);
    }

    /** The sizing; with work packages, the crews in use are the packages' count. */
    static ObjectNode responseJson(Restoration.Result r, ResponseSettings s, WorkPackages.Result wp) {
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
        int crews = wp == null || wp.packages().isEmpty() ? z.crews() : wp.packages().size();
        o.put("crews", crews);
        o.put("crews_computed", z.crewsComputed());
        if (wp != null) {
            o.put("work_packages", wp.packages().size());
            o.put("longest_package_hours", round(wp.maxHours(), 2));
            o.put("packing_extra_crews", wp.extraCrews());
        }
        o.put("shutoff_hours_with_crews", round(z.shutoffTechHours() / (crews * (double) s.rates().techsPerCrew()), 2));
        o.put("relight_hours_with_crews", round(z.relightTechHours() / (crews * (double) s.rates().techsPerCrew()), 2));
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
            o.put("crew", p.crew());
            o.put("sheet", p.sheet());
            o.set("sheets", Json.strings(p.sheets()));
            o.put("meters", p.meters());
            o.put("hours", round(p.hours(), 2));
            ArrayNode v = o.putArray("visits");
            for (WorkPackages.Visit x : p.visits()) {
                ObjectNode q = v.addObject();
                q.put("service", x.serviceId());
                q.put("address", x.address());
                q.put("street", x.street());
                q.put("sheet", x.sheet());
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
        sb.append("Valves to close, in field order (crew 1's route, then crew 2's; doubtful valves first in each):\n");
        for (ValveOrder.Step v : r.order().steps()) {
            sb.append(String.format(Locale.ROOT, "  %2d. %-10s crew %d  operable %-7s %s%s%s%n", v.order(), v.valveId(), v.crew(),
                    v.operable().name().toLowerCase(Locale.ROOT), grid.reference(v.x(), v.y()),
                    v.overdue() ? "  past inspection interval" : "", v.stationInlet() ? "  " + v.stopLabel() : ""));
            if (v.fallback() != null) sb.append("        if it will not close (").append(v.fallback().why()).append("): ")
                    .append(v.fallback().text()).append('\n');
        }
        if (r.order().steps().isEmpty()) sb.append("  (none)\n");
        iso.alternative().ifPresent(a -> sb.append("Alternative with fewer valves: ").append(String.join(", ", a.valves()))
                .append(" (adds ").append(Plural.of(a.addedServices().size(), "service")).append(", ").append(Plural.of(a.addedMeters(), "meter"))
                .append(r.alternativeRoute().map(rt -> String.format(Locale.ROOT, "; %.0f min", rt.elapsedMinutes())).orElse(""))
                .append(")\n"));
        routeText(sb, r.route());
        if (!r.stationsCutOff().isEmpty()) {
            sb.append("Stations left with no gas at the inlet (their districts go off unless another station feeds them): ")
                    .append(String.join("; ", r.stationsCutOff())).append('\n');
        }
        sb.append(String.format(Locale.ROOT, "Services off %d, meters off %d, unintended segments %d%n", iso.serviceIdsOff().size(),
                iso.metersOff(), iso.unintended().cardinality()));
        criticalText(sb, s.network(), "Critical customers off", r.restoration().criticalShutOff());
        sb.append(String.format(Locale.ROOT, "Initial isolation distance: %.0f m in all directions (ERG Guide 115)%n",
                IncidentResponse.INITIAL_ISOLATION_M));
    }

    static void fallbackText(StringBuilder sb, String indent, Isolation.Fallback f) {
        sb.append(indent).append("if ").append(f.valveId()).append(" will not close (").append(f.why()).append("): ")
                .append(org.shutline.report.ReportView.fallbackText(f)).append('\n');
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
            StationStop.Result stop = f.stop();
            sb.append("  station ").append(f.id()).append(f.name() == null ? "" : " (" + f.name() + ")").append(" from ")
                    .append(f.fromSystem()).append(": stop it: ")
                    .append(stop.valves().isEmpty() ? "no valve to close" : "close " + String.join(", ", stop.valves()))
                    .append(stop.stoppable() ? "" : " (valves alone cannot stop it)").append('\n');
            for (org.shutline.model.Station st : net.stations()) {
                if (st.id().equals(f.id())) {
                    sb.append("    ").append(org.shutline.analysis.OverpressureLimit.judge(net, st, org.shutline.model.PressureUnit.KPA,
                            org.shutline.analysis.OverpressureLimit.DEFAULT_LOW_PRESSURE_LIMIT)).append('\n');
                }
            }
            if (!stop.note().isEmpty()) sb.append("    ").append(stop.note()).append('\n');
            sb.append("    this also ").append(stop.alsoStopped().isEmpty() ? "stops no other station"
                    : "stops station " + String.join(", ", stop.alsoStopped()))
                    .append(" and puts off ").append(Plural.of(stop.otherOff().cardinality(), "service"))
                    .append(stop.ownDistrict().isEmpty() ? " (no district depends on this station alone: another station also feeds it)"
                            : " besides the station's own district (" + Plural.of(stop.ownDistrict().cardinality(), "service") + ")")
                    .append('\n');
            for (Isolation.Fallback x : f.fallbacks()) fallbackText(sb, "      ", x);
        }
        sb.append(String.format(Locale.ROOT, "Services at risk (fed on %s): %d, meters %d; check each for damage before relight%n",
                r.systemId(), r.atRisk().cardinality(), r.atRiskMeters()));
        criticalText(sb, net, "Critical customers at risk (first)", r.criticalAtRisk());
        sb.append(String.format(Locale.ROOT, "Off gas after the shut-off: %s, %s%n", Plural.of(r.off().cardinality(), "service"),
                Plural.of(r.metersOff(), "meter")));
    }

    static void responseText(StringBuilder sb, Restoration.Result r, ResponseSettings s) {
        responseText(sb, r, s, null);
    }

    /** The sizing; with work packages, the crews in use are the packages' count (one package per crew). */
    static void responseText(StringBuilder sb, Restoration.Result r, ResponseSettings s, WorkPackages.Result wp) {
        ResponseSizing.Result z = r.sizing();
        int crews = wp == null || wp.packages().isEmpty() ? z.crews() : wp.packages().size();
        double techs = crews * (double) s.rates().techsPerCrew();
        sb.append(String.format(Locale.ROOT, "Shut-off: %s, %.1f technician-hours; %s needed to finish in %.1f h (%s of %d)%n",
                Plural.of(r.metersShutOff(), "meter"), z.shutoffTechHours(), Plural.of(z.shutoffTechs(), "technician"), s.targetHours(), Plural.of(z.shutoffCrews(), "crew"), s.rates().techsPerCrew()));
        if (z.crewsComputed()) {
            sb.append(String.format(Locale.ROOT, "  crews: %d, computed from the %.1f h target%s; %.1f h with %s%n", crews, s.targetHours(),
                    wp != null && wp.extraCrews() > 0 ? " (" + wp.extraCrews() + " more than the arithmetic: the premises do not divide evenly along streets)" : "",
                    z.shutoffTechHours() / techs, Plural.of(crews, "crew")));
        } else {
            sb.append(String.format(Locale.ROOT, "  crews: %d, as given; %.1f h with %s%s%n", crews, z.shutoffTechHours() / techs, Plural.of(crews, "crew"),
                    z.shutoffTechHours() / techs > s.targetHours() + 1e-9 ? String.format(Locale.ROOT, " (over the %.1f h target)", s.targetHours()) : ""));
        }
        sb.append(String.format(Locale.ROOT, "Relight: %s (%.0f visits with %.0f %% second visits), %.1f technician-hours; %s (%d relight %s, sized separately) to finish in %.1f h; %.1f h with %s%n",
                Plural.of(r.metersRelight(), "meter"), z.relightVisits(), s.rates().secondVisitFraction() * 100, z.relightTechHours(), Plural.of(z.relightTechs(), "technician"),
                z.relightCrews(), Plural.noun(z.relightCrews(), "crew"), s.relightTargetHours(), z.relightTechHours() / techs, Plural.of(crews, "crew")));
        if (r.purge()) {
            sb.append("District(s) left dead: ").append(String.join(", ", r.deadSystems()))
                    .append(": purge the mains and relight every service of the district\n");
        }
    }

    static void packagesText(StringBuilder sb, WorkPackages.Result w, int maxPerPackage) {
        if (w.packages().isEmpty()) return;
        sb.append(String.format(Locale.ROOT, "Work packages: %d, one per crew, balanced by technician-hours (longest %.1f h%s); critical customers first in each, then along streets:%n",
                w.packages().size(), w.maxHours(), w.crewsComputed() ? String.format(Locale.ROOT, "; target %.1f h", w.targetHours()) : ""));
        if (w.overTarget() > 0) sb.append("  ").append(w.overTarget()).append(" package(s) over the target: a single premises needs more than one crew's target hours\n");
        for (WorkPackages.Package p : w.packages()) {
            sb.append(String.format(Locale.ROOT, "  crew %d  %4d %-8s %5d %-6s %5.1f h  %s%s%n", p.crew(), p.visits().size(), Plural.noun(p.visits().size(), "service"), p.meters(), Plural.noun(p.meters(), "meter"), p.hours(),
                    p.sheet(), p.criticalCount() > 0 ? "  (" + p.criticalCount() + " critical first)" : ""));
            if (!p.streets().isEmpty()) sb.append("      streets: ").append(String.join(", ", p.streets())).append('\n');
            int n = 0;
            for (WorkPackages.Visit v : p.visits()) {
                if (n++ >= maxPerPackage) {
                    sb.append("      ... and ").append(p.visits().size() - maxPerPackage).append(" more (all in --format json)\n");
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
