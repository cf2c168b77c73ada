package org.shutline.cli;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.stream.Stream;

/**
 * Makes the bad-input corpus from the committed sample (sample-gis/): each case a
 * broken copy of the sample GeoPackage, shapefile folder, plan, mapping or settings
 * file, or a bad command line on good files, with what the program must do: the exit
 * codes allowed, the message fragments (file, and layer/feature/field where it applies)
 * that must be on stderr, and the files that must be unchanged afterwards. Nothing is
 * committed as a binary: {@link #build} writes every file into a fresh folder.
 */
final class BadInputCorpus {
    /** One case: a name, the arguments ({@code {dir}} stands for the case folder), allowed exits, fragments, inputs to keep. */
    record Case(String name, List<String> args, Set<Integer> exits, List<String> fragments, List<Path> inputs, String disabled) {
        Case disabledBecause(String why) {
            return new Case(name, args, exits, fragments, inputs, why);
        }
    }

    static final Path SAMPLE = Path.of("sample-gis/tallowmere.gpkg");
    static final Path SAMPLE_SHP = Path.of("sample-gis/tallowmere-shp");
    static final Path SAMPLE_PLAN = Path.of("sample-gis/tallowmere-plan.yaml");

    private final Path dir;
    private final List<Case> cases = new ArrayList<>();

    private BadInputCorpus(Path dir) {
        this.dir = dir;
    }

    /** Writes every case's files under {@code dir} and returns the cases. */
    static List<Case> build(Path dir) throws IOException, SQLException {
        BadInputCorpus c = new BadInputCorpus(dir);
        c.geoPackages();
        c.shapefiles();
        c.plans();
        c.mappings();
        c.settingsFiles();
        c.commandLines();
        return List.copyOf(c.cases);
    }

    // ---- GeoPackages ----

    private void geoPackages() throws IOException, SQLException {
        gpkgCase("mains-no-ids", "UPDATE mains SET main_id = NULL", Set.of(2), "no usable mains", "mains-no-ids.gpkg");
        gpkgCase("mains-null-geometry", "UPDATE mains SET geom = NULL", Set.of(2), "no usable mains", "mains-null-geometry.gpkg");
        gpkgCase("mains-empty", "DELETE FROM mains", Set.of(2), "no usable mains", "mains-empty.gpkg");
        gpkgCase("mains-are-points", "UPDATE mains SET geom = (SELECT geom FROM valves LIMIT 1)", Set.of(1, 2), "mains-are-points.gpkg");
        gpkgCase("mains-table-dropped", "DROP TABLE mains; DELETE FROM gpkg_geometry_columns WHERE table_name = 'mains';"
                + " DELETE FROM gpkg_contents WHERE table_name = 'mains'", Set.of(2), "no mains layer", "mains-table-dropped.gpkg");
        gpkgCase("diameter-text", "UPDATE mains SET diam_mm = 'about six' WHERE fid = 3", Set.of(1), "bad-value");
        gpkgCase("status-unknown", "UPDATE mains SET status = 'sort of on' WHERE fid = 5", Set.of(1), "unknown-value");
        gpkgCase("main-ids-duplicated", "UPDATE mains SET main_id = 'M-SAME'", Set.of(1, 2), "duplicate-id");
        gpkgCase("valves-empty", "DELETE FROM valves", Set.of(0, 1), "gpkg");
        gpkgCase("services-empty", "DELETE FROM services", Set.of(0, 1), "gpkg");
        gpkgCase("stations-empty", "DELETE FROM stations", Set.of(0, 1, 2), "stations-empty.gpkg");
        gpkgCase("no-crs", "UPDATE gpkg_geometry_columns SET srs_id = -1; UPDATE gpkg_contents SET srs_id = -1", Set.of(0, 1), "gpkg");
        gpkgCase("srs-definition-garbage", "UPDATE gpkg_spatial_ref_sys SET definition = 'PROJCS[\"broken' WHERE srs_id = 32615;"
                + " UPDATE gpkg_spatial_ref_sys SET organization = 'NONE', organization_coordsys_id = 0 WHERE srs_id = 32615",
                Set.of(0, 1, 2), "srs-definition-garbage.gpkg");
        gpkgCase("geometry-bad-code", "UPDATE mains SET geom = X'4750000100000000' || X'01' || X'63000000' WHERE fid = 2",
                Set.of(0, 1, 2), "geometry-bad-code.gpkg");
        gpkgCase("geometry-truncated-wkb", "UPDATE mains SET geom = substr(geom, 1, 20) WHERE fid = 2", Set.of(0, 1, 2),
                "geometry-truncated-wkb.gpkg");

        Path truncated = dir.resolve("truncated.gpkg");
        byte[] all = Files.readAllBytes(SAMPLE);
        Files.write(truncated, java.util.Arrays.copyOf(all, all.length / 3));
        add("truncated-gpkg", List.of("trace", truncated.toString()), Set.of(2), List.of("truncated.gpkg"), List.of(truncated));

        Path zero = dir.resolve("zero.gpkg");
        Files.write(zero, new byte[0]);
        add("zero-byte-gpkg", List.of("trace", zero.toString()), Set.of(2), List.of("zero.gpkg"), List.of(zero));

        Path text = dir.resolve("text.gpkg");
        Files.writeString(text, "this is a note, not a GeoPackage\n");
        add("text-as-gpkg", List.of("check", text.toString()), Set.of(2), List.of("text.gpkg"), List.of(text));

        Path other = dir.resolve("network.txt");
        Files.writeString(other, "main,x,y\n");
        add("unknown-extension", List.of("trace", other.toString()), Set.of(2), List.of("network.txt"), List.of(other));

        add("missing-network", List.of("trace", dir.resolve("nowhere.gpkg").toString()), Set.of(2), List.of("nowhere.gpkg", "no such file"),
                List.of());
        Path empty = Files.createDirectories(dir.resolve("empty-folder"));
        add("folder-without-shapefiles", List.of("trace", empty.toString()), Set.of(2), List.of("empty-folder"), List.of());
    }

