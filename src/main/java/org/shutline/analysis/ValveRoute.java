package org.shutline.analysis;

import java.util.ArrayList;
import java.util.List;

/**
 * The field time to operate a list of valves: the order each crew visits them in and
 * how long it takes.
 *
 * <p>Method. The valves come in operating order. One tour is built by nearest
 * neighbour from the first valve in operating order: from the current valve, go to the
 * nearest valve not yet visited (straight-line distance; an exact tie goes to the one
 * earlier in operating order). With N crews the tour is split into N runs of
 * consecutive valves, as equal in count as possible, earlier runs taking one more
 * valve when the count does not divide evenly (fewer crews are used when there are
 * fewer valves). Each crew starts at the first valve of its run (the drive from the
 * depot is not counted: it depends on where the crew is); between valves it drives
 * the straight-line distance times the detour factor at the crew speed; at each valve
 * it spends the operating time. A crew's time is its travel plus its operating time;
 * the elapsed time is the longest crew's.
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

    /** A valve to visit, at (x, y) in metres (any metric plane). */
    public record Stop(String valveId, double x, double y) {}

    /** One visit of a crew: driving from the previous valve (0 for the first) and when it is done, in minutes from the start. */
    public record Visit(String valveId, double driveMetres, double driveMinutes, double doneMinute) {}

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
            List<Visit> visits = new ArrayList<>();
            double minute = 0, metres = 0;
            for (int i = 0; i < size; i++, k++) {
                Stop here = stops.get(tour[k]);
                double d = 0;
                if (i > 0) {
                    Stop prev = stops.get(tour[k - 1]);
                    d = Math.hypot(here.x() - prev.x(), here.y() - prev.y());
                }
                double drive = s.travelMinutes(d);
                minute += drive + s.minutesPerValve();
                metres += d * s.detourFactor();
                visits.add(new Visit(here.valveId(), d * s.detourFactor(), drive, minute));
            }
            runs.add(new CrewRun(c + 1, visits, metres, minute));
            elapsed = Math.max(elapsed, minute);
            road += metres;
        }
        return new Result(ids, runs, elapsed, road);
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
