package org.shutline.analysis;

/**
 * Rates for sizing a shut-off and relight response. Defaults are common practice
 * (order of magnitude from public utility restoration reports, see
 * docs/emergency.md): 10 meter shut-offs per technician-hour, 1.25 relights per
 * technician-hour (about 45-50 minutes a visit with entry, appliance relight and leak
 * check), 10 % of premises needing a second visit because nobody is home, two
 * technicians per crew, 8 working hours per shift.
 */
public record ResponseRates(double shutoffsPerTechHour, double relightsPerTechHour, double secondVisitFraction,
                            int techsPerCrew, double shiftHours) {
    public static final ResponseRates DEFAULT = new ResponseRates(10.0, 1.25, 0.10, 2, 8.0);

    public ResponseRates {
        if (!(shutoffsPerTechHour > 0) || !(relightsPerTechHour > 0)) throw new IllegalArgumentException("rates must be positive");
        if (!(secondVisitFraction >= 0 && secondVisitFraction <= 1)) throw new IllegalArgumentException("second-visit fraction must be 0..1");
        if (techsPerCrew < 1 || !(shiftHours > 0)) throw new IllegalArgumentException("crew size and shift must be positive");
    }
}
