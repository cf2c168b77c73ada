package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.model.Caution;

/**
 * End to end on the sample network (sample-gis/tallowmere.gpkg, UTM zone 15N): an
 * incident at a point on the LP-SOUTH district and step 1 of the sample plan
 * (sample-gis/tallowmere-plan.yaml: close V-TAN-N, V-TAN-S, V-ELD-W, V-CI-W in the
 * order Shutline suggests), exported through {@code shutline export}
 * and read back with PDFBox, GDAL's ogrinfo, poppler's pdftoppm and GeographicLib's
 * GeoConvert (each skipped visibly when missing).
 */
class ExportCommandTest {
    static final Path SAMPLE = Path.of("sample-gis/tallowmere.gpkg");
    static final Path PLAN = Path.of("sample-gis/tallowmere-plan.yaml");
    /** The order the plan command suggests for step 1 ("suggested order" in {@code shutline plan}). */
    static final List<String> STEP1 = List.of("V-ELD-W", "V-TAN-N", "V-TAN-S", "V-CI-W");
    /** On Fennel Way (row 5 of the sample grid), in the north-west valve zone of LP-SOUTH, which an inoperable valve joins to the zone Weir Lane Station feeds: valves alone cannot isolate it. */
    static final String INCIDENT = "512150,4890503";

    @TempDir static Path dir;
    static Path incident;
    static Path step;
    static CommandsTest.Run incidentRun;
    static CommandsTest.Run stepRun;
    static JsonNode isolation;

    @BeforeAll
    static void export() {
        incident = dir.resolve("incident");
        step = dir.resolve("step");
        incidentRun = CommandsTest.run("export", SAMPLE.toString(), "--at", INCIDENT, "--out", incident.toString(),
                "--as-of", "2026-12-01", "--prepared-by", "R. Tester", "--formats", "pdf,gpkg,geojson,csv");
        stepRun = CommandsTest.run("export", SAMPLE.toString(), "--plan", PLAN.toString(), "--step", "1", "--out",
                step.toString(), "--as-of", "2026-12-01", "--paper", "a4", "--portrait", "--dpi", "50");
        CommandsTest.Run iso = CommandsTest.run("isolate", SAMPLE.toString(), "--at", INCIDENT, "--as-of", "2026-12-01",
                "--format", "json");
        try {
            isolation = new ObjectMapper().readTree(iso.out());
        } catch (IOException e) {
            throw new IllegalStateException("isolate --format json did not print JSON: " + iso.out() + iso.err(), e);
        }
    }

    static boolean tool(String name) {
        return Files.isExecutable(Path.of("/usr/bin", name)) || Files.isExecutable(Path.of("/usr/local/bin", name));
    }

    static String exec(String stdin, String... cmd) throws IOException, InterruptedException {
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectErrorStream(true);
        pb.environment().put("CPL_LOG", "/dev/null");
        Process p = pb.start();
        if (stdin != null) p.getOutputStream().write(stdin.getBytes(StandardCharsets.UTF_8));
        p.getOutputStream().close();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertThat(p.waitFor(60, TimeUnit.SECONDS)).as("%s finished", cmd[0]).isTrue();
        assertThat(p.exitValue()).as("%s exit code; output:%n%s", String.join(" ", cmd), out).isZero();
        return out;
    }

