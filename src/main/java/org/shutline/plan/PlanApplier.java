package org.shutline.plan;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.shutline.model.LinearUnit;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.Operability;
import org.shutline.model.ValveKind;
import org.shutline.topology.EdgeKind;
import org.shutline.topology.Topology;
import org.shutline.trace.NetworkState;

/**
 * Applies a plan's steps cumulatively to the network as loaded, giving one state per
 * step as overlays of the frozen base graph (no copy of the graph per step).
 *
 * <p>How each step kind changes the state:
 * <ul>
 * <li>{@code close}/{@code open}: valve positions (closing a closed valve is a notice);</li>
 * <li>{@code cut}: the pipe edge at the point of the main nearest {@code at} is cut into two
 *     pieces that no longer meet (both ends capped); cutting an abandoned main fails;</li>
 * <li>{@code tie_in}: a tee node is made on each main at its point nearest {@code at}, joined
 *     by a zero-length link belonging to {@code main} (so it carries gas once that main is active);</li>
 * <li>{@code activate}/{@code abandon}: main status (abandoning an abandoned main fails);</li>
 * <li>{@code bypass_install}: tee nodes on the nearest mains of the two points, a new active main
 *     (the bypass) in the system of the first point's main, with its valves in series, open;
 *     {@code bypass_remove} takes its pipe and valves out again;</li>
 * <li>{@code transfer}: services re-attached to the nearest point of the receiving main;</li>
 * <li>{@code move_tap}: the tap re-attached to the nearest point of the named main;</li>
 * <li>{@code station_out}/{@code station_in}: station in service or not.</li>
 * </ul>
 * A point farther than {@link #MAX_OFFSET_M} metres from the main it names, a feature id that does
 * not exist, or a step that cannot be done in the state it meets is a {@link PlanException}
 * naming the step number and the reason.
 */
public final class PlanApplier {
    /** Farthest a plan's point may lie from the main it names, in metres. */
    public static final double MAX_OFFSET_M = 10.0;

    private final Topology topo;
    private final Network net;
    private final String file;
    private final double maxOffset;
    private final Map<String, Integer> mainIndex = new HashMap<>();
    private final Map<String, Integer> valveIndex = new HashMap<>();
    private final Map<String, Integer> stationIndex = new HashMap<>();
    private final Map<String, Integer> tapIndex = new HashMap<>();
    private final Map<String, Integer> serviceIndex = new HashMap<>();
    private final Map<String, Bypass> bypasses = new HashMap<>();

    private record Bypass(int main, List<Integer> edges) {
    }

    private PlanApplier(Topology topo, String file) {
        this.topo = topo;
        this.net = topo.network();
        this.file = file;
        LinearUnit u = net.crs().unit();
        this.maxOffset = u.fromMetres(MAX_OFFSET_M);
        for (int i = 0; i < net.mains().size(); i++) mainIndex.putIfAbsent(net.mains().get(i).id(), i);
        for (int i = 0; i < net.valves().size(); i++) valveIndex.putIfAbsent(net.valves().get(i).id(), i);
        for (int i = 0; i < net.stations().size(); i++) stationIndex.putIfAbsent(net.stations().get(i).id(), i);
        for (int i = 0; i < net.taps().size(); i++) tapIndex.putIfAbsent(net.taps().get(i).id(), i);
        for (int i = 0; i < net.services().size(); i++) serviceIndex.putIfAbsent(net.services().get(i).id(), i);
    }

    /** Apply from the network's normal state. */
    public static PlanStates apply(Plan plan, Topology topology, String fileName) throws PlanException {
        return apply(plan, NetworkState.of(topology), fileName);
    }

    /** Apply from a given starting state (which must be built on the topology of the plan's network). */
    public static PlanStates apply(Plan plan, NetworkState start, String fileName) throws PlanException {
        List<PlanException> idErrors = PlanValidator.validate(plan, start.network(), fileName);
        if (!idErrors.isEmpty()) throw idErrors.get(0);
        PlanApplier a = new PlanApplier(start.topology(), fileName);
        List<StepState> out = new ArrayList<>();
        NetworkState s = start;
        for (Step step : plan.steps()) {
            StepState st = a.applyStep(step, s);
            out.add(st);
            s = st.after();
        }
        return new PlanStates(plan, start, out);
    }

    private PlanException fail(Step step, String why) {
        return new PlanException(file + ":" + step.line() + ": step " + step.number() + " (" + step.action().key()
                + ") cannot be applied: " + why, step.line());
    }

