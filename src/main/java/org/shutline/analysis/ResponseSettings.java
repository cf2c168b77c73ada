package org.shutline.analysis;

/**
 * Settings of an emergency response estimate: the shut-off and relight rates, the valve
 * operating and travel settings, the crews available, and the target hours to finish
 * the shut-off and the relight. Default: {@link ResponseRates#DEFAULT},
 * {@link ValveRoute.Settings#DEFAULT}, 2 crews, shut-off within 4 hours, relight within
 * 24 hours (the crew count and targets are Shutline's starting values, not a rule:
 * set them to the operator's plan).
 */
public record ResponseSettings(ResponseRates rates, ValveRoute.Settings valves, int crews, double targetHours,
                               double relightTargetHours) {
    public static final ResponseSettings DEFAULT =
            new ResponseSettings(ResponseRates.DEFAULT, ValveRoute.Settings.DEFAULT, 2, 4.0, 24.0);

    public ResponseSettings {
        if (crews < 1) throw new IllegalArgumentException("crews must be at least 1");
        if (!(targetHours > 0) || !(relightTargetHours > 0)) throw new IllegalArgumentException("target hours must be positive");
    }

    public ResponseSettings withCrews(int n) {
        return new ResponseSettings(rates, valves, n, targetHours, relightTargetHours);
    }

    public ResponseSettings withTargetHours(double shutoff, double relight) {
        return new ResponseSettings(rates, valves, crews, shutoff, relight);
    }

    public ResponseSettings withValves(ValveRoute.Settings v) {
        return new ResponseSettings(rates, v, crews, targetHours, relightTargetHours);
    }
}
