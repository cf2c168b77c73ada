package org.shutline.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.shutline.model.Caution;
import org.shutline.model.Network;
import org.shutline.model.SenseTap;
import org.shutline.model.Station;
import org.shutline.model.Valve;
import org.shutline.plan.Phase;
import org.shutline.plan.PlanStates;
import org.shutline.plan.StepAction;
import org.shutline.plan.StepState;
import org.shutline.plan.WorkPoint;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * Emergency cards of a work plan, one per phase, for the pre-job briefing and the fire
 * department: in the network state after the phase's steps ({@link PlanStates#afterPhase}),
 * <ul>
 * <li>gas blowing at the excavation: the {@link IncidentResponse} of the work site.
 *     The site is the phase's work points (cuts and tie-ins), each taken as a pit of
 *     radius {@code pitRadiusM} (the segments of every active pipe edge crossing the
 *     circle, both sides of a cut included); a phase without work points takes the
 *     mains its steps name (cut, tie-in, activate, abandon, transfer, move tap). A
 *     phase that touches no pipe, or whose pits reach no active pipe in that state (a
 *     cut main since abandoned), has no site ({@code site} null, said in the site
 *     description);</li>
 * <li>an over-pressure of each pressure system the phase touches (the systems of the
 *     mains, valves and tap moves it names, and the outlet systems of stations it stops,
 *     starts or re-taps): the {@link OverpressureShutoff} of that system.</li>
 * </ul>
 * Every card carries {@link Caution#TEXT}. Cost per phase: one segment build, one
 * isolation, one over-pressure analysis per system touched.
 */
public final class EmergencyCards {
    /** Pit radius used when none is given: 2 m (Shutline's choice: a typical bell-hole around a main). */
    public static final double DEFAULT_PIT_RADIUS_M = 2.0;

    /** One phase's card. {@code site} is null when the phase touches no pipe. */
    public record Card(int phase, String name, String siteDescription, List<String> siteMains, IncidentResponse.Result site,
                       List<OverpressureShutoff.Result> overpressure, String caution) {
        public Card {
            siteMains = List.copyOf(siteMains);
            overpressure = List.copyOf(overpressure);
        }
    }

    private EmergencyCards() {}

    public static List<Card> build(PlanStates ps, ValveDoubt.Settings options, ResponseSettings settings, double pitRadiusM) {
        List<Card> cards = new ArrayList<>();
        List<Phase> phases = ps.plan().phases();
        for (int p = 0; p < phases.size(); p++) {
            NetworkState state = ps.afterPhase(p);
            ValveSegments segs = ValveSegments.build(state);
            List<WorkPoint> points = new ArrayList<>();
            Set<String> mains = new LinkedHashSet<>();
            Set<String> systems = new TreeSet<>();
            for (StepState st : ps.steps()) {
                if (st.step().phase() != p) continue;
                points.addAll(st.workPoints());
                touched(state.network(), st.step().action(), mains, systems);
            }
            for (String m : mains) {
                String sys = mainSystem(state, m);
                if (sys != null) systems.add(sys);
            }
            Zone zone = null;
            String where;
            if (!points.isEmpty()) {
                double r = state.network().crs().unit().fromMetres(pitRadiusM);
                BitSet z = new BitSet();
                List<String> names = new ArrayList<>();
                for (WorkPoint wp : points) {
                    z.or(ZoneSegments.of(new Zone.InPolygon(circle(wp.x(), wp.y(), r)), segs));
                    names.add(String.format(java.util.Locale.ROOT, "%s on %s at (%.1f, %.1f)", wp.kind(), wp.mainId(), wp.x(), wp.y()));
                }
                where = String.join("; ", names);
                if (z.isEmpty()) where += " (no active pipe within " + pitRadiusM + " m in this state: nothing to isolate)";
                else zone = new Zone.OfSegments(z.stream().toArray());
            } else if (!mains.isEmpty()) {
                zone = new Zone.OfMains(List.copyOf(mains));
                where = "mains " + String.join(", ", mains);
            } else {
                where = "no pipe work in this phase";
            }
            IncidentResponse.Result site = zone == null ? null : IncidentResponse.leak(segs, options, zone, settings);
            List<OverpressureShutoff.Result> ops = new ArrayList<>();
            for (String sys : systems) ops.add(OverpressureShutoff.of(segs, options, sys, settings));
            cards.add(new Card(p, phases.get(p).name(), where, List.copyOf(mains), site, ops, Caution.TEXT));
        }
        return cards;
    }

    private static void touched(Network net, StepAction a, Set<String> mains, Set<String> systems) {
        if (a instanceof StepAction.CutMain c) mains.add(c.main());
        else if (a instanceof StepAction.TieIn t) {
            mains.add(t.main());
            mains.add(t.to());
        } else if (a instanceof StepAction.ActivateMain m) mains.add(m.main());
        else if (a instanceof StepAction.AbandonMain m) mains.add(m.main());
        else if (a instanceof StepAction.TransferServices t) {
            mains.add(t.from());
            mains.add(t.to());
        } else if (a instanceof StepAction.MoveTap t) {
            mains.add(t.main());
            for (SenseTap tap : net.taps()) if (tap.id().equals(t.tap())) stationOut(net, tap.stationId(), systems);
        } else if (a instanceof StepAction.StationOut s) stationOut(net, s.station(), systems);
        else if (a instanceof StepAction.StationIn s) stationOut(net, s.station(), systems);
        else if (a instanceof StepAction.CloseValves c) valveSystems(net, c.valves(), systems);
        else if (a instanceof StepAction.OpenValves o) valveSystems(net, o.valves(), systems);
    }

    private static void stationOut(Network net, String stationId, Set<String> systems) {
        for (Station s : net.stations()) if (s.id().equals(stationId) && s.outSys() != null) systems.add(s.outSys());
    }

    private static void valveSystems(Network net, List<String> ids, Set<String> systems) {
        for (Valve v : net.valves()) if (ids.contains(v.id()) && v.systemId() != null && !v.systemId().isBlank()) systems.add(v.systemId());
    }

    private static String mainSystem(NetworkState s, String mainId) {
        for (int m = 0; m < s.mainCount(); m++) {
            if (Objects.equals(s.mainId(m), mainId)) return s.graph().systemId(s.mainSystem(m));
        }
        return null;
    }

    private static Polygon circle(double x, double y, double r) {
        GeometryFactory gf = new GeometryFactory();
        return (Polygon) gf.createPoint(new Coordinate(x, y)).buffer(r, 8);
    }
}
