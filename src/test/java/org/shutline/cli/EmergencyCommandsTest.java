package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.model.Caution;

/**
 * The emergency commands on the sample town (sample-gis/README.md): a leak on the
 * intermediate-pressure main M-IP-007 between V-013 and V-004, which feeds ST-S1 and
 * so the whole of LP-SOUTH (513 services, 653 meters, the care home); an over-pressure
 * of LP-SOUTH; the tables; the phase cards of a small renewal plan.
 */
class EmergencyCommandsTest {
    static final String NET = "sample-gis/tallowmere.gpkg";
    static final String PLAN = "src/test/resources/emerg/tallowmere-cards-plan.yaml";
    static final ObjectMapper JSON = new ObjectMapper();

    @TempDir Path dir;

    static CommandsTest.Run run(String... args) {
        return CommandsTest.run(args);
    }

    @Test
    void leakOnTheIntermediatePressureMainInText() {
        CommandsTest.Run r = run("incident", NET, "--at", "512547,4890597", "--system", "IP-1", "--as-of", "2026-12-01");
        CommandsTest.assertSampleRunDone(r);
        assertThat(r.out()).contains("1. V-013").contains("2. V-004")
                // the fallback printed under its valve, the extra valve joining the same crew's route
                .containsPattern("2\\. V-004 +crew 2 .*\\n +if it will not close \\(operability unknown\\): crew 2 then closes V-005 \\(\\+\\d+ min\\)")
                .contains("Services off 513, meters off 653")
                .contains("SV-C-CARE")
                .contains("District(s) left dead: LP-SOUTH")
                .contains("100 m in all directions (ERG Guide 115)")
                .contains("USNG 15T WJ 12547 90597")
                .contains(Caution.TEXT);
    }

    /** Count and meter sum of LP-SOUTH's services as GDAL's SQL reads them from the sample; null without ogrinfo. */
    private static long[] southByGdal() throws Exception {
        Process p;
        try {
            p = new ProcessBuilder("ogrinfo", "-q", NET, "-sql",
                    "SELECT count(*) AS n, sum(meters) AS m FROM services WHERE system_id = 'LP-SOUTH'")
                    .redirectErrorStream(true).start();
        } catch (java.io.IOException e) {
            return null;
        }
        String out = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        p.waitFor();
        java.util.regex.Matcher n = java.util.regex.Pattern.compile("\\bn \\(Integer\\) = (\\d+)").matcher(out);
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("\\bm \\(Integer\\) = (\\d+)").matcher(out);
        assertThat(n.find() && m.find()).as(out).isTrue();
        return new long[] {Long.parseLong(n.group(1)), Long.parseLong(m.group(1))};
    }

    @Test
    void theIntermediatePressureLeakFiguresAgreeWithGdalAndTheirReTrace() throws Exception {
        // outside the program: GDAL's SQL over the sample's services layer (every LP-SOUTH service and its
        // meters); the leak on M-IP-007 stops ST-S1, LP-SOUTH's only station, so the whole district goes off
        long[] south = southByGdal();
        org.junit.jupiter.api.Assumptions.assumeTrue(south != null, "ogrinfo (gdal-bin) not installed");
        CommandsTest.Run r = run("incident", NET, "--at", "512547,4890597", "--system", "IP-1", "--as-of", "2026-12-01",
                "--format", "json");
        CommandsTest.assertSampleRunDone(r);
        JsonNode j = JSON.readTree(r.out());
        assertThat(j.get("services_off").asLong()).isEqualTo(south[0]);
        assertThat(j.get("meters_off").asLong()).isEqualTo(south[1]);
        // re-trace with the trace command: the valves printed, closed, leave ST-S1 feeding nothing and put off the same
        List<String> valves = texts(j.get("valves_to_close"), "valve");
        CommandsTest.Run t = run("trace", NET, "--close", String.join(",", valves), "--format", "json");
        JsonNode tj = JSON.readTree(t.out());
        for (JsonNode st : tj.get("stations")) {
            if (st.get("station_id").asText().equals("ST-S1")) assertThat(st.get("services_fed").asInt()).isZero();
        }
        assertThat(tj.get("services_off").asLong()).isEqualTo(south[0]);
        assertThat(tj.get("meters_off").asLong()).isEqualTo(south[1]);
    }

