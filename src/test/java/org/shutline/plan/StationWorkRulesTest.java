package org.shutline.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.shutline.plan.HazardRulesTest.at;
import static org.shutline.plan.HazardRulesTest.run;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.model.Operability;
import org.shutline.model.Severity;
import org.shutline.model.TapDevice;
import org.shutline.topology.Topology;

/**
 * The move-tap and service-transfer rules and the attend step, on {@link PlanNet}: each at
 * the step where it must fire and the step before, where it must not.
 */
class StationWorkRulesTest {
    static final String MOVE_T1 = "      - move_tap: { tap: T-1, to: LP-A, at: [100, 30] }\n";

    @Test
    void movingTheOnlyTapOfAStationWithoutMonitorOrFullReliefIsCritical() throws PlanException {
        // 49 CFR 192.195-201 and the 2019 safety-board recommendation (single-failure-proof protection):
        // RS-1 has no monitor and a relief of unrecorded capacity, so nothing limits the outlet while T-1 is off.
        Topology t = PlanNet.build(HazardRulesTest.TAP_ON_A);
        PlanEvaluation.Result r = run(t, "      - open: V-1\n" + MOVE_T1);
        assertThat(at(r, 1, "move-tap")).isEmpty();
        assertThat(at(r, 2, "move-tap")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.CRITICAL);
            assertThat(h.features()).containsExactly("RS-1", "T-1");
            // failed open: IP maximum 400 kPa = 400 / 6.894757 = 58.02 psig; LP (MAOP 1.74 kPa, at or below
            // 14 in w.c.) is low-pressure: 192.201(a)(1) limit 0.5 psig = 13.8 in w.c. (common practice setting)
            assertThat(h.message()).contains("58.02 psig").contains("192.201(a)(1)").contains("13.8 in w.c.")
                    .contains("limit is exceeded").contains("unrecorded");
            assertThat(h.action()).contains("qualified person").contains("out of service").contains("192.195-201");
        });
        assertThat(r.hasCritical()).isTrue();
    }

    @Test
    void fullCapacityReliefOrAnIndependentMonitorMakesItAWarning() throws PlanException {
        // relief_full = yes on RS-1: the relief limits the over-pressure (192.201(a)), a warning remains
        Topology full = PlanNet.build(Operability.YES, HazardRulesTest.TAP_ON_A, true);
        assertThat(at(run(full, "      - open: V-1\n" + MOVE_T1), 2, "move-tap")).singleElement()
                .satisfies(h -> assertThat(h.severity()).isEqualTo(Severity.WARNING));
        // a relief recorded as token capacity does not count: still critical
        Topology token = PlanNet.build(Operability.YES, HazardRulesTest.TAP_ON_A, false);
        assertThat(at(run(token, "      - open: V-1\n" + MOVE_T1), 2, "move-tap")).singleElement()
                .satisfies(h -> assertThat(h.message()).contains("token"))
                .satisfies(h -> assertThat(h.severity()).isEqualTo(Severity.CRITICAL));
        // RS-2 (monitor 2.5 kPa) with its monitor at its own tap T-3 on LP-C: moving the worker tap T-2 warns
        Topology mon = PlanNet.build(List.of(PlanNet.tap("T-2", "RS-2", TapDevice.WORKER, 400, 60),
                PlanNet.tap("T-3", "RS-2", TapDevice.MONITOR, 350, 0)));
        PlanEvaluation.Result r = run(mon, "      - open: V-1\n      - move_tap: { tap: T-2, to: LP-D, at: [400, 30] }\n");
        assertThat(at(r, 2, "move-tap")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.WARNING);
            assertThat(h.message()).contains("monitor still senses at tap T-3");
        });
        // moving the monitor's own tap leaves no independent monitor: critical
        PlanEvaluation.Result m = run(mon, "      - open: V-1\n      - move_tap: { tap: T-3, to: LP-B, at: [280, 0] }\n");
        assertThat(at(m, 2, "move-tap")).singleElement().satisfies(h -> assertThat(h.severity()).isEqualTo(Severity.CRITICAL));
    }

    @Test
    void stationOutOfServiceRaisesNothing() throws PlanException {
        Topology t = PlanNet.build(HazardRulesTest.TAP_ON_A);
        PlanEvaluation.Result r = run(t, "      - station_out: RS-1\n" + MOVE_T1);
        assertThat(at(r, 2, "move-tap")).isEmpty();
    }

    @Test
    void attendingTheStationMitigatesItsHazardsOnlyWhileAttended() throws PlanException {
        Topology t = PlanNet.build(HazardRulesTest.TAP_ON_A);
        PlanEvaluation.Result r = run(t, "      - attend: { station: RS-1, until: 2 }\n" + MOVE_T1);
        assertThat(at(r, 1, "move-tap")).isEmpty();
        assertThat(at(r, 2, "move-tap")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.CRITICAL);
            assertThat(h.mitigatedBy()).contains("RS-1").contains("attend step 1");
        });
        assertThat(r.hasCritical()).isFalse();
        // attendance that ends before the move does not cover it
        PlanEvaluation.Result early = run(t, "      - attend: { station: RS-1, until: 1 }\n" + MOVE_T1);
        assertThat(at(early, 2, "move-tap")).singleElement().satisfies(h -> assertThat(h.mitigated()).isFalse());
        assertThat(early.hasCritical()).isTrue();
    }

    @Test
    void aHazardLeftWhenTheAttendanceEndsIsNewAgain() throws PlanException {
        // T-1 on LP-C: closing V-1 cuts it away from RS-1's outlet (tap-on-dead-main) at step 2, attended;
        // at step 3 the attendance (until 2) has ended and the hazard is raised again, unmitigated.
        Topology t = PlanNet.build(List.of(PlanNet.tap("T-1", "RS-1", TapDevice.WORKER, 350, 0)));
        PlanEvaluation.Result r = run(t, "      - attend: { station: RS-1, until: 2 }\n      - close: V-1\n      - open: V-2\n");
        assertThat(at(r, 1, "tap-on-dead-main")).isEmpty();
        assertThat(at(r, 2, "tap-on-dead-main")).singleElement().satisfies(h -> assertThat(h.mitigated()).isTrue());
        assertThat(r.steps().get(1).hasCritical()).isFalse();
        assertThat(at(r, 3, "tap-on-dead-main")).singleElement().satisfies(h -> assertThat(h.mitigated()).isFalse());
        assertThat(r.steps().get(2).hasCritical()).isTrue();
    }

    @Test
    void attendWithoutUntilLastsToTheEndOfItsPhase() throws PlanException {
        Plan p = PlanReader.parse("project: t\nphases:\n  - name: a\n    steps:\n      - attend: RS-1\n      - open: V-1\n"
                + "  - name: b\n    steps:\n      - open: V-2\n", "t.yaml");
        Attendance a = Attendance.of(p);
        assertThat(a.attendStep(1, "RS-1")).isEqualTo(1);
        assertThat(a.attendStep(2, "RS-1")).isEqualTo(1);
        assertThat(a.attendStep(3, "RS-1")).isZero();
        assertThat(a.attendStep(2, "RS-2")).isZero();
    }

    @Test
    void attendUntilOutsideThePlanIsRefused() throws PlanException {
        Plan p = PlanReader.parse("project: t\nphases:\n  - name: a\n    steps:\n      - open: V-1\n"
                + "      - attend: { station: RS-1, until: 1 }\n", "t.yaml");
        assertThat(PlanValidator.validate(p, PlanNet.build(HazardRulesTest.TAP_ON_A).network(), "t.yaml"))
                .singleElement().satisfies(e -> assertThat(e.getMessage()).contains("until: step 1"));
    }

    @Test
    void transferReportsTheServicesInterruptedAndRelights() throws PlanException {
        // common practice: each moved service is shut off, re-connected, relit. S-3 (3 meters) on LP-C moves to LP-B.
        Topology t = PlanNet.build(HazardRulesTest.TAP_ON_A);
        PlanEvaluation.Result r = run(t, "      - open: V-1\n      - transfer: { from: LP-C, to: LP-B }\n");
        assertThat(at(r, 1, "service-transfer")).isEmpty();
        assertThat(at(r, 2, "service-transfer")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.WARNING);
            assertThat(h.features()).containsExactly("LP-C", "LP-B", "S-3");
            assertThat(h.message()).contains("1 service (3 meters)").contains("is interrupted").contains("3 meters need a relight");
        });
    }

    @Test
    void cutNearASensingLineWarns() throws PlanException {
        // RS-1 at (100,100), tap T-1 at (100,60): no control_lines layer, so the line is assumed straight from
        // (100,100) to (100,60). A cut on LP-A at (100,50) is 10 m from the tap: within the 10 m setting (common
        // practice); with V-1 closed and LP-A fed by RS-1 it is live, but the rule looks at the line only.
        // The step before (close V-1) has no work point: nothing.
        Topology t = PlanNet.build(HazardRulesTest.TAP_ON_A);
        PlanEvaluation.Result r = run(t, "      - close: V-1\n      - cut: { main: LP-A, at: [100, 50] }\n");
        assertThat(at(r, 1, "work-near-sensing-line")).isEmpty();
        assertThat(at(r, 2, "work-near-sensing-line")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.WARNING);
            assertThat(h.features()).containsExactly("RS-1", "T-1", "LP-A");
            assertThat(h.message()).contains("10.0 m").contains("assumed straight");
        });
        // 11 m away (100, 49): beyond the setting, nothing
        PlanEvaluation.Result far = run(t, "      - close: V-1\n      - cut: { main: LP-A, at: [100, 49] }\n");
        assertThat(at(far, 2, "work-near-sensing-line")).isEmpty();
    }
}
