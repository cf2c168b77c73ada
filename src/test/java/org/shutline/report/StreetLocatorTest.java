package org.shutline.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.shutline.model.ContextLayer;
import org.shutline.model.LinearUnit;

/**
 * Location descriptions on a hand-built street grid (CRS units):
 *
 * <pre>
 *   y=200  ========== Birch Street ==========
 *          |               |
 *          Quarry Lane     Kiln Street
 *          |               |
 *   y=100  ==== Alder Row ====(two pieces)====
 *          |               |
 *   y=0    x=0             x=100
 *
 *   far away: Lone Road, y=1000, x=2000..2100, crossing nothing
 * </pre>
 */
class StreetLocatorTest {
    private static final GeometryFactory GF = new GeometryFactory();

    private static ContextLayer.Item street(String name, double x0, double y0, double x1, double y1) {
        return new ContextLayer.Item(GF.createLineString(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y1)}),
                Map.of("NAME", name));
    }

    private static List<ContextLayer> grid() {
        List<ContextLayer.Item> items = new ArrayList<>();
        items.add(street("Alder Row", -50, 100, 40, 100));
        items.add(street("Alder Row", 40, 100, 150, 100));
        items.add(street("Birch Street", -50, 200, 150, 200));
        items.add(street("Quarry Lane", 0, -50, 0, 250));
        items.add(street("Kiln Street", 100, -50, 100, 250));
        items.add(street("Lone Road", 2000, 1000, 2100, 1000));
        ContextLayer parcels = new ContextLayer("parcels", List.of(street("Not A Street", 30, 90, 30, 110)));
        return List.of(new ContextLayer("Streets", items), parcels);
    }

    @Test
    void pointOnAStreetIsMeasuredFromTheNearestCrossing() {
        StreetLocator s = new StreetLocator(grid(), LinearUnit.METRE);
        assertThat(s.streetCount()).isEqualTo(5); // the two Alder Row pieces are one street; parcels are ignored
        assertThat(s.describe(35, 102)).isEqualTo("on Alder Row, 35 m east of Quarry Lane");
        assertThat(s.describe(100, 160)).isEqualTo("on Kiln Street, 40 m south of Birch Street");
        assertThat(s.describe(72, 98)).isEqualTo("on Alder Row, 28 m west of Kiln Street");
    }

    @Test
    void pointAtACrossingAndPointAwayFromTheStreet() {
        StreetLocator s = new StreetLocator(grid(), LinearUnit.METRE);
        assertThat(s.describe(0.2, 100.4)).isEqualTo("on Quarry Lane at Alder Row");
        // 30 m from Alder Row is more than ON_STREET_M (15 m): said as an offset
        assertThat(s.describe(40, 130)).isEqualTo("30 m north of Alder Row, 40 m east of Quarry Lane");
    }

    @Test
    void streetWithoutCrossingAndNoStreetNear() {
        StreetLocator s = new StreetLocator(grid(), LinearUnit.METRE);
        assertThat(s.describe(2050, 1001)).isEqualTo("on Lone Road");
        assertThat(s.describe(9000, 9000)).isEmpty();
        assertThat(new StreetLocator(List.of(), LinearUnit.METRE).describe(35, 102)).isEmpty();
    }

    @Test
    void footCrsSaysFeet() {
        StreetLocator s = new StreetLocator(grid(), LinearUnit.INTERNATIONAL_FOOT);
        assertThat(s.describe(35, 102)).isEqualTo("on Alder Row, 35 ft east of Quarry Lane");
    }

    @Test
    void aValveOnAMainNearACornerIsOnTheStreetItsMainFollows() {
        // The main runs along Alder Row 3 m north of its line (y = 103); the valve on it at x = 99
        // is 1 m from Kiln Street's line (x = 100) but 3 m from Alder Row's:
        //
        //          Kiln Street
        //              |
        //   ====main===V+======  y = 103
        //   ---Alder Row-+-----  y = 100
        //              |
        var main = GF.createLineString(new Coordinate[] {new Coordinate(-50, 103), new Coordinate(150, 103)});
        StreetLocator plain = new StreetLocator(grid(), LinearUnit.METRE);
        assertThat(plain.describe(99, 103)).startsWith("on Kiln Street");
        StreetLocator withMains = new StreetLocator(grid(), LinearUnit.METRE, List.of(main));
        assertThat(withMains.describe(99, 103)).isEqualTo("on Alder Row, 1 m west of Kiln Street");
        // a point off every main keeps the plain rule
        assertThat(withMains.describe(99, 110)).startsWith("on Kiln Street");
        // a main along no street (45 degrees): the plain nearest street, Kiln Street 1 m away (Alder Row 4 m)
        var diagonal = GF.createLineString(new Coordinate[] {new Coordinate(59, 56), new Coordinate(139, 136)});
        assertThat(new StreetLocator(grid(), LinearUnit.METRE, List.of(diagonal)).describe(99, 96)).startsWith("on Kiln Street");
    }

    @Test
    void sampleValveCiEIsOnElderStreet() throws Exception {
        // sample-gis/README.md: V-CI-E at 512 499, 4 890 403 on the LP-SOUTH main 3 m north of Elder Street
        // (y 4 890 400), 1 m west of Weir Lane's line (x 512 500)
        org.shutline.model.Network net = org.shutline.io.NetworkReader.read(java.nio.file.Path.of("sample-gis/tallowmere.gpkg"),
                org.shutline.io.FieldMapping.DEFAULT);
        StreetLocator s = new StreetLocator(net.context(), net.crs().unit(),
                net.mains().stream().map(org.shutline.model.Main::geometry).toList());
        var v = net.valves().stream().filter(x -> x.id().equals("V-CI-E")).findFirst().orElseThrow();
        assertThat(s.describe(v.geometry().getX(), v.geometry().getY())).isEqualTo("on Elder Street, 1 m west of Weir Lane");
    }

    @Test
    void eightPointCompass() {
        Coordinate o = new Coordinate(0, 0);
        assertThat(StreetLocator.direction(o, new Coordinate(0, 5))).isEqualTo("north");
        assertThat(StreetLocator.direction(o, new Coordinate(5, 5))).isEqualTo("north-east");
        assertThat(StreetLocator.direction(o, new Coordinate(-5, -4))).isEqualTo("south-west");
        assertThat(StreetLocator.direction(o, new Coordinate(-5, 0.5))).isEqualTo("west");
    }
}
