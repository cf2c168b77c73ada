package org.shutline.analysis.hazard;

import java.time.LocalDate;
import java.time.Period;
import java.util.ArrayList;
import java.util.List;
import org.shutline.model.Network;
import org.shutline.model.Operability;
import org.shutline.model.PressureUnit;
import org.shutline.model.SenseTap;
import org.shutline.plan.StepState;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * What a hazard rule sees of one step: the step (null for the network as recorded),
 * the states before and after it, the plan's starting state, traces and valve segments
 * computed once on demand and shared by all rules, and the settings (date and
 * inspection interval for valve checks, pressure unit for messages).
 */
public final class StepContext {
    /** Settings shared by all rules. */
    public record Settings(LocalDate asOf, Period inspectionInterval, PressureUnit pressureUnit) {
        public static Settings defaults(LocalDate asOf) {
            return new Settings(asOf, Period.ofMonths(15), PressureUnit.KPA);
        }
    }

    private final StepState step;
    private final NetworkState base;
    private final NetworkState before;
    private final NetworkState after;
    private final Settings settings;
    private final FeedTrace.Result baseTrace;
    private FeedTrace.Result beforeTrace;
    private FeedTrace.Result afterTrace;
    private ValveSegments afterSegments;
    private int[] afterPieces;

    public StepContext(StepState step, NetworkState base, FeedTrace.Result baseTrace, FeedTrace.Result beforeTrace,
                       FeedTrace.Result afterTrace, Settings settings) {
        this(step, base, baseTrace, beforeTrace, afterTrace, null, settings);
    }

    /** With the valve segments of the state after the step already built (may be null). */
    public StepContext(StepState step, NetworkState base, FeedTrace.Result baseTrace, FeedTrace.Result beforeTrace,
                       FeedTrace.Result afterTrace, ValveSegments afterSegments, Settings settings) {
        this.afterSegments = afterSegments;
        this.step = step;
        this.base = base;
        this.before = step == null ? base : step.before();
        this.after = step == null ? base : step.after();
        this.baseTrace = baseTrace;
        this.beforeTrace = beforeTrace;
        this.afterTrace = afterTrace;
        this.settings = settings;
    }

    /** The step, or null when checking the network as recorded. */
    public StepState step() { return step; }
    public int stepNumber() { return step == null ? 0 : step.step().number(); }
    public NetworkState base() { return base; }
    public NetworkState before() { return before; }
    public NetworkState after() { return after; }
    public Network network() { return base.network(); }
    public Settings settings() { return settings; }

    public FeedTrace.Result baseTrace() { return baseTrace; }

    public FeedTrace.Result beforeTrace() {
        if (beforeTrace == null) beforeTrace = FeedTrace.run(before);
        return beforeTrace;
    }

    public FeedTrace.Result afterTrace() {
        if (afterTrace == null) afterTrace = FeedTrace.run(after);
        return afterTrace;
    }

    public ValveSegments afterSegments() {
        if (afterSegments == null) afterSegments = ValveSegments.build(after);
        return afterSegments;
    }

    /**
     * The connected piece of every node of the state after the step, over present pipe of
     * active mains and open valves, stations not crossed (computed once, shared by the rules).
     */
    public int[] afterPieces() {
        if (afterPieces == null) afterPieces = StateWalk.pieces(after);
        return afterPieces;
    }

    /** "step 7" or "the network as recorded". */
    public String stepLabel() {
        return step == null ? "the network as recorded" : "step " + step.step().number();
    }

    /** Indices of the sensing taps of station {@code stationId}. */
    public List<Integer> tapsOf(String stationId) {
        List<Integer> out = new ArrayList<>();
        List<SenseTap> taps = network().taps();
        for (int i = 0; i < taps.size(); i++) if (stationId.equals(taps.get(i).stationId())) out.add(i);
        return out;
    }

    /** True when valve v is unknown or past its inspection interval (never checked counts as past). */
    public boolean doubtful(NetworkState s, int v) {
        if (s.valveOperability(v) == Operability.UNKNOWN) return true;
        return overdue(s, v);
    }

    public boolean overdue(NetworkState s, int v) {
        if (v >= s.graph().valveCount()) return false; // valves installed by the plan are new
        LocalDate c = s.valveChecked(v);
        return c == null || c.plus(settings.inspectionInterval()).isBefore(settings.asOf());
    }
}
