package org.shutline.analysis;

/**
 * Settings of an emergency response estimate: the shut-off and relight rates, the valve
 * operating and travel settings, the crews, and the target hours to finish the
 * shut-off and the relight.
 *
 * <p>Crews are either given ({@code crewsGiven}: the operator's count, the
 * {@code --crews} option) or computed: the shut-off crews needed to finish within
 * {@code targetHours} ({@link ResponseSizing}); {@code crews} is then only a floor of 1
 * and is not used. Relight crews are always sized separately from
 * {@code relightTargetHours}.
 *
 * <p>Default ({@link #DEFAULT}, the command line's and the window's): {@link ResponseRates#DEFAULT},
 * {@link ValveRoute.Settings#DEFAULT}, crews computed, shut-off within 4 hours, relight
 * within 24 hours (the targets are Shutline's starting values, not a rule: set them to
 * the operator's plan).
 */
public record ResponseSettings(ResponseRates rates, ValveRoute.Settings valves, int crews, boolean crewsGiven, double targetHours,
                               double relightTargetHours) {
    public static final ResponseSettings DEFAULT =
            new ResponseSettings(ResponseRates.DEFAULT, ValveRoute.Settings.DEFAULT, 1, false, 4.0, 24.0);

    public ResponseSettings {
        if (crews < 1) throw new IllegalArgumentException("crews must be at least 1");
        if (!(targetHours > 0) || !(relightTargetHours > 0)) throw new IllegalArgumentException("target hours must be positive");
    }

    /** {@code n} crews given by the operator. */
    public ResponseSettings withCrews(int n) {
        return new ResponseSettings(rates, valves, n, true, targetHours, relightTargetHours);
    }

    /** Crews computed from the shut-off target. */
    public ResponseSettings withCrewsComputed() {
        return new ResponseSettings(rates, valves, 1, false, targetHours, relightTargetHours);
    }

    public ResponseSettings withTargetHours(double shutoff, double relight) {
        return new ResponseSettings(rates, valves, crews, crewsGiven, shutoff, relight);
    }

    public ResponseSettings withValves(ValveRoute.Settings v) {
        return new ResponseSettings(rates, v, crews, crewsGiven, targetHours, relightTargetHours);
    }

    /** Shut-off meters one crew does in an hour: shut-offs per technician-hour times technicians per crew. */
    public double metersPerCrewHour() {
        return rates.shutoffsPerTechHour() * rates.techsPerCrew();
    }
}
