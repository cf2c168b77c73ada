package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The command line: exit codes, messages on stderr, and the generate command's files. */
class CommandsTest {
    @TempDir Path dir;

    record Run(int code, String out, String err) {}

    /**
     * The one line every command prints about the bundled sample's four deliberate data
     * errors (SampleTown: the duplicate valve id V-017, the service SV-FAR attached to no
     * main, the status 'actve', the valve V-OFF off its main; `shutline check` lists the
     * same four at severity ERROR), before its result; the run then exits 1, not 0.
     */
    static final String SAMPLE_DATA_ERRORS = "shutline: data errors in tallowmere.gpkg: 4 error findings "
            + "(duplicate-id 1, unattached-service 1, unknown-value 1, valve-off-main 1): features skipped or values defaulted, "
            + "results may be incomplete";

    /** A command on the bundled sample that did its work: exit 1 for the sample's data errors only, and their line. */
    static void assertSampleRunDone(Run r) {
        assertThat(r.err()).as("the data-error line on stderr").contains(SAMPLE_DATA_ERRORS);
        assertThat(r.err().lines().filter(l -> !l.isBlank()).count()).as(r.err()).isEqualTo(1);
        assertThat(r.code()).as(r.err()).isEqualTo(1);
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = Main.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void checkOfAMissingFileExitsTwoWithAPlainMessage() {
        Path missing = dir.resolve("nowhere.gpkg");
        Run r = run("check", missing.toString());
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("cannot read " + missing).doesNotContain("Exception").doesNotContain("\tat ");
        assertThat(r.out()).isEmpty();
    }

    @Test
    void checkOfAMissingMappingFileExitsTwo() throws Exception {
        Path gpkg = dir.resolve("t.gpkg");
        assertThat(run("generate", gpkg.toString()).code()).isZero();
        Run r = run("check", gpkg.toString(), "--mapping", dir.resolve("nomap.yaml").toString());
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("mapping file").contains("nomap.yaml");
    }

    @Test
    void badOptionsAreUsageErrors() {
        assertThat(run("check", "x.gpkg", "--format", "xml").code()).isEqualTo(2);
        assertThat(run("generate", dir.resolve("g.gpkg").toString(), "--mains", "5").code()).isEqualTo(2);
        assertThat(run("nosuchcommand").code()).isEqualTo(2);
    }

    @Test
    void generateWritesTheSampleTownInBothFormats() throws Exception {
        Path gpkg = dir.resolve("town.gpkg");
        Run g = run("generate", gpkg.toString());
        assertThat(g.code()).isZero();
        assertThat(g.out()).contains("4 stations", "55 valves");
        assertThat(Files.size(gpkg)).isGreaterThan(100_000);
        Path shp = dir.resolve("town-shp");
        assertThat(run("generate", shp.toString()).code()).isZero();
        assertThat(shp.resolve("mains.shp")).exists();
        assertThat(shp.resolve("services.dbf")).exists();
        Path grid = dir.resolve("grid");
        Run r = run("generate", grid.toString(), "--mains", "500", "--seed", "3", "--format", "shp");
        assertThat(r.code()).isZero();
        assertThat(r.out()).contains("500 mains");
        assertThat(Files.size(grid.resolve("mains.shx"))).isEqualTo(100 + 8 * 500); // ESRI 1998: 8 bytes a record
    }

    /** End to end on the bundled sample town, both forms: the same counts and the seeded flaws. */
    @Test
    void checkOfTheSampleTownInBothFormsAgrees() throws Exception {
        Run g = run("check", "sample-gis/tallowmere.gpkg", "--format", "json");
        Run s = run("check", "sample-gis/tallowmere-shp", "--format", "json");
        // the deliberate flaws include an unknown status word and a duplicate valve id: errors, exit 1
        assertThat(g.code()).as(g.err()).isEqualTo(1);
        assertThat(s.code()).as(s.err()).isEqualTo(1);
        JsonNode jg = new ObjectMapper().readTree(g.out());
        JsonNode js = new ObjectMapper().readTree(s.out());
        assertThat(jg.get("layers")).isEqualTo(js.get("layers"));
        assertThat(jg.get("systems")).isEqualTo(js.get("systems"));
        assertThat(jg.get("layers").get("services").asInt()).isBetween(1400, 1600);
        assertThat(jg.get("systems").has("LP-NORTH")).isTrue();
        for (JsonNode j : List.of(jg, js)) {
            assertThat(j.get("findings").toString()).contains("M-N-0001", "SV-FAR", "V-OFF", "M-E-NM", "V-017");
        }
        List<String> codesG = new java.util.ArrayList<>();
        jg.get("findings").forEach(f -> codesG.add(f.get("code").asText() + " " + f.get("features")));
        List<String> codesS = new java.util.ArrayList<>();
        js.get("findings").forEach(f -> codesS.add(f.get("code").asText() + " " + f.get("features")));
        assertThat(codesS).containsExactlyInAnyOrderElementsOf(codesG);
    }
}
