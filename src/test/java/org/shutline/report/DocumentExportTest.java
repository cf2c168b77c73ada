package org.shutline.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DocumentExportTest {
    @TempDir
    Path dir;

    private static Sheet labelled(String text) {
        return (g, w, h) -> {
            g.setColor(Color.BLACK);
            g.setFont(new Font(ReportFonts.family(), Font.PLAIN, 14));
            g.drawString(text, 72, 72);
            g.setColor(new Color(0xD55E00));
            g.fill(new Rectangle2D.Double(w / 2 - 36, h / 2 - 36, 72, 72));
        };
    }

    static boolean tool(String name) {
        return new File("/usr/bin/" + name).canExecute();
    }

    @Test
    void pdfHasPagesOfTheAskedSizeAndSelectableText() throws Exception {
        Path pdf = dir.resolve("out.pdf");
        DocumentExport.pdf(List.of(labelled("Valve V-12 close first"), labelled("Sheet 2 of 2")),
                PageFormat.LETTER_LANDSCAPE, new DocumentExport.Info("Test map", "step 3", "tester"), pdf);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertThat(doc.getNumberOfPages()).isEqualTo(2);
            PDRectangle box = doc.getPage(0).getMediaBox();
            // US Letter landscape: 11 x 8.5 in = 792 x 612 pt
            assertThat(box.getWidth()).isEqualTo(792f);
            assertThat(box.getHeight()).isEqualTo(612f);
            String text = new PDFTextStripper().getText(doc);
            assertThat(text).contains("Valve V-12 close first").contains("Sheet 2 of 2");
            assertThat(doc.getDocumentInformation().getTitle()).isEqualTo("Test map");
        }
        assertThat(dir.toFile().list()).containsExactly("out.pdf"); // no temporary file left behind
    }

    @Test
    void a4PortraitIsIsoSize() throws Exception {
        Path pdf = dir.resolve("a4.pdf");
        DocumentExport.pdf(List.of(labelled("A4")), new PageFormat(Paper.A4, false), new DocumentExport.Info("t", "s", "a"), pdf);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            // ISO 216 A4 = 210 x 297 mm = 595.28 x 841.89 pt
            assertThat(doc.getPage(0).getMediaBox().getWidth()).isCloseTo(595.28f, org.assertj.core.data.Offset.offset(0.01f));
            assertThat(doc.getPage(0).getMediaBox().getHeight()).isCloseTo(841.89f, org.assertj.core.data.Offset.offset(0.01f));
        }
    }

    @Test
    void pdfRendersWithPoppler() throws Exception {
        assumeTrue(tool("pdftoppm"), "pdftoppm (poppler-utils) not installed: skipped");
        Path pdf = dir.resolve("r.pdf");
        DocumentExport.pdf(List.of(labelled("render me")), PageFormat.LETTER_LANDSCAPE, new DocumentExport.Info("t", "s", "a"), pdf);
        Process p = new ProcessBuilder("pdftoppm", "-png", "-r", "36", pdf.toString(), dir.resolve("page").toString())
                .redirectErrorStream(true).start();
        assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
        assertThat(p.exitValue()).isZero();
        Path png = Files.list(dir).filter(f -> f.getFileName().toString().startsWith("page")).findFirst().orElseThrow();
        BufferedImage img = ImageIO.read(png.toFile());
        // 792 x 612 pt at 36 dpi = 396 x 306 px; the orange square sits in the middle
        assertThat(img.getWidth()).isEqualTo(396);
        Color mid = new Color(img.getRGB(198, 153));
        assertThat(mid.getRed()).isGreaterThan(180);
        assertThat(mid.getBlue()).isLessThan(60);
    }

    @Test
    void pngAtChosenDpi() throws Exception {
        Path png = dir.resolve("m.png");
        DocumentExport.png(labelled("x"), PageFormat.LETTER_LANDSCAPE, 100, png);
        BufferedImage img = ImageIO.read(png.toFile());
        assertThat(img.getWidth()).isEqualTo(1100);
        assertThat(img.getHeight()).isEqualTo(850);
        assertThat(new Color(img.getRGB(550, 425))).isEqualTo(new Color(0xD55E00));
        assertThat(new Color(img.getRGB(5, 5))).isEqualTo(Color.WHITE);
    }

    @Test
    void svgIsWellFormedAndRenders() throws Exception {
        Path svg = dir.resolve("m.svg");
        DocumentExport.svg(labelled("svg text"), PageFormat.LETTER_LANDSCAPE, svg);
        String s = Files.readString(svg);
        assertThat(s).contains("<svg").contains("svg text");
        assumeTrue(tool("rsvg-convert"), "rsvg-convert (librsvg2-bin) not installed: skipped");
        Process p = new ProcessBuilder("rsvg-convert", "-o", dir.resolve("svg.png").toString(), svg.toString())
                .redirectErrorStream(true).start();
        assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
        assertThat(p.exitValue()).isZero();
        BufferedImage img = ImageIO.read(dir.resolve("svg.png").toFile());
        assertThat(img.getWidth()).isEqualTo(792);
    }
}
