package org.shutline.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.model.Finding;
import org.shutline.analysis.hazard.HazardCheck;
import org.shutline.analysis.hazard.HazardChecks;
import org.shutline.analysis.hazard.StepContext;
import org.shutline.model.Operability;
import org.shutline.model.PressureUnit;
import org.shutline.model.SenseTap;
import org.shutline.model.Severity;
import org.shutline.model.TapDevice;
import org.shutline.model.Progress;
import org.shutline.topology.Topology;

/**
 * Each hazard rule on the network of {@link PlanNet}, with the step where it must fire
 * and the step before it where it must not.
 */
class HazardRulesTest {
    static final LocalDate AS_OF = LocalDate.of(2026, 12, 1);
    static final List<SenseTap> TAP_ON_A = List.of(PlanNet.tap("T-1", "RS-1", TapDevice.WORKER, 100, 60),
            PlanNet.tap("T-2", "RS-2", TapDevice.WORKER, 400, 60));

    static PlanEvaluation.Result run(Topology t, String steps) throws PlanException {
        return run(t, steps, PressureUnit.KPA);
    }

    static PlanEvaluation.Result run(Topology t, String steps, PressureUnit unit) throws PlanException {
        String yaml = "project: test\nphases:\n  - name: one\n    start: 2027-05-03T07:00\n    end: 2027-05-03T17:00\n    steps:\n" + steps;
        Plan p = PlanReader.parse(yaml, "t.yaml");
        PlanStates ps = PlanApplier.apply(p, t, "t.yaml");
        return PlanEvaluation.evaluate(ps, HazardChecks.discover(), new StepContext.Settings(AS_OF, java.time.Period.ofMonths(15), unit),
                12.0, Progress.NONE);
    }

    static List<Finding> at(PlanEvaluation.Result r, int step, String code) {
        return r.steps().get(step - 1).hazards().stream().filter(h -> h.code().equals(code)).toList();
    }

    @Test
    void allRulesAreDiscoveredThroughServiceLoader() {
        assertThat(HazardChecks.discover()).extracting(HazardCheck::code).contains("tap-on-dead-main", "sensing-common-mode",
                "no-secondary-protection", "systems-joined", "district-feed", "work-zone", "critical-customer-off");
    }

