package org.shutline.analysis;

import java.time.Duration;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.locationtech.jts.geom.Geometry;
import org.shutline.model.Finding;
import org.shutline.analysis.hazard.HazardCheck;
import org.shutline.analysis.hazard.StepContext;
import org.shutline.model.Network;
import org.shutline.model.Progress;
import org.shutline.model.Service;
import org.shutline.model.ServiceClass;
import org.shutline.model.Severity;
import org.shutline.model.Station;
import org.shutline.plan.Phase;
import org.shutline.plan.PlanStates;
import org.shutline.plan.Step;
import org.shutline.plan.StepState;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * Evaluates every step of an applied plan: services and meters off gas against the
 * network as recorded (by class), critical customers off, which stations feed each
 * district, the gas-off extent, who went off and who came back since the step
 * before, the hazards of each state (the rules found by
 * {@link org.shutline.analysis.hazard.HazardChecks}), suggested orders for unordered
 * closings, and customer-hours off gas per phase.
 *
 * <p>Hazards: every rule runs on every state. A step lists the hazards that are new at
 * it (not present, by code and features, in the state before); those still present
 * from earlier are listed as continuing. Hazards of the network as recorded are
 * reported apart, as step 0. A rule whose hazards an attending person mitigates
 * ({@link HazardCheck#mitigatedByAttendance()}) has its hazards of a station attended at
 * the step (plan {@code attend} steps) marked mitigated: listed, not counted as critical;
 * one mitigated at a step and no longer at the next is new again at the next.
 *
 * <p>Customer-hours of a phase: the sum over its steps of services off after the step
 * times the step's hours. A step's hours are its duration when given; the phase's
 * planned time left over is shared evenly by its steps without one (zero when the
 * phase has no planned times).
 *
 * <p>Cost: one feed trace per step (O(network) each) plus the rules; a 50-step plan
 * costs about 50 traces.
 */
public final class PlanEvaluation {
    private PlanEvaluation() {}

    /** A critical customer off gas. */
    public record CriticalOff(String serviceId, String kind, String address, int meters) {
    }

    /** One step's outcome. */
    public record StepResult(Step step, int servicesOff, long metersOff, Map<ServiceClass, Integer> servicesOffByClass,
                             List<CriticalOff> criticalOff, List<String> wentOff, List<String> cameBack,
                             Map<String, List<String>> districtFeeds, List<Finding> hazards, List<Finding> continuing,
                             List<String> notices, Lazy<Geometry> gasOffExtent, BitSet servicesOffSet, Suggestion suggestion) {
        public StepResult {
            servicesOffByClass = Map.copyOf(servicesOffByClass);
            criticalOff = List.copyOf(criticalOff);
            wentOff = List.copyOf(wentOff);
            cameBack = List.copyOf(cameBack);
            districtFeeds = Map.copyOf(districtFeeds);
            hazards = List.copyOf(hazards);
            continuing = List.copyOf(continuing);
            notices = List.copyOf(notices);
            servicesOffSet = (BitSet) servicesOffSet.clone();
        }

        @Override public BitSet servicesOffSet() { return (BitSet) servicesOffSet.clone(); }

        /** The gas-off extent polygons (computed on first use: buffering is the costly part of a step). */
        public Geometry gasOff() {
            return gasOffExtent.get();
        }

        /** True when a hazard new at this step is critical and not mitigated. */
        public boolean hasCritical() {
            return hazards.stream().anyMatch(Finding::critical);
        }
    }

    /** A suggested order for a step's valves, with the fallback for each doubtful valve. */
    public record Suggestion(List<String> order, List<Isolation.Fallback> fallbacks) {
        public Suggestion {
            order = List.copyOf(order);
            fallbacks = List.copyOf(fallbacks);
        }
    }

    /** A value computed once, on first use; thread-safe. */
    public static final class Lazy<T> {
        private final java.util.function.Supplier<T> supplier;
        private volatile T value;

        Lazy(java.util.function.Supplier<T> supplier) {
            this.supplier = supplier;
        }

        public T get() {
            T v = value;
            if (v == null) {
                synchronized (this) {
                    v = value;
                    if (v == null) value = v = supplier.get();
                }
            }
            return v;
        }
    }

    public record PhaseResult(Phase phase, int index, double customerHours, int servicesOffAtEnd) {
    }

    public record Result(PlanStates states, List<Finding> recordedHazards, List<StepResult> steps, List<PhaseResult> phases) {
        public Result {
            recordedHazards = List.copyOf(recordedHazards);
            steps = List.copyOf(steps);
            phases = List.copyOf(phases);
        }

        public boolean hasCritical() {
            return steps.stream().anyMatch(StepResult::hasCritical);
        }
    }

    public static Result evaluate(PlanStates ps, List<HazardCheck> checks, StepContext.Settings settings, double bufferM,
                                  Progress progress) {
        NetworkState base = ps.base();
        Network net = base.network();
        progress.begin("evaluate plan", ps.steps().size() + 1L);
        // each state's valve segments are built once: for its trace, its rules, and the next step's suggestion
        ValveSegments baseSegs = ValveSegments.build(base);
        FeedTrace.Result baseTrace = FeedTrace.run(baseSegs, Progress.NONE);
        BitSet baseFed = baseTrace.fedServices();
        BitSet baseLive = baseTrace.liveEdges();
        List<Finding> recorded = run(checks, new StepContext(null, base, baseTrace, baseTrace, baseTrace, baseSegs, settings), null);
        Set<String> active = keys(recorded);
        Set<String> activeMitigated = new HashSet<>();
        org.shutline.plan.Attendance attendance = org.shutline.plan.Attendance.of(ps.plan());
        FeedTrace.Result prevTrace = baseTrace;
        ValveSegments prevSegs = baseSegs;
        BitSet prevOff = new BitSet();
        double buffer = net.crs().unit().fromMetres(bufferM);
        List<StepResult> out = new ArrayList<>();
        for (StepState st : ps.steps()) {
            progress.checkCancelled();
            ValveSegments segs = ValveSegments.build(st.after());
            FeedTrace.Result tr = FeedTrace.run(segs, Progress.NONE);
            StepContext ctx = new StepContext(st, base, baseTrace, prevTrace, tr, segs, settings);
            List<Finding> all = run(checks, ctx, attendance);
            List<Finding> fresh = new ArrayList<>();
            List<Finding> cont = new ArrayList<>();
            for (Finding h : all) {
                boolean was = active.contains(h.key()) && !(activeMitigated.contains(h.key()) && !h.mitigated());
                (was ? cont : fresh).add(h);
            }
            active = keys(all);
            activeMitigated = mitigatedKeys(all);
            BitSet off = (BitSet) baseFed.clone();
            off.andNot(tr.fedServices());
            Suggestion sug = Suggestions.forStep(st, prevSegs, settings);
            Lazy<Geometry> extent;
            if (!out.isEmpty() && off.equals(prevOff) && tr.liveEdges().equals(prevTrace.liveEdges())) {
                extent = out.get(out.size() - 1).gasOffExtent();
            } else {
                NetworkState after = st.after();
                BitSet liveNow = tr.liveEdges();
                BitSet offNow = (BitSet) off.clone();
                extent = new Lazy<>(() -> GasOffExtent.of(after, baseLive, liveNow, offNow, buffer));
            }
            out.add(result(st, net, off, prevOff, tr, fresh, cont, extent, sug));
            prevOff = off;
            prevTrace = tr;
            prevSegs = segs;
            progress.done(out.size() + 1L);
        }
        return new Result(ps, recorded, out, phases(ps, out));
    }

    private static List<Finding> run(List<HazardCheck> checks, StepContext ctx, org.shutline.plan.Attendance attendance) {
        List<Finding> out = new ArrayList<>();
        for (HazardCheck c : checks) {
            for (Finding h : c.check(ctx)) {
                if (attendance != null && c.mitigatedByAttendance()) h = mitigate(h, ctx, attendance);
                out.add(h);
            }
        }
        return out;
    }

    /** The hazard marked mitigated when one of its features is a station attended at this step. */
    private static Finding mitigate(Finding h, StepContext ctx, org.shutline.plan.Attendance attendance) {
        for (String f : h.features()) {
            int by = attendance.attendStep(ctx.stepNumber(), f);
            if (by > 0) return h.withMitigation("station " + f + " attended by a qualified person able to shut it down (attend step " + by + ")");
        }
        return h;
    }

    private static Set<String> keys(List<Finding> hs) {
        Set<String> k = new HashSet<>();
        for (Finding h : hs) k.add(h.key());
        return k;
    }

    /** Keys of the mitigated hazards: one mitigated at a step and not at the next is new again there (the attendance ended). */
    private static Set<String> mitigatedKeys(List<Finding> hs) {
        Set<String> k = new HashSet<>();
        for (Finding h : hs) if (h.mitigated()) k.add(h.key());
        return k;
    }

    private static StepResult result(StepState st, Network net, BitSet off, BitSet prevOff, FeedTrace.Result tr,
                                     List<Finding> fresh, List<Finding> cont, Lazy<Geometry> gasOff, Suggestion sug) {
        List<Service> svc = net.services();
        Map<ServiceClass, Integer> byClass = new EnumMap<>(ServiceClass.class);
        List<CriticalOff> crit = new ArrayList<>();
        long meters = 0;
        for (int i = off.nextSetBit(0); i >= 0; i = off.nextSetBit(i + 1)) {
            Service s = svc.get(i);
            meters += s.meters();
            byClass.merge(s.serviceClass(), 1, Integer::sum);
            if (s.isCritical()) crit.add(new CriticalOff(s.id(), s.critical() == null || s.critical().isBlank() ? "critical" : s.critical(),
                    s.address(), s.meters()));
        }
        List<String> wentOff = ids(svc, off, prevOff);
        List<String> cameBack = ids(svc, prevOff, off);
        Map<String, List<String>> feeds = new LinkedHashMap<>();
        NetworkState s = st.after();
        List<Station> sts = net.stations();
        for (int i = 0; i < sts.size(); i++) {
            feeds.computeIfAbsent(sts.get(i).outSys(), k -> new ArrayList<>());
            if (tr.stationPasses(s, i)) feeds.get(sts.get(i).outSys()).add(sts.get(i).id());
        }
        return new StepResult(st.step(), off.cardinality(), meters, byClass, crit, wentOff, cameBack, feeds, fresh, cont,
                st.notices(), gasOff, off, sug);
    }

    private static List<String> ids(List<Service> svc, BitSet in, BitSet notIn) {
        BitSet b = (BitSet) in.clone();
        b.andNot(notIn);
        List<String> out = new ArrayList<>(b.cardinality());
        for (int i = b.nextSetBit(0); i >= 0; i = b.nextSetBit(i + 1)) out.add(svc.get(i).id());
        return out;
    }

    private static List<PhaseResult> phases(PlanStates ps, List<StepResult> steps) {
        List<PhaseResult> out = new ArrayList<>();
        List<Phase> phases = ps.plan().phases();
        for (int p = 0; p < phases.size(); p++) {
            Phase ph = phases.get(p);
            List<StepResult> mine = new ArrayList<>();
            for (StepResult r : steps) if (r.step().phase() == p) mine.add(r);
            double planned = ph.plannedHours();
            double given = 0;
            int without = 0;
            for (StepResult r : mine) {
                Duration d = r.step().duration();
                if (d == null) without++; else given += d.toMinutes() / 60.0;
            }
            double share = Double.isNaN(planned) || without == 0 ? 0 : Math.max(0, planned - given) / without;
            double ch = 0;
            for (StepResult r : mine) {
                Duration d = r.step().duration();
                ch += r.servicesOff() * (d == null ? share : d.toMinutes() / 60.0);
            }
            int atEnd = mine.isEmpty() ? 0 : mine.get(mine.size() - 1).servicesOff();
            out.add(new PhaseResult(ph, p, ch, atEnd));
        }
        return out;
    }
}
