package org.shutline.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.util.EnumSet;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Envelope;
import org.shutline.model.Progress;
import org.shutline.trace.NetworkState;

/** The builder on the hand-built network of {@link FieldListsTest} (UTM 18N, one main, one valve). */
class ReportBuilderTest {
    @TempDir Path dir;

    private static ReportBuilder.Options opts() {
        return ReportBuilder.Options.defaults().withMade(LocalDateTime.of(2026, 12, 1, 9, 30)).withPreparedBy("A. Tester");
    }

    @Test
    void plainViewOfAGivenAreaIsOneMapWithTitleBlock() throws Exception {
        NetworkState s = FieldListsTest.network();
        Envelope window = new Envelope(323380, 323620, 4306400, 4306560);
        ReportBuilder b = ReportBuilder.of(ReportView.ofState(s, "Network as recorded"), null, opts()).withArea(window);
        assertThat(b.area()).isEqualTo(window);
        // 240 x 160 m plus 8 % of 240 m on each side = 278.4 x 198.4 m; the Letter landscape frame is 492 x 508 pt:
        // at 1:1,200 (1 pt = 0.423 m) it shows 208 x 215 m, too narrow; at 1:2,000 (0.706 m) 347 x 358 m
        MapSheet sheet = b.mapSheet();
        assertThat(MapSheet.layout(792, 612).frame().getWidth()).isEqualTo(492);
        assertThat(sheet.scaleFor(792, 612)).isEqualTo(2000);
        List<Path> files = b.withArea(window).write(dir, Progress.NONE);
        assertThat(files).extracting(p -> p.getFileName().toString()).contains("report.pdf", "map.png", "map.svg",
                "results.gpkg", "valves.csv", "customers.csv", "gas_off.geojson").doesNotContain("chart-steps.png");
        try (PDDocument doc = Loader.loadPDF(dir.resolve("report.pdf").toFile())) {
            String t = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertThat(t).contains("Network map: fgdc.gpkg").contains("Network as recorded").contains("Prepared 2026-12-01 09:30 by A. Tester")
                    .contains("Scale 1:2,000 on Letter").contains("Grid: US National Grid 18S UJ").contains("Legend")
                    .contains("Main LP, active").contains("Valve open, unknown").contains("(no valves to operate in this view)");
        }
    }

    @org.junit.jupiter.params.ParameterizedTest(name = "{0} landscape={1}")
    @org.junit.jupiter.params.provider.CsvSource({"LETTER,true", "LETTER,false", "TABLOID,true", "TABLOID,false",
        "A4,true", "A4,false", "A3,true", "A3,false"})
    void everyPaperAndOrientation(Paper paper, boolean landscape) throws Exception {
        NetworkState s = FieldListsTest.network();
        PageFormat f = new PageFormat(paper, landscape);
        ReportBuilder b = ReportBuilder.of(ReportView.ofState(s, "paper test"), null,
                opts().withPage(f).withFormats(EnumSet.of(ReportBuilder.Format.PDF)));
        MapSheet.Layout lay = MapSheet.layout(f.widthPt(), f.heightPt());
        // the frame and the panel parts lie on the page and do not overlap the frame
        java.awt.geom.Rectangle2D page = new java.awt.geom.Rectangle2D.Double(0, 0, f.widthPt(), f.heightPt());
        for (java.awt.geom.Rectangle2D r : List.of(lay.frame(), lay.title(), lay.furniture(), lay.legend(), lay.notes())) {
            assertThat(page.contains(r)).as("%s inside the page", r).isTrue();
            if (r != lay.frame()) assertThat(r.intersects(lay.frame())).as("%s clear of the frame", r).isFalse();
        }
        b.write(dir, Progress.NONE);
        try (PDDocument doc = Loader.loadPDF(dir.resolve("report.pdf").toFile())) {
            // Paper sizes: ANSI Letter 612 x 792 pt, Tabloid 792 x 1224 pt; ISO 216 A4 595.28 x 841.89, A3 841.89 x 1190.55
            assertThat(doc.getPage(0).getMediaBox().getWidth()).isCloseTo((float) f.widthPt(), org.assertj.core.data.Offset.offset(0.01f));
            assertThat(doc.getPage(0).getMediaBox().getHeight()).isCloseTo((float) f.heightPt(), org.assertj.core.data.Offset.offset(0.01f));
            String name = paper.name().charAt(0) + paper.name().substring(1).toLowerCase(java.util.Locale.ROOT);
            assertThat(new PDFTextStripper().getText(doc).replaceAll("\\s+", " ")).contains("on " + name + " printed at 100 %");
        }
    }

    @Test
    void refusesATargetThatIsTheInput() throws IOException {
        NetworkState s = FieldListsTest.network();
        Path input = dir.resolve("valves.csv"); // an input that happens to sit where a list would go
        Files.writeString(input, "precious");
        ReportBuilder b = ReportBuilder.of(ReportView.ofState(s, "x"), input,
                opts().withFormats(EnumSet.of(ReportBuilder.Format.PDF)));
        assertThatThrownBy(() -> b.write(dir, Progress.NONE)).isInstanceOf(IOException.class)
                .hasMessageContaining("refusing to write").hasMessageContaining("valves.csv");
        assertThat(Files.readString(input)).isEqualTo("precious");
        assertThat(dir.resolve("report.pdf")).doesNotExist(); // refused before anything was written
    }
}