    @Test
    void bothExportsSucceedAndNameEveryFile() {
        CommandsTest.assertSampleRunDone(incidentRun);
        CommandsTest.assertSampleRunDone(stepRun);
        for (String f : List.of("report.pdf", "results.gpkg", "valves.csv", "customers.csv", "gas_off.geojson",
                "isolation_circle.geojson")) {
            assertThat(incident.resolve(f)).exists();
        }
        assertThat(incident.resolve("map.png")).doesNotExist(); // not among the chosen formats
        List<String> customers;
        try {
            customers = Files.readAllLines(incident.resolve("customers.csv"));
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        assertThat(customers.get(0)).isEqualTo("service,address,class,meters,critical,sheet");
        assertThat(customers.get(1)).startsWith("SV-C-CARE,").contains(",critical,").contains("care home"); // critical first
        assertThat(customers).hasSize(1 + isolation.get("services_off").asInt());
        for (String f : List.of("report.pdf", "map.png", "map.svg", "results.gpkg", "chart-steps.png", "chart-phases.svg")) {
            assertThat(step.resolve(f)).exists();
        }
        assertThat(stepRun.out()).contains("wrote " + step.resolve("map.png")).contains(Caution.TEXT);
    }

    @Test
    void incidentPdfHasTitleBlockLegendBookAndCaution() throws Exception {
        try (PDDocument doc = Loader.loadPDF(incident.resolve("report.pdf").toFile())) {
            // Letter landscape (default): 11 x 8.5 in = 792 x 612 pt
            assertThat(doc.getPage(0).getMediaBox().getWidth()).isEqualTo(792f);
            assertThat(doc.getPage(0).getMediaBox().getHeight()).isEqualTo(612f);
            String page1 = oneLine(text(doc, 1, 1));
            assertThat(page1).contains("Incident response: tallowmere.gpkg").contains("Incident at 512150.0, 4890503.0")
                    .contains("by R. Tester").contains("Network: tallowmere.gpkg").contains("Scale 1:")
                    .contains("Grid: US National Grid 15T WJ")
                    .contains("Legend").contains("Off gas (gas-off extent)").contains("Isolation distance")
                    .contains("District regulator station").contains("Critical customer")
                    .contains("r = 100 m") // the isolation circle's label: ERG (2024) Guide 115 default of 100 m
                    .contains("see the lists"); // the side list is full: ST-S1's verified stop adds V-004 to the valves
            assertThat(oneLine(page1)).contains(oneLine(Caution.TEXT));
            String all = text(doc, 1, doc.getNumberOfPages());
            assertThat(all).contains("Sheet 2 of").contains("continued on sheet").contains("Valve operation list")
                    .contains("Customers off gas (" + isolation.get("services_off").asInt() + " services, "
                            + isolation.get("meters_off").asLong() + " meters)") // the same as shutline isolate says
                    .contains("station-feeds-zone")
                    .contains("SV-C-CARE"); // the care home off gas is in the lists
            // every page carries the caution
            int n = doc.getNumberOfPages();
            for (int p = 1; p <= n; p++) {
                assertThat(oneLine(text(doc, p, p))).as("page %d", p).contains("CAUTION: Results depend on the completeness")
                        .contains("page " + p + " of " + n);
            }
        }
    }

    @Test
    void stepPdfListsTheValvesInOrderOnA4Portrait() throws Exception {
        try (PDDocument doc = Loader.loadPDF(step.resolve("report.pdf").toFile())) {
            // ISO 216 A4 portrait: 210 x 297 mm = 595.28 x 841.89 pt
            assertThat(doc.getPage(0).getMediaBox().getWidth()).isCloseTo(595.28f, org.assertj.core.data.Offset.offset(0.01f));
            assertThat(doc.getPage(0).getMediaBox().getHeight()).isCloseTo(841.89f, org.assertj.core.data.Offset.offset(0.01f));
            String page1 = oneLine(text(doc, 1, 1));
            assertThat(page1).contains("Elder Street cast-iron renewal (Tallowmere)")
                    .contains("Phase 1: West tie-in at Tannery Lane").contains("Step 1: close V-TAN-N, V-TAN-S, V-ELD-W, V-CI-W")
                    .contains("Valve to close");
            for (int i = 0; i < STEP1.size(); i++) assertThat(page1).contains((i + 1) + ". close " + STEP1.get(i));
            String all = text(doc, 1, doc.getNumberOfPages());
            assertThat(all).contains("Valve operation list").contains("Services and meters off gas per step")
                    .contains("Customer-hours off gas per phase");
        }
        List<String> csv = Files.readAllLines(step.resolve("valves.csv"));
        assertThat(csv.get(0)).isEqualTo("order,crew,valve,grid reference (USNG),location,kind,operable,last inspection,action,if it will not close");
        assertThat(csv).hasSize(1 + STEP1.size());
        for (int i = 0; i < STEP1.size(); i++) {
            // a plan step has no crews: the crew column is empty
            assertThat(csv.get(i + 1)).startsWith((i + 1) + ",," + STEP1.get(i) + ",15T WJ ").contains(",close,");
        }
        assertThat(csv.get(1)).containsPattern(",\"on [A-Z][a-z]+ [A-Z][a-z]+, \\d+ m (north|south|east|west) of [A-Z][a-z]+ [A-Z][a-z]+\",");
    }

    @Test
    void pngAtTheChosenDpiAndSvgThatRenders() throws Exception {
        BufferedImage png = ImageIO.read(step.resolve("map.png").toFile());
        // A4 portrait 595.28 x 841.89 pt at 50 dpi: 413 x 585 px
        assertThat(png.getWidth()).isEqualTo(413);
        assertThat(png.getHeight()).isEqualTo(585);
        String svg = Files.readString(step.resolve("map.svg"));
        assertThat(svg).contains("<svg").contains("V-ELD-W").contains("CAUTION: Results depend")
                .contains("data:image/png;base64,"); // the gas-off hatch tile
        assumeTrue(tool("rsvg-convert"), "rsvg-convert (librsvg2-bin) not installed: skipped");
        Path out = dir.resolve("svg.png");
        exec(null, "rsvg-convert", "-o", out.toString(), step.resolve("map.svg").toString());
        BufferedImage img = ImageIO.read(out.toFile());
        assertThat(img.getWidth()).isEqualTo(596); // ceil(595.28) pt at 72 px per inch
        int dark = 0;
        for (int y = 0; y < img.getHeight(); y += 2) {
            for (int x = 0; x < img.getWidth(); x += 2) {
                Color c = new Color(img.getRGB(x, y), true);
                if (c.getAlpha() > 200 && c.getRed() + c.getGreen() + c.getBlue() < 200) dark++;
            }
        }
        assertThat(dark).as("dark pixels: frame, text, symbols").isGreaterThan(500);
    }

    @Test
    void valveListGridColumnAgreesWithGeoConvert() throws Exception {
        assumeTrue(tool("GeoConvert"), "GeoConvert (geographiclib-tools) not installed: skipped");
        JsonNode fc = new ObjectMapper().readTree(step.resolve("valves_to_operate.geojson").toFile());
        List<String> csv = Files.readAllLines(step.resolve("valves.csv"));
        for (int i = 0; i < STEP1.size(); i++) {
            JsonNode c = fc.get("features").get(i).get("geometry").get("coordinates");
            // GeographicLib GeoConvert: UTM zone 15 north input (the network CRS), MGRS out at 10 m (-p -1)
            String ref = exec(String.format(java.util.Locale.ROOT, "15n %.3f %.3f%n", c.get(0).asDouble(), c.get(1).asDouble()),
                    "GeoConvert", "-m", "-p", "-1").trim();
            String column = csv.get(i + 1).split(",")[3];
            assertThat(column.replace(" ", "")).isEqualTo(ref);
        }
    }

    @Test
    void pdfRendersWithPdftoppm() throws Exception {
        assumeTrue(tool("pdftoppm"), "pdftoppm (poppler-utils) not installed: skipped");
        exec(null, "pdftoppm", "-png", "-r", "40", "-f", "1", "-l", "1", incident.resolve("report.pdf").toString(),
                dir.resolve("page").toString());
        Path png;
        try (var s = Files.list(dir)) {
            png = s.filter(f -> f.getFileName().toString().startsWith("page")).findFirst().orElseThrow();
        }
        BufferedImage img = ImageIO.read(png.toFile());
        // 792 x 612 pt at 40 dpi = 440 x 340 px
        assertThat(img.getWidth()).isEqualTo(440);
        assertThat(img.getHeight()).isEqualTo(340);
        int vermilion = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                Color c = new Color(img.getRGB(x, y));
                if (c.getRed() > 180 && c.getGreen() > 60 && c.getGreen() < 140 && c.getBlue() < 60) vermilion++;
            }
        }
        assertThat(vermilion).as("pixels of the gas-off outline and hatching (Okabe-Ito vermilion)").isGreaterThan(200);
    }

    @Test
    void geoPackageLayersReadByOgrinfo() throws Exception {
        assumeTrue(tool("ogrinfo"), "ogrinfo (gdal-bin) not installed: skipped");
        Map<String, String[]> inc = layers(exec(null, "ogrinfo", "-so", "-al", incident.resolve("results.gpkg").toString()));
        assertThat(inc.keySet()).containsExactly("gas_off", "valves_to_operate", "affected_services", "hazards",
                "station_sheds", "isolation_circle");
        assertThat(inc.get("gas_off")).containsExactly("Multi Polygon", "1", "32615");
        // the isolation's valves, then the inlet valves of the stations to stop (as shutline isolate lists them)
        int operated = isolation.get("valves_to_close").size() + isolation.get("station_inlet_valves").size();
        assertThat(operated).isPositive();
        assertThat(inc.get("valves_to_operate")).containsExactly("Point", Integer.toString(operated), "32615");
        assertThat(inc.get("affected_services")).containsExactly("Point", isolation.get("services_off").asText(), "32615");
        assertThat(inc.get("hazards")).containsExactly("Point", "1", "32615");
        // ST-S1 is stopped for the incident: the other three stations have sheds
        assertThat(inc.get("station_sheds")).containsExactly("Multi Polygon", "3", "32615");
        assertThat(inc.get("isolation_circle")).containsExactly("Multi Polygon", "1", "32615");
        String circle = exec(null, "ogrinfo", "-al", "-q", incident.resolve("results.gpkg").toString(), "isolation_circle");
        // Emergency Response Guidebook (2024), Guide 115: initial isolation at least 100 m (330 ft) in all directions
        assertThat(circle).contains("radius_m (Real) = 100").contains("Guide 115");
        Map<String, String[]> st = layers(exec(null, "ogrinfo", "-so", "-al", step.resolve("results.gpkg").toString()));
        // nothing is off at step 1: the empty layer gets GeoPackageWriter's default type for its kind, Polygon
        assertThat(st.get("gas_off")).containsExactly("Multi Polygon", "1", "32615"); // one service off at step 1
        assertThat(st.get("valves_to_operate")).containsExactly("Point", "4", "32615");
        assertThat(st.keySet()).doesNotContain("isolation_circle");
        String valves = exec(null, "ogrinfo", "-al", "-q", step.resolve("results.gpkg").toString(), "valves_to_operate");
        assertThat(valves).contains("valve_id (String) = V-ELD-W").contains("step (Integer) = 1")
                .contains("phase (String) = West tie-in at Tannery Lane").contains("action (String) = close");
    }

    @Test
    void geoJsonLayersReadByOgrinfoInTheNetworkCrs() throws Exception {
        assumeTrue(tool("ogrinfo"), "ogrinfo (gdal-bin) not installed: skipped");
        Map<String, String> expected = new LinkedHashMap<>();
        expected.put("gas_off", "Multi Polygon,1");
        expected.put("affected_services", "Point," + isolation.get("services_off").asText());
        expected.put("station_sheds", "Multi Polygon,3");
        expected.put("isolation_circle", "Multi Polygon,1");
        for (Map.Entry<String, String> e : expected.entrySet()) {
            Path f = incident.resolve(e.getKey() + ".geojson");
            Map<String, String[]> l = layers(exec(null, "ogrinfo", "-so", "-al", f.toString()));
            assertThat(l).containsKey(e.getKey());
            String[] want = e.getValue().split(",");
            // the top-level "crs" member names EPSG:32615, which GDAL honours
            assertThat(l.get(e.getKey())).as(f.toString()).containsExactly(want[0], want[1], "32615");
        }
        JsonNode root = new ObjectMapper().readTree(incident.resolve("gas_off.geojson").toFile());
        assertThat(root.get("crs").get("properties").get("name").asText()).isEqualTo("urn:ogc:def:crs:EPSG::32615");
        double x = root.get("features").get(0).get("geometry").get("coordinates").get(0).get(0).get(0).get(0).asDouble();
        assertThat(x).as("easting in metres, not a longitude").isBetween(511000.0, 514000.0);
    }

    @Test
    void refusesToWriteOverTheInput() throws Exception {
        Path copy = dir.resolve("input").resolve("results.gpkg");
        Files.createDirectories(copy.getParent());
        Files.copy(SAMPLE, copy);
        byte[] before = Files.readAllBytes(copy);
        CommandsTest.Run r = CommandsTest.run("export", copy.toString(), "--at", INCIDENT, "--out", copy.getParent().toString(),
                "--formats", "gpkg");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("refusing to write").contains("input file");
        assertThat(Files.readAllBytes(copy)).isEqualTo(before);
        CommandsTest.Run r2 = CommandsTest.run("export", SAMPLE.toString(), "--at", INCIDENT, "--out", SAMPLE.toString());
        assertThat(r2.code()).isEqualTo(2);
    }

    @Test
    void defaultIsolationRadiusIsErgGuide115() {
        // Emergency Response Guidebook (2024), Guide 115 (natural gas): initial isolation at least 100 m (330 ft)
        var spec = Main.commandLine().getSubcommands().get("export").getCommandSpec();
        assertThat(spec.findOption("--radius-m").defaultValue()).isEqualTo("100");
    }

    @Test
    void badOptionsExitTwo() {
        assertThat(CommandsTest.run("export", SAMPLE.toString(), "--plan", PLAN.toString(), "--out", dir.toString()).code()).isEqualTo(2);
        assertThat(CommandsTest.run("export", SAMPLE.toString(), "--at", INCIDENT, "--out", dir.toString(), "--paper", "b5").code())
                .isEqualTo(2);
        assertThat(CommandsTest.run("export", SAMPLE.toString(), "--at", INCIDENT, "--out", dir.toString(), "--formats", "pdf,dwg")
                .code()).isEqualTo(2);
        CommandsTest.Run far = CommandsTest.run("export", SAMPLE.toString(), "--at", "0,0", "--out", dir.resolve("far").toString());
        assertThat(far.code()).isEqualTo(2);
        assertThat(far.err()).contains("from the nearest active main").contains("the network's active mains span");
        assertThat(dir.resolve("far")).doesNotExist();
        assertThat(CommandsTest.run("export", SAMPLE.toString(), "--plan", PLAN.toString(), "--step", "0", "--out",
                dir.toString()).code()).isEqualTo(2);
        CommandsTest.Run r3 = CommandsTest.run("export", SAMPLE.toString(), "--plan", PLAN.toString(), "--step", "99", "--out",
                dir.toString());
        assertThat(r3.err()).contains("steps 1 to 14");
    }

    private static String text(PDDocument doc, int from, int to) throws IOException {
        PDFTextStripper s = new PDFTextStripper();
        s.setStartPage(from);
        s.setEndPage(to);
        return s.getText(doc);
    }

    private static String oneLine(String s) {
        return s.replaceAll("\\s+", " ");
    }

    /** Layer name to {geometry, feature count, EPSG code} from {@code ogrinfo -so -al}. */
    static Map<String, String[]> layers(String info) {
        Map<String, String[]> out = new LinkedHashMap<>();
        List<String> blocks = new ArrayList<>(List.of(info.split("\nLayer name: ")));
        blocks.remove(0);
        Pattern geom = Pattern.compile("\nGeometry: ([^\n]+)");
        Pattern count = Pattern.compile("\nFeature Count: (\\d+)");
        Pattern epsg = Pattern.compile("\n    ID\\[\"EPSG\",(\\d+)\\]\\]\n"); // the CRS's own id, at the WKT's first level
        for (String b : blocks) {
            String name = b.substring(0, b.indexOf('\n')).trim();
            Matcher g = geom.matcher(b);
            Matcher c = count.matcher(b);
            Matcher e = epsg.matcher(b);
            out.put(name, new String[] {g.find() ? g.group(1).trim() : "?", c.find() ? c.group(1) : "?", e.find() ? e.group(1) : "?"});
        }
        return out;
    }
}
