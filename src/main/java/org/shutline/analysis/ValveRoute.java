package org.shutline.analysis;

import java.util.ArrayList;
import java.util.List;

/**
 * The field order and time to operate a list of valves: which crew closes which
 * valve, in what order, and how long it takes. The order numbers printed everywhere
 * follow this route: crew 1's valves in its driving order, then crew 2's, and so on.
 *
 * <p>Method.
 * <ol>
 * <li>Crews. The valves come in operating order (feeding side first). One tour is
 *     built by nearest neighbour from the first valve in operating order: from the
 *     current valve, go to the nearest valve not yet visited (straight-line distance;
 *     an exact tie goes to the one earlier in operating order). With N crews the tour
 *     is split into N runs of consecutive valves, as equal in count as possible,
 *     earlier runs taking one more valve when the count does not divide evenly (fewer
 *     crews are used when there are fewer valves). So crew 1 starts on the feeding
 *     side and each crew keeps to one part of the area.</li>
 * <li>Order within a crew's run: first the doubtful valves (operability unknown or
 *     past the inspection interval), so that a valve that will not close is found
 *     before the others are shut and its fallback can start at once; then the others.
 *     Within each of the two groups: by {@link Stop#rank()} (the isolation's hop
 *     distance from the sources: feeding side first), equal ranks in tour order.</li>
 * <li>Time. Each crew starts at the first valve of its run (the drive from the depot
 *     is not counted: it depends on where the crew is); between valves it drives the
 *     straight-line distance times the detour factor at the crew speed; at each valve
 *     it spends the operating time. A crew's time is its travel plus its operating
 *     time; the elapsed time is the longest crew's.</li>
 * <li>A fallback ({@link #detour}): when a doubtful valve will not close, the same
 *     crew drives from it to the extra valves (nearest neighbour from it), closes
 *     them, and goes on to its next valve; the extra minutes are reported.</li>
 * </ol>
 *
 * <p>Defaults (common practice, see docs/emergency.md): 10 minutes to operate a valve
 * (locate the box, clear it, turn it), 25 km/h street driving, a detour factor of 1.3
 * on the straight-line distance. Cost O(n^2) for n valves.
 */
public final class ValveRoute {
    /** Per-valve operating minutes, crew speed (km/h) and the street detour factor. */
    public record Settings(double minutesPerValve, double speedKmh, double detourFactor) {
        public static final Settings DEFAULT = new Settings(10.0, 25.0, 1.3);

        public Settings {
            if (!(minutesPerValve >= 0) || !(speedKmh > 0) || !(detourFactor >= 1)) {
                throw new IllegalArgumentException("valve minutes >= 0, speed > 0 and detour factor >= 1 are required");
            }
        }

        /** Driving minutes for a straight-line distance in metres. */
        public double travelMinutes(double straightMetres) {
            return straightMetres * detourFactor / 1000.0 / speedKmh * 60.0;
        }
    }

    /**
     * A valve to visit, at (x, y) in metres (any metric plane); {@code doubtful} when its
     * closing is in doubt (visited first in its crew's run); {@code rank} orders valves
     * of the same group within a run (lower first: the hop distance from the sources).
     */
    public record Stop(String valveId, double x, double y, boolean doubtful, int rank) {
        /** A sound valve, all of one rank (the run keeps the tour order). */
        public Stop(String valveId, double x, double y) {
            this(valveId, x, y, false, 0);
        }
    }

    /** The extra work of a fallback: the extra valves in driving order from the failed valve, and the minutes and road metres it adds to the crew. */
    public record Detour(int crew, List<String> valves, double extraMinutes, double extraMetres) {
        public Detour {
            valves = List.copyOf(valves);
        }
    }

    /** One visit of a crew: the valve and its position (metres), driving from the previous valve (0 for the first) and when it is done, in minutes from the start. */
    public record Visit(String valveId, double x, double y, double driveMetres, double driveMinutes, double doneMinute) {}

    /** One crew's run: its visits in order, its road distance and its total minutes. */
    public record CrewRun(int crew, List<Visit> visits, double driveMetres, double minutes) {
        public CrewRun {
            visits = List.copyOf(visits);
        }
    }

    /** The nearest-neighbour tour (valve ids), the crews' runs, and the elapsed minutes (the longest run). */
    public record Result(List<String> tour, List<CrewRun> crews, double elapsedMinutes, double driveMetres) {
        public Result {
            tour = List.copyOf(tour);
            crews = List.copyOf(crews);
        }

        public static final Result EMPTY = new Result(List.of(), List.of(), 0, 0);

        /** Valve ids in field order: crew 1's run, then crew 2's, ...; index + 1 is the order number. */
        public List<String> fieldOrder() {
            List<String> out = new ArrayList<>();
            for (CrewRun c : crews) for (Visit v : c.visits()) out.add(v.valveId());
            return out;
        }

        /** The crew (1-based) that visits a valve, or 0 when it is not on the route. */
        public int crewOf(String valveId) {
            for (CrewRun c : crews) for (Visit v : c.visits()) if (v.valveId().equals(valveId)) return c.crew();
            return 0;
        }

        /** The order number (1-based, along the crews' runs) of a valve, or 0 when it is not on the route. */
        public int orderOf(String valveId) {
            int k = 0;
            for (CrewRun c : crews) {
                for (Visit v : c.visits()) {
                    k++;
                    if (v.valveId().equals(valveId)) return k;
                }
            }
            return 0;
        }
    }

