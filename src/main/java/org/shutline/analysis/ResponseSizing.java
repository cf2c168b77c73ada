package org.shutline.analysis;

/**
 * Sizes the field work of shutting off and relighting a number of meters.
 *
 * <p>Shut-off: {@code meters / shutoffsPerTechHour} technician-hours. Relight:
 * {@code meters * (1 + secondVisitFraction) / relightsPerTechHour} technician-hours
 * (each second visit is counted as a full relight visit). Technicians needed to finish
 * within a target time: {@code ceil(techHours / targetHours)}; crews:
 * {@code ceil(technicians / techsPerCrew)}. With a given number of crews, the elapsed
 * time is {@code techHours / (crews * techsPerCrew)}. A whole district that went dead
 * is purged and relit, so every meter in it is relit (the caller passes that count).
 *
 * <p>Crews in use ({@link Result#crews()}): the crews given, or, when none are given
 * ({@code crews = 0}), the shut-off crews needed (at least 1). The shut-off work
 * packages ({@link WorkPackages}) are one per crew in use.
 */
public final class ResponseSizing {
    private ResponseSizing() {}

    /** The sizing result: counts, technician-hours, and crews or hours. */
    public record Result(int metersShutOff, int metersToRelight, double shutoffTechHours, double relightTechHours,
                         double relightVisits, int shutoffTechs, int shutoffCrews, int relightTechs, int relightCrews,
                         double shutoffHoursWithCrews, double relightHoursWithCrews, int crews, boolean crewsComputed) {
    }

    /**
     * @param metersShutOff meters to shut off
     * @param metersToRelight meters to relight (equal to the shut-off, or the whole district when it went dead)
     * @param targetShutoffHours time within which the shut-off should be finished
     * @param targetRelightHours time within which relight should be finished
     * @param crews crews available (for the elapsed-time figures); 0 = compute them from the shut-off target
     */
    public static Result size(int metersShutOff, int metersToRelight, double targetShutoffHours, double targetRelightHours,
                              int crews, ResponseRates r) {
        if (metersShutOff < 0 || metersToRelight < 0) throw new IllegalArgumentException("negative meter count");
        if (!(targetShutoffHours > 0) || !(targetRelightHours > 0)) throw new IllegalArgumentException("target hours must be positive");
        if (crews < 0) throw new IllegalArgumentException("crews must be at least 1 (or 0 to compute them)");
        double shutHours = metersShutOff / r.shutoffsPerTechHour();
        double visits = metersToRelight * (1 + r.secondVisitFraction());
        double relightHours = visits / r.relightsPerTechHour();
        int shutTechs = (int) Math.ceil(shutHours / targetShutoffHours - 1e-9);
        int relightTechs = (int) Math.ceil(relightHours / targetRelightHours - 1e-9);
        int shutCrews = ceilDiv(shutTechs, r.techsPerCrew());
        boolean computed = crews == 0;
        int inUse = computed ? Math.max(1, shutCrews) : crews;
        int techs = inUse * r.techsPerCrew();
        return new Result(metersShutOff, metersToRelight, shutHours, relightHours, visits,
                shutTechs, shutCrews, relightTechs, ceilDiv(relightTechs, r.techsPerCrew()),
                shutHours / techs, relightHours / techs, inUse, computed);
    }

    private static int ceilDiv(int a, int b) {
        return (a + b - 1) / b;
    }
}
