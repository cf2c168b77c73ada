package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The order on paper is the order in the field, crews agree with the sizing, and the
 * fallbacks are complete in every output, on the sample town (sample-gis/tallowmere.gpkg).
 *
 * <p>The leak point 512470,4890150 lies in the south-east valve zone of LP-SOUTH
 * (between Alder Row and Cedar Walk): eight valves, V-015 (operability unknown) and
 * V-026 (unknown) doubtful; two crews computed from the 4 h target (156 meters =
 * 15.6 technician-hours: 4 technicians, 2 crews).
 */
class FieldOrderCommandsTest {
    static final String NET = "sample-gis/tallowmere.gpkg";
    static final String LEAK = "512470,4890150";
    static final ObjectMapper JSON = new ObjectMapper();
    /** V-015's fallback: it joins crew 1's route (the minutes are from the route, checked separately in ValveRouteTest). */
    static final String V015 = "crew 1 then closes V-024, V-023, V-022, V-021, V-020 (+";
    static final String V015_ADDS = "adds 124 services, 157 meters";
    /** V-026's fallback: the grown area is fed straight by Weir Lane Station. */
    static final String V026 = "valves alone cannot isolate: stop station ST-S1 Weir Lane Station (close V-013, V-004); adds 387 services, 497 meters";

    @TempDir static Path dir;
    static Path out;
    static CommandsTest.Run export;

    @BeforeAll
    static void exportTheLeak() {
        out = dir.resolve("leak");
        export = CommandsTest.run("export", NET, "--at", LEAK, "--out", out.toString(), "--as-of", "2026-12-01",
                "--formats", "pdf,gpkg,geojson,csv");
    }