    private void gpkgCase(String name, String sql, Set<Integer> exits, String... fragments) throws IOException, SQLException {
        Path f = dir.resolve(name + ".gpkg");
        Files.copy(SAMPLE, f, StandardCopyOption.REPLACE_EXISTING);
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + f); Statement s = c.createStatement()) {
            for (String q : sql.split(";")) if (!q.isBlank()) s.executeUpdate(q);
        }
        add(name, List.of("trace", f.toString()), exits, List.of(fragments), List.of(f));
    }

    // ---- shapefiles ----

    private void shapefiles() throws IOException {
        Path noShx = shpCopy("shp-no-shx");
        Files.delete(noShx.resolve("mains.shx"));
        add("shp-no-shx", List.of("trace", noShx.toString()), Set.of(0, 1, 2), List.of("shp-no-shx"), files(noShx));

        Path noDbf = shpCopy("shp-no-dbf");
        Files.delete(noDbf.resolve("mains.dbf"));
        add("shp-no-dbf", List.of("trace", noDbf.toString()), Set.of(2), List.of("mains"), files(noDbf));

        Path shortShp = shpCopy("shp-truncated");
        truncate(shortShp.resolve("mains.shp"), 0.5);
        add("shp-truncated", List.of("trace", shortShp.toString()), Set.of(1, 2), List.of("mains"), files(shortShp));

        Path shortDbf = shpCopy("dbf-truncated");
        truncate(shortDbf.resolve("mains.dbf"), 0.5);
        add("dbf-truncated", List.of("trace", shortDbf.toString()), Set.of(1, 2), List.of("mains.dbf"), files(shortDbf));

        Path badPrj = shpCopy("prj-garbage");
        Files.writeString(badPrj.resolve("mains.prj"), "PROJCS[\"half a definition\",GEOGCS[");
        add("prj-garbage", List.of("trace", badPrj.toString()), Set.of(2), List.of("mains.prj"), files(badPrj));

        Path noPrj = shpCopy("prj-missing");
        try (Stream<Path> s = Files.list(noPrj)) {
            for (Path p : s.filter(p -> p.toString().endsWith(".prj")).toList()) Files.delete(p);
        }
        add("prj-missing", List.of("trace", noPrj.toString()), Set.of(0, 1), List.of("prj-missing"), files(noPrj));

        Path latin = shpCopy("dbf-latin1-cpg-utf8");
        // the first id character of the first record becomes a latin-1 e-acute (0xE9), while the .cpg says UTF-8
        replaceFirstIdByte(latin.resolve("mains.dbf"), (byte) 0xE9);
        add("dbf-latin1-cpg-utf8", List.of("trace", latin.toString()), Set.of(2),
                List.of("dbf-latin1-cpg-utf8/mains.dbf: record 1, field", "not UTF-8", "mains.cpg"), files(latin));

        Path far = shpCopy("shp-far-coordinates");
        farFirstPoint(far.resolve("mains.shp"));
        add("shp-far-coordinates", List.of("trace", far.toString()), Set.of(2),
                List.of("shp-far-coordinates/mains.shp", "layer mains, feature 1", "beyond any projected CRS"), files(far));

        Path text = shpCopy("dbf-numeric-text");
        overwriteNumericField(text.resolve("mains.dbf"));
        add("dbf-numeric-text", List.of("trace", text.toString()), Set.of(1, 2), List.of("mains"), files(text));
    }

    private Path shpCopy(String name) throws IOException {
        Path d = Files.createDirectories(dir.resolve(name));
        try (Stream<Path> s = Files.list(SAMPLE_SHP)) {
            for (Path p : s.toList()) Files.copy(p, d.resolve(p.getFileName().toString()), StandardCopyOption.REPLACE_EXISTING);
        }
        return d;
    }

    private static List<Path> files(Path d) throws IOException {
        try (Stream<Path> s = Files.list(d)) {
            return s.sorted(Comparator.naturalOrder()).toList();
        }
    }

    /**
     * The first point of the first record set to x = 1e12 (a polyline record: 8-byte record header, shape type, a
     * 32-byte box, part and point counts, part starts, then x, y little-endian doubles; ESRI Shapefile Technical
     * Description, 1998), with the record's box widened to match.
     */
    private static void farFirstPoint(Path shp) throws IOException {
        byte[] b = Files.readAllBytes(shp);
        java.nio.ByteBuffer le = java.nio.ByteBuffer.wrap(b).order(java.nio.ByteOrder.LITTLE_ENDIAN);
        int content = 108;
        int parts = le.getInt(content + 36);
        int firstX = content + 44 + 4 * parts;
        le.putDouble(firstX, 1e12);
        le.putDouble(content + 20, 1e12); // the record's Xmax
        le.putDouble(68, 1e12); // the file header's Xmax
        Files.write(shp, b);
    }

    private static void truncate(Path f, double fraction) throws IOException {
        try (RandomAccessFile r = new RandomAccessFile(f.toFile(), "rw")) {
            r.setLength((long) (r.length() * fraction));
        }
    }

    /** Header length and record length from the dBASE header (bytes 8-9 and 10-11, little-endian, dBASE III layout). */
    private static int[] dbfLayout(byte[] b) {
        int header = (b[8] & 0xff) | (b[9] & 0xff) << 8;
        int record = (b[10] & 0xff) | (b[11] & 0xff) << 8;
        return new int[] {header, record};
    }

    /** Field descriptors are 32 bytes from offset 32: name (11 bytes), type (1), ..., length at 16. Returns {offset in record, length} of the first field of {@code type}. */
    private static int[] field(byte[] b, char type) {
        int offset = 1; // the deletion flag
        for (int p = 32; b[p] != 0x0D; p += 32) {
            int len = b[p + 16] & 0xff;
            if (b[p + 11] == type) return new int[] {offset, len};
            offset += len;
        }
        throw new IllegalStateException("no field of type " + type);
    }

    private static void replaceFirstIdByte(Path dbf, byte value) throws IOException {
        byte[] b = Files.readAllBytes(dbf);
        int[] lay = dbfLayout(b);
        int[] f = field(b, 'C');
        b[lay[0] + f[0]] = value;
        Files.write(dbf, b);
    }

    private static void overwriteNumericField(Path dbf) throws IOException {
        byte[] b = Files.readAllBytes(dbf);
        int[] lay = dbfLayout(b);
        int[] f = field(b, 'N');
        byte[] word = "abc".getBytes(StandardCharsets.US_ASCII);
        for (int i = 0; i < f[1]; i++) b[lay[0] + lay[1] + f[0] + i] = i < word.length ? word[i] : (byte) ' ';
        Files.write(dbf, b);
    }

    // ---- plans ----

    private void plans() throws IOException {
        String good = Files.readString(SAMPLE_PLAN);
        planCase("plan-utf16.yaml", good.getBytes(StandardCharsets.UTF_16), "UTF-16");
        byte[] noise = new byte[4096];
        new Random(11).nextBytes(noise);
        planCase("plan-binary.yaml", noise, "plan-binary.yaml");
        planCase("plan-empty.yaml", new byte[0], "plan-empty.yaml");
        planCase("plan-duplicate-key.yaml", ("project: one\nproject: two\n" + good.replaceFirst("(?m)^project:.*\n", ""))
                .getBytes(StandardCharsets.UTF_8), "project");
        planCase("plan-not-yaml.yaml", "steps: [ {close: V-1\n".getBytes(StandardCharsets.UTF_8), "plan-not-yaml.yaml");
        planCase("plan-list-at-top.yaml", "- close: V-1\n".getBytes(StandardCharsets.UTF_8), "plan-list-at-top.yaml");
        planCase("plan-long-line.yaml", ("project: " + "x".repeat(2_000_000) + "\n").getBytes(StandardCharsets.UTF_8), "plan-long-line.yaml");
        planCase("plan-huge.yaml", ("# " + "y".repeat(100) + "\n").repeat(90_000).getBytes(StandardCharsets.UTF_8), "plan-huge.yaml");
        planCase("plan-unknown-valve.yaml", good.replaceAll("V-[A-Z0-9-]+", "V-NOT-THERE").getBytes(StandardCharsets.UTF_8),
                "V-NOT-THERE");
        StringBuilder deep = new StringBuilder("project: deep\nx: ");
        for (int i = 0; i < 5000; i++) deep.append('[');
        planCase("plan-deep.yaml", deep.toString().getBytes(StandardCharsets.UTF_8), "plan-deep.yaml");
        add("plan-missing", List.of("plan", SAMPLE.toString(), dir.resolve("no-plan.yaml").toString()), Set.of(2),
                List.of("no-plan.yaml"), List.of());
        Path folder = Files.createDirectories(dir.resolve("plan-folder.yaml"));
        add("plan-is-folder", List.of("plan", SAMPLE.toString(), folder.toString()), Set.of(2), List.of("plan-folder.yaml"), List.of());
    }

    private void planCase(String file, byte[] content, String fragment) throws IOException {
        Path f = dir.resolve(file);
        Files.write(f, content);
        add(file.replace(".yaml", ""), List.of("plan", SAMPLE.toString(), f.toString()), Set.of(2), List.of(fragment), List.of(f));
    }

    // ---- mapping and settings files ----

    private void mappings() throws IOException {
        mappingCase("mapping-utf16.yaml", "layers:\n  mains: pipes\n".getBytes(StandardCharsets.UTF_16LE), "mapping-utf16.yaml");
        StringBuilder bomb = new StringBuilder("a: &a [x, x, x, x, x, x, x, x, x]\n");
        for (char c = 'b'; c <= 'k'; c++) {
            char p = (char) (c - 1);
            bomb.append(c).append(": &").append(c).append(" [*").append(p).append(", *").append(p).append(", *").append(p).append(", *")
                    .append(p).append(", *").append(p).append(", *").append(p).append(", *").append(p).append(", *").append(p).append("]\n");
        }
        mappingCase("mapping-alias-bomb.yaml", bomb.toString().getBytes(StandardCharsets.UTF_8), "mapping-alias-bomb.yaml");
        mappingCase("mapping-missing-layer.yaml", "layers:\n  mains:\n    name: pipes_that_are_not_there\n"
                .getBytes(StandardCharsets.UTF_8), "pipes_that_are_not_there");
        mappingCase("mapping-wrong-shape.yaml", "layers:\n  mains: pipes\n".getBytes(StandardCharsets.UTF_8), "layers.mains");
        mappingCase("mapping-not-a-map.yaml", "just a sentence\n".getBytes(StandardCharsets.UTF_8), "mapping-not-a-map.yaml");
    }

    private void mappingCase(String file, byte[] content, String fragment) throws IOException {
        Path f = dir.resolve(file);
        Files.write(f, content);
        add(file.replace(".yaml", ""), List.of("trace", SAMPLE.toString(), "--mapping", f.toString()), Set.of(2), List.of(fragment),
                List.of(f));
    }

    private void settingsFiles() throws IOException {
        Path dup = dir.resolve("settings-duplicate.yaml");
        Files.writeString(dup, "inspection_months: 12\ninspection_months: 15\n");
        add("settings-duplicate", List.of("trace", SAMPLE.toString(), "--settings", dup.toString()), Set.of(2),
                List.of("settings-duplicate.yaml"), List.of(dup));
        Path bin = dir.resolve("settings-binary.yaml");
        byte[] noise = new byte[2048];
        new Random(12).nextBytes(noise);
        Files.write(bin, noise);
        add("settings-binary", List.of("trace", SAMPLE.toString(), "--settings", bin.toString()), Set.of(2),
                List.of("settings-binary.yaml"), List.of(bin));
    }

    // ---- command lines: outputs over inputs, bad options ----

    private void commandLines() throws IOException {
        Path out = Files.createDirectories(dir.resolve("out"));
        Path planInOut = out.resolve("plan.json");
        Files.copy(SAMPLE_PLAN, planInOut, StandardCopyOption.REPLACE_EXISTING);
        add("plan-over-its-plan", List.of("plan", SAMPLE.toString(), planInOut.toString(), "--out", out.toString()), Set.of(2),
                List.of("plan.json", "read by this command"), List.of(planInOut));

        Path planSteps = dir.resolve("plan-steps.csv");
        Files.copy(SAMPLE_PLAN, planSteps, StandardCopyOption.REPLACE_EXISTING);
        add("plan-named-plan-steps", List.of("plan", SAMPLE.toString(), planSteps.toString(), "--out", dir.toString()), Set.of(2),
                List.of("plan-steps.csv", "read by this command"), List.of(planSteps));

        Path riskNet = out.resolve("risk-segments.gpkg");
        Files.copy(SAMPLE, riskNet, StandardCopyOption.REPLACE_EXISTING);
        add("risk-over-its-network", List.of("risk", riskNet.toString(), "--out", out.resolve("..").resolve("out").toString()),
                Set.of(2), List.of("risk-segments.gpkg", "read by this command"), List.of(riskNet));

        Path exportNet = out.resolve("results.gpkg");
        Files.copy(SAMPLE, exportNet, StandardCopyOption.REPLACE_EXISTING);
        add("export-over-its-network", List.of("export", exportNet.toString(), "--main", "M-CI-01", "--out", out.toString()),
                Set.of(2), List.of("results.gpkg", "read by this command"), List.of(exportNet));

        Path cardsPlan = out.resolve("emergency-cards.pdf");
        Files.copy(SAMPLE_PLAN, cardsPlan, StandardCopyOption.REPLACE_EXISTING);
        add("cards-over-its-plan", List.of("cards", SAMPLE.toString(), cardsPlan.toString(), "--out", out.toString()), Set.of(2),
                List.of("emergency-cards.pdf", "read by this command"), List.of(cardsPlan));

        Path settings = out.resolve("valves.csv");
        Files.writeString(settings, "inspection_months: 12\n");
        add("export-over-its-settings", List.of("export", SAMPLE.toString(), "--main", "M-CI-01", "--settings", settings.toString(),
                "--out", out.toString()), Set.of(2), List.of("valves.csv", "read by this command"), List.of(settings));

        Path plainFile = dir.resolve("a-file");
        Files.writeString(plainFile, "keep me\n");
        add("out-is-a-file", List.of("risk", SAMPLE.toString(), "--out", plainFile.toString()), Set.of(2),
                List.of("a-file", "is a file, not a folder"), List.of(plainFile));

        Path existing = dir.resolve("existing.gpkg");
        Files.copy(SAMPLE, existing, StandardCopyOption.REPLACE_EXISTING);
        add("generate-over-a-file", List.of("generate", existing.toString()), Set.of(2), List.of("existing.gpkg", "--force"),
                List.of(existing));

        add("trace-close-empty-ids", List.of("trace", SAMPLE.toString(), "--close", ",,,"), Set.of(2), List.of("--close"), List.of());
        add("cards-negative-pit-radius", List.of("cards", SAMPLE.toString(), SAMPLE_PLAN.toString(), "--pit-radius", "-5", "--no-pdf"),
                Set.of(2), List.of("--pit-radius"), List.of());
        add("export-absurd-radius", List.of("export", SAMPLE.toString(), "--main", "M-CI-01", "--radius-m", "1e9", "--out",
                dir.resolve("never").toString()), Set.of(2), List.of("--radius-m"), List.of());
        add("plan-negative-inspection-months", List.of("plan", SAMPLE.toString(), SAMPLE_PLAN.toString(), "--inspection-months", "-3"),
                Set.of(2), List.of("--inspection-months"), List.of());
        add("incident-crews-absurd", List.of("incident", SAMPLE.toString(), "--main", "M-CI-01", "--crews", "100000000"), Set.of(2),
                List.of("--crews"), List.of());
        add("incident-at-infinity", List.of("incident", SAMPLE.toString(), "--at", "Infinity,0"), Set.of(2), List.of("--at"), List.of());
        add("isolate-at-nan", List.of("isolate", SAMPLE.toString(), "--at", "NaN,0"), Set.of(2), List.of("--at"), List.of());
    }

    private void add(String name, List<String> args, Set<Integer> exits, List<String> fragments, List<Path> inputs) {
        cases.add(new Case(name, args, exits, fragments, inputs, null));
    }
}
