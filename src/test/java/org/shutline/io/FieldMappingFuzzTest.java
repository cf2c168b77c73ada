package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;

import com.code_intelligence.jazzer.junit.DictionaryEntries;
import com.code_intelligence.jazzer.junit.FuzzTest;
import java.nio.file.Path;
import org.shutline.fuzz.Bounded;
import org.shutline.fuzz.TempInput;
import org.shutline.model.Tolerances;

/**
 * Fuzzes the mapping file reader ({@link FieldMapping#load}: size, text and line limits of
 * {@link SmallTextFile}, the YAML, then the keys of docs/mapping.md). The documented
 * refusal is {@link InputException} naming the file; any other exception, a message
 * without the file name, or an input past {@link Bounded#LIMIT_SECONDS} is a finding.
 * Tolerances it accepts are finite and not negative (they are distances in metres).
 * Seeds: {@code FieldMappingFuzzTestInputs/mapping} (the example of docs/mapping.md and
 * edge cases).
 */
class FieldMappingFuzzTest {
    private static final TempInput FILE = new TempInput("fuzz-mapping.yaml");

    @FuzzTest(maxDuration = "2m")
    @DictionaryEntries({"layers:", "tolerances:", "name: ", "fields: ", "values: ", "mains", "valves", "stations",
        "sense_taps", "services", "sources", "snap_m: ", "point_m: ", "service_m: ", "main_id", "status", "active",
        ".inf", ".nan", "&a ", "*a", "{", "[", "\\x0A  "})
    void mapping(byte[] data) {
        Path file = FILE.with(data);
        Throwable t = Bounded.run(() -> {
            FieldMapping m = FieldMapping.load(file);
            Tolerances tol = m.tolerances();
            if (tol != null) {
                for (double d : new double[] {tol.snapM(), tol.pointM(), tol.serviceM()}) {
                    assertThat(Double.isFinite(d) && d >= 0).as("tolerance " + d).isTrue();
                }
            }
        }, InputException.class);
        if (t != null) assertThat(t.getMessage()).contains("fuzz-mapping.yaml");
    }
}