    @Test
    void aLeakThatMustStopAStationGivesAFallbackForItsDoubtfulStopValve() throws Exception {
        // on the LP-SOUTH stub next to ST-S1: the station feeds the zone straight in, so it is stopped by closing its
        // stop valves V-013 and V-004 (V-004: operability unknown in sample-gis/README.md); if V-004 will not close the
        // stop grows to V-005 (SampleTown: the next valve east on IP-1)
        CommandsTest.Run r = run("incident", NET, "--at", "512503,4890590", "--as-of", "2026-12-01", "--format", "json");
        CommandsTest.assertSampleRunDone(r);
        JsonNode j = JSON.readTree(r.out());
        JsonNode v004 = null;
        for (JsonNode v : j.get("valves_to_close")) if (v.get("valve").asText().equals("V-004")) v004 = v;
        assertThat(v004).isNotNull();
        assertThat(v004.get("station_inlet").asBoolean()).isTrue();
        assertThat(texts(v004.get("stops_stations"))).containsExactly("ST-S1");
        assertThat(v004.get("if_it_will_not_close").asText()).contains("stop station ST-S1 Weir Lane Station (close V-013, V-005)")
                .contains("adds 0 services, 0 meters");
        // re-trace by the trace command: the fallback's stop (V-013 and V-005 closed, V-004 left open) leaves ST-S1
        // feeding nothing and puts off what the shut-off says (513 services, 653 meters: the GDAL-checked district)
        CommandsTest.Run t = run("trace", NET, "--close", "V-013,V-005", "--format", "json");
        JsonNode tj = JSON.readTree(t.out());
        for (JsonNode st : tj.get("stations")) {
            if (st.get("station_id").asText().equals("ST-S1")) assertThat(st.get("services_fed").asInt()).isZero();
        }
        assertThat(tj.get("services_off").asLong()).isEqualTo(j.get("services_off").asLong()).isEqualTo(513);
    }

    @Test
    void aLeakOnTheInletMainNamesTheStationItCutsOff() throws Exception {
        // M-IP-007 between V-013 and V-004 is ST-S1's only inlet (sample-gis/README.md): the leak isolation leaves the
        // station with no gas, and with it the whole of LP-SOUTH
        CommandsTest.Run r = run("incident", NET, "--at", "512520,4890597", "--system", "IP-1", "--as-of", "2026-12-01", "--format", "json");
        JsonNode j = JSON.readTree(r.out());
        assertThat(texts(j.get("stations_cut_off"))).containsExactly("ST-S1 Weir Lane Station (feeds LP-SOUTH)");
        CommandsTest.Run text = run("incident", NET, "--at", "512520,4890597", "--system", "IP-1", "--as-of", "2026-12-01");
        assertThat(text.out()).contains("Stations left with no gas at the inlet (their districts go off unless another station feeds them): "
                + "ST-S1 Weir Lane Station (feeds LP-SOUTH)");
    }

    @Test
    void overPressureFallbacksCountAgainstTheWholeShutOff() throws Exception {
        // LP-NORTH is fed by ST-N1 (stop V-011, V-013) and ST-N2 (stop V-012, never checked). If V-012 will not close,
        // ST-N2's stop grows to V-010 and V-005; with V-013 closed for ST-N1 at the same time that also cuts ST-S1's
        // inlet, so the whole shut-off puts LP-SOUTH off too. Re-traced with the trace command below.
        CommandsTest.Run r = run("incident", NET, "--at", "512613,4890915", "--kind", "overpressure", "--as-of", "2026-12-01", "--format", "json");
        JsonNode j = JSON.readTree(r.out());
        JsonNode n2 = null;
        for (JsonNode f : j.get("feeds")) if (f.get("id").asText().equals("ST-N2")) n2 = f;
        JsonNode fb = n2.get("stop").get("fallbacks").get(0);
        assertThat(fb.get("valve").asText()).isEqualTo("V-012");
        assertThat(texts(fb.get("then_close"))).containsExactly("V-010", "V-005");
        CommandsTest.Run whole = run("trace", NET, "--close", "V-011,V-013,V-012", "--format", "json");
        CommandsTest.Run failed = run("trace", NET, "--close", "V-011,V-013,V-010,V-005", "--format", "json");
        long base = JSON.readTree(whole.out()).get("services_off").asLong();
        long withFallback = JSON.readTree(failed.out()).get("services_off").asLong();
        assertThat(j.get("services_off").asLong()).isEqualTo(base).isEqualTo(710);
        assertThat(fb.get("adds_services").asLong()).isEqualTo(withFallback - base).isEqualTo(513);
        assertThat(fb.get("text").asText()).isEqualTo("close V-010, V-005; adds 513 services, 653 meters");
    }

