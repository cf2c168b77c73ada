package org.shutline.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Rectangle2D;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.locationtech.jts.geom.Envelope;
import org.shutline.model.LinearUnit;
import org.shutline.render.GeoTransform;
import org.shutline.render.GridReference;
import org.shutline.render.Legend;
import org.shutline.render.LegendEntry;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapPainter;
import org.shutline.render.MapStyle;
import org.shutline.render.NorthArrow;
import org.shutline.render.ScaleBar;
import org.shutline.render.UsngGrid;
import org.shutline.render.Viewport;

/**
 * One printed map page: a map frame, a side panel (right of the frame on a landscape
 * page, below it on a portrait page) with the title block, scale bar, north arrow,
 * legend and a short list, and the safety caution ({@link org.shutline.model.Caution#TEXT})
 * across the foot.
 *
 * <p>The frame shows a {@link Viewport} of the frame's size in points (one viewport
 * pixel = one point) at a round scale ({@link MapScales}): the fixed scale when one is
 * given, else the most detailed round scale at which the area of interest fits; the
 * frame is centred on the area (or on {@code centre} when given). The map is painted by
 * {@link MapPainter} (which draws the US National Grid lines and their labels when the
 * painter has a grid); the legend lists exactly the entries that paint returned. The
 * north arrow points to true north at the frame centre when the CRS is known. Optional
 * extras: "continued on sheet N" texts outside the frame edges, and numbered sheet
 * outlines (the index of a map book) drawn over the map.
 *
 * <p>A value object: the {@code with...} methods return changed copies. Painting keeps
 * no state, so one sheet may be painted into a PDF page, an image and an SVG.
 */
public final class MapSheet implements Sheet {
    /** An edge of the map frame. */
    public enum Side { NORTH, EAST, SOUTH, WEST }

    /** A numbered outline drawn on the map (a map-book sheet on the overview). */
    public record IndexCell(int number, Envelope ground) {}

    /** Where the frame and the panel parts fall on a page (points from the top left). */
    public record Layout(Rectangle2D frame, Rectangle2D title, Rectangle2D furniture, Rectangle2D legend,
                         Rectangle2D notes) {}

    static final double MARGIN = 24;
    static final double GAP = 13;
    private static final double FOOTER = 30;
    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm");

    private final MapPainter painter;
    private final MapOverlays overlays;
    private final Envelope area;
    private final double[] centre;
    private final int scale;
    private final TitleInfo title;
    private final String sheetLabel;
    private final Map<Side, String> edges;
    private final List<IndexCell> index;
    private final List<String> notes;
    private final String notesHeading;
    private final GeoTransform geo;
    private final String paperName;

    private MapSheet(MapPainter painter, MapOverlays overlays, Envelope area, double[] centre, int scale, TitleInfo title,
                     String sheetLabel, Map<Side, String> edges, List<IndexCell> index, String notesHeading,
                     List<String> notes, GeoTransform geo, String paperName) {
        this.painter = Objects.requireNonNull(painter, "painter");
        this.overlays = Objects.requireNonNull(overlays, "overlays");
        this.area = area == null ? new Envelope() : new Envelope(area);
        this.centre = centre == null ? null : centre.clone();
        this.scale = scale;
        this.title = Objects.requireNonNull(title, "title");
        this.sheetLabel = sheetLabel == null ? "" : sheetLabel;
        this.edges = edges.isEmpty() ? Map.of() : Map.copyOf(edges);
        this.index = List.copyOf(index);
        this.notesHeading = notesHeading == null ? "" : notesHeading;
        this.notes = List.copyOf(notes);
        this.geo = geo;
        this.paperName = paperName == null ? "" : paperName;
    }

    /** A sheet of the given area; the scale is chosen when painted (see class comment). {@code geo} may be null. */
    public static MapSheet of(MapPainter painter, MapOverlays overlays, Envelope area, TitleInfo title, GeoTransform geo) {
        return new MapSheet(painter, overlays, area, null, 0, title, "", Map.of(), List.of(), "", List.of(), geo, "");
    }

