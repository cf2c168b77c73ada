package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The write guard compares real paths: a link to the output folder, or a name with "..", still names the input. */
class WriteGuardTest {
    @TempDir Path dir;

    private static int run(StringWriter err, String... args) {
        CommandLine cl = Main.commandLine();
        cl.setOut(new PrintWriter(new StringWriter()));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    @Test
    void planReachedThroughALinkIsNotWrittenOver() throws Exception {
        Path real = Files.createDirectories(dir.resolve("work"));
        Path plan = real.resolve("plan-hazards.csv");
        Files.copy(Path.of("sample-gis/tallowmere-plan.yaml"), plan);
        byte[] before = Files.readAllBytes(plan);
        Path link = Files.createSymbolicLink(dir.resolve("link"), real);
        StringWriter err = new StringWriter();
        int code = run(err, "plan", "sample-gis/tallowmere.gpkg", plan.toString(), "--out", link.toString());
        assertThat(code).as(err.toString()).isEqualTo(2);
        assertThat(err.toString()).contains("plan-hazards.csv", "read by this command", plan.toString());
        assertThat(Files.readAllBytes(plan)).isEqualTo(before);
        // nothing at all was written: the other two outputs are not there either
        assertThat(real.resolve("plan-steps.csv")).doesNotExist();
        assertThat(real.resolve("plan.json")).doesNotExist();
    }

    @Test
    void outputsNotYetThereAreComparedThroughTheirFolder() {
        Path planned = WriteGuard.realOrPlanned(dir.resolve("a/../b/new.csv"));
        assertThat(planned).isEqualTo(WriteGuard.realOrPlanned(dir).resolve("b/new.csv"));
    }

    @Test
    void aPlanOutsideTheOutputFolderIsWrittenNormally() throws Exception {
        Path out = dir.resolve("out");
        StringWriter err = new StringWriter();
        int code = run(err, "plan", "sample-gis/tallowmere.gpkg", "sample-gis/tallowmere-plan.yaml", "--out", out.toString());
        assertThat(code).as(err.toString()).isIn(0, 1);
        assertThat(out.resolve("plan-steps.csv")).exists();
    }
}