    @Test
    void leakOnTheIntermediatePressureMainInJson() throws Exception {
        CommandsTest.Run r = run("incident", NET, "--at", "512547,4890597", "--system", "IP-1", "--as-of", "2026-12-01",
                "--crews", "1", "--format", "json");
        CommandsTest.assertSampleRunDone(r);
        JsonNode j = JSON.readTree(r.out());
        assertThat(j.get("kind").asText()).isEqualTo("leak");
        assertThat(j.get("system").asText()).isEqualTo("IP-1");
        // one crew: the doubtful V-004 first (a valve that will not close is found before the other is shut)
        assertThat(texts(j.get("valves_to_close"), "valve")).containsExactly("V-004", "V-013");
        assertThat(texts(j.get("valves_to_close"), "order")).containsExactly("1", "2");
        assertThat(j.get("services_off").asInt()).isEqualTo(513);
        assertThat(j.get("meters_off").asInt()).isEqualTo(653);
        assertThat(texts(j.get("critical_off"), "service")).containsExactly("SV-C-CARE");
        JsonNode resp = j.get("response");
        // 653 meters / 10 per technician-hour = 65.3; relight 653 x 1.1 / 1.25 = 574.64 (common-practice rates)
        assertThat(resp.get("shutoff_tech_hours").asDouble()).isEqualTo(65.3);
        assertThat(resp.get("relight_tech_hours").asDouble()).isEqualTo(574.64);
        assertThat(resp.get("purge").asBoolean()).isTrue();
        // one crew: V-004 then V-013, both on Gorse Avenue 45 m apart: 20 min operating + the drive
        JsonNode vt = j.get("valve_time");
        assertThat(vt.get("crews")).hasSize(1);
        double drive = vt.get("drive_m").asDouble();
        assertThat(drive).isBetween(40 * 1.3, 50 * 1.3);
        assertThat(vt.get("elapsed_minutes").asDouble()).isBetween(20.0, 20.2);
        // one crew given: one package, its critical customer first
        assertThat(j.get("work_packages")).hasSize(1);
        assertThat(j.get("work_packages").get(0).get("visits").get(0).get("service").asText()).isEqualTo("SV-C-CARE");
        assertThat(j.get("caution").asText()).isEqualTo(Caution.TEXT);
    }

    @Test
    void leakInAStationFedDistrictNamesTheStationsToStop() throws Exception {
        // next to Larch Road Clinic, in LP-NORTH: the west valve line has an inoperable valve (V-032), so the region
        // grows over the west zone, which ST-N1 feeds straight: stop ST-N1 and close the east line
        CommandsTest.Run r = run("incident", NET, "--at", "512613,4890915", "--as-of", "2026-12-01", "--format", "json");
        JsonNode j = JSON.readTree(r.out());
        assertThat(j.get("isolable").asBoolean()).isFalse();
        assertThat(texts(j.get("stations_to_stop"))).containsExactly("ST-N1");
        // ST-N1's station valve V-011 sits inline on IP-1 (SampleTown): alone it leaves the station fed from the other
        // side; the verified stop closes the IP-1 stretch around the tee, V-011 and V-013 (ST-S1's inline valve, the
        // next valve east), as `shutline trace --close V-011,V-013` confirms (ST-N1 then feeds nothing)
        assertThat(texts(j.get("station_inlet_valves"))).containsExactly("V-011", "V-013");
        // the stop's valves join the field order after the isolation's own (they stop the station that feeds the zone)
        assertThat(texts(j.get("valves_to_close"), "valve")).containsExactly("V-031", "V-033", "V-037", "V-013", "V-011");
        assertThat(j.get("valves_to_close").get(3).get("station_inlet").asBoolean()).isTrue();
        assertThat(j.get("valves_to_close").get(4).get("station_inlet").asBoolean()).isTrue();
        // V-037's fallback cannot be done by valves: the stations to stop are named with the valves of their stops
        assertThat(j.get("valves_to_close").get(2).get("if_it_will_not_close").asText())
                .startsWith("valves alone cannot isolate: stop stations ST-N1 Tannery Lane Station, ST-N2 Glassworks Road Station (close ");
        assertThat(texts(j.get("critical_off"), "service")).containsExactly("SV-C-CLINIC", "SV-C-SCHOOL1");
        assertThat(j.get("meters_off").asInt()).isEqualTo(650);
    }

