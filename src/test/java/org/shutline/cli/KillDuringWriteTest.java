package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.shutline.io.OutputPackage;

/**
 * Kills {@code shutline export} at random moments and checks what it leaves. A child
 * Java process runs a real export of an incident on the sample town
 * (sample-gis/tallowmere.gpkg, all formats) into a folder that already holds a whole
 * package and some files of the user's own; after a delay drawn from a seeded random
 * generator it is killed ({@link Process#destroyForcibly}, SIGKILL on Linux: no
 * shutdown hooks, no finally blocks). After each kill:
 * <ul>
 * <li>every file of the package is complete: the old one byte for byte (its SHA-256 as
 *     before the run), or a complete new one (a PDF that ends with its {@code %%EOF}
 *     marker and that PDFBox opens, a PNG ImageIO decodes to the full size, an SVG that
 *     parses as XML, GeoJSON that parses as a FeatureCollection, a CSV whose lines all
 *     have the header's column count and end in a newline, a GeoPackage SQLite finds
 *     intact by {@code PRAGMA integrity_check});</li>
 * <li>the manifest tells the truth: {@link OutputPackage#check} says WHOLE exactly when
 *     every file the manifest lists has the size and SHA-256 it gives, recomputed here
 *     with the JDK's MessageDigest and, when present, GNU coreutils' {@code sha256sum};</li>
 * <li>only temporary files of killed runs may be left (a run removes them when it begins
 *     its package); the user's files are untouched.</li>
 * </ul>
 * A last run to the end leaves a whole package, no temporary file of ours, and the
 * user's files as they were. The delays fall between a little before the first
 * temporary file appeared and the end of a full run, both measured on a first full run.
 * 12 kills in the build; {@link #longRun} (tag "long", not in {@code mvn verify}) makes 100:
 * {@code mvn -o test -Dtest=KillDuringWriteTest -Dgroups=long -DexcludedGroups=jazzer}.
 */
class KillDuringWriteTest {
    private static final long SEED = 0x5eed_2026_1205L;
    private static final Pattern OURS = Pattern.compile("\\..+\\.shutline-tmp-(\\d+)-\\d+(\\.[A-Za-z0-9_-]+)?");
    private static final Map<String, String> USER_FILES = Map.of("my-notes.txt", "valve V-TAN-N stiff, bring the long key\n",
            ".valves.csv.tmp-1-2", "a file that looks like an old-style temporary name but is the user's\n",
            ".report.pdf.shutline-tmp-x-1", "not digits: not ours\n");

    @TempDir Path tmp;

    @Test
    @Timeout(900)
    void killedExportsLeaveOldOrNewFilesAndTheManifestSaysWhich() throws Exception {
        harness(12);
    }

    @Test
    @Tag("long")
    void longRun() throws Exception {
        harness(100);
    }