    @Test
    void orderNumbersFollowTheCrewsRoutesDoubtfulFirst() throws Exception {
        CommandsTest.Run r = CommandsTest.run("incident", NET, "--at", LEAK, "--as-of", "2026-12-01", "--format", "json");
        CommandsTest.assertSampleRunDone(r);
        JsonNode j = JSON.readTree(r.out());
        JsonNode valves = j.get("valves_to_close");
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < valves.size(); i++) {
            assertThat(valves.get(i).get("order").asInt()).isEqualTo(i + 1);
            ids.add(valves.get(i).get("valve").asText());
        }
        // crew 1: the doubtful V-015 first, then the others feeding side first; crew 2: the doubtful V-026 first.
        // (Before: V-025 1, V-017 8, V-016 7, V-015 6 while crew 1 drove V-025, V-017, V-016, V-015.)
        assertThat(ids).containsExactly("V-015", "V-025", "V-017", "V-016", "V-026", "V-027", "V-028", "V-029");
        List<String> driven = new ArrayList<>();
        for (JsonNode c : j.get("valve_time").get("crews")) for (JsonNode v : c.get("valves")) driven.add(v.asText());
        assertThat(driven).as("the list is the crews' routes, crew 1 then crew 2").isEqualTo(ids);
        for (JsonNode v : valves) {
            int crew = v.get("crew").asInt();
            assertThat(crew).isEqualTo(v.get("order").asInt() <= 4 ? 1 : 2);
        }
        // doubtful valves come first within each crew
        for (int crew = 1; crew <= 2; crew++) {
            boolean sound = false;
            for (JsonNode v : valves) {
                if (v.get("crew").asInt() != crew) continue;
                if (!v.get("doubtful").asBoolean()) sound = true;
                else assertThat(sound).as("doubtful %s after a sound valve of crew %d", v.get("valve").asText(), crew).isFalse();
            }
        }
        assertThat(valves.get(0).get("if_it_will_not_close").asText()).startsWith(V015).endsWith(V015_ADDS);
        assertThat(valves.get(4).get("if_it_will_not_close").asText()).isEqualTo(V026);
        // the text prints the fallback right under its valve
        CommandsTest.Run t = CommandsTest.run("incident", NET, "--at", LEAK, "--as-of", "2026-12-01");
        assertThat(t.out()).containsPattern(" 1\\. V-015 +crew 1 .*\\n +if it will not close \\(operability unknown\\): "
                + java.util.regex.Pattern.quote(V015));
        assertThat(t.out()).containsPattern(" 5\\. V-026 +crew 2 .*\\n +if it will not close \\(operability unknown\\): "
                + java.util.regex.Pattern.quote(V026));
        // crews computed from the target = work packages
        assertThat(j.get("response").get("crews").asInt()).isEqualTo(2);
        assertThat(j.get("work_packages")).hasSize(2);
    }

    @Test
    void overPressureCrewsEqualPackagesBalancedWithinTheTarget() throws Exception {
        CommandsTest.Run r = CommandsTest.run("incident", NET, "--at", "512650,4890203", "--kind", "overpressure",
                "--as-of", "2026-12-01", "--format", "json");
        CommandsTest.assertSampleRunDone(r);
        JsonNode j = JSON.readTree(r.out());
        JsonNode resp = j.get("response");
        // 653 meters / 10 per technician-hour = 65.3 h; / 4 h = 16.3 -> 17 technicians -> 9 crews of 2 (common-practice rates)
        assertThat(resp.get("shutoff_crews_needed").asInt()).isEqualTo(9);
        assertThat(resp.get("crews").asInt()).isEqualTo(9);
        JsonNode wp = j.get("work_packages");
        assertThat(wp).hasSize(9);
        long meters = 0;
        for (int i = 0; i < wp.size(); i++) {
            JsonNode p = wp.get(i);
            assertThat(p.get("crew").asInt()).isEqualTo(i + 1);
            // a crew of 2 at 10 meters per technician-hour does 80 meters in the 4 h target
            assertThat(p.get("meters").asLong()).isLessThanOrEqualTo(80);
            assertThat(p.get("hours").asDouble()).isLessThanOrEqualTo(4.0);
            meters += p.get("meters").asLong();
            boolean rest = false;
            for (JsonNode v : p.get("visits")) {
                if (!v.has("critical")) rest = true;
                else assertThat(rest).as("critical customer after others in crew %d", i + 1).isFalse();
            }
        }
        assertThat(meters).isEqualTo(653);
        // with crews given, exactly that many packages, none longer than an even share plus one premises
        CommandsTest.Run two = CommandsTest.run("incident", NET, "--at", "512650,4890203", "--kind", "overpressure",
                "--crews", "2", "--as-of", "2026-12-01", "--format", "json");
        JsonNode w2 = JSON.readTree(two.out()).get("work_packages");
        assertThat(w2).hasSize(2);
        assertThat(Math.abs(w2.get(0).get("meters").asLong() - w2.get(1).get("meters").asLong())).isLessThanOrEqualTo(40);
    }

    @Test
    void csvCarriesTheWholeFallback() throws Exception {
        CommandsTest.assertSampleRunDone(export);
        List<String> csv = Files.readAllLines(out.resolve("valves.csv"));
        assertThat(csv.get(1)).startsWith("1,1,V-015,").contains(V015).contains(V015_ADDS);
        assertThat(csv.get(5)).startsWith("5,2,V-026,").contains(V026);
        assertThat(String.join("\n", csv)).doesNotContain("...");
    }

    @Test
    void pdfValveListWrapsTheFallbackInsteadOfCuttingIt() throws Exception {
        try (PDDocument doc = Loader.loadPDF(out.resolve("report.pdf").toFile())) {
            String all = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            int list = all.indexOf("Valve operation list");
            assertThat(list).isPositive();
            String table = all.substring(list);
            // wrapped cells are read back with line breaks, made blanks above
            assertThat(table).contains("V-024, V-023, V-022, V-021, V-020").contains(V015_ADDS)
                    .contains("stop station ST-S1 Weir Lane Station (close V-013, V-004)").contains("adds 387 services, 497 meters");
        }
    }

    @Test
    void geoPackageAndGeoJsonCarryTheWholeFallback() throws Exception {
        JsonNode fc = JSON.readTree(out.resolve("valves_to_operate.geojson").toFile());
        JsonNode first = fc.get("features").get(0).get("properties");
        assertThat(first.get("valve_id").asText()).isEqualTo("V-015");
        assertThat(first.get("op_order").asInt()).isEqualTo(1);
        assertThat(first.get("crew").asInt()).isEqualTo(1);
        assertThat(first.get("if_fails").asText()).startsWith(V015).endsWith(V015_ADDS);
        assumeTrue(ExportCommandTest.tool("ogrinfo"), "ogrinfo (gdal-bin) not installed: skipped");
        // GDAL ogrinfo reads the GeoPackage layer written by io.GeoPackageWriter
        String v = ExportCommandTest.exec(null, "ogrinfo", "-al", "-q", out.resolve("results.gpkg").toString(), "valves_to_operate",
                "-where", "valve_id = 'V-026'");
        assertThat(v).contains("op_order (Integer) = 5").contains("crew (Integer) = 2").contains("if_fails (String) = " + V026);
    }

    /* Cards: the over-pressure of LP-SOUTH (phases that touch it) stops ST-S1; its upstream V-004 is doubtful. */
    @Test
    void cardsGiveTheUpstreamFallbackInTextAndPdf() throws Exception {
        Path cards = dir.resolve("cards");
        CommandsTest.Run r = CommandsTest.run("cards", NET, "sample-gis/tallowmere-plan.yaml", "--out", cards.toString(),
                "--as-of", "2026-12-01");
        CommandsTest.assertSampleRunDone(r);
        String fallback = "if V-004 will not close (operability unknown): close V-005; adds 0 services, 0 meters";
        assertThat(r.out()).contains(fallback);
        try (PDDocument doc = Loader.loadPDF(cards.resolve("emergency-cards.pdf").toFile())) {
            String all = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertThat(all).contains("if V-004 will not close").contains("(operability unknown) close V-005; adds 0 services, 0 meters");
            assertThat(all).doesNotContain("V-00...");
        }
    }
}
