package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.shutline.model.ContextLayer;
import org.shutline.model.CrsInfo;
import org.shutline.model.Finding;
import org.shutline.model.LinearUnit;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.Service;
import org.shutline.model.ServiceClass;
import org.shutline.model.Severity;

/**
 * Counts and finding groups of the check report on a small hand-made network:
 *
 * <pre>
 *   IP-A ======   LP-A ------ LP-B       s1 (1 meter), s2 (3 meters) on LP-1
 *                                        s3 (2 meters) in LP-9, a system with no mains
 * </pre>
 */
class CheckReportTest {
    static final GeometryFactory GF = new GeometryFactory();

    static Network network() {
        var l = GF.createLineString(new Coordinate[] {new Coordinate(0, 0), new Coordinate(10, 0)});
        var p = GF.createPoint(new Coordinate(5, 5));
        List<Main> mains = List.of(new Main("IP-A", "IP-1", MainStatus.ACTIVE, null, null, null, null, l),
            new Main("LP-A", "LP-1", MainStatus.ACTIVE, null, null, null, null, l),
            new Main("LP-B", "LP-1", MainStatus.ABANDONED, null, null, null, null, l));
        List<Service> svc = List.of(new Service("s1", "LP-1", ServiceClass.RESIDENTIAL, 1, null, null, null, p),
            new Service("s2", "LP-1", ServiceClass.COMMERCIAL, 3, null, null, null, p),
            new Service("s3", "LP-9", ServiceClass.RESIDENTIAL, 2, null, null, null, p));
        ContextLayer streets = new ContextLayer("streets", List.of(new ContextLayer.Item(l, Map.of("name", "Weir Lane"))));
        return new Network("small", new CrsInfo("WGS 84 / UTM zone 15N", 32615, null, LinearUnit.METRE), mains,
            List.of(), List.of(), List.of(), svc, List.of(), List.of(streets), List.of());
    }

    static List<Finding> findings(boolean withError) {
        List<Finding> f = new ArrayList<>();
        for (int i = 1; i <= 6; i++) {
            f.add(Finding.at("near-miss", Severity.WARNING, "mains", i, 2 * i, "end 1.2 m from main", "M" + i));
        }
        f.add(Finding.of("shared-vertex", Severity.NOTE, "mains", "mains cross at a shared vertex", "M1", "M2"));
        if (withError) f.add(Finding.at("unknown-word", Severity.ERROR, "mains", 3, 4, "status 'actve'", "M9"));
        return f;
    }

    @Test
    void countsPerLayerAndSystem() {
        CheckReport r = CheckReport.of(network(), findings(false));
        assertThat(r.layers()).containsExactly(Map.entry("mains", 3), Map.entry("valves", 0), Map.entry("stations", 0),
            Map.entry("sense_taps", 0), Map.entry("services", 3), Map.entry("sources", 0), Map.entry("streets", 1));
        assertThat(r.systems()).containsExactly(
            Map.entry("IP-1", new CheckReport.SystemCounts(1, 0, 0)),
            Map.entry("LP-1", new CheckReport.SystemCounts(2, 2, 4)),
            Map.entry("LP-9", new CheckReport.SystemCounts(0, 1, 2)));
        assertThat(r.exitCode()).isZero();
    }

    @Test
    void textGroupsByCodeWithFiveExamplesAndSeverityOrder() {
        String t = CheckReport.of(network(), findings(true)).toText();
        assertThat(t).contains("unknown-word  ERROR  (1)", "near-miss  WARNING  (6)", "shared-vertex  NOTE  (1)");
        assertThat(t.indexOf("unknown-word")).isLessThan(t.indexOf("near-miss"));
        assertThat(t.indexOf("near-miss")).isLessThan(t.indexOf("shared-vertex"));
        assertThat(t).contains("M5: end 1.2 m from main (at 5.0, 10.0)", "... and 1 more")
            .doesNotContain("M6: end");
        assertThat(t).contains("M1, M2: mains cross at a shared vertex\n");
        assertThat(t).contains("Result: errors found (exit 1)");
        assertThat(CheckReport.of(network(), findings(false)).toText()).contains("Result: no errors (exit 0)");
    }

    @Test
    void jsonKeys() throws Exception {
        CheckReport r = CheckReport.of(network(), findings(true));
        JsonNode j = new ObjectMapper().readTree(r.toJson());
        assertThat(j.get("layers").get("mains").asInt()).isEqualTo(3);
        assertThat(j.get("layers").get("streets").asInt()).isEqualTo(1);
        assertThat(j.get("systems").get("LP-1").get("meters").asLong()).isEqualTo(4);
        assertThat(j.get("systems").get("LP-9").get("mains").asInt()).isZero();
        assertThat(j.get("findings")).hasSize(8);
        JsonNode last = j.get("findings").get(7);
        assertThat(last.get("code").asText()).isEqualTo("unknown-word");
        assertThat(last.get("severity").asText()).isEqualTo("error");
        assertThat(last.get("features").get(0).asText()).isEqualTo("M9");
        assertThat(last.get("x").asDouble()).isEqualTo(3.0);
        assertThat(last.get("message").asText()).isEqualTo("status 'actve'");
        JsonNode unlocated = j.get("findings").get(6);
        assertThat(unlocated.get("x").isNull()).isTrue();
        assertThat(j.get("errors").asBoolean()).isTrue();
        assertThat(r.exitCode()).isEqualTo(1);
    }
}
