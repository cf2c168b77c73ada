package org.shutline.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shutline.model.PressureUnit;
import org.shutline.plan.Phase;
import org.shutline.plan.Plan;
import org.shutline.plan.Step;
import org.shutline.plan.StepAction;

/** Editing a plan in the window: add, remove, move within and across phases, renumbering. */
class PlanDraftTest {
    private static Step step(int n, int phase, String valve) {
        return new Step(n, phase, new StepAction.CloseValves(List.of(valve), true), null, null, 0);
    }

    private static Plan twoPhases() {
        return new Plan("p", null, PressureUnit.KPA, List.of(
                new Phase("one", null, null, List.of(step(1, 0, "A"), step(2, 0, "B")), 0),
                new Phase("two", null, null, List.of(step(3, 1, "C")), 0)));
    }

    private static List<String> order(PlanDraft d) {
        return d.plan().steps().stream().map(s -> s.phase() + ":" + s.number() + ":" + s.describe()).toList();
    }

    @Test
    void addInsertsAfterTheSelectedStepInItsPhase() {
        PlanDraft d = new PlanDraft(twoPhases());
        int at = d.add(0, new StepAction.AbandonMain("M-1"));
        assertThat(at).isEqualTo(1);
        assertThat(order(d)).containsExactly("0:1:close A", "0:2:abandon M-1", "0:3:close B", "1:4:close C");
    }

    @Test
    void movingAcrossAPhaseBoundaryChangesThePhase() {
        PlanDraft d = new PlanDraft(twoPhases());
        assertThat(d.moveDown(1)).isEqualTo(1);                  // B: last of phase one -> first of phase two
        assertThat(order(d)).containsExactly("0:1:close A", "1:2:close B", "1:3:close C");
        assertThat(d.moveDown(1)).isEqualTo(2);                  // B below C within phase two
        assertThat(order(d)).containsExactly("0:1:close A", "1:2:close C", "1:3:close B");
        assertThat(d.moveDown(2)).isEqualTo(2);                  // last step of the last phase stays
        assertThat(d.moveUp(1)).isEqualTo(1);                    // C: first of phase two -> end of phase one
        assertThat(order(d)).containsExactly("0:1:close A", "0:2:close C", "1:3:close B");
        assertThat(d.moveUp(0)).isEqualTo(0);                    // first step stays
    }

    @Test
    void removeAndEmptyPlan() {
        PlanDraft d = new PlanDraft(twoPhases());
        d.remove(0);
        assertThat(order(d)).containsExactly("0:1:close B", "1:2:close C");
        PlanDraft e = PlanDraft.empty("new", "net.gpkg");
        assertThat(e.size()).isZero();
        e.add(-1, new StepAction.StationOut("ST-1"));
        assertThat(order(e)).containsExactly("0:1:take station ST-1 out of service");
        assertThat(e.plan().phases()).hasSize(1);
    }
}
