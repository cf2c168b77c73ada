package org.shutline.render;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;
import org.shutline.model.ContextLayer;
import org.shutline.model.CrsInfo;
import org.shutline.model.LinearUnit;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.SenseTap;
import org.shutline.model.Service;
import org.shutline.model.ServiceClass;
import org.shutline.model.Source;
import org.shutline.model.Station;
import org.shutline.model.TapDevice;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;

/**
 * A small hand-drawn network in WGS 84 / UTM zone 18N (EPSG:32618), coordinates
 * relative to the origin (X0, Y0) = (323 000, 4 306 000), in metres:
 *
 * <pre>
 *  y=100  SRC*==========M1 (HP, active)=========[ST]--M2 (LP, active)--V2<>--V1(#)--V3[x]--T1v--
 *  y= 60                                                            s1 .    C1 [+]
 *  y= 50  ------------------------- Alder Row (street) ------------------------------------
 *  y=  0                                               - - M3 (LP, proposed) - - - - - - - -
 *  y=-100                                             . . M4 (LP, abandoned) . . . . . . .
 *         x=0                                   x=200     x=250   x=300  x=350  x=380  x=400
 * </pre>
 * V1 closed/operable, V2 open/unknown, V3 open/inoperable; T1 senses for ST; s1 an
 * ordinary service, C1 a critical customer (a clinic). Nothing lies below y = -120.
 */
final class RenderFixtures {
    static final double X0 = 323_000;
    static final double Y0 = 4_306_000;
    static final CrsInfo UTM18N = new CrsInfo("WGS 84 / UTM zone 18N", 32618, null, LinearUnit.METRE);
    static final GeometryFactory GF = new GeometryFactory();

    private RenderFixtures() {}

    static Point pt(double x, double y) {
        return GF.createPoint(new Coordinate(X0 + x, Y0 + y));
    }

    static LineString line(double... xy) {
        Coordinate[] cs = new Coordinate[xy.length / 2];
        for (int i = 0; i < cs.length; i++) cs[i] = new Coordinate(X0 + xy[2 * i], Y0 + xy[2 * i + 1]);
        return GF.createLineString(cs);
    }

    static Polygon box(double x0, double y0, double x1, double y1) {
        return GF.createPolygon(new Coordinate[] {
            new Coordinate(X0 + x0, Y0 + y0), new Coordinate(X0 + x1, Y0 + y0), new Coordinate(X0 + x1, Y0 + y1),
            new Coordinate(X0 + x0, Y0 + y1), new Coordinate(X0 + x0, Y0 + y0)});
    }

    static Network town() {
        return town(true);
    }

    static Network town(boolean withStation) {
        List<Main> mains = List.of(
                new Main("M1", "HP", MainStatus.ACTIVE, "steel", 150.0, 400.0, 1988, line(0, 100, 200, 100)),
                new Main("M2", "LP", MainStatus.ACTIVE, "PE", 100.0, 3.0, 1995, line(200, 100, 400, 100)),
                new Main("M3", "LP", MainStatus.PROPOSED, "PE", 100.0, 3.0, null, line(200, 0, 400, 0)),
                new Main("M4", "LP", MainStatus.ABANDONED, "cast iron", 100.0, 3.0, 1931, line(200, -100, 400, -100)));
        List<Valve> valves = List.of(
                new Valve("V1", "LP", ValveKind.MAIN, NormalPosition.CLOSED, Operability.YES, null, pt(300, 100)),
                new Valve("V2", "LP", ValveKind.MAIN, NormalPosition.OPEN, Operability.UNKNOWN, null, pt(250, 100)),
                new Valve("V3", "LP", ValveKind.MAIN, NormalPosition.OPEN, Operability.NO, null, pt(350, 100)));
        List<Station> stations = withStation
                ? List.of(new Station("ST", "HP", "LP", 1.7, 2.2, null, "Kestrel Yard", pt(200, 100)))
                : List.of();
        List<SenseTap> taps = withStation
                ? List.of(new SenseTap("T1", "ST", TapDevice.BOTH, pt(380, 100)))
                : List.of();
        List<Service> services = List.of(
                new Service("s1", "LP", ServiceClass.RESIDENTIAL, 1, "", "M2", "4 Alder Row", pt(300, 60)),
                new Service("C1", "LP", ServiceClass.CRITICAL, 1, "clinic", "M2", "9 Alder Row", pt(350, 60)));
        List<Source> sources = List.of(new Source("SRC", "HP", 700.0, pt(0, 100)));
        ContextLayer streets = new ContextLayer("streets", List.of(
                new ContextLayer.Item(line(0, 50, 400, 50), Map.of("name", "Alder Row"))));
        return new Network("town (test)", UTM18N, mains, valves, stations, taps, services, sources,
                List.of(streets), List.of());
    }

    /** 600 x 400 px at 1 m/px centred on (200, 0): screen x = x + 100, screen y = 200 - y. */
    static Viewport view() {
        return new Viewport(X0 + 200, Y0, 1.0, 600, 400);
    }

    static BufferedImage paint(MapPainter painter, Viewport v, MapOverlays overlays, List<LegendEntry> legendOut) {
        BufferedImage img = new BufferedImage(v.width(), v.height(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        List<LegendEntry> legend = painter.paint(g, v, overlays);
        g.dispose();
        if (legendOut != null) legendOut.addAll(legend);
        return img;
    }

    static int rgb(BufferedImage img, double x, double y) {
        return img.getRGB((int) Math.floor(x), (int) Math.floor(y)) & 0xFFFFFF;
    }

    static int rgb(java.awt.Color c) {
        return c.getRGB() & 0xFFFFFF;
    }

    /** Number of pixels of exactly colour {@code c} in the rectangle [x0, x1) x [y0, y1). */
    static int count(BufferedImage img, java.awt.Color c, int x0, int y0, int x1, int y1) {
        int want = rgb(c);
        int n = 0;
        for (int y = y0; y < y1; y++) {
            for (int x = x0; x < x1; x++) {
                if ((img.getRGB(x, y) & 0xFFFFFF) == want) n++;
            }
        }
        return n;
    }

    /** Number of pixels that are not of colour {@code c} in the rectangle [x0, x1) x [y0, y1). */
    static int countOther(BufferedImage img, java.awt.Color c, int x0, int y0, int x1, int y1) {
        return (x1 - x0) * (y1 - y0) - count(img, c, x0, y0, x1, y1);
    }
}
