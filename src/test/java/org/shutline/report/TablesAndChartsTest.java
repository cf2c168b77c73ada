package org.shutline.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CategoryPlot;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TablesAndChartsTest {
    @TempDir
    Path dir;

    @Test
    void csvQuotesPerRfc4180() {
        // RFC 4180 section 2: fields with commas, quotes or line breaks are enclosed in quotes; quotes doubled
        String s = Csv.format(List.of("id", "address"), List.of(List.of("S-1", "12 Birch Lane, unit 3"), List.of("S-2", "the \"Mill\"")));
        assertThat(s).isEqualTo("id,address\r\nS-1,\"12 Birch Lane, unit 3\"\r\nS-2,\"the \"\"Mill\"\"\"\r\n");
    }

    @Test
    void longTableSpansPagesWithHeaderAndCautionOnEach() throws Exception {
        List<List<String>> rows = new ArrayList<>();
        for (int i = 1; i <= 130; i++) rows.add(List.of(Integer.toString(i), "V-" + i, "18S UJ 2348 0648", "close"));
        List<Sheet> sheets = TableSheets.layout("Valve operation list", "Step 7", List.of("order", "valve", "grid", "action"), rows,
                PageFormat.LETTER_LANDSCAPE);
        assertThat(sheets.size()).isGreaterThan(1);
        Path pdf = dir.resolve("t.pdf");
        DocumentExport.pdf(sheets, PageFormat.LETTER_LANDSCAPE, new DocumentExport.Info("t", "s", "a"), pdf);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertThat(doc.getNumberOfPages()).isEqualTo(sheets.size());
            PDFTextStripper st = new PDFTextStripper();
            st.setStartPage(doc.getNumberOfPages());
            st.setEndPage(doc.getNumberOfPages());
            String last = st.getText(doc);
            assertThat(last).contains("V-130").contains("valve").contains("CAUTION").contains("page " + sheets.size() + " of " + sheets.size());
            String all = new PDFTextStripper().getText(doc);
            for (int i = 1; i <= 130; i++) assertThat(all).contains("V-" + i + " ");
        }
    }

    @Test
    void chartsCarryTheFigures() throws Exception {
        JFreeChart c = Charts.offPerStep("Services off per step",
                List.of(new Charts.StepFigure(1, 0, 0), new Charts.StepFigure(2, 42, 45), new Charts.StepFigure(3, 7, 7)));
        CategoryPlot p = (CategoryPlot) c.getPlot();
        assertThat(p.getDataset().getValue("services off", "2")).isEqualTo(42.0);
        assertThat(p.getDataset().getValue("meters off", "2")).isEqualTo(45.0);
        Path png = dir.resolve("c.png");
        DocumentExport.png(Charts.sheet(c, "Plan"), PageFormat.LETTER_LANDSCAPE, 72, png);
        assertThat(Files.size(png)).isGreaterThan(1000);
        JFreeChart h = Charts.customerHoursPerPhase("Customer-hours", List.of(new Charts.PhaseFigure("1", 120.5)));
        assertThat(((CategoryPlot) h.getPlot()).getDataset().getValue(0, 0)).isEqualTo(120.5);
    }
}
