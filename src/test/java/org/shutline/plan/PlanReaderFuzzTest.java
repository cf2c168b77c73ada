package org.shutline.plan;

import static org.assertj.core.api.Assertions.assertThat;

import com.code_intelligence.jazzer.junit.DictionaryEntries;
import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.file.Path;
import org.shutline.fuzz.Bounded;
import org.shutline.fuzz.TempInput;

/**
 * Fuzzes the plan reader as a command reads a plan: the bytes are a plan file given to
 * {@link PlanReader#read} (size, text and line limits of {@code io.SmallTextFile}, then
 * the YAML and the plan's keys). The documented refusal is {@link PlanException} naming
 * the file; any other exception, a message without the file name, or an input past
 * {@link org.shutline.fuzz.Bounded#LIMIT_SECONDS} is a finding. A plan it reads has at
 * least one phase (the reader's rule). Seeds: {@code PlanReaderFuzzTestInputs/plan}
 * (the sample town's plans and hand-written edge cases).
 */
class PlanReaderFuzzTest {
    private static final TempInput FILE = new TempInput("fuzz-plan.yaml");

    @FuzzTest(maxDuration = "2m")
    @DictionaryEntries({"project: ", "network: ", "pressure_unit: ", "phases:", "- name: ", "start: ", "end: ", "steps:",
        "close: ", "open: ", "note: ", "duration: ", "ordered: ", "&a ", "*a", "<<: ", "!!", "{", "[", "\\x0A  ", "\\x0A- "})
    void plan(byte[] data) {
        Path file = FILE.with(data);
        Throwable t = Bounded.run(() -> {
            Plan p = PlanReader.read(file);
            assertThat(p.phases()).isNotEmpty();
        }, PlanException.class);
        if (t != null) assertThat(t.getMessage()).contains("fuzz-plan.yaml");
    }
}
