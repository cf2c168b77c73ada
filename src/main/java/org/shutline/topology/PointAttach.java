package org.shutline.topology;

import java.util.Arrays;
import java.util.List;
import org.locationtech.jts.geom.Point;
import org.shutline.model.Finding;
import org.shutline.model.Findings;
import org.shutline.model.Main;
import org.shutline.model.Network;
import org.shutline.model.Progress;
import org.shutline.model.SenseTap;
import org.shutline.model.Service;
import org.shutline.model.Severity;
import org.shutline.model.Source;
import org.shutline.model.Station;
import org.shutline.model.Tolerances;
import org.shutline.model.Valve;
import org.shutline.topology.LineSet.Hit;

/**
 * Attaches valves, stations, sources, sensing taps and services to mains by the
 * connectivity rules, using {@link NearestMain}, and records the cuts (valve splits,
 * station and source nodes) that {@link GraphAssembly} turns into nodes and edges.
 *
 * <p>Valves, stations (each side), sources: nearest main of their system within the
 * point tolerance, any status; taps likewise on their station's outlet system. A
 * service with a {@code main_id} attaches to that main at any distance; without one,
 * to the nearest active main of its system within the service tolerance. Every
 * feature left out, and every doubtful attachment, gives a finding.
 */
final class PointAttach {
    static final byte VALVE = 2;
    static final byte POINT = 1;

    // cuts other than junctions: line, measure, type, ref (valve index or point request)
    int cutCount;
    int[] cutLine = new int[16];
    double[] cutMeasure = new double[16];
    byte[] cutType = new byte[16];
    int[] cutRef = new int[16];

    /** Point requests (station inlet/outlet, source): node filled in by the assembly. */
    int pointCount;
    final int[] stationIn;
    final int[] stationOut;
    final int[] sourcePoint;

    final int[] tapLine;
    final double[] tapMeasure;
    final int[] serviceLine;
    final double[] serviceMeasure;

    /** Attached valve / station side / source positions by line, for the dangling-end check. */
    int featCount;
    int[] featLine = new int[16];
    double[] featX = new double[16];
    double[] featY = new double[16];

    private final Network net;
    private final InputCheck in;
    private final NearestMain near;
    private final Tolerances tol;
    private final Findings out;
    private final Hit hit = new Hit();
    private Progress progress = Progress.NONE;
    private long ticks;

    PointAttach(Network net, InputCheck in, NearestMain near, Tolerances tol, Findings out) {
        this.net = net;
        this.in = in;
        this.near = near;
        this.tol = tol;
        this.out = out;
        stationIn = minusOnes(net.stations().size());
        stationOut = minusOnes(net.stations().size());
        sourcePoint = minusOnes(net.sources().size());
        tapLine = minusOnes(net.taps().size());
        tapMeasure = new double[net.taps().size()];
        serviceLine = minusOnes(net.services().size());
        serviceMeasure = new double[net.services().size()];
    }

    private static int[] minusOnes(int n) {
        int[] a = new int[n];
        Arrays.fill(a, -1);
        return a;
    }

    void run(Progress p) {
        progress = p;
        long total = (long) net.valves().size() + net.stations().size() + net.sources().size()
                + net.taps().size() + net.services().size();
        progress.begin("Attaching valves, stations, taps and services", total);
        valves();
        stations();
        sources();
        taps();
        services();
        progress.done(total);
    }

    /** Counts one feature; every 4096 reports progress and checks cancellation. */
    private void tick() {
        if ((++ticks & 4095) == 0) {
            progress.checkCancelled();
            progress.done(ticks);
        }
    }

    private int systemOf(String sysId, String layer, String featureId, Point p) {
        int s = in.system(sysId);
        if (!in.systemUsable(s)) {
            out.add(Finding.at(FindingCodes.UNKNOWN_SYSTEM, Severity.WARNING, layer, p.getX(), p.getY(),
                    "Feature " + featureId + " in " + layer + " names system " + InputCheck.key(sysId)
                            + ", which has no main.", featureId));
            return -1;
        }
        return s;
    }