    @Test
    void addressesAreMatchedWithoutCaseAndAmbiguityListsTheCandidates() throws Exception {
        CommandsTest.Run one = run("incident", NET, "--address", "elder street care home, 431 ELDER STREET", "--as-of", "2026-12-01",
                "--format", "json");
        CommandsTest.assertSampleRunDone(one);
        JsonNode j = JSON.readTree(one.out());
        assertThat(j.get("location").get("given").asText()).contains("SV-C-CARE");
        assertThat(j.get("system").asText()).isEqualTo("LP-SOUTH");
        CommandsTest.Run many = run("incident", NET, "--address", "Elder Street");
        assertThat(many.code()).isEqualTo(2);
        assertThat(many.err()).contains("matches").contains("SV-0879  101 Elder Street");
        assertThat(many.out()).isEmpty();
        assertThat(run("incident", NET, "--address", "no such road").code()).isEqualTo(2);
    }

    @Test
    void gridReferenceIsTheCentreOfItsCell() throws Exception {
        // 10 m reference: cell 12540..12550 E, 90590..90600 N: centre 12545, 90595 (FGDC-STD-011-2001 truncation)
        CommandsTest.Run r = run("incident", NET, "--usng", "15T WJ 1254 9059", "--system", "IP-1", "--as-of", "2026-12-01",
                "--format", "json");
        CommandsTest.assertSampleRunDone(r);
        JsonNode loc = JSON.readTree(r.out()).get("location");
        assertThat(loc.get("usng").asText()).isEqualTo("15T WJ 12545 90595");
        assertThat(texts(JSON.readTree(r.out()).get("valves_to_close"), "valve")).containsExactly("V-013", "V-004");
        assertThat(run("incident", NET, "--usng", "not a grid ref").code()).isEqualTo(2);
    }

    @Test
    void overPressureOfADistrict() throws Exception {
        CommandsTest.Run r = run("incident", NET, "--kind", "overpressure", "--system", "LP-SOUTH", "--main", "M-CI-01",
                "--as-of", "2026-12-01", "--format", "json");
        CommandsTest.assertSampleRunDone(r);
        JsonNode j = JSON.readTree(r.out());
        assertThat(j.get("feeds")).singleElement().satisfies(f -> {
            assertThat(f.get("id").asText()).isEqualTo("ST-S1");
            // V-013 alone leaves ST-S1 fed from the west along IP-1: the stop also closes the next IP-1 valve east, V-004
            // (the same pair that isolates that IP-1 stretch in gridReferenceIsTheCentreOfItsCell)
            assertThat(texts(f.get("inlet_valves"))).containsExactly("V-013", "V-004");
            assertThat(f.get("by_station_valves").asBoolean()).isFalse();
            assertThat(texts(f.get("stop").get("valves_to_close"))).containsExactly("V-013", "V-004");
            assertThat(f.get("other_services_off").asInt()).isZero(); // IP-1 carries no services
        });
        assertThat(j.get("services_at_risk").asInt()).isEqualTo(513);
        assertThat(j.get("meters_at_risk").asInt()).isEqualTo(653);
        assertThat(j.get("services_to_check").get(0).asText()).isEqualTo("SV-C-CARE");
        assertThat(texts(j.get("response").get("dead_systems"))).containsExactly("LP-SOUTH");
        // the system comes from the place when --system is not given
        CommandsTest.Run byPlace = run("incident", NET, "--kind", "overpressure", "--main", "M-CI-01", "--format", "json");
        assertThat(JSON.readTree(byPlace.out()).get("system").asText()).isEqualTo("LP-SOUTH");
        assertThat(run("incident", NET, "--kind", "overpressure", "--system", "NOPE", "--main", "M-CI-01").code()).isEqualTo(2);
    }

