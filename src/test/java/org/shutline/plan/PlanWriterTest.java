package org.shutline.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.model.PressureUnit;

/** PlanWriter output read back by PlanReader gives the same plan (all step kinds, quoting, numbers). */
class PlanWriterTest {
    private static final String EXAMPLE = """
            project: Birch Lane cast-iron renewal
            network: maple-hollow.gpkg
            pressure_unit: in_wc
            phases:
              - name: 1 Bypass and tie-in
                start: 2027-05-03T07:00
                end: 2027-05-03T17:00
                steps:
                  - bypass_install: { id: BP-1, from: [1210.0, 840.0], to: [1490.0, 840.0], valves: [BPV-1] }
                    note: temporary 2 in PE bypass along the verge
                    duration: 2h
                  - tie_in: { main: M-NEW-1, to: M-210, at: [1210.0, 845.0] }
                  - activate: M-NEW-1
              - name: 2 Transfer services
                start: 2027-05-04T07:00
                end: 2027-05-05T17:00
                steps:
                  - transfer: { from: M-211, to: M-NEW-1, services: all }
                    duration: 12h
                  - transfer: { from: M-212, to: M-NEW-1, services: [S-1, S-2] }
                  - move_tap: { tap: TAP-3, to: M-NEW-1 }
                  - move_tap: { tap: TAP-4, to: M-NEW-1, at: [0.1, -3.25e-3] }
              - name: 3 Abandon the old main
                steps:
                  - close: [V-21, V-22]
                    ordered: false
                  - cut: { main: M-211, at: [1300.0, 840.0] }
                  - abandon: M-211
                  - close: BPV-1
                    duration: 1h30m
                  - open: [V-21]
                  - bypass_remove: BP-1
                  - station_out: ST-1
                  - station_in: ST-1
                    note: "watch: outlet \\"pressure\\" # not a comment"
            """;

    @Test
    void theFormatExampleRoundTrips() throws Exception {
        Plan p = PlanReader.parse(EXAMPLE, "example.yaml");
        String text = PlanWriter.format(p);
        Plan back = PlanReader.parse(text, "written.yaml");
        assertSamePlan(back, p);
        // writing the read-back plan again gives the same text: the form is stable
        assertThat(PlanWriter.format(back)).isEqualTo(text);
        assertThat(back.pressureUnit()).isEqualTo(PressureUnit.IN_WC);
        assertThat(back.steps().get(14).note()).isEqualTo("watch: outlet \"pressure\" # not a comment");
        assertThat(back.steps().get(10).duration()).isEqualTo(Duration.ofMinutes(90));
        assertThat(((StepAction.CloseValves) back.steps().get(7).action()).ordered()).isFalse();
    }

    @Test
    void writesAtomicallyAndReadsBackFromTheFile(@TempDir Path dir) throws Exception {
        Plan p = PlanReader.parse(EXAMPLE, "example.yaml");
        Path f = dir.resolve("plan.yaml");
        Files.writeString(f, "old content");
        PlanWriter.write(p, f);
        assertSamePlan(PlanReader.read(f), p);
        try (var files = Files.list(dir)) {
            assertThat(files.map(x -> x.getFileName().toString())).containsExactly("plan.yaml");
        }
    }

    @Test
    void randomTextsAndNumbersRoundTrip() throws Exception {
        long seed = 20261201L;
        Random r = new Random(seed);
        String alphabet = "abcXYZ019 -_:#'\"\\{}[],&*!|>%@`\t";
        for (int round = 0; round < 200; round++) {
            StringBuilder name = new StringBuilder();
            int n = 1 + r.nextInt(12);
            for (int i = 0; i < n; i++) name.append(alphabet.charAt(r.nextInt(alphabet.length())));
            String text = name.toString().strip();
            if (text.isEmpty()) text = "x";
            double x = (r.nextDouble() - 0.5) * Math.pow(10, r.nextInt(14) - 4);
            double y = r.nextDouble() * 1e7;
            List<Step> steps = new ArrayList<>();
            steps.add(new Step(1, 0, new StepAction.CutMain("M-" + round, new XY(x, y)), text, Duration.ofMinutes(r.nextInt(5000)), 0));
            steps.add(new Step(2, 0, new StepAction.CloseValves(List.of("V-" + round, text), r.nextBoolean()), null, null, 0));
            Plan p = new Plan(text, null, PressureUnit.KPA, List.of(new Phase(text, LocalDateTime.of(2027, 1, 2, 3, 4), null, steps, 0)));
            String yaml = PlanWriter.format(p);
            Plan back = PlanReader.parse(yaml, "random.yaml");
            assertThat(back.project()).as("seed %d round %d:%n%s", seed, round, yaml).isEqualTo(text);
            assertSamePlan(back, p);
        }
    }

    private static void assertSamePlan(Plan actual, Plan expected) {
        assertThat(actual.project()).isEqualTo(expected.project());
        assertThat(actual.network()).isEqualTo(expected.network());
        assertThat(actual.pressureUnit()).isEqualTo(expected.pressureUnit());
        assertThat(actual.phases()).hasSameSizeAs(expected.phases());
        for (int i = 0; i < expected.phases().size(); i++) {
            Phase a = actual.phases().get(i);
            Phase e = expected.phases().get(i);
            assertThat(a.name()).isEqualTo(e.name());
            assertThat(a.start()).isEqualTo(e.start());
            assertThat(a.end()).isEqualTo(e.end());
            assertThat(a.steps()).hasSameSizeAs(e.steps());
            for (int j = 0; j < e.steps().size(); j++) {
                Step as = a.steps().get(j);
                Step es = e.steps().get(j);
                assertThat(as.action()).isEqualTo(es.action());
                assertThat(as.note()).isEqualTo(es.note());
                assertThat(as.duration()).isEqualTo(es.duration() == null ? null : Duration.ofMinutes(es.duration().toMinutes()));
                assertThat(as.phase()).isEqualTo(i);
            }
        }
    }
}
