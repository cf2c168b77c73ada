package org.shutline.io;

import com.linuxense.javadbf.DBFDataType;
import com.linuxense.javadbf.DBFField;
import com.linuxense.javadbf.DBFWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.shutline.model.CrsInfo;
import org.shutline.model.Progress;

/**
 * Writes layers as shapefiles into a folder: per layer {@code <name>.shp}, {@code .shx}
 * (see {@link ShpGeometryWriter}), {@code .dbf} (javadbf, UTF-8), {@code .prj} (ESRI
 * WKT1 from {@link CrsWkt#esri}) and {@code .cpg} ("UTF-8").
 *
 * <p>dBASE field names are at most 10 characters: longer names are cut to 10 (as GDAL
 * does, e.g. {@code monitor_kpa} becomes {@code monitor_kp}) and a clash is resolved by
 * replacing the last characters with a number. Field types: TEXT is C (width the
 * longest value in UTF-8 bytes, 1 to 254; longer values are cut), INTEGER is N(9,0) (GDAL reads wider ones as Integer64),
 * REAL is N(19,6), DATE is D. Every file is written under a temporary name in the
 * folder and all are moved into place once the layer is complete.
 */
public final class ShapefileWriter {
    private ShapefileWriter() {}

    /** Write every layer into {@code folder} (created if missing), replacing files of the same names. */
    public static void write(Path folder, CrsInfo crs, List<WriteLayer> layers, Progress progress) throws IOException {
        Files.createDirectories(folder);
        String prj = CrsWkt.esri(crs);
        for (WriteLayer layer : layers) writeLayer(folder, prj, layer, progress);
    }

    /** The dBASE field names used for {@code columns}, in order (at most 10 characters, unique). */
    public static List<String> fieldNames(List<WriteLayer.Column> columns) {
        List<String> out = new ArrayList<>();
        Set<String> used = new HashSet<>();
        for (WriteLayer.Column c : columns) {
            String n = c.name().length() > 10 ? c.name().substring(0, 10) : c.name();
            for (int k = 1; !used.add(n.toUpperCase(Locale.ROOT)); k++) {
                String suffix = Integer.toString(k);
                n = n.substring(0, Math.min(n.length(), 10 - suffix.length())) + suffix;
            }
            out.add(n);
        }
        return out;
    }

    private static void writeLayer(Path folder, String prj, WriteLayer layer, Progress progress) throws IOException {
        progress.begin("writing " + layer.name(), layer.size());
        Map<String, Path> tmp = new LinkedHashMap<>();
        for (String ext : List.of("shp", "shx", "dbf", "prj", "cpg")) {
            tmp.put(ext, AtomicFiles.tempBeside(folder.resolve(layer.name() + "." + ext), "." + ext));
        }
        boolean done = false;
        try {
            ShpGeometryWriter.write(layer, tmp.get("shp"), tmp.get("shx"), progress);
            writeDbf(layer, tmp.get("dbf"), progress);
            Files.writeString(tmp.get("prj"), prj, StandardCharsets.UTF_8);
            Files.writeString(tmp.get("cpg"), "UTF-8", StandardCharsets.US_ASCII);
            for (Map.Entry<String, Path> e : tmp.entrySet()) {
                AtomicFiles.moveIntoPlace(e.getValue(), folder.resolve(layer.name() + "." + e.getKey()));
            }
            done = true;
        } finally {
            if (!done) for (Path p : tmp.values()) Files.deleteIfExists(p);
        }
        progress.done(layer.size());
    }

    private static void writeDbf(WriteLayer layer, Path dbf, Progress progress) throws IOException {
        List<WriteLayer.Column> cols = layer.columns();
        List<String> names = fieldNames(cols);
        DBFField[] fields = new DBFField[cols.size()];
        for (int c = 0; c < cols.size(); c++) fields[c] = field(layer, c, names.get(c));
        Files.deleteIfExists(dbf);
        DBFWriter w = new DBFWriter(dbf.toFile(), StandardCharsets.UTF_8);
        try {
            w.setFields(fields);
            Object[] rec = new Object[cols.size()];
            for (int i = 0; i < layer.size(); i++) {
                for (int c = 0; c < cols.size(); c++) rec[c] = dbfValue(cols.get(c).type(), layer.value(i, c), fields[c]);
                w.addRecord(rec);
                if ((i & 0x3FFF) == 0x3FFF) progress.checkCancelled();
            }
        } finally {
            w.close();
        }
    }

    private static DBFField field(WriteLayer layer, int c, String name) {
        return switch (layer.columns().get(c).type()) {
            case TEXT -> new DBFField(name, DBFDataType.CHARACTER, textWidth(layer, c));
            case INTEGER -> new DBFField(name, DBFDataType.NUMERIC, 9, 0); // GDAL: up to 9 digits is Integer
            case REAL -> new DBFField(name, DBFDataType.NUMERIC, 19, 6);
            case DATE -> new DBFField(name, DBFDataType.DATE);
        };
    }

    private static int textWidth(WriteLayer layer, int c) {
        int w = 1;
        for (int i = 0; i < layer.size(); i++) {
            Object v = layer.value(i, c);
            if (v != null) w = Math.max(w, v.toString().getBytes(StandardCharsets.UTF_8).length);
        }
        return Math.min(w, 254);
    }

    private static Object dbfValue(WriteLayer.ColumnType type, Object v, DBFField f) {
        if (v == null) return null;
        return switch (type) {
            case TEXT -> cut(v.toString(), f.getLength());
            case INTEGER -> ((Number) v).longValue();
            case REAL -> ((Number) v).doubleValue();
            case DATE -> java.sql.Date.valueOf((LocalDate) v);
        };
    }

    /** The longest prefix of {@code s} that fits {@code bytes} UTF-8 bytes without splitting a character. */
    private static String cut(String s, int bytes) {
        if (s.getBytes(StandardCharsets.UTF_8).length <= bytes) return s;
        int end = s.length();
        while (end > 0 && s.substring(0, end).getBytes(StandardCharsets.UTF_8).length > bytes) end--;
        return s.substring(0, end);
    }
}