    private void harness(int kills) throws Exception {
        Path out = tmp.resolve("out");
        Files.createDirectories(out);
        for (Map.Entry<String, String> f : USER_FILES.entrySet()) Files.writeString(out.resolve(f.getKey()), f.getValue());
        // a temporary file of ours from a process that has ended: the first run removes it
        Process gone = new ProcessBuilder(java(), "-version").redirectErrorStream(true).redirectOutput(tmp.resolve("v.txt").toFile()).start();
        gone.waitFor();
        Path stale = out.resolve(".map.png.shutline-tmp-" + gone.pid() + "-1.tmp");
        Files.writeString(stale, "half a PNG");

        long t0 = System.nanoTime();
        Process first = export(out, "Crew A", tmp.resolve("first.log"));
        long firstTemp = -1;
        while (first.isAlive()) {
            if (firstTemp < 0 && ourTemps(out).stream().anyMatch(p -> !p.equals(stale))) firstTemp = (System.nanoTime() - t0) / 1_000_000;
            Thread.sleep(10);
        }
        long full = (System.nanoTime() - t0) / 1_000_000;
        // exit 1: written, with the sample's deliberate data errors reported (sample-gis/README.md)
        assertThat(first.exitValue()).as(Files.readString(tmp.resolve("first.log"))).isIn(0, 1);
        assertThat(stale).as("stale temporary file of an ended process").doesNotExist();
        OutputPackage.Check whole = OutputPackage.check(out);
        assertThat(whole.status()).isEqualTo(OutputPackage.Status.WHOLE);
        assertThat(whole.files()).extracting(OutputPackage.Entry::name).contains("report.pdf", "map.png", "map.svg",
                "results.gpkg", "valves.csv", "customers.csv", "gas_off.geojson");
        Map<String, String> before = manifestHashes(out);
        assertThat(before).isEqualTo(sha256(out, before.keySet())).isEqualTo(sha256sum(out, before.keySet(), before));

        Random rnd = new Random(SEED);
        long from = Math.max(0, (firstTemp < 0 ? full / 2 : firstTemp) - 200);
        int broken = 0, old = 0, renewed = 0;
        java.util.Set<Long> killed = new java.util.HashSet<>();
        for (int k = 0; k < kills; k++) {
            long delay = from + (long) (rnd.nextDouble() * (full - from));
            String who = "Crew B" + k;
            String msg = "kill " + k + " after " + delay + " ms (seed " + SEED + ")";
            Process p = export(out, who, tmp.resolve("run.log"));
            if (!p.waitFor(delay, TimeUnit.MILLISECONDS)) p.destroyForcibly();
            p.waitFor();

            killed.add(p.pid());
            for (Path t : ourTemps(out)) {
                // a run killed before it began its package has not yet removed the temporary files of the run before it
                Matcher m = OURS.matcher(t.getFileName().toString());
                assertThat(m.matches() && killed.contains(Long.parseLong(m.group(1)))).as(msg + ": only killed runs' temporary files, not " + t).isTrue();
            }
            for (String name : before.keySet()) {
                Path f = out.resolve(name);
                assertThat(f).as(msg).exists();
                String h = sha256(out, List.of(name)).get(name);
                if (!h.equals(before.get(name))) assertComplete(f, msg);
            }
            OutputPackage.Check c = OutputPackage.check(out);
            Map<String, String> listed = manifestHashes(out);
            Map<String, String> actual = sha256(out, listed.keySet());
            assertThat(c.status()).as(msg).isIn(OutputPackage.Status.WHOLE, OutputPackage.Status.BROKEN);
            assertThat(c.status() == OutputPackage.Status.WHOLE).as(msg + ": the manifest says whole exactly when every file matches it")
                    .isEqualTo(listed.equals(actual));
            assertUserFiles(out, msg);
            if (c.status() == OutputPackage.Status.BROKEN) broken++;
            else if (listed.equals(before)) old++;
            else renewed++;
            before = actual; // the next run's "old" files
        }
        System.out.printf("KillDuringWriteTest: %d kills: %d left the old package whole, %d a mixed folder the manifest calls"
                + " not whole, %d the new package whole%n", kills, old, broken, renewed);

        Process last = export(out, "Crew C", tmp.resolve("last.log"));
        assertThat(last.waitFor(120, TimeUnit.SECONDS)).isTrue();
        assertThat(last.exitValue()).as(Files.readString(tmp.resolve("last.log"))).isIn(0, 1);
        assertThat(OutputPackage.check(out).status()).isEqualTo(OutputPackage.Status.WHOLE);
        assertThat(ourTemps(out)).as("temporary files of ours after a full run").isEmpty();
        Map<String, String> end = manifestHashes(out);
        assertThat(sha256(out, end.keySet())).isEqualTo(end);
        for (String name : end.keySet()) assertComplete(out.resolve(name), "last run");
        assertUserFiles(out, "last run");
    }

    private Process export(Path out, String preparedBy, Path log) throws IOException {
        return new ProcessBuilder(java(), "-Xmx768m", "-Djava.awt.headless=true", "-cp", System.getProperty("java.class.path"),
                "org.shutline.cli.Main", "export", "sample-gis/tallowmere.gpkg", "--at", ExportCommandTest.INCIDENT,
                "--as-of", "2026-12-01", "--out", out.toString(), "--prepared-by", preparedBy)
                .redirectErrorStream(true).redirectOutput(log.toFile()).start();
    }

    private static String java() {
        return Path.of(System.getProperty("java.home"), "bin", "java").toString();
    }