    private StepState applyStep(Step step, NetworkState s) throws PlanException {
        Change c = new Change(step, s);
        StepAction a = step.action();
        if (a instanceof StepAction.CloseValves cv) {
            for (String v : cv.valves()) c.valve(v, true);
        } else if (a instanceof StepAction.OpenValves ov) {
            for (String v : ov.valves()) c.valve(v, false);
        } else if (a instanceof StepAction.CutMain cm) {
            c.cut(cm.main(), cm.at());
        } else if (a instanceof StepAction.TieIn t) {
            c.tieIn(t.main(), t.to(), t.at());
        } else if (a instanceof StepAction.ActivateMain m) {
            int i = mainIndex.get(m.main());
            if (c.state.mainStatus(i) == MainStatus.ACTIVE) c.notice("main " + m.main() + " was already active");
            c.state = c.state.withMainStatus(i, MainStatus.ACTIVE);
        } else if (a instanceof StepAction.AbandonMain m) {
            int i = mainIndex.get(m.main());
            if (c.state.mainStatus(i) == MainStatus.ABANDONED) throw fail(step, "main " + m.main() + " is already abandoned");
            c.state = c.state.withMainStatus(i, MainStatus.ABANDONED);
        } else if (a instanceof StepAction.InstallBypass b) {
            c.bypass(b);
        } else if (a instanceof StepAction.RemoveBypass b) {
            Bypass bp = bypasses.remove(b.id());
            for (int e : bp.edges()) c.state = c.state.withEdgeRemoved(e);
        } else if (a instanceof StepAction.TransferServices t) {
            c.transfer(t);
        } else if (a instanceof StepAction.MoveTap m) {
            c.moveTap(m);
        } else if (a instanceof StepAction.StationOut so) {
            int i = stationIndex.get(so.station());
            if (!c.state.stationInService(i)) c.notice("station " + so.station() + " was already out of service");
            c.state = c.state.withStationInService(i, false);
        } else if (a instanceof StepAction.Attend at) {
            int i = stationIndex.get(at.station());
            if (!c.state.stationInService(i)) c.notice("station " + at.station() + " is out of service at this step");
        } else if (a instanceof StepAction.StationIn si) {
            int i = stationIndex.get(si.station());
            if (c.state.stationInService(i)) c.notice("station " + si.station() + " was already in service");
            c.state = c.state.withStationInService(i, true);
        }
        return new StepState(step, s, c.state, c.points, c.added, c.notices);
    }

    /** The changes of one step, built up on a working state. */
    private final class Change {
        final Step step;
        final NetworkState before;
        NetworkState state;
        final List<WorkPoint> points = new ArrayList<>();
        final List<Integer> added = new ArrayList<>();
        final List<String> notices = new ArrayList<>();

        Change(Step step, NetworkState s) {
            this.step = step;
            this.before = s;
            this.state = s;
        }

        void notice(String text) {
            notices.add(text);
        }

        void valve(String id, boolean close) {
            Integer v = valveIndex.get(id);
            if (state.valveEdge(v) < 0) notice("valve " + id + " is not on any main in the network; the step changes nothing");
            if (state.valveClosed(v) == close) notice("valve " + id + " was already " + (close ? "closed" : "open"));
            state = state.withValveClosed(v, close);
        }

        PipeLocator.Located locate(String mainId, XY at, String what) throws PlanException {
            int main = mainIndex.get(mainId);
            PipeLocator.Located l = PipeLocator.nearest(state, main, at.x(), at.y());
            if (l == null) throw fail(step, "main " + mainId + " has no pipe left to " + what);
            if (l.distance() > maxOffset) {
                throw fail(step, String.format(Locale.ROOT, "the point (%.1f, %.1f) is %.1f %s from main %s (at most %.1f)",
                        at.x(), at.y(), l.distance(), net.crs().unit().symbol(), mainId, maxOffset));
            }
            return l;
        }

        void cut(String mainId, XY at) throws PlanException {
            int main = mainIndex.get(mainId);
            if (state.mainStatus(main) == MainStatus.ABANDONED) throw fail(step, "main " + mainId + " is already abandoned");
            PipeLocator.Located l = locate(mainId, at, "cut");
            points.add(new WorkPoint("cut", mainId, l.edge(), l.measure(), l.x(), l.y()));
            state = state.withCut(l.edge(), l.measure());
        }

        /** A node on the main at the located point: an existing end node, or a new tee (cut and re-joined). */
        int tee(PipeLocator.Located l) {
            int e = l.edge();
            double eps = 1e-6;
            if (Math.abs(l.measure() - state.edgeM0(e)) < eps) return state.edgeFrom(e);
            if (Math.abs(l.measure() - state.edgeM1(e)) < eps) return state.edgeTo(e);
            int c1 = state.nodeCount();
            int main = state.edgeFeature(e), part = state.edgePart(e);
            state = state.withCut(e, l.measure());
            state = state.withPipe(c1, c1 + 1, main, part, l.measure(), l.measure());
            return c1;
        }

        void tieIn(String mainId, String toId, XY at) throws PlanException {
            PipeLocator.Located la = locate(mainId, at, "tie in");
            PipeLocator.Located lb = locate(toId, at, "tie in to");
            points.add(new WorkPoint("tie-in", toId, lb.edge(), lb.measure(), lb.x(), lb.y()));
            int a = tee(la);
            lb = locate(toId, at, "tie in to");
            int b = tee(lb);
            int main = mainIndex.get(mainId);
            state = state.withPipe(a, b, main, state.edgePart(la.edge()), la.measure(), la.measure());
        }

