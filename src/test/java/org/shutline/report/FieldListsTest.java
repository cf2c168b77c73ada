package org.shutline.report;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.shutline.io.WriteLayer;
import org.shutline.model.ContextLayer;
import org.shutline.model.CrsInfo;
import org.shutline.model.LinearUnit;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.Source;
import org.shutline.model.Tolerances;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;
import org.shutline.render.GeoTransform;
import org.shutline.render.GridReference;
import org.shutline.topology.NetworkBuilder;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;

/**
 * The valve list on a hand-built network in WGS 84 / UTM zone 18N (EPSG:32618) with its
 * valve on the test point of the US National Grid standard:
 *
 * <pre>
 *   SRC *-------------(V-1)------------- M-1 (200 m along northing 4 306 483.048)
 *     E 323 400      E 323 486.737      E 323 600
 *   street "Mall Drive" 3 m south, "Test Street" crossing at E 323 450
 * </pre>
 */
class FieldListsTest {
    private static final GeometryFactory GF = new GeometryFactory();
    private static final CrsInfo UTM18N = new CrsInfo("WGS 84 / UTM zone 18N", 32618,
            "+proj=utm +zone=18 +datum=WGS84 +units=m +no_defs", LinearUnit.METRE);
    // FGDC-STD-011-2001 test point 38.8895 N, 77.0352 W in UTM 18N, from GeographicLib GeoConvert -u -p 3:
    // "18n 323486.737 4306483.048"
    private static final double E = 323486.737;
    private static final double N = 4306483.048;

