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
 * widest cell (at most 45 % of the width each, shrunk proportionally to fit), long
 * cells wrapped onto as many lines as they need (at blanks; a word wider than its
 * column is broken), never cut; a row is never split across sheets; the caution and
 * "page i of n" at the foot of each sheet. Text is measured with the bundled report
 * font at layout time (an off-screen graphics), so the sheets are known before
 * painting.
 */
public final class TableSheets {
    private static final double MARGIN = 36;
    private static final double ROW = 13;
    private static final double LINE = 10.5;
    private static final float BODY_PT = 8.5f;
    /** Room kept on the right of each cell, and slack for renderers that measure a little wider. */
    private static final double PAD = 8;

    private TableSheets() {}

    /** One row laid out: its cells as wrapped lines, and its height. */
    private record Laid(List<List<String>> cells, double height) {}

    public static List<Sheet> layout(String title, String subtitle, List<String> header, List<List<String>> rows, PageFormat format) {
        String fam = ReportFonts.family();
        Font body = new Font(fam, Font.PLAIN, (int) BODY_PT).deriveFont(BODY_PT);
        Font bold = body.deriveFont(Font.BOLD);
        java.awt.image.BufferedImage img = new java.awt.image.BufferedImage(1, 1, java.awt.image.BufferedImage.TYPE_INT_ARGB);
        Graphics2D scratch = img.createGraphics();
        double[] widths;
        List<Laid> laid = new ArrayList<>();
        try {
            widths = columnWidths(scratch, header, rows, body, bold, format.widthPt() - 2 * MARGIN);
            FontMetrics fm = scratch.getFontMetrics(body);
            for (List<String> r : rows) laid.add(lay(r, widths, fm));
        } finally {
            scratch.dispose();
        }
        double usable = format.heightPt() - 2 * MARGIN - 40 - 36 - ROW - 2 * LINE;
        List<List<Laid>> pages = new ArrayList<>();
        List<Laid> page = new ArrayList<>();
        double used = 0;
        for (Laid l : laid) {
            if (!page.isEmpty() && used + l.height() > usable) {
                pages.add(page);
                page = new ArrayList<>();
                used = 0;
            }
            page.add(l);
            used += l.height();
        }
        pages.add(page);
        List<Sheet> out = new ArrayList<>();
        for (int p = 0; p < pages.size(); p++) {
            List<Laid> slice = pages.get(p);
            int n = p + 1, total = pages.size();
            out.add((g, w, h) -> paint(g, w, h, title, subtitle, header, slice, widths, body, bold, n, total));
        }
        return out;
    }

    private static Laid lay(List<String> row, double[] widths, FontMetrics fm) {
        List<List<String>> cells = new ArrayList<>();
        int lines = 1;
        for (int c = 0; c < widths.length; c++) {
            String s = c < row.size() && row.get(c) != null ? row.get(c) : "";
            List<String> ls = wrapCell(s, fm, widths[c] - PAD);
            cells.add(ls);
            lines = Math.max(lines, ls.size());
        }
        return new Laid(cells, ROW + (lines - 1) * LINE);
    }

    /** A cell's text as lines no wider than {@code width}: wrapped at blanks, a longer word broken. */
    static List<String> wrapCell(String s, FontMetrics fm, double width) {
        List<String> out = new ArrayList<>();
        if (s.isEmpty()) {
            out.add("");
            return out;
        }
        for (String line : TableSheets.Footer.wrap(s, fm, width)) {
            String rest = line;
            while (fm.stringWidth(rest) > width && rest.length() > 1) {
                int end = rest.length() - 1;
                while (end > 1 && fm.stringWidth(rest.substring(0, end)) > width) end--;
                out.add(rest.substring(0, end));
                rest = rest.substring(end);
            }
            out.add(rest);
        }
        return out;
    }

