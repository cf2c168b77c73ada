package org.shutline.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.locationtech.jts.geom.Geometry;
import org.shutline.model.CrsInfo;

/**
 * Reads every shapefile ({@code .shp} with its {@code .shx}, {@code .dbf}, and
 * optional {@code .prj} and {@code .cpg}, extensions matched ignoring case) in one
 * folder into {@link RawLayer}s named by base name, sorted by name. Record counts
 * of {@code .shp}, {@code .shx} and {@code .dbf} must agree; a missing
 * {@code .shx} or {@code .dbf} is an {@link InputException}. Records marked deleted
 * in the {@code .dbf} are left out. A layer without
 * {@code .prj} has a null CRS (the caller decides). Files are only read.
 */
final class ShapefileSource {
    private ShapefileSource() {}

    static List<RawLayer> read(Path folder) throws InputException {
        List<Path> shps = new ArrayList<>();
        try (Stream<Path> s = Files.list(folder)) {
            s.filter(p -> lower(p).endsWith(".shp") && Files.isRegularFile(p)).sorted().forEach(shps::add);
        } catch (IOException e) {
            throw new InputException(folder + ": cannot list folder: " + e.getMessage(), e);
        }
        List<RawLayer> out = new ArrayList<>();
        for (Path shp : shps) out.add(layer(shp));
        return out;
    }

    static RawLayer layer(Path shp) throws InputException {
        String file = shp.getFileName().toString();
        String base = file.substring(0, file.length() - 4);
        Path shx = sibling(shp, base, ".shx");
        Path dbf = sibling(shp, base, ".dbf");
        ShpReader.Result geo = ShpReader.read(shp, shx);
        if (dbf == null) throw new InputException(shp + ": no .dbf table beside it (layer " + base + ")");
        DbfTable.Result table = DbfTable.read(dbf, sibling(shp, base, ".cpg"));
        if (table.rows().size() != geo.geometries().size()) {
            throw new InputException(shp + ": " + geo.geometries().size() + " shapes but " + dbf.getFileName() + " has "
                    + table.rows().size() + " records (layer " + base + ")");
        }
        Path prj = sibling(shp, base, ".prj");
        CrsInfo crs = null;
        if (prj != null) {
            try {
                crs = Crs.fromWkt(Files.readString(prj, StandardCharsets.ISO_8859_1), prj.toString());
            } catch (IOException e) {
                throw new InputException(prj + ": cannot read: " + e.getMessage(), e);
            }
        }
        List<RawLayer.Feature> fs = new ArrayList<>(geo.geometries().size());
        for (int i = 0; i < geo.geometries().size(); i++) {
            if (table.isDeleted(i)) continue; // marked deleted in the .dbf: not a feature (as GDAL reads it)
            Geometry g = geo.geometries().get(i);
            fs.add(new RawLayer.Feature(i + 1, g == null || g.isEmpty() ? null : g, null,
                    table.rows().get(i)));
        }
        return new RawLayer(base, shp.toString(), true, table.fields(), fs, crs);
    }

    /** The file beside {@code shp} with the same base name and this extension, any case; null if none. */
    private static Path sibling(Path shp, String base, String ext) throws InputException {
        Path dir = shp.toAbsolutePath().getParent();
        Path exact = dir.resolve(base + ext);
        if (Files.isRegularFile(exact)) return exact;
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> p.getFileName().toString().equalsIgnoreCase(base + ext)).findFirst().orElse(null);
        } catch (IOException e) {
            throw new InputException(dir + ": cannot list folder: " + e.getMessage(), e);
        }
    }

    private static String lower(Path p) {
        return p.getFileName().toString().toLowerCase(Locale.ROOT);
    }
}
