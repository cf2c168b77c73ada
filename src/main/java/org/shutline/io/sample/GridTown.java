package org.shutline.io.sample;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.shutline.model.ContextLayer;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.SenseTap;
import org.shutline.model.Service;
import org.shutline.model.ServiceClass;
import org.shutline.model.Source;
import org.shutline.model.Station;
import org.shutline.model.TapDevice;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;

/**
 * A large synthetic grid town for benchmarks, deterministic for a seed: exactly
 * {@code mains} mains. An IP-1 main runs 50 m south of a square low-pressure grid
 * (system LP-1, blocks of 100 m, mains end to end at the intersections) with a source
 * at each end; a regulator station every 10 columns links IP-1 to LP-1 through a
 * 48.5 m stub main, with an inlet valve on IP-1 and one worker sensing tap on the
 * grid. About every fourth grid main has a valve; every grid main has two services
 * (given its main_id) 15 m to either side. CRS as {@link SampleTown#CRS}.
 *
 * <p>Memory is about 1 kB per main (geometry, records and services); O(mains) time.
 */
public final class GridTown {
    private GridTown() {}

    /** Generate a grid town with exactly {@code mains} mains (at least 20). */
    public static GeneratedTown generate(int mains, long seed) {
        if (mains < 20) throw new IllegalArgumentException("a grid town needs at least 20 mains, got " + mains);
        Random rnd = new Random(seed);
        GeometryFactory gf = new GeometryFactory();
        int side = (int) Math.ceil(Math.sqrt(mains / 2.0)) + 1; // nodes per row and column
        int stationCount = (side + 9) / 10;
        int ipCount = side + 1;
        int gridCount = mains - ipCount - stationCount;
        double x0 = SampleTown.X0;
        double y0 = SampleTown.Y0;
        double b = SampleTown.BLOCK;
        List<Main> ms = new ArrayList<>(mains);
        List<Valve> vs = new ArrayList<>();
        List<Service> ss = new ArrayList<>(2 * gridCount);
        List<Station> sts = new ArrayList<>();
        List<SenseTap> ts = new ArrayList<>();
        List<Source> srcs = new ArrayList<>();
        double ipY = y0 - 50;
        for (int i = 0; i < ipCount; i++) {
            double xa = x0 + (i - 1) * b;
            ms.add(new Main(String.format("IP-%06d", i + 1), "IP-1", MainStatus.ACTIVE, "steel", 200.0, 420.0, 1980,
                line(gf, xa, ipY, xa + b, ipY)));
        }
        srcs.add(new Source("SRC-1", "IP-1", 400.0, gf.createPoint(new Coordinate(x0 - b, ipY))));
        srcs.add(new Source("SRC-2", "IP-1", 400.0, gf.createPoint(new Coordinate(x0 + (ipCount - 1) * b, ipY))));
        for (int s = 0; s < stationCount; s++) {
            double x = x0 + s * 10 * b;
            String id = String.format("ST-%04d", s + 1);
            ms.add(new Main("STUB-" + id, "LP-1", MainStatus.ACTIVE, "steel", 150.0, SampleTown.LP_MAOP, 1990,
                line(gf, x, ipY + 1.5, x, y0)));
            sts.add(new Station(id, "IP-1", "LP-1", 1.74, s % 2 == 0 ? 2.24 : null, 2.74, "Station " + (s + 1),
                gf.createPoint(new Coordinate(x, ipY + 1.5))));
            vs.add(new Valve("V-" + id, "IP-1", ValveKind.STATION, NormalPosition.OPEN, Operability.YES,
                SampleTown.AS_OF.minusDays(30), gf.createPoint(new Coordinate(x - 1, ipY))));
            double tx = s * 10 + 1 < side ? x + 30 : x - 30; // on the first grid row, which is made first
            ts.add(new SenseTap("T-" + id, id, TapDevice.WORKER, gf.createPoint(new Coordinate(tx, y0))));
        }
        int made = 0;
        for (int r = 0; r < side && made < gridCount; r++) {
            for (int c = 0; c + 1 < side && made < gridCount; c++) {
                addGrid(gf, rnd, ms, vs, ss, x0 + c * b, y0 + r * b, x0 + (c + 1) * b, y0 + r * b, ++made);
            }
        }
        for (int c = 0; c < side && made < gridCount; c++) {
            for (int r = 0; r + 1 < side && made < gridCount; r++) {
                addGrid(gf, rnd, ms, vs, ss, x0 + c * b, y0 + r * b, x0 + c * b, y0 + (r + 1) * b, ++made);
            }
        }
        Network n = new Network("grid-" + mains, SampleTown.CRS, ms, vs, sts, ts, ss, srcs, List.<ContextLayer>of(),
            List.of());
        return new GeneratedTown(n, List.of());
    }

    private static void addGrid(GeometryFactory gf, Random rnd, List<Main> ms, List<Valve> vs, List<Service> ss,
                                double xa, double ya, double xb, double yb, int n) {
        String id = String.format("M-%07d", n);
        ms.add(new Main(id, "LP-1", MainStatus.ACTIVE, "PE", 63.0, SampleTown.LP_MAOP, 1970 + rnd.nextInt(55),
            line(gf, xa, ya, xb, yb)));
        double ux = (xb - xa) / 100;
        double uy = (yb - ya) / 100;
        if (rnd.nextInt(4) == 0) {
            int k = rnd.nextInt(50);
            Operability op = k == 0 ? Operability.NO : k < 4 ? Operability.UNKNOWN : Operability.YES;
            LocalDate checked = SampleTown.AS_OF.minusDays(10 + rnd.nextInt(600));
            vs.add(new Valve("V-" + id, "LP-1", ValveKind.MAIN, NormalPosition.OPEN, op, checked,
                gf.createPoint(new Coordinate(xa + 10 * ux, ya + 10 * uy))));
        }
        for (int j = 0; j < 2; j++) {
            double t = j == 0 ? 33 : 67;
            double off = j == 0 ? 15 : -15;
            Point p = gf.createPoint(new Coordinate(xa + t * ux - off * uy, ya + t * uy + off * ux));
            ss.add(new Service("S-" + id + "-" + j, "LP-1", ServiceClass.RESIDENTIAL, 1, null, id, null, p));
        }
    }

    private static LineString line(GeometryFactory gf, double xa, double ya, double xb, double yb) {
        return gf.createLineString(new Coordinate[] {new Coordinate(xa, ya), new Coordinate(xb, yb)});
    }
}