    public MapSheet withScale(int denominator, double centreX, double centreY) {
        if (denominator <= 0) throw new IllegalArgumentException("scale denominator must be positive: " + denominator);
        return new MapSheet(painter, overlays, area, new double[] {centreX, centreY}, denominator, title, sheetLabel, edges,
                index, notesHeading, notes, geo, paperName);
    }

    public MapSheet withSheetLabel(String label) {
        return new MapSheet(painter, overlays, area, centre, scale, title, label, edges, index, notesHeading, notes, geo,
                paperName);
    }

    public MapSheet withEdges(Map<Side, String> e) {
        Map<Side, String> m = new EnumMap<>(Side.class);
        m.putAll(e);
        return new MapSheet(painter, overlays, area, centre, scale, title, sheetLabel, m, index, notesHeading, notes, geo,
                paperName);
    }

    public MapSheet withIndex(List<IndexCell> cells) {
        return new MapSheet(painter, overlays, area, centre, scale, title, sheetLabel, edges, cells, notesHeading, notes,
                geo, paperName);
    }

    public MapSheet withNotes(String heading, List<String> lines) {
        return new MapSheet(painter, overlays, area, centre, scale, title, sheetLabel, edges, index, heading, lines, geo,
                paperName);
    }

    /** The paper's name as printed beside the scale ("Letter"); empty to leave it out. */
    public MapSheet withPaperName(String name) {
        return new MapSheet(painter, overlays, area, centre, scale, title, sheetLabel, edges, index, notesHeading, notes,
                geo, name);
    }

    public TitleInfo title() {
        return title;
    }

    /** The page layout for a page of this size: panel right of the frame when wider than tall, else below. */
    public static Layout layout(double w, double h) {
        double bottom = h - MARGIN - FOOTER;
        if (w >= h) {
            double pw = Math.min(220, w * 0.3);
            double px = w - MARGIN - pw;
            Rectangle2D frame = new Rectangle2D.Double(MARGIN + GAP, MARGIN + GAP, px - GAP - (MARGIN + GAP) - 6,
                    bottom - GAP - (MARGIN + GAP));
            double y = MARGIN;
            Rectangle2D t = new Rectangle2D.Double(px, y, pw, 158);
            Rectangle2D f = new Rectangle2D.Double(px, y + 162, pw, 42);
            double rest = bottom - (y + 208);
            Rectangle2D l = new Rectangle2D.Double(px, y + 208, pw, rest * 0.6);
            Rectangle2D n = new Rectangle2D.Double(px, y + 208 + rest * 0.6 + 4, pw, rest * 0.4 - 4);
            return new Layout(frame, t, f, l, n);
        }
        double ph = Math.min(270, h * 0.34);
        double py = bottom - ph;
        Rectangle2D frame = new Rectangle2D.Double(MARGIN + GAP, MARGIN + GAP, w - 2 * (MARGIN + GAP), py - GAP - 6 - (MARGIN + GAP));
        double cw = (w - 2 * MARGIN - 8) / 2;
        Rectangle2D t = new Rectangle2D.Double(MARGIN, py, cw, 158);
        Rectangle2D f = new Rectangle2D.Double(MARGIN, py + 162, cw, 42);
        Rectangle2D n = new Rectangle2D.Double(MARGIN, py + 208, cw, ph - 208);
        Rectangle2D l = new Rectangle2D.Double(MARGIN + cw + 8, py, cw, ph);
        return new Layout(frame, t, f, l, n);
    }

    /** The scale denominator this sheet is drawn at on a page of the given size. */
    public int scaleFor(double w, double h) {
        if (scale > 0) return scale;
        Layout lay = layout(w, h);
        Envelope e = new Envelope(area);
        if (!e.isNull()) e.expandBy(Math.max(e.getWidth(), e.getHeight()) * 0.08);
        return MapScales.fitting(e, lay.frame().getWidth(), lay.frame().getHeight(), unit());
    }