    private static void paint(Graphics2D g, double w, double h, String title, String subtitle, List<String> header,
                              List<Laid> slice, double[] widths, Font body, Font bold, int page, int pages) {
        String fam = ReportFonts.family();
        g.setColor(Color.BLACK);
        g.setFont(new Font(fam, Font.BOLD, 14));
        g.drawString(title, (float) MARGIN, (float) (MARGIN + 12));
        g.setFont(new Font(fam, Font.PLAIN, 9));
        if (subtitle != null) g.drawString(subtitle, (float) MARGIN, (float) (MARGIN + 26));
        double y = MARGIN + 44;
        g.setFont(bold);
        FontMetrics hm = g.getFontMetrics();
        double x = MARGIN;
        int headerLines = 1;
        for (int c = 0; c < widths.length; c++) {
            List<String> ls = wrapCell(header.get(c), hm, widths[c] - PAD);
            headerLines = Math.max(headerLines, ls.size());
            for (int k = 0; k < ls.size(); k++) g.drawString(ls.get(k), (float) (x + 2), (float) (y + k * LINE));
            x += widths[c];
        }
        y += (headerLines - 1) * LINE;
        g.setStroke(new BasicStroke(0.6f));
        g.draw(new Line2D.Double(MARGIN, y + 3, w - MARGIN, y + 3));
        g.setFont(body);
        double top = y + 3.5;
        for (int i = 0; i < slice.size(); i++) {
            Laid l = slice.get(i);
            if (i % 2 == 1) {
                g.setColor(new Color(0xF0F0F0));
                g.fill(new java.awt.geom.Rectangle2D.Double(MARGIN, top, w - 2 * MARGIN, l.height()));
                g.setColor(Color.BLACK);
            }
            double base = top + ROW - 3.5;
            x = MARGIN;
            for (int c = 0; c < widths.length; c++) {
                List<String> ls = l.cells().get(c);
                for (int k = 0; k < ls.size(); k++) g.drawString(ls.get(k), (float) (x + 2), (float) (base + k * LINE));
                x += widths[c];
            }
            top += l.height();
        }
        g.setFont(new Font(fam, Font.PLAIN, 7));
        Footer.paint(g, w, h, MARGIN, "page " + page + " of " + pages);
    }

    /**
     * Widths: each column its widest cell (at most 45 % of the room), header included.
     * When they do not fit, each column keeps at least its longest word (and its header's)
     * and only the room above that is shrunk, proportionally; only when even the words do
     * not fit is everything shrunk (long words are then broken).
     */
    private static double[] columnWidths(Graphics2D g, List<String> header, List<List<String>> rows, Font body, Font bold, double avail) {
        int n = header.size();
        double[] w = new double[n];
        double[] min = new double[n];
        FontMetrics fb = g.getFontMetrics(bold);
        FontMetrics fm = g.getFontMetrics(body);
        for (int c = 0; c < n; c++) {
            w[c] = fb.stringWidth(header.get(c)) + PAD + 2;
            min[c] = longestWord(header.get(c), fb) + PAD + 2;
        }
        int sample = Math.min(rows.size(), 2000);
        for (int r = 0; r < sample; r++) {
            List<String> row = rows.get(r);
            for (int c = 0; c < n && c < row.size(); c++) {
                String s = row.get(c) == null ? "" : row.get(c);
                w[c] = Math.max(w[c], Math.min(fm.stringWidth(s) + PAD + 2, avail * 0.45));
                min[c] = Math.max(min[c], Math.min(longestWord(s, fm) + PAD + 2, avail * 0.45));
            }
        }
        double sum = 0, sumMin = 0;
        for (int c = 0; c < n; c++) {
            min[c] = Math.min(min[c], w[c]);
            sum += w[c];
            sumMin += min[c];
        }
        if (sum <= avail) return w;
        if (sumMin <= avail) {
            double f = (avail - sumMin) / (sum - sumMin);
            for (int c = 0; c < n; c++) w[c] = min[c] + (w[c] - min[c]) * f;
            return w;
        }
        for (int c = 0; c < n; c++) w[c] *= avail / sum;
        return w;
    }

    private static double longestWord(String s, FontMetrics fm) {
        double m = 0;
        for (String word : s.split(" ")) m = Math.max(m, fm.stringWidth(word));
        return m;
    }

    /** The longest start of {@code s} that fits {@code width}, with "..." when cut (for one-line labels on maps, not for tables). */
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
