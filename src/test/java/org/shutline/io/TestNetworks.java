package org.shutline.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * A small invented network written as GeoJSON files (EPSG:32618, metres), one per
 * layer, for conversion with ogr2ogr.
 *
 * <pre>
 *  SRC1 (IP1)                      streets: Quarry Lane along y = 4 300 010
 *   *---- M4 (IP1) ---- S1 ----M1 (LP1)----V1----M2 (LP1, abandoned)
 *                        |T1         |SV1
 *                       M3 (LP1, proposed, two parts)    SV2
 * </pre>
 */
final class TestNetworks {
    private TestNetworks() {}

    static final double X0 = 500000;
    static final double Y0 = 4300000;

    static String crs() {
        return "\"crs\":{\"type\":\"name\",\"properties\":{\"name\":\"urn:ogc:def:crs:EPSG::32618\"}},";
    }

    static String collection(String... features) {
        return "{\"type\":\"FeatureCollection\"," + crs() + "\"features\":[" + String.join(",", features) + "]}";
    }

    static String feature(String geometry, String props) {
        return "{\"type\":\"Feature\",\"geometry\":" + geometry + ",\"properties\":{" + props + "}}";
    }

    static String point(double dx, double dy) {
        return "{\"type\":\"Point\",\"coordinates\":[" + (X0 + dx) + "," + (Y0 + dy) + "]}";
    }

    static String line(double... d) {
        return "{\"type\":\"LineString\",\"coordinates\":" + coords(d) + "}";
    }

    static String coords(double... d) {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < d.length; i += 2) sb.append(i == 0 ? "" : ",").append('[').append(X0 + d[i]).append(',').append(Y0 + d[i + 1]).append(']');
        return sb.append(']').toString();
    }

    static String mains() {
        return collection(
                feature(line(100, 0, 200, 0), "\"main_id\":\"M1\",\"system_id\":\"LP1\",\"status\":\"Active\",\"material\":\"PE\",\"diam_mm\":114.3,\"maop_kpa\":3.45,\"install_yr\":1998"),
                feature(line(200, 0, 300, 0, 300, 50), "\"main_id\":\"M2\",\"system_id\":\"LP1\",\"status\":\"ABANDONED\",\"material\":\"cast iron\",\"diam_mm\":152.4,\"maop_kpa\":null,\"install_yr\":1931"),
                feature("{\"type\":\"MultiLineString\",\"coordinates\":[" + coords(100, 0, 100, -80) + "," + coords(100, -80, 160, -80) + "]}",
                        "\"main_id\":\"M3\",\"system_id\":\"LP1\",\"status\":\"proposed\",\"material\":\"PE\",\"diam_mm\":60.3,\"maop_kpa\":3.45,\"install_yr\":null"),
                feature(line(0, 0, 99, 0), "\"main_id\":\"M4\",\"system_id\":\"IP1\",\"status\":\"actve\",\"material\":\"steel\",\"diam_mm\":168.3,\"maop_kpa\":400.0,\"install_yr\":1975"));
    }

    static String valves() {
        return collection(
                feature(point(200, 0), "\"valve_id\":\"V1\",\"system_id\":\"LP1\",\"kind\":\"Main\",\"normal\":\"open\",\"operable\":\"YES\",\"checked\":\"2024-03-15\""),
                feature(point(50, 0), "\"valve_id\":\"V2\",\"system_id\":\"IP1\",\"kind\":\"station\",\"normal\":\"CLOSED\",\"operable\":\"Unknown\",\"checked\":null"));
    }

    static String stations() {
        return collection(feature(point(99.5, 0), "\"station_id\":\"S1\",\"in_sys\":\"IP1\",\"out_sys\":\"LP1\",\"set_kpa\":1.74,"
                + "\"monitor_kpa\":2.2,\"relief_kpa\":null,\"name\":\"Millbrook Gate\""));
    }

    static String taps() {
        return collection(feature(point(150, 0), "\"tap_id\":\"T1\",\"station_id\":\"S1\",\"device\":\"Worker\""));
    }

    static String services() {
        return collection(
                feature(point(150, 20), "\"service_id\":\"SV1\",\"system_id\":\"LP1\",\"class\":\"Residential\",\"meters\":2,\"critical\":null,\"main_id\":\"M1\",\"address\":\"12 Quarry Lane\""),
                feature(point(250, 20), "\"service_id\":\"SV2\",\"system_id\":\"LP1\",\"class\":\"critical\",\"meters\":null,\"critical\":\"clinic\",\"main_id\":null,\"address\":\"5 Rue \u00c9lan\""));
    }

    static String sources() {
        return collection(feature(point(0, 0), "\"source_id\":\"SRC1\",\"system_id\":\"IP1\",\"kpa\":400"));
    }

    static String streets() {
        return collection(feature(line(-20, 10, 320, 10), "\"name\":\"Quarry Lane\",\"lanes\":2"));
    }

    /** Writes all seven layers into {@code dir}; returns the files. */
    static List<Path> writeAll(Path dir) throws IOException {
        List<Path> out = new ArrayList<>();
        out.add(write(dir, "mains", mains()));
        out.add(write(dir, "valves", valves()));
        out.add(write(dir, "stations", stations()));
        out.add(write(dir, "sense_taps", taps()));
        out.add(write(dir, "services", services()));
        out.add(write(dir, "sources", sources()));
        out.add(write(dir, "streets", streets()));
        return out;
    }

    static Path write(Path dir, String name, String json) throws IOException {
        Files.createDirectories(dir);
        Path p = dir.resolve(name + ".geojson");
        Files.writeString(p, json, StandardCharsets.UTF_8);
        return p;
    }
}
