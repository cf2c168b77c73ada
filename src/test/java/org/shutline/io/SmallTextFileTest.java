package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.plan.PlanException;
import org.shutline.plan.PlanReader;

/**
 * Plan and mapping files under limits: a huge file, a huge one-line value, UTF-16, binary
 * and an alias bomb are refused at once with the limit or the reason named, and nothing
 * is changed on disk.
 */
class SmallTextFileTest {
    @TempDir
    Path dir;

    @Test
    void aFileOverTheLimitIsRefusedBeforeItIsRead() throws Exception {
        Path plan = dir.resolve("big-plan.yaml");
        // a 9 MB one-line value: over the 8 MB plan limit
        byte[] value = new byte[9 << 20];
        java.util.Arrays.fill(value, (byte) 'x');
        Files.write(plan, ("project: ").getBytes(StandardCharsets.UTF_8));
        Files.write(plan, value, java.nio.file.StandardOpenOption.APPEND);
        long before = Files.size(plan);
        assertThatThrownBy(() -> PlanReader.read(plan)).isInstanceOf(PlanException.class)
                .hasMessageContaining("big-plan.yaml").hasMessageContaining("plan file too large: 9.0 MB, the limit is 8.0 MB");
        assertThat(Files.size(plan)).isEqualTo(before);
    }

    @Test
    void aLongOneLineValueIsRefusedWithItsLine() throws Exception {
        Path map = dir.resolve("mapping.yaml");
        Files.writeString(map, "layers:\n  mains:\n    name: " + "m".repeat(100_000) + "\n");
        assertThatThrownBy(() -> FieldMapping.load(map)).isInstanceOf(InputException.class)
                .hasMessageContaining("mapping.yaml").hasMessageContaining("mapping file line 3 is longer than 65,536 characters");
    }

    @Test
    void utf16AndBinaryFilesSayWhatTheyAre() throws Exception {
        Path u16 = dir.resolve("plan-utf16.yaml");
        Files.write(u16, "project: x\n".getBytes(StandardCharsets.UTF_16)); // Java writes a big-endian byte order mark
        assertThatThrownBy(() -> PlanReader.read(u16)).hasMessageContaining("plan-utf16.yaml: plan file is UTF-16 text; save it as UTF-8");
        Path bin = dir.resolve("plan.bin");
        Files.write(bin, new byte[] {'p', 0, 1, 2, 3});
        assertThatThrownBy(() -> PlanReader.read(bin)).hasMessageContaining("plan file is not text (a NUL byte at byte 2");
        Path latin1 = dir.resolve("plan-latin1.yaml");
        Files.write(latin1, "project: Caf\u00e9\n".getBytes(StandardCharsets.ISO_8859_1));
        assertThatThrownBy(() -> PlanReader.read(latin1)).hasMessageContaining("plan file is not UTF-8 text");
    }

    @Test
    void anAliasBombIsRefused() throws Exception {
        // the classic "billion laughs" shape: each level refers to the one before ten times
        StringBuilder y = new StringBuilder("a: &a [\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\"]\n");
        for (char c = 'b'; c <= 'j'; c++) {
            char p = (char) (c - 1);
            y.append(c).append(": &").append(c).append(" [");
            for (int i = 0; i < 9; i++) y.append(i == 0 ? "" : ",").append('*').append(p);
            y.append("]\n");
        }
        Path plan = dir.resolve("bomb.yaml");
        Files.writeString(plan, y.toString());
        assertThatThrownBy(() -> PlanReader.read(plan)).isInstanceOf(PlanException.class).hasMessageContaining("not valid YAML")
                .hasMessageContaining("aliases");
    }

    @Test
    void aByteOrderMarkInUtf8IsDropped() throws Exception {
        Path f = dir.resolve("bom.yaml");
        Files.write(f, new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF, 'a', ':', ' ', '1', '\n'});
        assertThat(SmallTextFile.read(f, "plan file", 1000)).isEqualTo("a: 1\n");
    }

    @Test
    void aRepeatedKeyInAPlanIsRefusedWithItsLine() throws Exception {
        Path plan = dir.resolve("twice.yaml");
        Files.writeString(plan, "project: One\nproject: Two\nphases: []\n");
        assertThatThrownBy(() -> PlanReader.read(plan)).isInstanceOf(PlanException.class)
                .hasMessageContaining("twice.yaml").hasMessageContaining("key 'project' is given twice");
    }
}
