package org.shutline.io.sample;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.shutline.io.GeoPackageWriter;
import org.shutline.io.NetworkWriter;
import org.shutline.io.ShapefileWriter;
import org.shutline.io.WriteLayer;
import org.shutline.model.Network;
import org.shutline.model.Progress;

/**
 * A generated network plus the raw field values that the model cannot hold (for
 * example a misspelt status word), which are written over the model's values.
 */
public record GeneratedTown(Network network, List<RawValue> rawValues) {
    public GeneratedTown {
        rawValues = List.copyOf(rawValues);
    }

    /** A value written as is into {@code field} of feature number {@code row} of {@code layer}. */
    public record RawValue(String layer, int row, String field, Object value) {}

    /** The layers as written: {@link NetworkWriter#layers} with the raw values applied. */
    public List<WriteLayer> layers() {
        List<WriteLayer> out = new ArrayList<>();
        for (WriteLayer l : NetworkWriter.layers(network)) {
            WriteLayer w = l;
            for (RawValue r : rawValues) if (r.layer().equals(l.name())) w = w.withValue(r.row(), r.field(), r.value());
            out.add(w);
        }
        return out;
    }

    public void writeGeoPackage(Path file, Progress progress) throws IOException {
        GeoPackageWriter.write(file, network.crs(), layers(), progress);
    }

    public void writeShapefiles(Path folder, Progress progress) throws IOException {
        ShapefileWriter.write(folder, network.crs(), layers(), progress);
    }
}