    private void valves() {
        List<Valve> vs = net.valves();
        for (int i = 0; i < vs.size(); i++) {
            tick();
            if (!in.valveOk[i]) continue;
            Valve v = vs.get(i);
            Point p = v.geometry();
            int s = systemOf(v.systemId(), FindingCodes.VALVES, v.id(), p);
            if (!near.near(p.getX(), p.getY(), s, tol.pointM(), false, hit)) {
                out.add(Finding.at(FindingCodes.VALVE_OFF_MAIN, Severity.ERROR, FindingCodes.VALVES,
                        p.getX(), p.getY(), "Valve " + v.id() + " is not within the point tolerance of a main of"
                                + " system " + InputCheck.key(v.systemId()) + "; it is left out of the network.",
                        v.id()));
                continue;
            }
            cut(hit.line, hit.measure, VALVE, i);
            feature(hit.line, p);
        }
    }

    private void stations() {
        List<Station> ss = net.stations();
        for (int i = 0; i < ss.size(); i++) {
            tick();
            if (!in.stationOk[i]) continue;
            Station st = ss.get(i);
            Point p = st.geometry();
            int si = systemOf(st.inSys(), FindingCodes.STATIONS, st.id(), p);
            int so = systemOf(st.outSys(), FindingCodes.STATIONS, st.id(), p);
            boolean hasIn = near.near(p.getX(), p.getY(), si, tol.pointM(), false, hit);
            int inLine = hit.line;
            double inM = hit.measure;
            boolean hasOut = near.near(p.getX(), p.getY(), so, tol.pointM(), false, hit);
            if (!hasIn) {
                out.add(Finding.at(FindingCodes.STATION_NO_INLET, Severity.ERROR, FindingCodes.STATIONS,
                        p.getX(), p.getY(), "Station " + st.id() + " has no main of its inlet system "
                                + InputCheck.key(st.inSys()) + " within the point tolerance;"
                                + " it is left out of the network.", st.id()));
            }
            if (!hasOut) {
                out.add(Finding.at(FindingCodes.STATION_NO_OUTLET, Severity.ERROR, FindingCodes.STATIONS,
                        p.getX(), p.getY(), "Station " + st.id() + " has no main of its outlet system "
                                + InputCheck.key(st.outSys()) + " within the point tolerance;"
                                + " it is left out of the network.", st.id()));
            }
            if (!hasIn || !hasOut) continue;
            stationIn[i] = pointCut(inLine, inM);
            stationOut[i] = pointCut(hit.line, hit.measure);
            feature(inLine, p);
            feature(hit.line, p);
        }
    }

    private void sources() {
        List<Source> ss = net.sources();
        for (int i = 0; i < ss.size(); i++) {
            tick();
            if (!in.sourceOk[i]) continue;
            Source s = ss.get(i);
            Point p = s.geometry();
            int sys = systemOf(s.systemId(), FindingCodes.SOURCES, s.id(), p);
            if (!near.near(p.getX(), p.getY(), sys, tol.pointM(), false, hit)) {
                out.add(Finding.at(FindingCodes.SOURCE_OFF_MAIN, Severity.ERROR, FindingCodes.SOURCES,
                        p.getX(), p.getY(), "Source " + s.id() + " is not within the point tolerance of a main"
                                + " of system " + InputCheck.key(s.systemId()) + "; it is left out of the network.",
                        s.id()));
                continue;
            }
            sourcePoint[i] = pointCut(hit.line, hit.measure);
            feature(hit.line, p);
        }
    }

    private void taps() {
        List<SenseTap> ts = net.taps();
        for (int i = 0; i < ts.size(); i++) {
            tick();
            if (!in.tapOk[i]) continue;
            SenseTap t = ts.get(i);
            Point p = t.geometry();
            Integer st = in.stationById.get(InputCheck.key(t.stationId()));
            if (st == null) {
                out.add(Finding.at(FindingCodes.STATION_UNKNOWN, Severity.ERROR, FindingCodes.TAPS,
                        p.getX(), p.getY(), "Sensing tap " + t.id() + " names station "
                                + InputCheck.key(t.stationId()) + ", which is not in the stations layer;"
                                + " the tap is left out.", t.id()));
                continue;
            }
            String outSys = net.stations().get(st).outSys();
            int sys = systemOf(outSys, FindingCodes.TAPS, t.id(), p);
            if (!near.near(p.getX(), p.getY(), sys, tol.pointM(), false, hit)) {
                out.add(Finding.at(FindingCodes.TAP_OFF_MAIN, Severity.ERROR, FindingCodes.TAPS,
                        p.getX(), p.getY(), "Sensing tap " + t.id() + " of station " + t.stationId()
                                + " is not within the point tolerance of a main of the station's outlet system "
                                + InputCheck.key(outSys) + "; it is left out.", t.id(), t.stationId()));
                continue;
            }
            tapLine[i] = hit.line;
            tapMeasure[i] = hit.measure;
        }
    }