    private static ContextLayer.Item street(String name, double x0, double y0, double x1, double y1) {
        return new ContextLayer.Item(GF.createLineString(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y1)}),
                Map.of("name", name));
    }

    static NetworkState network() {
        Main m = new Main("M-1", "LP", MainStatus.ACTIVE, "PE", 100.0, 7.0, 2001,
                GF.createLineString(new Coordinate[] {new Coordinate(323400, N), new Coordinate(323600, N)}));
        Valve v = new Valve("V-1", "LP", ValveKind.MAIN, NormalPosition.OPEN, Operability.UNKNOWN, LocalDate.of(2024, 3, 5),
                GF.createPoint(new Coordinate(E, N)));
        Source s = new Source("SRC", "LP", 7.0, GF.createPoint(new Coordinate(323400, N)));
        ContextLayer streets = new ContextLayer("streets", List.of(street("Mall Drive", 323300, N - 3, 323700, N - 3),
                street("Test Street", 323450, N - 200, 323450, N + 200)));
        Network n = new Network("fgdc.gpkg", UTM18N, List.of(m), List.of(v), List.of(), List.of(), List.of(), List.of(s),
                List.of(streets), List.of());
        return NetworkState.of(NetworkBuilder.build(n, Tolerances.DEFAULT));
    }

    static ReportView view(NetworkState s) {
        ReportView.OperatedValve v = new ReportView.OperatedValve(1, "V-1", E, N, true, ValveKind.MAIN, Operability.UNKNOWN,
                LocalDate.of(2024, 3, 5), true, List.of("V-7", "V-9"));
        return new ReportView(ReportView.Kind.INCIDENT, "test", "", 0, s, null, List.of(v), new BitSet(), List.of(),
                null, FeedTrace.run(s));
    }

    @Test
    void gridColumnMatchesThePublishedTestPoint() {
        NetworkState s = network();
        GeoTransform geo = GeoTransform.forCrs(UTM18N).orElseThrow();
        StreetLocator streets = new StreetLocator(s.network().context(), LinearUnit.METRE);
        // FGDC-STD-011-2001 (trade-facts.md): 38.8895 N, 77.0352 W -> 18S UJ 23486 06483 (1 m), 18S UJ 234 064 (100 m);
        // digits are truncated, so the 10 m reference is 18S UJ 2348 0648
        assertThat(FieldLists.valveRows(view(s), geo, GridReference.Precision.M1, streets).get(0).get(3))
                .isEqualTo("18S UJ 23486 06483");
        List<String> row = FieldLists.valveRows(view(s), geo, GridReference.Precision.M10, streets).get(0);
        assertThat(row.get(3)).isEqualTo("18S UJ 2348 0648");
        assertThat(FieldLists.valveRows(view(s), geo, GridReference.Precision.M100, streets).get(0).get(3))
                .isEqualTo("18S UJ 234 064");
        assertThat(row).containsExactly("1", "", "V-1", "18S UJ 2348 0648", "on Mall Drive, 37 m east of Test Street", "main",
                "unknown, past inspection", "2024-03-05", "close", "close V-7, V-9");
        assertThat(FieldLists.VALVE_HEADER).hasSameSizeAs(row);
        assertThat(FieldLists.valveRows(view(s), null, GridReference.Precision.M10, streets).get(0).get(3)).isEmpty();
    }

    @Test
    void geoJsonCarriesCrsTypesAndNullGeometry(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        List<Geometry> gs = new ArrayList<>(Arrays.asList(GF.createPoint(new Coordinate(E, N)), null));
        List<List<Object>> rows = new ArrayList<>();
        rows.add(Arrays.asList("V-1", 3, 2.5, LocalDate.of(2024, 3, 5)));
        rows.add(Arrays.asList("no place", null, null, null));
        WriteLayer l = WriteLayer.of("t", WriteLayer.GeometryKind.POINT, List.of(new WriteLayer.Column("id", WriteLayer.ColumnType.TEXT),
                new WriteLayer.Column("n", WriteLayer.ColumnType.INTEGER), new WriteLayer.Column("r", WriteLayer.ColumnType.REAL),
                new WriteLayer.Column("d", WriteLayer.ColumnType.DATE)), gs, rows);
        Path f = dir.resolve("t.geojson");
        GeoJsonExport.write(f, l, UTM18N);
        JsonNode root = new ObjectMapper().readTree(Files.readString(f));
        assertThat(root.get("type").asText()).isEqualTo("FeatureCollection");
        assertThat(root.get("crs").get("properties").get("name").asText()).isEqualTo("urn:ogc:def:crs:EPSG::32618");
        JsonNode f0 = root.get("features").get(0);
        assertThat(f0.get("geometry").get("type").asText()).isEqualTo("Point");
        assertThat(f0.get("geometry").get("coordinates").get(0).asDouble()).isEqualTo(E); // 3 decimals kept: millimetres
        assertThat(f0.get("geometry").has("crs")).isFalse();
        assertThat(f0.get("properties").get("n").isIntegralNumber()).isTrue();
        assertThat(f0.get("properties").get("r").asDouble()).isEqualTo(2.5);
        assertThat(f0.get("properties").get("d").asText()).isEqualTo("2024-03-05");
        JsonNode f1 = root.get("features").get(1);
        assertThat(f1.get("geometry").isNull()).isTrue();
        assertThat(f1.get("properties").get("n").isNull()).isTrue();
        String unknown = GeoJsonExport.format(l, CrsInfo.UNKNOWN_METRES);
        JsonNode u = new ObjectMapper().readTree(unknown);
        assertThat(u.has("crs")).isFalse();
        assertThat(u.get("shutline_crs").get("unit").asText()).isEqualTo("m");
    }

    @Test
    void ergGuide115IsTheDefaultIsolationDistance() {
        // Emergency Response Guidebook (2024), Guide 115 (natural gas): initial isolation at least 100 m (330 ft)
        assertThat(ReportView.ERG_115_ISOLATION_M).isEqualTo(100.0);
        NetworkState s = network();
        ReportView v = new ReportView(ReportView.Kind.INCIDENT, "t", "", 0, s, null, List.of(), new BitSet(), List.of(),
                org.shutline.render.IsolationRing.of(E, N, ReportView.ERG_115_ISOLATION_M), FeedTrace.run(s));
        WriteLayer ring = ResultLayers.ring(v);
        assertThat(ring.value(0, ring.columnIndex("basis")).toString()).contains("Guide 115").contains("100 m");
        // a 64-sided polygon inscribed in the 100 m circle: area just under pi r^2
        assertThat(ring.geometry(0).getArea()).isBetween(0.99 * Math.PI * 1e4, Math.PI * 1e4);
    }
}