        void bypass(StepAction.InstallBypass bp) throws PlanException {
            int fromMain = nearestMain(bp.from());
            int toMain = nearestMain(bp.to());
            PipeLocator.Located lf = locate(net.mains().get(fromMain).id(), bp.from(), "connect bypass " + bp.id());
            int a = tee(lf);
            PipeLocator.Located lt = locate(net.mains().get(toMain).id(), bp.to(), "connect bypass " + bp.id());
            int b = tee(lt);
            int main = state.mainCount();
            state = state.withMain(bp.id(), state.mainSystem(fromMain), MainStatus.ACTIVE);
            added.add(main);
            List<Integer> edges = new ArrayList<>();
            double ax = state.nodeX(a), ay = state.nodeY(a), bx = state.nodeX(b), by = state.nodeY(b);
            double len = Math.hypot(bx - ax, by - ay);
            int k = bp.valves().size();
            int prev = a;
            double prevM = 0;
            for (int i = 0; i < k; i++) {
                double t = (i + 1.0) / (k + 1.0);
                double x = ax + t * (bx - ax), y = ay + t * (by - ay);
                int p = state.nodeCount();
                state = state.withNode(x, y).withNode(x, y);
                edges.add(state.edgeCount());
                state = state.withPipe(prev, p, main, 0, prevM, t * len);
                int v = state.valveCount();
                edges.add(state.edgeCount());
                state = state.withValve(p, p + 1, bp.valves().get(i), ValveKind.BYPASS, Operability.YES, false);
                valveIndex.put(bp.valves().get(i), v);
                prev = p + 1;
                prevM = t * len;
            }
            edges.add(state.edgeCount());
            state = state.withPipe(prev, b, main, 0, prevM, len);
            bypasses.put(bp.id(), new Bypass(main, edges));
        }

        int nearestMain(XY p) throws PlanException {
            int best = -1;
            double bestD = Double.POSITIVE_INFINITY;
            org.locationtech.jts.geom.Point pt = new org.locationtech.jts.geom.GeometryFactory()
                    .createPoint(new org.locationtech.jts.geom.Coordinate(p.x(), p.y()));
            for (int i = 0; i < net.mains().size(); i++) {
                if (state.mainStatus(i) == MainStatus.ABANDONED || net.mains().get(i).geometry() == null) continue;
                if (!net.mains().get(i).geometry().getEnvelopeInternal().intersects(
                        new org.locationtech.jts.geom.Envelope(p.x() - maxOffset, p.x() + maxOffset, p.y() - maxOffset, p.y() + maxOffset))) continue;
                double d = net.mains().get(i).geometry().distance(pt);
                if (d < bestD || (d == bestD && best >= 0 && net.mains().get(i).id().compareTo(net.mains().get(best).id()) < 0)) {
                    bestD = d;
                    best = i;
                }
            }
            if (best < 0 || bestD > maxOffset) {
                throw fail(step, String.format(Locale.ROOT, "no main within %.1f %s of (%.1f, %.1f)", maxOffset,
                        net.crs().unit().symbol(), p.x(), p.y()));
            }
            return best;
        }

        void transfer(StepAction.TransferServices t) throws PlanException {
            int from = mainIndex.get(t.from());
            int to = mainIndex.get(t.to());
            List<Integer> which = new ArrayList<>();
            if (t.services().isEmpty()) {
                for (int i = 0; i < state.serviceCount(); i++) if (mainOf(i) == from) which.add(i);
                if (which.isEmpty()) notice("main " + t.from() + " has no services to transfer");
            } else {
                for (String id : t.services()) {
                    int i = serviceIndex.get(id);
                    if (mainOf(i) != from) throw fail(step, "service " + id + " is not on main " + t.from());
                    which.add(i);
                }
            }
            if (state.mainStatus(to) != MainStatus.ACTIVE) {
                notice("main " + t.to() + " is not active: services moved to it stay off gas until it is activated");
            }
            for (int i : which) {
                org.locationtech.jts.geom.Point g = net.services().get(i).geometry();
                PipeLocator.Located l = PipeLocator.nearest(state, to, g.getX(), g.getY());
                if (l == null) throw fail(step, "main " + t.to() + " has no pipe to take service " + net.services().get(i).id());
                state = state.withServiceAttachment(i, l.edge(), l.measure());
            }
        }

        int mainOf(int service) {
            int e = state.serviceEdge(service);
            return e < 0 || state.edgeKind(e) != EdgeKind.PIPE ? -1 : state.edgeFeature(e);
        }

        void moveTap(StepAction.MoveTap m) throws PlanException {
            int tap = tapIndex.get(m.tap());
            XY at = m.at();
            if (at == null) {
                org.locationtech.jts.geom.Point g = net.taps().get(tap).geometry();
                at = new XY(g.getX(), g.getY());
                int main = mainIndex.get(m.main());
                PipeLocator.Located l = PipeLocator.nearest(state, main, at.x(), at.y());
                if (l == null) throw fail(step, "main " + m.main() + " has no pipe to take the tap");
                state = state.withTapAttachment(tap, l.edge(), l.measure());
                return;
            }
            PipeLocator.Located l = locate(m.main(), at, "take the tap");
            state = state.withTapAttachment(tap, l.edge(), l.measure());
        }
    }
}
