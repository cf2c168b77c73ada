package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code shutline export --plan ... --step N} writes the state of step N: the sample plan
 * (sample-gis/tallowmere-plan-corrected.yaml) lays bypass BP-1 with valve BPV-1 at
 * step 10 and takes it off at step 13, and cuts M-CI-01 at step 14. The layers are read
 * back with GDAL's ogrinfo (an outside reader); the map labels with PDFBox's text
 * extraction of the report.
 */
class BypassStepExportTest {
    static final Path PLAN = Path.of("sample-gis/tallowmere-plan-corrected.yaml");
    @TempDir static Path dir;

    @BeforeAll
    static void export() {
        for (int step : new int[] {11, 14}) {
            CommandsTest.Run r = CommandsTest.run("export", ExportCommandTest.SAMPLE.toString(), "--plan", PLAN.toString(),
                    "--step", Integer.toString(step), "--as-of", "2026-12-01", "--formats", "gpkg,geojson,pdf",
                    "--out", dir.resolve("s" + step).toString());
            CommandsTest.assertSampleRunDone(r);
        }
    }

    private static String ogr(int step, String file, String layer) throws Exception {
        return ExportCommandTest.exec(null, "ogrinfo", "-al", "-q", dir.resolve("s" + step).resolve(file).toString(), layer);
    }

    @Test
    void theBypassAndItsValveAreLayersOfStep11AndGoneAtStep14() throws Exception {
        assumeTrue(ExportCommandTest.tool("ogrinfo"), "ogrinfo (gdal-bin) not installed: skipped");
        // GDAL ogrinfo reads the GeoPackage
        String pipe11 = ogr(11, "results.gpkg", "plan_pipe");
        assertThat(pipe11).contains("pipe_id (String) = BP-1").contains("kind (String) = bypass")
                .contains("temporary (String) = yes")
                .contains("MULTILINESTRING ((512450 4890399,512450 4890401,512450 4890403))");
        String valves11 = ogr(11, "results.gpkg", "plan_valves");
        assertThat(valves11).contains("valve_id (String) = BPV-1").contains("position (String) = open")
                .contains("POINT (512450 4890401)");
        // and the GeoJSON files
        assertThat(ogr(11, "plan_valves.geojson", "plan_valves")).contains("valve_id (String) = BPV-1");
        assertThat(ogr(11, "plan_pipe.geojson", "plan_pipe")).contains("pipe_id (String) = BP-1");
        // step 13 took the bypass off: no BP-1, no BPV-1 at step 14; the west cut of M-CI-01 is there
        assertThat(ogr(14, "results.gpkg", "plan_pipe")).doesNotContain("BP-1");
        assertThat(ogr(14, "results.gpkg", "plan_valves")).doesNotContain("BPV-1");
        assertThat(ogr(14, "plan_valves.geojson", "plan_valves")).doesNotContain("BPV-1");
        assertThat(ogr(14, "results.gpkg", "cuts")).contains("main_id (String) = M-CI-01").contains("POINT (512311 4890403)");
        assertThat(ogr(11, "results.gpkg", "cuts")).doesNotContain("M-CI-01");
    }

    @Test
    void theReportMapLabelsTheBypassAndItsValveAtStep11Only() throws Exception {
        String at11;
        String at14;
        try (PDDocument d = Loader.loadPDF(dir.resolve("s11").resolve("report.pdf").toFile())) {
            PDFTextStripper t = new PDFTextStripper();
            t.setStartPage(1);
            t.setEndPage(1);
            at11 = t.getText(d);
        }
        try (PDDocument d = Loader.loadPDF(dir.resolve("s14").resolve("report.pdf").toFile())) {
            PDFTextStripper t = new PDFTextStripper();
            t.setStartPage(1);
            t.setEndPage(1);
            at14 = t.getText(d);
        }
        assertThat(at11).contains("BP-1 (temporary)").contains("BPV-1").contains("Temporary pipe (bypass)");
        assertThat(at14).doesNotContain("BP-1 (temporary)").doesNotContain("BPV-1").contains("Cut and capped");
    }
}
