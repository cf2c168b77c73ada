package org.shutline.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.util.ArrayList;
import java.util.List;
import org.shutline.model.Caution;

/**
 * Lays a table out over as many sheets as it needs: title and subtitle at the top,
 * header row repeated on each sheet, rows in a fixed font, column widths from the
 * widest cell (shrunk proportionally to fit), long cells cut with an ellipsis,
 * the caution and "page i of n" at the foot of each sheet.
 */
public final class TableSheets {
    private static final double MARGIN = 36;
    private static final double ROW = 13;
    private static final float BODY_PT = 8.5f;

    private TableSheets() {}

    public static List<Sheet> layout(String title, String subtitle, List<String> header, List<List<String>> rows, PageFormat format) {
        double usable = format.heightPt() - 2 * MARGIN - 40 - 36;
        int perSheet = Math.max(1, (int) Math.floor(usable / ROW) - 1);
        int pages = Math.max(1, (rows.size() + perSheet - 1) / perSheet);
        List<Sheet> out = new ArrayList<>();
        for (int p = 0; p < pages; p++) {
            List<List<String>> slice = rows.subList(Math.min(rows.size(), p * perSheet), Math.min(rows.size(), (p + 1) * perSheet));
            int page = p + 1;
            out.add((g, w, h) -> paint(g, w, h, title, subtitle, header, slice, rows, page, pages));
        }
        return out;
    }

    private static void paint(Graphics2D g, double w, double h, String title, String subtitle, List<String> header,
                              List<List<String>> slice, List<List<String>> all, int page, int pages) {
        String fam = ReportFonts.family();
        g.setColor(Color.BLACK);
        g.setFont(new Font(fam, Font.BOLD, 14));
        g.drawString(title, (float) MARGIN, (float) (MARGIN + 12));
        g.setFont(new Font(fam, Font.PLAIN, 9));
        if (subtitle != null) g.drawString(subtitle, (float) MARGIN, (float) (MARGIN + 26));
        Font body = new Font(fam, Font.PLAIN, (int) BODY_PT).deriveFont(BODY_PT);
        Font bold = body.deriveFont(Font.BOLD);
        double[] widths = columnWidths(g, header, all, body, bold, w - 2 * MARGIN);
        double y = MARGIN + 44;
        g.setFont(bold);
        row(g, header, widths, y);
        g.setStroke(new BasicStroke(0.6f));
        g.draw(new Line2D.Double(MARGIN, y + 3, w - MARGIN, y + 3));
        g.setFont(body);
        for (int i = 0; i < slice.size(); i++) {
            y += ROW;
            if (i % 2 == 1) {
                g.setColor(new Color(0xF0F0F0));
                g.fill(new java.awt.geom.Rectangle2D.Double(MARGIN, y - ROW + 3.5, w - 2 * MARGIN, ROW));
                g.setColor(Color.BLACK);
            }
            row(g, slice.get(i), widths, y);
        }
        g.setFont(new Font(fam, Font.PLAIN, 7));
        Footer.paint(g, w, h, MARGIN, "page " + page + " of " + pages);
    }

    private static double[] columnWidths(Graphics2D g, List<String> header, List<List<String>> rows, Font body, Font bold, double avail) {
        int n = header.size();
        double[] w = new double[n];
        FontMetrics fb = g.getFontMetrics(bold);
        FontMetrics fm = g.getFontMetrics(body);
        for (int c = 0; c < n; c++) w[c] = fb.stringWidth(header.get(c)) + 10;
        int sample = Math.min(rows.size(), 2000);
        for (int r = 0; r < sample; r++) {
            List<String> row = rows.get(r);
            for (int c = 0; c < n && c < row.size(); c++) {
                String s = row.get(c) == null ? "" : row.get(c);
                w[c] = Math.max(w[c], Math.min(fm.stringWidth(s) + 10, avail * 0.45));
            }
        }
        double sum = 0;
        for (double x : w) sum += x;
        if (sum > avail) for (int c = 0; c < n; c++) w[c] *= avail / sum;
        return w;
    }

    private static void row(Graphics2D g, List<String> cells, double[] widths, double y) {
        double x = MARGIN;
        FontMetrics fm = g.getFontMetrics();
        for (int c = 0; c < widths.length; c++) {
            String s = c < cells.size() && cells.get(c) != null ? cells.get(c) : "";
            g.drawString(fit(s, fm, widths[c] - 6), (float) (x + 2), (float) y);
            x += widths[c];
        }
    }

    static String fit(String s, FontMetrics fm, double width) {
        if (fm.stringWidth(s) <= width) return s;
        String e = "...";
        int end = s.length();
        while (end > 0 && fm.stringWidth(s.substring(0, end) + e) > width) end--;
        return s.substring(0, end) + e;
    }

    /** The foot of every exported sheet: the caution on the left, a page label on the right. */
    public static final class Footer {
        private Footer() {}

        public static void paint(Graphics2D g, double w, double h, double margin, String pageLabel) {
            g.setColor(Color.BLACK);
            FontMetrics fm = g.getFontMetrics();
            double y = h - margin + 4;
            List<String> lines = wrap(Caution.TEXT, fm, w - 2 * margin - 90);
            for (int i = 0; i < lines.size(); i++) {
                g.drawString(lines.get(i), (float) margin, (float) (y - (lines.size() - 1 - i) * (fm.getHeight())));
            }
            if (pageLabel != null) g.drawString(pageLabel, (float) (w - margin - fm.stringWidth(pageLabel)), (float) y);
        }

        public static List<String> wrap(String text, FontMetrics fm, double width) {
            List<String> out = new ArrayList<>();
            StringBuilder line = new StringBuilder();
            for (String word : text.split(" ")) {
                String trial = line.length() == 0 ? word : line + " " + word;
                if (fm.stringWidth(trial) > width && line.length() > 0) {
                    out.add(line.toString());
                    line = new StringBuilder(word);
                } else {
                    line = new StringBuilder(trial);
                }
            }
            if (line.length() > 0) out.add(line.toString());
            return out;
        }
    }
}