    /** The viewport of the map frame on a page of the given size. */
    public Viewport viewport(double w, double h) {
        Layout lay = layout(w, h);
        int d = scaleFor(w, h);
        double cx;
        double cy;
        if (centre != null) {
            cx = centre[0];
            cy = centre[1];
        } else if (!area.isNull()) {
            cx = (area.getMinX() + area.getMaxX()) / 2;
            cy = (area.getMinY() + area.getMaxY()) / 2;
        } else {
            Envelope ext = painter.scene().extent();
            cx = ext.isNull() ? 0 : (ext.getMinX() + ext.getMaxX()) / 2;
            cy = ext.isNull() ? 0 : (ext.getMinY() + ext.getMaxY()) / 2;
        }
        return new Viewport(cx, cy, MapScales.crsUnitsPerPoint(d, unit()), (int) Math.floor(lay.frame().getWidth()),
                (int) Math.floor(lay.frame().getHeight()));
    }

    private LinearUnit unit() {
        return painter.scene().network().crs().unit();
    }

    @Override
    public void paint(Graphics2D g, double w, double h) {
        Layout lay = layout(w, h);
        Viewport v = viewport(w, h);
        MapStyle s = painter.style();
        g.setColor(Color.WHITE);
        g.fill(new Rectangle2D.Double(0, 0, w, h));
        AffineTransform old = g.getTransform();
        Shape oldClip = g.getClip();
        g.translate(lay.frame().getX(), lay.frame().getY());
        List<LegendEntry> legend = painter.paint(g, v, overlays);
        g.clipRect(0, 0, v.width(), v.height());
        paintIndex(g, v, s);
        g.setTransform(old);
        g.setClip(oldClip);
        g.setColor(Color.BLACK);
        g.setStroke(new BasicStroke(1.2f));
        g.draw(new Rectangle2D.Double(lay.frame().getX(), lay.frame().getY(), v.width(), v.height()));
        paintEdges(g, lay.frame(), v);
        paintTitle(g, lay.title(), v, w, h);
        paintFurniture(g, lay.furniture(), v, s);
        Rectangle2D[] ln = split(lay.legend(), lay.notes(), legend.size(), s);
        Legend.paint(g, ln[0], legend, s);
        paintNotes(g, ln[1]);
        g.setColor(Color.BLACK);
        g.setFont(font(Font.PLAIN, 7));
        TableSheets.Footer.paint(g, w, h, MARGIN, sheetLabel.isEmpty() ? null : sheetLabel);
    }

    /**
     * Shares the legend and notes boxes (the notes box below the legend, or beside it)
     * between the two: the legend gets the height its entries need, the notes at least
     * three lines when there are notes.
     */
    private Rectangle2D[] split(Rectangle2D legendBox, Rectangle2D notesBox, int entries, MapStyle s) {
        if (notesBox.getX() != legendBox.getX()) return new Rectangle2D[] {legendBox, notesBox};
        double top = legendBox.getY();
        double bottom = notesBox.getMaxY();
        double rowH = Math.max(s.symbolPx() * 1.7, 12);
        double need = 20 + entries * rowH;
        double minNotes = notes.isEmpty() && notesHeading.isEmpty() ? 0 : 14 + 3 * 9;
        double lh = Math.min(need, bottom - top - minNotes);
        return new Rectangle2D[] {new Rectangle2D.Double(legendBox.getX(), top, legendBox.getWidth(), lh),
            new Rectangle2D.Double(notesBox.getX(), top + lh + 6, notesBox.getWidth(), bottom - top - lh - 6)};
    }

