package org.shutline.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.Period;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.analysis.hazard.HazardChecks;
import org.shutline.analysis.hazard.StepContext;
import org.shutline.io.FieldMapping;
import org.shutline.io.NetworkReader;
import org.shutline.model.PressureUnit;
import org.shutline.model.Progress;
import org.shutline.model.Severity;
import org.shutline.model.Tolerances;
import org.shutline.topology.NetworkBuilder;
import org.shutline.topology.Topology;

/** The two sample plans on the sample town (sample-gis/). */
class SamplePlanTest {
    static Topology town;

    @BeforeAll
    static void load() throws Exception {
        town = NetworkBuilder.build(NetworkReader.read(Path.of("sample-gis/tallowmere.gpkg"), FieldMapping.DEFAULT), Tolerances.DEFAULT);
    }

    static PlanEvaluation.Result evaluate(String file) throws Exception {
        Plan p = PlanReader.read(Path.of("sample-gis", file));
        PlanStates ps = PlanApplier.apply(p, town, file);
        return PlanEvaluation.evaluate(ps, HazardChecks.discover(),
                new StepContext.Settings(LocalDate.of(2026, 12, 1), Period.ofMonths(15), PressureUnit.IN_WC), 12, Progress.NONE);
    }

    @Test
    void tapHazardFiresExactlyAtTheBypassRemoval() throws Exception {
        PlanEvaluation.Result r = evaluate("tallowmere-plan.yaml");
        assertThat(r.steps()).hasSize(14);
        int removal = 11;
        assertThat(r.steps().get(removal - 1).step().action()).isInstanceOf(StepAction.RemoveBypass.class);
        for (PlanEvaluation.StepResult s : r.steps()) {
            boolean fires = s.hazards().stream().anyMatch(h -> h.code().equals("tap-on-dead-main"));
            assertThat(fires).as("tap hazard at step " + s.step().number()).isEqualTo(s.step().number() == removal);
        }
        assertThat(r.steps().get(removal - 1).hazards()).singleElement().satisfies(h -> {
            assertThat(h.severity()).isEqualTo(Severity.CRITICAL);
            assertThat(h.features()).containsExactly("ST-S1", "T-S1-W");
            assertThat(h.message()).contains("M-CI-01").contains("in w.c.");
        });
        // still present (continuing) through the cuts and the abandonment
        assertThat(r.steps().get(13).continuing()).anyMatch(h -> h.code().equals("tap-on-dead-main"));
        assertThat(r.hasCritical()).isTrue();
    }

    @Test
    void correctedPlanRaisesNoHazardAndKeepsTheCareHomeOnGas() throws Exception {
        PlanEvaluation.Result r = evaluate("tallowmere-plan-corrected.yaml");
        assertThat(r.steps()).hasSize(16);
        // step 8 attends ST-S1 through step 9, the tap move: the move-tap hazard (critical: ST-S1 has no monitor
        // and no relief) is listed at step 9 and marked mitigated; the transfer at step 12 interrupts 6 services.
        // Nothing else is raised.
        assertThat(r.steps().get(7).step().action()).isInstanceOf(StepAction.Attend.class);
        assertThat(r.steps().get(8).hazards()).singleElement().satisfies(h -> {
            assertThat(h.code()).isEqualTo("move-tap");
            assertThat(h.severity()).isEqualTo(Severity.CRITICAL);
            assertThat(h.mitigatedBy()).contains("ST-S1").contains("attend step 8");
        });
        assertThat(r.steps().get(11).hazards()).extracting(h -> h.code()).containsExactly("service-transfer");
        for (PlanEvaluation.StepResult s : r.steps()) {
            if (s.step().number() != 9 && s.step().number() != 12) assertThat(s.hazards()).as("step " + s.step().number()).isEmpty();
        }
        assertThat(r.hasCritical()).isFalse();
        assertThat(r.steps()).allSatisfy(s -> assertThat(s.criticalOff()).isEmpty());
        // at the end every customer of the old main is on the new one and on gas
        assertThat(r.steps().get(15).servicesOff()).isZero();
        // the tie-ins were made on isolated pipe: the junction isolation puts only what lies between the valves off
        assertThat(r.steps().get(1).servicesOff()).isLessThanOrEqualTo(2);
        assertThat(r.steps().get(0).suggestion().order()).containsExactlyInAnyOrder("V-TAN-N", "V-TAN-S", "V-ELD-W", "V-CI-W");
        List<String> recorded = r.recordedHazards().stream().map(h -> h.code()).toList();
        assertThat(recorded).contains("no-secondary-protection", "sensing-common-mode");
    }
}
