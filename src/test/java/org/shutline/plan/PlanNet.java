package org.shutline.plan;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.shutline.model.CrsInfo;
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
import org.shutline.model.Tolerances;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;
import org.shutline.topology.NetworkBuilder;
import org.shutline.topology.Topology;

/**
 * The hand-drawn test network of the plan and hazard tests (metres):
 * <pre>
 *  SRC-1                 RS-1                                         RS-2
 *   o=====================[S]=====================IP-1=================[S]     IP, 400 kPa
 *  (0,100)              (100,100)                                  (400,100)
 *                          |  LP-A                                     | LP-D
 *                          |   S-4 (110,50)                            |
 *                          |                                           |
 *                  (100,0) o-------x--------------x----------o---------o (400,0)
 *                               V-1 (150,0)    V-2 (250,0) (300,0)
 *                          LP-B: S-1 (200,10), clinic S-2 (200,-10)  LP-C: S-3 (350,10)
 * </pre>
 * RS-1 and RS-2 both feed LP (a grid fed by two stations). RS-1 has a relief valve,
 * RS-2 a monitor. Taps are given per test.
 */
final class PlanNet {
    static final GeometryFactory GF = new GeometryFactory();
    static final LocalDate CHECKED = LocalDate.of(2026, 6, 1);

    private PlanNet() {}

    static LineString line(double... xy) {
        Coordinate[] c = new Coordinate[xy.length / 2];
        for (int i = 0; i < c.length; i++) c[i] = new Coordinate(xy[2 * i], xy[2 * i + 1]);
        return GF.createLineString(c);
    }

    static Point pt(double x, double y) {
        return GF.createPoint(new Coordinate(x, y));
    }

    static Main main(String id, String sys, LineString g) {
        return new Main(id, sys, MainStatus.ACTIVE, "PE", 100.0, sys.equals("IP") ? 400.0 : 1.74, 1990, g);
    }

    static SenseTap tap(String id, String station, TapDevice d, double x, double y) {
        return new SenseTap(id, station, d, pt(x, y));
    }

    static Topology build(Operability v2, List<SenseTap> taps) {
        return build(v2, taps, null);
    }

    /** With RS-1's relief recorded as full-capacity ({@code true}), token ({@code false}) or not recorded (null). */
    static Topology build(Operability v2, List<SenseTap> taps, Boolean rs1ReliefFull) {
        List<Main> mains = List.of(
                main("IP-1", "IP", line(0, 100, 400, 100)),
                main("LP-A", "LP", line(100, 99, 100, 0)),
                main("LP-B", "LP", line(100, 0, 300, 0)),
                main("LP-C", "LP", line(300, 0, 400, 0)),
                main("LP-D", "LP", line(400, 99, 400, 0)));
        List<Valve> valves = List.of(
                new Valve("V-1", "LP", ValveKind.MAIN, NormalPosition.OPEN, Operability.YES, CHECKED, pt(150, 0)),
                new Valve("V-2", "LP", ValveKind.MAIN, NormalPosition.OPEN, v2, CHECKED, pt(250, 0)));
        List<Station> stations = List.of(
                new Station("RS-1", "IP", "LP", 1.74, null, 3.0, "Mill Road", pt(100, 100), rs1ReliefFull),
                new Station("RS-2", "IP", "LP", 1.74, 2.5, null, "Fern Hill", pt(400, 100)));
        List<Service> services = new ArrayList<>(List.of(
                new Service("S-1", "LP", ServiceClass.RESIDENTIAL, 1, "", null, "1 Tansy Walk", pt(200, 10)),
                new Service("S-2", "LP", ServiceClass.CRITICAL, 2, "clinic", null, "2 Tansy Walk", pt(200, -10)),
                new Service("S-3", "LP", ServiceClass.COMMERCIAL, 3, "", null, "3 Tansy Walk", pt(350, 10)),
                new Service("S-4", "LP", ServiceClass.RESIDENTIAL, 1, "", null, "4 Sorrel Lane", pt(110, 50))));
        List<Source> sources = List.of(new Source("SRC-1", "IP", 400.0, pt(0, 100)));
        Network net = new Network("plan-net", CrsInfo.UNKNOWN_METRES, mains, valves, stations, taps, services, sources,
                List.of(), List.of());
        return NetworkBuilder.build(net, Tolerances.DEFAULT);
    }

    static Topology build(List<SenseTap> taps) {
        return build(Operability.YES, taps);
    }
}