    private void paintIndex(Graphics2D g, Viewport v, MapStyle s) {
        if (index.isEmpty()) return;
        g.setStroke(new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {7f, 3f}, 0f));
        g.setFont(font(Font.BOLD, 14));
        FontMetrics fm = g.getFontMetrics();
        for (IndexCell c : index) {
            Envelope e = c.ground();
            double x0 = v.screenX(e.getMinX());
            double x1 = v.screenX(e.getMaxX());
            double y0 = v.screenY(e.getMaxY());
            double y1 = v.screenY(e.getMinY());
            g.setColor(Color.BLACK);
            g.draw(new Rectangle2D.Double(x0, y0, x1 - x0, y1 - y0));
            String t = Integer.toString(c.number());
            float tx = (float) (x0 + 4);
            float ty = (float) (y0 + 3 + fm.getAscent());
            g.setColor(Color.WHITE);
            g.fill(new Rectangle2D.Double(tx - 2, y0 + 2, fm.stringWidth(t) + 4, fm.getAscent() + 2));
            g.setColor(Color.BLACK);
            g.drawString(t, tx, ty);
        }
    }

    private void paintEdges(Graphics2D g, Rectangle2D f, Viewport v) {
        if (edges.isEmpty()) return;
        g.setColor(Color.BLACK);
        g.setFont(font(Font.BOLD, 8));
        FontMetrics fm = g.getFontMetrics();
        for (Map.Entry<Side, String> e : edges.entrySet()) {
            String t = e.getValue();
            double tw = fm.stringWidth(t);
            switch (e.getKey()) {
                case NORTH -> g.drawString(t, (float) (f.getCenterX() - tw / 2), (float) (f.getY() - 4));
                case SOUTH -> g.drawString(t, (float) (f.getCenterX() - tw / 2), (float) (f.getY() + v.height() + fm.getAscent() + 2));
                case WEST, EAST -> {
                    AffineTransform old = g.getTransform();
                    double x = e.getKey() == Side.WEST ? f.getX() - 4 : f.getX() + v.width() + 4;
                    g.translate(x, f.getCenterY());
                    g.rotate(e.getKey() == Side.WEST ? -Math.PI / 2 : Math.PI / 2);
                    g.drawString(t, (float) (-tw / 2), 0f);
                    g.setTransform(old);
                }
            }
        }
    }

    private void paintTitle(Graphics2D g, Rectangle2D r, Viewport v, double w, double h) {
        g.setColor(Color.BLACK);
        g.setStroke(new BasicStroke(0.8f));
        g.draw(r);
        double x = r.getX() + 5;
        double y = r.getY() + 4;
        double width = r.getWidth() - 10;
        y = lines(g, font(Font.BOLD, 10), title.project(), x, y, width, 2);
        if (!title.phase().isEmpty()) y = lines(g, font(Font.PLAIN, 8), (title.phase().startsWith("Phase ") ? "" : "Phase: ") + title.phase(), x, y, width, 2);
        y = lines(g, font(Font.BOLD, 8.5f), title.subject(), x, y, width, 3);
        Font small = font(Font.PLAIN, 7);
        String made = "Prepared " + WHEN.format(title.made()) + (title.preparedBy().isEmpty() ? "" : " by " + title.preparedBy());
        y = lines(g, small, made, x, y, width, 2);
        if (!title.networkFile().isEmpty()) {
            String nf = "Network: " + title.networkFile()
                    + (title.networkDate() == null ? "" : " (" + WHEN.format(title.networkDate()) + ")");
            y = lines(g, small, nf, x, y, width, 2);
        }
        int d = scaleFor(w, h);
        String sc = "Scale " + MapScales.label(d) + (paperName.isEmpty() ? "" : " on " + paperName) + " printed at 100 %";
        y = lines(g, font(Font.BOLD, 8), sc, x, y, width, 2);
        String grid = gridText(v);
        if (!grid.isEmpty()) y = lines(g, small, grid, x, y, width, 2);
        if (!sheetLabel.isEmpty()) lines(g, font(Font.BOLD, 8), sheetLabel, x, y, width, 1);
    }

    private String gridText(Viewport v) {
        if (geo == null) return "";
        int spacing = UsngGrid.spacingFor(unit().toMetres(v.scale()));
        try {
            GridReference c = geo.gridReference(v.centerX(), v.centerY());
            String lines = spacing == 0 ? "" : ", lines every " + (spacing >= 1000 ? spacing / 1000 + " km" : spacing + " m");
            return "Grid: US National Grid " + c.gridZone() + " " + c.squareId() + lines + "; centre "
                    + c.format(GridReference.Precision.M10);
        } catch (IllegalArgumentException e) {
            return "Grid: no US National Grid reference here (" + e.getMessage() + ")";
        }
    }

    private void paintFurniture(Graphics2D g, Rectangle2D r, Viewport v, MapStyle s) {
        Rectangle2D bar = new Rectangle2D.Double(r.getX(), r.getY() + 8, r.getWidth() - 50, r.getHeight() - 12);
        ScaleBar.paint(g, bar, v, unit(), s);
        double angle = geo == null ? 0 : NorthArrow.trueNorth(geo, v);
        NorthArrow.paint(g, new Rectangle2D.Double(r.getMaxX() - 40, r.getY(), 36, r.getHeight()), angle, s);
    }

    private void paintNotes(Graphics2D g, Rectangle2D r) {
        if (notes.isEmpty() && notesHeading.isEmpty()) return;
        g.setColor(Color.BLACK);
        double y = lines(g, font(Font.BOLD, 8), notesHeading, r.getX() + 2, r.getY(), r.getWidth() - 4, 1);
        Font f = font(Font.PLAIN, 7);
        g.setFont(f);
        FontMetrics fm = g.getFontMetrics();
        int room = (int) ((r.getMaxY() - y) / fm.getHeight());
        float x = (float) (r.getX() + 2);
        if (notes.isEmpty() && room > 0) g.drawString("(none)", x, (float) (y + fm.getAscent()));
        for (int i = 0; i < notes.size() && room > 0; i++) {
            List<String> ls = TableSheets.Footer.wrap(notes.get(i), fm, r.getWidth() - 12);
            // a note is drawn whole, wrapped, or not at all (then counted in the line below): never cut mid-sentence
            boolean last = i == notes.size() - 1;
            if (room < ls.size() + (last ? 0 : 1)) {
                g.drawString("... and " + (notes.size() - i) + " more (see the lists)", x, (float) (y + fm.getAscent()));
                break;
            }
            for (int k = 0; k < ls.size(); k++) {
                g.drawString(ls.get(k), k == 0 ? x : x + 8, (float) (y + fm.getAscent()));
                y += fm.getHeight();
                room--;
            }
        }
    }

    /** Draws {@code text} wrapped to {@code width}, at most {@code max} lines; returns the y below it. */
    private static double lines(Graphics2D g, Font f, String text, double x, double y, double width, int max) {
        if (text == null || text.isEmpty()) return y;
        g.setFont(f);
        FontMetrics fm = g.getFontMetrics();
        List<String> ls = new ArrayList<>(TableSheets.Footer.wrap(text, fm, width));
        if (ls.size() > max) {
            List<String> cut = new ArrayList<>(ls.subList(0, max));
            cut.set(max - 1, TableSheets.fit(cut.get(max - 1) + " " + ls.get(max), fm, width));
            ls = cut;
        }
        for (String l : ls) {
            g.drawString(l, (float) x, (float) (y + fm.getAscent()));
            y += fm.getHeight();
        }
        return y + 2;
    }

    static Font font(int style, float size) {
        return new Font(ReportFonts.family(), style, 10).deriveFont(size);
    }

    /** The light map style with the report font (so map text is real text in a PDF) and symbols sized for paper. */
    public static MapStyle printStyle() {
        MapStyle l = MapStyle.LIGHT;
        return new MapStyle("print", l.background(), l.foreground(), l.halo(), l.street(), l.streetLabel(),
                l.systemColours(), l.service(), l.critical(), l.station(), l.tap(), l.source(), l.gasOff(), l.hazard(),
                l.isolation(), l.grid(), font(Font.PLAIN, 7), 2.2f, 4f, 7.5, 2.0, 3.5, 0.3);
    }
}
