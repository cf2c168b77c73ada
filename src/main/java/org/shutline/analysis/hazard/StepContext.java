package org.shutline.analysis.hazard;

import java.time.LocalDate;
import java.time.Period;
import java.util.ArrayList;
import java.util.List;
import org.shutline.model.Network;
import org.shutline.analysis.OverpressureLimit;
import org.shutline.analysis.ValveDoubt;
import org.shutline.model.Pressure;
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
    /**
     * Settings shared by all rules: the doubtful-valve rule's settings ({@link ValveDoubt}),
     * the pressure unit for messages, the limit taken for a low-pressure distribution
     * system under 49 CFR 192.201(a)(1) (default 0.5 psig: common practice), and the
     * distance within which a cut or tie-in may damage a sensing line (default 10 m:
     * common practice).
     */
    public record Settings(ValveDoubt.Settings doubt, PressureUnit pressureUnit, Pressure lowPressureLimit, double sensingLineM) {
        public Settings {
            java.util.Objects.requireNonNull(doubt, "doubt");
            java.util.Objects.requireNonNull(pressureUnit, "pressureUnit");
            java.util.Objects.requireNonNull(lowPressureLimit, "lowPressureLimit");
        }

        /** The defaults for the rest, with this valve-doubt date and interval and unit. */
        public Settings(LocalDate asOf, Period inspectionInterval, PressureUnit pressureUnit) {
            this(new ValveDoubt.Settings(asOf, inspectionInterval), pressureUnit, OverpressureLimit.DEFAULT_LOW_PRESSURE_LIMIT,
                    DEFAULT_SENSING_LINE_M);
        }

        public static Settings defaults(LocalDate asOf) {
            return new Settings(asOf, ValveDoubt.INTERVAL, PressureUnit.KPA);
        }

        public LocalDate asOf() { return doubt.asOf(); }
        public Period inspectionInterval() { return doubt.interval(); }
    }

    /** Default distance of a cut or tie-in from a sensing tap or its line that warns, in metres (common practice). */
    public static final double DEFAULT_SENSING_LINE_M = 10.0;

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

    /** The verdict of the one doubtful-valve rule ({@link ValveDoubt}) on valve v of state s. */
    public ValveDoubt.Verdict doubt(NetworkState s, int v) {
        return ValveDoubt.of(s, v, settings.doubt());
    }
}
