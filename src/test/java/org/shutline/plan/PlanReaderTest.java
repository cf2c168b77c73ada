package org.shutline.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Duration;
import java.time.LocalDateTime;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.shutline.model.CrsInfo;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.PressureUnit;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;

class PlanReaderTest {
    static final String GOOD = """
            project: Birch Lane renewal
            network: town.gpkg
            pressure_unit: in_wc
            phases:
              - name: Bypass
                start: 2027-05-03T07:00
                end: 2027-05-03 17:30
                steps:
                  - bypass_install: { id: BP-1, from: [10, 0], to: [90, 0], valves: [BPV-1] }
                    note: weld on both fittings
                    duration: 1h30m
                  - close: [V-1, V-2]
                    ordered: false
              - name: Renewal
                steps:
                  - cut: { main: M-1, at: [50, 0] }
                  - tie_in: { main: M-9, to: M-1, at: [20, 0] }
                  - activate: M-9
                  - transfer: { from: M-1, to: M-9, services: all }
                  - move_tap: { tap: T-1, to: M-9 }
                  - abandon: M-1
                  - close: BPV-1
                  - bypass_remove: BP-1
                  - station_out: RS-1
                  - station_in: RS-1
                    duration: 45m
            """;

    @Test
    void readsEveryStepKindWithNumbersLinesAndTimes() throws PlanException {
        Plan p = PlanReader.parse(GOOD, "good.yaml");
        assertThat(p.project()).isEqualTo("Birch Lane renewal");
        assertThat(p.pressureUnit()).isEqualTo(PressureUnit.IN_WC);
        assertThat(p.phases()).hasSize(2);
        assertThat(p.phases().get(0).start()).isEqualTo(LocalDateTime.of(2027, 5, 3, 7, 0));
        assertThat(p.phases().get(0).plannedHours()).isEqualTo(10.5);
        List<Step> steps = p.steps();
        assertThat(steps).hasSize(12);
        assertThat(steps).extracting(Step::number).containsExactly(1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12);
        assertThat(steps.get(0).action()).isEqualTo(new StepAction.InstallBypass("BP-1", new XY(10, 0), new XY(90, 0), List.of("BPV-1")));
        assertThat(steps.get(0).duration()).isEqualTo(Duration.ofMinutes(90));
        assertThat(steps.get(0).note()).isEqualTo("weld on both fittings");
        assertThat(steps.get(0).line()).isEqualTo(9);
        assertThat(steps.get(1).action()).isEqualTo(new StepAction.CloseValves(List.of("V-1", "V-2"), false));
        assertThat(steps.get(2).phase()).isEqualTo(1);
        assertThat(steps.get(5).action()).isEqualTo(new StepAction.TransferServices("M-1", "M-9", List.of()));
        assertThat(steps.get(6).action()).isEqualTo(new StepAction.MoveTap("T-1", "M-9", null));
        assertThat(steps.get(11).duration()).isEqualTo(Duration.ofMinutes(45));
        assertThat(steps.get(4).describe()).isEqualTo("activate M-9");
    }

    private static void fails(String yaml, int line, String... words) {
        assertThatThrownBy(() -> PlanReader.parse(yaml, "bad.yaml"))
                .isInstanceOf(PlanException.class)
                .hasMessageStartingWith("bad.yaml:" + line + ":")
                .satisfies(e -> {
                    for (String w : words) assertThat(e.getMessage()).contains(w);
                    assertThat(((PlanException) e).line()).isEqualTo(line);
                });
    }

    @Test
    void unknownTopKeyNamesLine() {
        fails("project: X\nphasez: []\n", 2, "unknown key 'phasez'");
    }

    @Test
    void unknownStepKindNamesLine() {
        fails("project: X\nphases:\n  - name: A\n    steps:\n      - close: V-1\n      - shut: V-2\n", 6, "unknown key 'shut'");
    }

    @Test
    void twoKindsInOneStep() {
        fails("project: X\nphases:\n  - name: A\n    steps:\n      - close: V-1\n        open: V-2\n", 6, "one kind");
    }

    @Test
    void missingFieldOfCut() {
        fails("project: X\nphases:\n  - name: A\n    steps:\n      - cut: { main: M-1 }\n", 5, "missing key 'at'");
    }

    @Test
    void badPointBadDateBadDuration() {
        fails("project: X\nphases:\n  - name: A\n    steps:\n      - cut: { main: M-1, at: [1, two] }\n", 5, "'two' is not a number");
        fails("project: X\nphases:\n  - name: A\n    start: next tuesday\n    steps: []\n", 4, "not a date-time");
        fails("project: X\nphases:\n  - name: A\n    steps:\n      - close: V-1\n        duration: soon\n", 6, "not a duration");
    }

    @Test
    void endBeforeStartAndEmptyAndNotYaml() {
        fails("project: X\nphases:\n  - name: A\n    start: 2027-01-02T08:00\n    end: 2027-01-01T08:00\n    steps: []\n", 5, "ends before it starts");
        fails("", 1, "empty");
        fails("project: X\nphases: [\n", 3, "not valid YAML");
        fails("phases:\n  - name: A\n    steps: []\n", 1, "missing key 'project'");
    }

    @Test
    void unknownFeatureIdsNameTheLineAndStep() throws PlanException {
        GeometryFactory gf = new GeometryFactory();
        Main m1 = new Main("M-1", "LP", MainStatus.ACTIVE, "cast iron", 150.0, 1.7, 1950,
                gf.createLineString(new Coordinate[] {new Coordinate(0, 0), new Coordinate(100, 0)}));
        Valve v1 = new Valve("V-1", "LP", ValveKind.MAIN, NormalPosition.OPEN, Operability.YES, null, gf.createPoint(new Coordinate(5, 0)));
        Network net = new Network("t", CrsInfo.UNKNOWN_METRES, List.of(m1), List.of(v1), List.of(), List.of(), List.of(), List.of(), List.of(), List.of());
        Plan p = PlanReader.parse(GOOD, "good.yaml");
        List<PlanException> errs = PlanValidator.validate(p, net, "good.yaml");
        assertThat(errs).extracting(Throwable::getMessage)
                .anySatisfy(m -> assertThat(m).startsWith("good.yaml:12: step 2 (close): no valve with id 'V-2'"))
                .anySatisfy(m -> assertThat(m).contains("no main with id 'M-9'"))
                .anySatisfy(m -> assertThat(m).contains("no sensing tap with id 'T-1'"))
                .anySatisfy(m -> assertThat(m).contains("no station with id 'RS-1'"))
                .noneSatisfy(m -> assertThat(m).contains("'BPV-1'"));
        String twiceRemoved = "project: X\nphases:\n  - name: A\n    steps:\n      - bypass_remove: BP-9\n";
        assertThat(PlanValidator.validate(PlanReader.parse(twiceRemoved, "b.yaml"), net, "b.yaml"))
                .singleElement().satisfies(e -> assertThat(e.getMessage()).contains("b.yaml:5: step 1").contains("no bypass BP-9"));
    }
}