    @Test
    void tapCutAwayFromItsStationOutletIsCritical() throws PlanException {
        // RS-1's tap on LP-C: its path from RS-1's outlet runs LP-A, LP-B, V-1, V-2. LP-C stays live from RS-2,
        // but closing V-1 cuts the tap away from RS-1: RS-1 no longer senses its own outlet.
        Topology t = PlanNet.build(List.of(PlanNet.tap("T-1", "RS-1", TapDevice.WORKER, 350, 0)));
        PlanEvaluation.Result r = run(t, "      - open: V-2\n      - close: V-1\n");
        assertThat(at(r, 1, "tap-on-dead-main")).isEmpty();
        assertThat(at(r, 2, "tap-on-dead-main")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.CRITICAL);
            assertThat(h.features()).containsExactly("RS-1", "T-1");
            assertThat(h.message()).contains("step 2").contains("cut away").contains("RS-1").contains("T-1");
            assertThat(h.action()).contains("Move sensing tap T-1").contains("staff station RS-1").contains("outlet pressure");
        });
        assertThat(r.hasCritical()).isTrue();
    }

    @Test
    void tapOnAbandonedMainFiresAtTheAbandonmentAndMovingItFirstPasses() throws PlanException {
        Topology t = PlanNet.build(List.of(PlanNet.tap("T-1", "RS-1", TapDevice.WORKER, 350, 0)));
        PlanEvaluation.Result bad = run(t, "      - transfer: { from: LP-C, to: LP-B }\n      - abandon: LP-C\n");
        assertThat(at(bad, 1, "tap-on-dead-main")).isEmpty();
        assertThat(at(bad, 2, "tap-on-dead-main")).singleElement()
                .satisfies(h -> assertThat(h.message()).contains("abandoned").contains("over-pressure"));
        PlanEvaluation.Result good = run(t,
                "      - move_tap: { tap: T-1, to: LP-A, at: [100, 50] }\n      - transfer: { from: LP-C, to: LP-B }\n      - abandon: LP-C\n");
        assertThat(good.steps()).allSatisfy(s -> assertThat(s.hazards()).noneMatch(h -> h.code().equals("tap-on-dead-main")));
        // the transferred service S-3 stays on gas throughout
        assertThat(good.steps().get(2).servicesOff()).isZero();
    }

    @Test
    void tapMessagesUseTheChosenPressureUnit() throws PlanException {
        Topology t = PlanNet.build(List.of(PlanNet.tap("T-1", "RS-1", TapDevice.WORKER, 350, 0)));
        PlanEvaluation.Result r = run(t, "      - close: V-1\n", PressureUnit.IN_WC);
        // 1.74 kPa = 7.0 in w.c. (NIST SP 811 factor 249.0889 Pa per in w.c.); the 400 kPa inlet (58.02 psig, above
        // 1 psig) is given in psig only: inches of water column are a low-pressure unit (1605.9 in w.c. is not shown)
        assertThat(at(r, 1, "tap-on-dead-main").get(0).message()).contains("7.0 in w.c.").contains("58.02 psig")
                .doesNotContain("1605.9");
        PlanEvaluation.Result psi = run(t, "      - close: V-1\n", PressureUnit.PSI);
        // 400 kPa / 6.894757 = 58.02 psi
        assertThat(at(psi, 1, "tap-on-dead-main").get(0).message()).contains("58.02 psi");
    }

    @Test
    void workerAndMonitorOnOneSegmentIsCommonMode() throws PlanException {
        // T-1 worker on LP-A, T-2 monitor on LP-B between V-1 and V-2: separate segments. Moving T-2 to LP-A joins them.
        Topology t = PlanNet.build(List.of(PlanNet.tap("T-1", "RS-1", TapDevice.WORKER, 100, 60),
                PlanNet.tap("T-2", "RS-1", TapDevice.MONITOR, 200, 0)));
        PlanEvaluation.Result r = run(t, "      - open: V-1\n      - move_tap: { tap: T-2, to: LP-A, at: [100, 30] }\n");
        assertThat(r.recordedHazards()).noneMatch(h -> h.code().equals("sensing-common-mode"));
        assertThat(at(r, 1, "sensing-common-mode")).isEmpty();
        assertThat(at(r, 2, "sensing-common-mode")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.WARNING);
            assertThat(h.features()).contains("RS-1", "T-1", "T-2");
        });
    }

    @Test
    void stationWithoutMonitorOrReliefIsRecordedOnce() throws PlanException {
        // RS-2 has a monitor: nothing. RS-1 has only a relief whose capacity is not recorded (relief_full empty):
        // a relief limits an over-pressure only when full-capacity (49 CFR 192.201(a)), so it warns, once, as recorded.
        PlanEvaluation.Result r = run(PlanNet.build(TAP_ON_A), "      - open: V-1\n");
        assertThat(r.recordedHazards()).filteredOn(h -> h.code().equals("no-secondary-protection")).singleElement()
                .satisfies(h -> {
                    assertThat(h.features()).containsExactly("RS-1");
                    assertThat(h.severity()).isEqualTo(Severity.WARNING);
                    assertThat(h.message()).contains("unrecorded capacity");
                });
        assertThat(at(r, 1, "no-secondary-protection")).isEmpty();
        assertThat(new org.shutline.analysis.hazard.SecondaryProtectionCheck().description()).isNotBlank();
    }

    @Test
    void bypassBetweenTwoSystemsJoinsThem() throws PlanException {
        PlanEvaluation.Result r = run(PlanNet.build(TAP_ON_A),
                "      - open: V-1\n      - bypass_install: { id: BP-9, from: [50, 100], to: [100, 20], valves: [BPV-9] }\n      - close: BPV-9\n");
        assertThat(at(r, 1, "systems-joined")).isEmpty();
        assertThat(at(r, 2, "systems-joined")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.CRITICAL);
            assertThat(h.features()).contains("BP-9");
            assertThat(h.message()).contains("IP").contains("LP");
        });
        // closing the bypass valve parts them again: nothing new, and the join is no longer active
        assertThat(r.steps().get(2).continuing()).noneMatch(h -> h.code().equals("systems-joined"));
    }

    @Test
    void districtLeftWithOneStationThenNone() throws PlanException {
        PlanEvaluation.Result r = run(PlanNet.build(TAP_ON_A),
                "      - open: V-1\n      - station_out: RS-2\n      - station_out: RS-1\n");
        assertThat(at(r, 1, "district-feed")).isEmpty();
        assertThat(at(r, 2, "district-feed")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.WARNING);
            assertThat(h.features()).containsExactly("LP", "RS-1");
        });
        assertThat(at(r, 3, "district-feed")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.CRITICAL);
            assertThat(h.message()).contains("purged and relit");
        });
        assertThat(r.steps().get(1).districtFeeds().get("LP")).containsExactly("RS-1");
        assertThat(r.steps().get(2).servicesOff()).isEqualTo(4);
    }

    @Test
    void cutOfLiveMainIsCriticalAndIsolatedCutPasses() throws PlanException {
        PlanEvaluation.Result live = run(PlanNet.build(TAP_ON_A), "      - open: V-1\n      - cut: { main: LP-B, at: [200, 0] }\n");
        assertThat(at(live, 1, "work-zone")).isEmpty();
        assertThat(at(live, 2, "work-zone")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.CRITICAL);
            assertThat(h.message()).contains("still live");
        });
        PlanEvaluation.Result dead = run(PlanNet.build(TAP_ON_A),
                "      - close: [V-1, V-2]\n      - cut: { main: LP-B, at: [200, 0] }\n");
        assertThat(at(dead, 2, "work-zone")).isEmpty();
        // closing V-1 and V-2 puts S-1 and the clinic S-2 off: 2 services, 3 meters
        assertThat(dead.steps().get(0).servicesOff()).isEqualTo(2);
        assertThat(dead.steps().get(0).metersOff()).isEqualTo(3);
    }

    @Test
    void isolationThroughUnknownOrInoperableValveIsFlagged() throws PlanException {
        PlanEvaluation.Result unknown = run(PlanNet.build(Operability.UNKNOWN, TAP_ON_A),
                "      - close: [V-1, V-2]\n      - cut: { main: LP-B, at: [200, 0] }\n");
        assertThat(at(unknown, 2, "work-zone")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.WARNING);
            assertThat(h.features()).containsExactly("LP-B", "V-2");
            assertThat(h.message()).contains("operability unknown");
        });
        PlanEvaluation.Result no = run(PlanNet.build(Operability.NO, TAP_ON_A),
                "      - close: [V-1, V-2]\n      - cut: { main: LP-B, at: [200, 0] }\n");
        assertThat(at(no, 2, "work-zone")).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.ERROR);
            assertThat(h.message()).contains("inoperable");
        });
    }

    @Test
    void overdueValveUsesThe15MonthIntervalOf49Cfr192747() throws PlanException {
        // 49 CFR 192.747: valves checked at intervals not exceeding 15 months. V-1/V-2 checked 2026-06-01.
        Topology t = PlanNet.build(TAP_ON_A);
        String steps = "      - close: [V-1, V-2]\n      - cut: { main: LP-B, at: [200, 0] }\n";
        Plan p = PlanReader.parse("project: t\nphases:\n  - name: a\n    steps:\n" + steps, "t.yaml");
        PlanStates ps = PlanApplier.apply(p, t, "t.yaml");
        // 2027-09-01 is 15 months after: not yet past; 2027-09-02 is past
        PlanEvaluation.Result onTime = PlanEvaluation.evaluate(ps, HazardChecks.discover(),
                StepContext.Settings.defaults(LocalDate.of(2027, 9, 1)), 12, Progress.NONE);
        assertThat(at(onTime, 2, "work-zone")).isEmpty();
        PlanEvaluation.Result late = PlanEvaluation.evaluate(ps, HazardChecks.discover(),
                StepContext.Settings.defaults(LocalDate.of(2027, 9, 2)), 12, Progress.NONE);
        assertThat(at(late, 2, "work-zone")).hasSize(2).allSatisfy(h -> assertThat(h.message()).contains("15 months").contains("192.747"));
    }

    @Test
    void criticalCustomerOffIsRaisedWhenItGoesOff() throws PlanException {
        PlanEvaluation.Result r = run(PlanNet.build(TAP_ON_A), "      - close: V-1\n      - close: V-2\n");
        assertThat(at(r, 1, "critical-customer-off")).isEmpty();
        assertThat(at(r, 2, "critical-customer-off")).singleElement().satisfies(h -> {
            assertThat(h.features()).containsExactly("S-2");
            assertThat(h.message()).contains("clinic").contains("2 Tansy Walk");
        });
        assertThat(r.steps().get(1).criticalOff()).extracting(PlanEvaluation.CriticalOff::serviceId).containsExactly("S-2");
        assertThat(r.steps().get(1).wentOff()).containsExactly("S-1", "S-2");
    }
}
