package org.shutline.report;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.shutline.analysis.GasOffExtent;
import org.shutline.analysis.IncidentResponse;
import org.shutline.analysis.StationStop;
import org.shutline.analysis.ValveOrder;
import org.shutline.analysis.Isolation;
import org.shutline.analysis.ValveDoubt;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.model.Finding;
import org.shutline.model.Operability;
import org.shutline.model.Severity;
import org.shutline.model.Station;
import org.shutline.model.ValveKind;
import org.shutline.plan.Phase;
import org.shutline.plan.StepAction;
import org.shutline.plan.StepState;
import org.shutline.render.IsolationRing;
import org.shutline.render.ValveToOperate;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;

/**
 * What one exported map and its lists show: a plan step or an incident. Holds the
 * state drawn (for a step: the state after it; for an incident: the network as
 * recorded), the gas-off extent, the valves to operate in order, the services off gas
 * (indices of the network's services), the hazards, the isolation circle (incidents at
 * a point only) and the feed trace of the state after (for station sheds).
 *
 * <p>Built by {@link #ofStep} or {@link #ofIncident}; see those for exactly where each
 * part comes from.
 */
public record ReportView(Kind kind, String subject, String phase, int step, NetworkState state, Geometry gasOff,
                         List<OperatedValve> valves, BitSet servicesOff, List<Finding> hazards, IsolationRing ring,
                         FeedTrace.Result traceAfter) {
    /** What the view is of: a plan step, an incident, or a plain network state (a map of what is shown). */
    public enum Kind { STEP, INCIDENT, STATE }

    /** Emergency Response Guidebook (2024), Guide 115 (natural gas): initial isolation at least 100 m in all directions. */
    public static final double ERG_115_ISOLATION_M = 100;

    /**
     * A valve to operate with what the valve list needs: its order number (the one used
     * in every output), position (network CRS), kind, operability, last inspection (null
     * when never recorded), whether it is past its inspection interval, the fallback
     * valves to close if it fails, the crew that operates it (0 when no crews are
     * planned, as for a plan step) and the whole instruction if it will not close
     * ({@code ifFails}, "" when the valve is not in doubt).
     */
    public record OperatedValve(int order, String valveId, double x, double y, boolean close, ValveKind valveKind,
                                Operability operable, LocalDate checked, boolean overdue, List<String> fallbacks, int crew,
                                String ifFails)
            implements ValveToOperate {
        public OperatedValve {
            fallbacks = List.copyOf(fallbacks);
            ifFails = ifFails == null ? "" : ifFails;
        }

        /** Without crew; the instruction is "close " and the fallback valves. */
        public OperatedValve(int order, String valveId, double x, double y, boolean close, ValveKind valveKind,
                             Operability operable, LocalDate checked, boolean overdue, List<String> fallbacks) {
            this(order, valveId, x, y, close, valveKind, operable, checked, overdue, fallbacks, 0,
                    fallbacks.isEmpty() ? "" : "close " + String.join(", ", fallbacks));
        }
    }

    /**
     * A plan-step fallback in one line: "close V-5, V-6; adds 3 services, 4 meters", with
     * "valves alone then cannot isolate: stop the station feeding the area" when the
     * grown area is fed by a station or source.
     */
    public static String fallbackText(Isolation.Fallback f) {
        StringBuilder sb = new StringBuilder();
        if (!f.isolable()) {
            sb.append("valves alone cannot isolate: ");
            List<String> what = new ArrayList<>();
            if (!f.stationsToStop().isEmpty()) what.add((f.stationsToStop().size() == 1 ? "stop station " : "stop stations ") + String.join(", ", f.stationsToStop()));
            if (!f.sourcesInRegion().isEmpty()) what.add("shut the supply at source " + String.join(", ", f.sourcesInRegion()));
            sb.append(what.isEmpty() ? "stop the station or source feeding the grown area" : String.join(" and ", what));
        }
        if (!f.thenClose().isEmpty()) sb.append(sb.length() == 0 ? "close " : "; and close ").append(String.join(", ", f.thenClose()));
        if (sb.length() == 0) sb.append("no further valve to close");
        int n = f.addedServices().size();
        sb.append("; adds ").append(n).append(n == 1 ? " service, " : " services, ").append(f.addedMeters())
                .append(f.addedMeters() == 1 ? " meter" : " meters");
        int k = f.stayOnServices().size();
        if (k > 0 || f.stayOnMeters() > 0) {
            sb.append("; ").append(k).append(k == 1 ? " service, " : " services, ").append(f.stayOnMeters())
                    .append(f.stayOnMeters() == 1 ? " meter" : " meters").append(" of the shut-off stay on");
        }
        return sb.toString();
    }

    public ReportView {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(state, "state");
        gasOff = gasOff == null ? new GeometryFactory().createPolygon() : gasOff;
        valves = List.copyOf(valves);
        servicesOff = (BitSet) servicesOff.clone();
        hazards = List.copyOf(hazards);
        phase = phase == null ? "" : phase;
    }

    @Override
    public BitSet servicesOff() {
        return (BitSet) servicesOff.clone();
    }

    /**
     * The view of step {@code number} of an evaluated plan: the state after the step, its
     * gas-off extent, services off and hazards (new and continuing) from the evaluation;
     * the valves of a {@code close} step in the listed order when ordered, else in the
     * suggested order, with the suggestion's fallbacks; the valves of an {@code open}
     * step in the listed order; no valves for other kinds of step.
     *
     * A valve is past its inspection by the one rule, {@link ValveDoubt}, with {@code options}.
     *
     * @throws IllegalArgumentException when the plan has no such step
     */
    public static ReportView ofStep(PlanEvaluation.Result r, int number, ValveDoubt.Settings options) {
        List<StepState> states = r.states().steps();
        for (int i = 0; i < states.size(); i++) {
            StepState st = states.get(i);
            if (st.step().number() != number) continue;
            PlanEvaluation.StepResult sr = r.steps().get(i);
            Phase ph = r.states().plan().phases().get(st.step().phase());
            List<OperatedValve> vs = stepValves(st, sr, options);
            List<Finding> hz = new ArrayList<>(sr.hazards());
            hz.addAll(sr.continuing());
            String subject = "Step " + number + ": " + st.step().describe()
                    + (st.step().note() == null || st.step().note().isBlank() ? "" : " (" + st.step().note() + ")");
            return new ReportView(Kind.STEP, subject, ph.name(), number, st.after(), sr.gasOff(), vs,
                    sr.servicesOffSet(), hz, null, FeedTrace.run(st.after()));
        }
        throw new IllegalArgumentException("the plan has no step " + number + " (it has " + states.size() + ")");
    }

    private static List<OperatedValve> stepValves(StepState st, PlanEvaluation.StepResult sr, ValveDoubt.Settings opt) {
        List<String> ids;
        boolean close;
        Map<String, List<String>> fallbacks = new HashMap<>();
        Map<String, String> texts = new HashMap<>();
        if (st.step().action() instanceof StepAction.CloseValves c) {
            ids = c.ordered() || sr.suggestion() == null ? c.valves() : sr.suggestion().order();
            close = true;
            if (sr.suggestion() != null) {
                for (Isolation.Fallback f : sr.suggestion().fallbacks()) {
                    fallbacks.put(f.valveId(), f.thenClose());
                    texts.put(f.valveId(), fallbackText(f));
                }
            }
        } else if (st.step().action() instanceof StepAction.OpenValves o) {
            ids = o.valves();
            close = false;
        } else {
            return List.of();
        }
        NetworkState s = st.before();
        Map<String, Integer> index = valveIndex(s);
        List<OperatedValve> out = new ArrayList<>();
        for (String id : ids) {
            Integer v = index.get(id);
            if (v == null) continue;
            double[] xy = valvePoint(s, v);
            out.add(new OperatedValve(out.size() + 1, id, xy[0], xy[1], close, s.valveKind(v), s.valveOperability(v),
                    s.valveChecked(v), ValveDoubt.of(s, v, opt).overdue(), fallbacks.getOrDefault(id, List.of()), 0,
                    texts.getOrDefault(id, "")));
        }
        return out;
    }

    /**
     * The view of an incident isolated in {@code state}: the valves in the field order of
     * {@code response.order()} ({@link ValveOrder}: numbers along the crews' routes, the
     * crew, the whole fallback instruction of each doubtful valve, and the inlet valves
     * of stations to stop when valves alone cannot isolate); the services off from the
     * isolation; the gas-off extent of the pipe live before and dead once the listed
     * valves are closed and the stations to stop are out (buffered by {@code bufferM}
     * metres, see {@link GasOffExtent}); an isolation circle of {@code radiusM} metres
     * around ({@code x}, {@code y}) when {@code x} is not NaN; and, when valves alone
     * cannot isolate, a critical hazard at each station to stop.
     */
    public static ReportView ofIncident(NetworkState state, IncidentResponse.Result response, String subject, double x, double y,
                                        double radiusM, double bufferM) {
        Isolation.Result r = response.isolation();
        List<OperatedValve> vs = new ArrayList<>();
        NetworkState after = state;
        for (ValveOrder.Step v : response.order().steps()) {
            double[] xy = valvePoint(state, v.valve());
            ValveOrder.Fallback f = v.fallback();
            vs.add(new OperatedValve(v.order(), v.valveId(), xy[0], xy[1], true, state.valveKind(v.valve()), v.operable(),
                    state.valveChecked(v.valve()), v.overdue(), f == null ? List.of() : f.thenClose(), v.crew(),
                    f == null ? "" : f.text()));
            after = after.withValveClosed(v.valve(), true);
        }
        List<Finding> hz = new ArrayList<>();
        List<Station> stations = state.network().stations();
        for (String sid : r.stationsToStop()) {
            for (int i = 0; i < stations.size(); i++) {
                if (!stations.get(i).id().equals(sid)) continue;
                StationStop.Result stop = StationStop.Result.of(r.stationStops(), sid);
                boolean byValves = stop != null && stop.byValves();
                // stopped as the instruction says: by its stop's valves (closed above with the field order), else at the station
                if (!byValves) after = after.withStationInService(i, false);
                Station st = stations.get(i);
                double sx = st.geometry() == null ? Double.NaN : st.geometry().getX();
                double sy = st.geometry() == null ? Double.NaN : st.geometry().getY();
                hz.add(Finding.hazard("station-feeds-zone", Severity.CRITICAL, 0, List.of(sid), sx, sy,
                        "Valves alone cannot isolate the incident: " + r.reason(),
                        "Stop station " + sid + (byValves ? " (close " + String.join(", ", stop.valves()) + ")" : " at the station (no valve on record stops it)")
                                + " and watch its outlet pressure."));
            }
        }
        FeedTrace.Result before = FeedTrace.run(state);
        FeedTrace.Result tr = FeedTrace.run(after);
        double buffer = state.network().crs().unit().fromMetres(bufferM);
        Geometry gasOff = GasOffExtent.of(after, before.liveEdges(), tr.liveEdges(), r.servicesOff(), buffer);
        IsolationRing ring = Double.isNaN(x) ? null : IsolationRing.of(x, y, radiusM);
        return new ReportView(Kind.INCIDENT, subject, "", 0, state, gasOff, vs, r.servicesOff(), hz, ring, tr);
    }

    /**
     * A plain view of a state: no gas-off extent, valves, hazards or circle; for printing
     * the network as it stands (for example the window's current map).
     */
    public static ReportView ofState(NetworkState state, String subject) {
        return new ReportView(Kind.STATE, subject == null ? "Network map" : subject, "", 0, state, null, List.of(),
                new BitSet(), List.of(), null, FeedTrace.run(state));
    }

    static Map<String, Integer> valveIndex(NetworkState s) {
        Map<String, Integer> m = new HashMap<>();
        for (int v = 0; v < s.valveCount(); v++) m.putIfAbsent(s.valveId(v), v);
        return m;
    }

    /** A valve's position: the start node of its valve edge (both ends lie at the valve). */
    static double[] valvePoint(NetworkState s, int v) {
        int e = s.valveEdge(v);
        int n = s.edgeFrom(e);
        return new double[] {s.nodeX(n), s.nodeY(n)};
    }

    /** "step 2", "incident" or "network", for file metadata and attributes. */
    public String label() {
        return switch (kind) {
            case STEP -> "step " + step;
            case INCIDENT -> "incident";
            case STATE -> "network";
        };
    }

    /** Number of meters off gas. */
    public long metersOff() {
        long m = 0;
        var svc = state.network().services();
        for (int i = servicesOff.nextSetBit(0); i >= 0; i = servicesOff.nextSetBit(i + 1)) m += svc.get(i).meters();
        return m;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "ReportView[%s, %d valves, %d services off]", subject, valves.size(),
                servicesOff.cardinality());
    }
}
