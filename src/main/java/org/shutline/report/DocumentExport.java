package org.shutline.report;

import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2DFontTextDrawer;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Calendar;
import java.util.List;
import javax.imageio.ImageIO;
import org.apache.batik.svggen.SVGGraphics2D;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.shutline.io.AtomicFiles;
import org.w3c.dom.DOMImplementation;
import org.w3c.dom.Document;

/**
 * Writes sheets as PDF (one vector page each, text embedded as DejaVu Sans so it can
 * be selected and searched), PNG (one sheet at a chosen resolution) or SVG. Every
 * file is written to a temporary file beside the target and moved into place.
 */
public final class DocumentExport {
    private DocumentExport() {}

    /** Document properties written into the PDF. */
    public record Info(String title, String subject, String author) {
    }

    public static void pdf(List<Sheet> sheets, PageFormat format, Info info, Path out) throws IOException {
        if (sheets.isEmpty()) throw new IllegalArgumentException("no sheets to write");
        String family = ReportFonts.family();
        AtomicFiles.write(out, os -> {
            try (PDDocument doc = new PDDocument();
                 PdfBoxGraphics2DFontTextDrawer text = new PdfBoxGraphics2DFontTextDrawer()) {
                text.registerFont(family, ReportFonts.open(ReportFonts.REGULAR));
                text.registerFont(family + " Bold", ReportFonts.open(ReportFonts.BOLD));
                float w = (float) format.widthPt();
                float h = (float) format.heightPt();
                for (Sheet s : sheets) {
                    PDPage page = new PDPage(new PDRectangle(w, h));
                    doc.addPage(page);
                    PdfBoxGraphics2D g = new PdfBoxGraphics2D(doc, w, h);
                    g.setFontTextDrawer(text);
                    try {
                        s.paint(g, w, h);
                    } finally {
                        g.dispose();
                    }
                    PDFormXObject form = g.getXFormObject();
                    try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                        cs.drawForm(form);
                    }
                }
                PDDocumentInformation di = doc.getDocumentInformation();
                di.setTitle(info.title());
                di.setSubject(info.subject());
                di.setAuthor(info.author());
                di.setCreator("Shutline");
                di.setCreationDate(Calendar.getInstance());
                doc.save(os);
            }
        });
    }

    /** One sheet as PNG at {@code dpi} dots per inch, white background. */
    public static void png(Sheet sheet, PageFormat format, int dpi, Path out) throws IOException {
        BufferedImage img = image(sheet, format, dpi);
        AtomicFiles.write(out, os -> {
            if (!ImageIO.write(img, "png", os)) throw new IOException("no PNG writer available");
        });
    }

    /** One sheet drawn into an image at {@code dpi}. */
    public static BufferedImage image(Sheet sheet, PageFormat format, int dpi) {
        if (dpi < 10 || dpi > 1200) throw new IllegalArgumentException("dpi must be 10..1200, was " + dpi);
        double k = dpi / 72.0;
        int wpx = (int) Math.round(format.widthPt() * k);
        int hpx = (int) Math.round(format.heightPt() * k);
        BufferedImage img = new BufferedImage(wpx, hpx, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setColor(java.awt.Color.WHITE);
            g.fillRect(0, 0, wpx, hpx);
            g.scale(k, k);
            ReportFonts.family();
            sheet.paint(g, format.widthPt(), format.heightPt());
        } finally {
            g.dispose();
        }
        return img;
    }

    /** One sheet as SVG, sized in points. */
    public static void svg(Sheet sheet, PageFormat format, Path out) throws IOException {
        Document doc;
        try {
            DOMImplementation dom = javax.xml.parsers.DocumentBuilderFactory.newInstance().newDocumentBuilder().getDOMImplementation();
            doc = dom.createDocument("http://www.w3.org/2000/svg", "svg", null);
        } catch (javax.xml.parsers.ParserConfigurationException e) {
            throw new IOException("no XML DOM available for SVG", e);
        }
        org.apache.batik.svggen.SVGGeneratorContext ctx = org.apache.batik.svggen.SVGGeneratorContext.createDefault(doc);
        ctx.setImageHandler(new PngImages());
        SVGGraphics2D g = new SVGGraphics2D(ctx, false);
        ReportFonts.family();
        int w = (int) Math.ceil(format.widthPt());
        int h = (int) Math.ceil(format.heightPt());
        g.setSVGCanvasSize(new java.awt.Dimension(w, h));
        sheet.paint(g, format.widthPt(), format.heightPt());
        AtomicFiles.write(out, os -> {
            Writer wr = new OutputStreamWriter(os, StandardCharsets.UTF_8);
            g.stream(wr, true);
            wr.flush();
        });
        g.dispose();
    }

    /**
     * Embeds images (such as the hatch tile of a gas-off area) in an SVG as base64 PNG
     * written by ImageIO: Batik's own encoder needs the batik-codec module, which is not
     * a dependency.
     */
    private static final class PngImages extends org.apache.batik.svggen.ImageHandlerBase64Encoder {
        @Override
        public void encodeImage(java.awt.image.RenderedImage buf, java.io.OutputStream os)
                throws org.apache.batik.svggen.SVGGraphics2DIOException {
            try (java.io.OutputStream b64 = new org.apache.batik.util.Base64EncoderStream(os)) {
                if (!ImageIO.write(buf, "png", b64)) throw new IOException("no PNG writer available");
            } catch (IOException e) {
                throw new org.apache.batik.svggen.SVGGraphics2DIOException(e);
            }
        }
    }
}