    private static List<Path> ourTemps(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> OURS.matcher(p.getFileName().toString()).matches()).toList();
        }
    }

    private static void assertUserFiles(Path out, String msg) throws IOException {
        for (Map.Entry<String, String> f : USER_FILES.entrySet()) {
            assertThat(Files.readString(out.resolve(f.getKey()))).as(msg + ": user's file " + f.getKey()).isEqualTo(f.getValue());
        }
    }

    /** The manifest's files and checksums, read here line by line (docs/output-package.md). */
    private static Map<String, String> manifestHashes(Path dir) throws IOException {
        Map<String, String> m = new LinkedHashMap<>();
        for (String l : Files.readAllLines(dir.resolve(OutputPackage.MANIFEST))) {
            if (!l.startsWith("file: ")) continue;
            String[] f = l.substring(6).split(" ", 3);
            m.put(f[2], f[0]);
        }
        return m;
    }

    private static Map<String, String> sha256(Path dir, Iterable<String> names) throws Exception {
        Map<String, String> m = new LinkedHashMap<>();
        for (String n : names) {
            Path f = dir.resolve(n);
            m.put(n, Files.exists(f) ? HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(f))) : "missing");
        }
        return m;
    }

    /** The checksums by GNU coreutils' sha256sum, or {@code expected} when it is not installed (nothing to compare with). */
    private static Map<String, String> sha256sum(Path dir, Iterable<String> names, Map<String, String> expected) throws Exception {
        List<String> cmd = new ArrayList<>(List.of("sha256sum", "--"));
        for (String n : names) cmd.add(n);
        Process p;
        try {
            p = new ProcessBuilder(cmd).directory(dir.toFile()).redirectErrorStream(true).start();
        } catch (IOException e) {
            return expected;
        }
        String text = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        p.waitFor();
        Map<String, String> m = new LinkedHashMap<>();
        for (String l : text.split("\n")) if (l.length() > 66) m.put(l.substring(66), l.substring(0, 64));
        return m;
    }

    /** The file is a complete file of its format (see the class comment). */
    private static void assertComplete(Path f, String msg) throws Exception {
        String name = f.getFileName().toString();
        byte[] b = Files.readAllBytes(f);
        String as = msg + ": " + name + " complete";
        if (name.endsWith(".pdf")) {
            assertThat(new String(b, StandardCharsets.ISO_8859_1).stripTrailing()).as(as).endsWith("%%EOF");
            try (org.apache.pdfbox.pdmodel.PDDocument d = org.apache.pdfbox.Loader.loadPDF(b)) {
                assertThat(d.getNumberOfPages()).as(as).isPositive();
            }
        } else if (name.endsWith(".png")) {
            java.awt.image.BufferedImage img = ImageIO.read(new ByteArrayInputStream(b));
            assertThat(img).as(as).isNotNull();
            assertThat(b).as(as + " (IEND chunk last)").endsWith(0x49, 0x45, 0x4E, 0x44, 0xAE, 0x42, 0x60, 0x82);
        } else if (name.endsWith(".svg")) {
            try (InputStream in = new ByteArrayInputStream(b)) {
                DocumentBuilderFactory dbf = DocumentBuilderFactory.newInstance();
                dbf.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
                assertThat(dbf.newDocumentBuilder().parse(in).getDocumentElement().getTagName()).as(as).isEqualTo("svg");
            }
        } else if (name.endsWith(".geojson")) {
            JsonNode n = new ObjectMapper().readTree(b);
            assertThat(n.path("type").asText()).as(as).isEqualTo("FeatureCollection");
        } else if (name.endsWith(".csv")) {
            String t = new String(b, StandardCharsets.UTF_8);
            assertThat(t).as(as).endsWith("\n");
            String[] lines = t.split("\n");
            int cols = lines[0].split(",", -1).length;
            for (String l : lines) if (!l.contains("\"")) assertThat(l.split(",", -1).length).as(as + ": " + l).isEqualTo(cols);
        } else if (name.endsWith(".gpkg")) {
            try (Connection c = DriverManager.getConnection("jdbc:sqlite:file:" + f + "?mode=ro"); Statement s = c.createStatement();
                 ResultSet rs = s.executeQuery("PRAGMA integrity_check")) {
                rs.next();
                assertThat(rs.getString(1)).as(as).isEqualTo("ok");
                try (ResultSet n = s.executeQuery("SELECT count(*) FROM gpkg_contents")) {
                    n.next();
                    assertThat(n.getInt(1)).as(as).isPositive();
                }
            }
        } else {
            throw new AssertionError(as + ": no completeness check for this kind of file");
        }
    }
}