    @Test
    void riskWritesTheTablesTheLayerAndTheMap() throws Exception {
        CommandsTest.Run r = run("risk", NET, "--out", dir.toString());
        CommandsTest.assertSampleRunDone(r);
        assertThat(r.out()).contains("ST-S1").contains("Valves to fix first").contains(Caution.TEXT);
        List<String> seg = Files.readAllLines(dir.resolve("segments.csv"));
        assertThat(seg.get(0)).isEqualTo(String.join(",", RiskCommand.SEGMENT_HEADER));
        assertThat(seg).hasSize(28); // 27 segments with pipe in the sample town
        assertThat(seg.get(1)).startsWith("1,").contains("IP-1,M-IP-007").contains(",513,653,1,2,yes");
        List<String> st = Files.readAllLines(dir.resolve("stations.csv"));
        assertThat(st.get(1)).startsWith("1,ST-S1,Weir Lane Station,IP-1,LP-SOUTH,yes,513,653,1,V-013");
        List<String> valves = Files.readAllLines(dir.resolve("valves-to-fix.csv"));
        assertThat(valves.get(0)).isEqualTo(String.join(",", RiskCommand.VALVE_HEADER));
        assertThat(valves.size()).isGreaterThan(10);
        BufferedImage img = ImageIO.read(dir.resolve("risk-map.png").toFile());
        assertThat(img.getWidth()).isEqualTo(1600);
        try (var files = Files.list(dir)) {
            assertThat(files.map(p -> p.getFileName().toString())).noneMatch(n -> n.endsWith(".tmp"));
        }
        // the layer read back by GDAL (ogrinfo)
        Assumptions.assumeTrue(Files.isExecutable(Path.of("/usr/bin/ogrinfo")), "ogrinfo not installed: skipped");
        Process p = new ProcessBuilder("/usr/bin/ogrinfo", "-so", dir.resolve("risk-segments.gpkg").toString(), "segments")
                .redirectErrorStream(true).start();
        String info = new String(p.getInputStream().readAllBytes());
        p.waitFor();
        assertThat(info).contains("Feature Count: 27").contains("services_off: Integer").contains("Multi Line String");
    }

    @Test
    void cardsPerPhaseAsTextJsonAndPdf() throws Exception {
        CommandsTest.Run r = run("cards", NET, PLAN, "--out", dir.toString(), "--as-of", "2026-12-01", "--format", "json");
        CommandsTest.assertSampleRunDone(r);
        JsonNode j = JSON.readTree(r.out());
        assertThat(j.get("cards")).hasSize(3);
        JsonNode one = j.get("cards").get(0);
        assertThat(one.get("work_site").asText()).contains("tie-in on M-S-0210");
        // both tie-in pits: the junction valves of each end isolate them
        assertThat(one.get("excavation").get("isolable").asBoolean()).isTrue();
        assertThat(texts(one.get("excavation").get("valves_to_close"), "valve")).contains("V-TAN-S", "V-WEI-S", "V-CI-W", "V-CI-E");
        assertThat(one.get("overpressure").get(0).get("system").asText()).isEqualTo("LP-SOUTH");
        // phase 3 cuts the cast-iron main and abandons it: no live pipe left in the pits
        JsonNode three = j.get("cards").get(2);
        assertThat(three.has("excavation")).isFalse();
        assertThat(three.get("work_site").asText()).contains("nothing to isolate");
        try (PDDocument pdf = Loader.loadPDF(dir.resolve("emergency-cards.pdf").toFile())) {
            // one text page per phase, and before phase 1's a map page of its excavation isolation
            // (phase 3's pits reach no live pipe: no map)
            assertThat(pdf.getNumberOfPages()).isEqualTo(4);
            PDFTextStripper first = new PDFTextStripper();
            first.setStartPage(1);
            first.setEndPage(1);
            String map = first.getText(pdf).replaceAll("\\s+", " ");
            assertThat(map).contains("gas blowing at the tie-in").contains("r = 100 m").contains("Valve to close").contains("CAUTION");
            String text = new PDFTextStripper().getText(pdf).replaceAll("\\s+", " ");
            assertThat(text).contains("Emergency card: phase 1").contains("OVER-PRESSURE OF LP-SOUTH").contains("CAUTION");
        }
        CommandsTest.Run txt = run("cards", NET, PLAN, "--no-pdf", "--as-of", "2026-12-01");
        assertThat(txt.out()).contains("=== Phase 2").contains("stop it: close V-013, V-004").contains(Caution.TEXT);
        assertThat(run("cards", NET, dir.resolve("missing.yaml").toString(), "--no-pdf").code()).isEqualTo(2);
    }

    private static List<String> texts(JsonNode array, String field) {
        List<String> out = new ArrayList<>();
        for (JsonNode n : array) out.add(n.get(field).asText());
        return out;
    }

    private static List<String> texts(JsonNode array) {
        List<String> out = new ArrayList<>();
        for (JsonNode n : array) out.add(n.asText());
        return out;
    }
}
