package org.shutline.io;

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

/** Test helper: runs the GDAL and PROJ command-line tools (ogr2ogr, ogrinfo, cs2cs). */
final class Gdal {
    private Gdal() {}

    static boolean has(String tool) {
        return Files.isExecutable(Path.of("/usr/bin", tool)) || Files.isExecutable(Path.of("/usr/local/bin", tool));
    }

    /** Runs a command, feeding {@code stdin} (may be null); returns stdout, failing on a non-zero exit. */
    static String run(String stdin, String... cmd) throws IOException, InterruptedException {
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectErrorStream(true);
        pb.environment().put("CPL_LOG", "/dev/null");
        Process p = pb.start();
        if (stdin != null) p.getOutputStream().write(stdin.getBytes(StandardCharsets.UTF_8));
        p.getOutputStream().close();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(60, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new IOException("timed out: " + String.join(" ", cmd));
        }
        if (p.exitValue() != 0) throw new IOException(String.join(" ", cmd) + " failed (" + p.exitValue() + "):\n" + out);
        return out;
    }

    /** Converts each GeoJSON file into one layer (named by its base name) of a new GeoPackage. */
    static Path toGpkg(Path gpkg, List<Path> geojson) throws IOException, InterruptedException {
        for (Path g : geojson) {
            List<String> cmd = new ArrayList<>(List.of("ogr2ogr", "-f", "GPKG"));
            if (Files.exists(gpkg)) cmd.add("-update");
            cmd.addAll(List.of("-nln", base(g), gpkg.toString(), g.toString()));
            run(null, cmd.toArray(new String[0]));
        }
        return gpkg;
    }

    /** Converts each GeoJSON file into a shapefile (UTF-8, with .cpg) in {@code folder}. */
    static Path toShapefiles(Path folder, List<Path> geojson, String... extra) throws IOException, InterruptedException {
        Files.createDirectories(folder);
        for (Path g : geojson) {
            List<String> cmd = new ArrayList<>(List.of("ogr2ogr", "-f", "ESRI Shapefile", "-lco", "ENCODING=UTF-8"));
            cmd.addAll(List.of(extra));
            cmd.addAll(List.of(folder.resolve(base(g) + ".shp").toString(), g.toString()));
            run(null, cmd.toArray(new String[0]));
        }
        return folder;
    }

    /** Layer name to "Feature Count: N" as printed by {@code ogrinfo -so -al}. */
    static Map<String, Integer> featureCounts(Path data) throws IOException, InterruptedException {
        String out = run(null, "ogrinfo", "-ro", "-so", "-al", data.toString());
        Map<String, Integer> counts = new LinkedHashMap<>();
        Matcher m = Pattern.compile("Layer name: (\\S+)|Feature Count: (\\d+)").matcher(out);
        String layer = null;
        while (m.find()) {
            if (m.group(1) != null) layer = m.group(1);
            else counts.put(layer, Integer.parseInt(m.group(2)));
        }
        return counts;
    }

    /** Features GDAL returns when it iterates a layer: "OGRFeature(layer):fid" lines of {@code ogrinfo -al}. */
    static int iteratedCount(Path data, String layer) throws IOException, InterruptedException {
        String out = run(null, "ogrinfo", "-ro", "-al", "-q", data.toString(), layer);
        Matcher m = Pattern.compile("OGRFeature\\(" + Pattern.quote(layer) + "\\):").matcher(out);
        int n = 0;
        while (m.find()) n++;
        return n;
    }

    static String base(Path p) {
        String n = p.getFileName().toString();
        return n.substring(0, n.lastIndexOf('.'));
    }
}