    private ValveRoute() {}

    /**
     * @param stops valves in operating order
     * @param crews crews available, at least 1
     */
    public static Result plan(List<Stop> stops, int crews, Settings s) {
        if (crews < 1) throw new IllegalArgumentException("crews must be at least 1");
        if (stops.isEmpty()) return Result.EMPTY;
        int[] tour = nearestNeighbour(stops);
        int n = tour.length;
        int used = Math.min(crews, n);
        List<CrewRun> runs = new ArrayList<>();
        List<String> ids = new ArrayList<>();
        for (int t : tour) ids.add(stops.get(t).valveId());
        double elapsed = 0, road = 0;
        int k = 0;
        for (int c = 0; c < used; c++) {
            int size = n / used + (c < n % used ? 1 : 0);
            int[] run = runOrder(stops, java.util.Arrays.copyOfRange(tour, k, k + size));
            k += size;
            List<Visit> visits = new ArrayList<>();
            double minute = 0, metres = 0;
            for (int i = 0; i < run.length; i++) {
                Stop here = stops.get(run[i]);
                double d = i == 0 ? 0 : dist(stops.get(run[i - 1]), here);
                double drive = s.travelMinutes(d);
                minute += drive + s.minutesPerValve();
                metres += d * s.detourFactor();
                visits.add(new Visit(here.valveId(), here.x(), here.y(), d * s.detourFactor(), drive, minute));
            }
            runs.add(new CrewRun(c + 1, visits, metres, minute));
            elapsed = Math.max(elapsed, minute);
            road += metres;
        }
        return new Result(ids, runs, elapsed, road);
    }

    /** A crew's run (stop indices in tour order) reordered: doubtful first, then by rank, then tour position. */
    static int[] runOrder(List<Stop> stops, int[] tourRun) {
        Integer[] pos = new Integer[tourRun.length];
        for (int i = 0; i < pos.length; i++) pos[i] = i;
        java.util.Arrays.sort(pos, java.util.Comparator.<Integer>comparingInt(i -> stops.get(tourRun[i]).doubtful() ? 0 : 1)
                .thenComparingInt(i -> stops.get(tourRun[i]).rank()).thenComparingInt(i -> i));
        int[] out = new int[tourRun.length];
        for (int i = 0; i < out.length; i++) out[i] = tourRun[pos[i]];
        return out;
    }

    /**
     * The fallback of a valve on a route: the crew that visits {@code failed} drives from
     * it to the {@code extra} valves (nearest neighbour from it, ties to the earlier in
     * the list), closes each, and then drives on to the valve it would have gone to next.
     * Extra time = the drive through the extra valves and on to the next valve, plus
     * their operating time, less the drive it replaces.
     *
     * @param failedAt the failed valve's position (metres)
     * @throws IllegalArgumentException when {@code failed} is not on the route
     */
    public static Detour detour(Result route, Stop failedAt, List<Stop> extra, Settings s) {
        for (CrewRun c : route.crews()) {
            List<Visit> vs = c.visits();
            for (int i = 0; i < vs.size(); i++) {
                if (!vs.get(i).valveId().equals(failedAt.valveId())) continue;
                if (extra.isEmpty()) return new Detour(c.crew(), List.of(), 0, 0);
                List<Stop> all = new ArrayList<>();
                all.add(failedAt);
                all.addAll(extra);
                int[] nn = nearestNeighbour(all);
                List<String> ids = new ArrayList<>();
                double straight = 0;
                for (int j = 1; j < nn.length; j++) {
                    ids.add(all.get(nn[j]).valveId());
                    straight += dist(all.get(nn[j - 1]), all.get(nn[j]));
                }
                double metres = straight * s.detourFactor();
                double minutes = s.travelMinutes(straight) + extra.size() * s.minutesPerValve();
                if (i + 1 < vs.size()) {
                    // the drive to the next valve now starts at the last extra valve
                    Visit next = vs.get(i + 1);
                    double replaced = next.driveMetres() / s.detourFactor();
                    Stop last = all.get(nn[nn.length - 1]);
                    double on = Math.hypot(last.x() - next.x(), last.y() - next.y());
                    metres += (on - replaced) * s.detourFactor();
                    minutes += s.travelMinutes(on) - s.travelMinutes(replaced);
                }
                return new Detour(c.crew(), ids, minutes, metres);
            }
        }
        throw new IllegalArgumentException("valve " + failedAt.valveId() + " is not on the route");
    }

    private static double dist(Stop a, Stop b) {
        return Math.hypot(a.x() - b.x(), a.y() - b.y());
    }

    /** Nearest-neighbour order from stop 0; ties to the earlier stop. */
    static int[] nearestNeighbour(List<Stop> stops) {
        int n = stops.size();
        boolean[] seen = new boolean[n];
        int[] order = new int[n];
        int cur = 0;
        seen[0] = true;
        order[0] = 0;
        for (int k = 1; k < n; k++) {
            int best = -1;
            double bd = Double.POSITIVE_INFINITY;
            for (int j = 0; j < n; j++) {
                if (seen[j]) continue;
                double d = Math.hypot(stops.get(j).x() - stops.get(cur).x(), stops.get(j).y() - stops.get(cur).y());
                if (d < bd) {
                    bd = d;
                    best = j;
                }
            }
            seen[best] = true;
            order[k] = best;
            cur = best;
        }
        return order;
    }
}