    private void services() {
        List<Service> ss = net.services();
        List<Main> mains = net.mains();
        for (int i = 0; i < ss.size(); i++) {
            tick();
            if (!in.serviceOk[i]) continue;
            Service s = ss.get(i);
            Point p = s.geometry();
            String mainId = s.mainId();
            if (mainId != null && !mainId.isBlank()) {
                systemOf(s.systemId(), FindingCodes.SERVICES, s.id(), p);
                byMainId(i, s, p, mainId, mains);
                continue;
            }
            int sys = systemOf(s.systemId(), FindingCodes.SERVICES, s.id(), p);
            if (!near.near(p.getX(), p.getY(), sys, tol.serviceM(), true, hit)) {
                out.add(Finding.at(FindingCodes.UNATTACHED_SERVICE, Severity.ERROR, FindingCodes.SERVICES,
                        p.getX(), p.getY(), "Service " + s.id() + " has no main_id and no active main of system "
                                + InputCheck.key(s.systemId()) + " within the service tolerance;"
                                + " it is not attached.", s.id()));
                continue;
            }
            serviceLine[i] = hit.line;
            serviceMeasure[i] = hit.measure;
        }
    }

    private void byMainId(int i, Service s, Point p, String mainId, List<Main> mains) {
        Integer m = in.mainById.get(mainId);
        if (m == null || !near.onMain(m, p.getX(), p.getY(), hit)) {
            String why = m == null ? "names main " + mainId + ", which is not in the mains layer"
                    : "names main " + mainId + ", which has no usable geometry";
            out.add(Finding.at(FindingCodes.SERVICE_MAIN_NOT_FOUND, Severity.ERROR, FindingCodes.SERVICES,
                    p.getX(), p.getY(), "Service " + s.id() + " " + why + "; it is not attached.", s.id(), mainId));
            return;
        }
        serviceLine[i] = hit.line;
        serviceMeasure[i] = hit.measure;
        if (hit.dist > tol.serviceM()) {
            out.add(Finding.at(FindingCodes.SERVICE_FAR_FROM_MAIN, Severity.WARNING, FindingCodes.SERVICES,
                    p.getX(), p.getY(), "Service " + s.id() + " is attached to its main_id " + mainId
                            + ", which is farther away than the service tolerance.", s.id(), mainId));
        }
        String mainSys = InputCheck.key(mains.get(m).systemId());
        if (!mainSys.equals(InputCheck.key(s.systemId()))) {
            out.add(Finding.at(FindingCodes.SERVICE_OTHER_SYSTEM, Severity.WARNING, FindingCodes.SERVICES,
                    p.getX(), p.getY(), "Service " + s.id() + " of system " + InputCheck.key(s.systemId())
                            + " is attached to its main_id " + mainId + ", which is in system " + mainSys + ".",
                    s.id(), mainId));
        }
    }

    private int pointCut(int line, double m) {
        int req = pointCount++;
        cut(line, m, POINT, req);
        return req;
    }

    private void cut(int line, double m, byte type, int ref) {
        if (cutCount == cutLine.length) {
            int n = cutCount * 2;
            cutLine = Arrays.copyOf(cutLine, n);
            cutMeasure = Arrays.copyOf(cutMeasure, n);
            cutType = Arrays.copyOf(cutType, n);
            cutRef = Arrays.copyOf(cutRef, n);
        }
        cutLine[cutCount] = line;
        cutMeasure[cutCount] = m;
        cutType[cutCount] = type;
        cutRef[cutCount] = ref;
        cutCount++;
    }

    private void feature(int line, Point p) {
        if (featCount == featLine.length) {
            int n = featCount * 2;
            featLine = Arrays.copyOf(featLine, n);
            featX = Arrays.copyOf(featX, n);
            featY = Arrays.copyOf(featY, n);
        }
        featLine[featCount] = line;
        featX[featCount] = p.getX();
        featY[featCount] = p.getY();
        featCount++;
    }
}
