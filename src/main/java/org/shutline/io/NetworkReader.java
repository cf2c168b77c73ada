package org.shutline.io;

import java.nio.file.Path;
import org.shutline.model.Network;

/**
 * Reads a network from one GeoPackage ({@code .gpkg}) or one folder of shapefiles.
 * (Placeholder: the reader work fills this in.)
 */
public final class NetworkReader {
    private NetworkReader() {}

    /** Read the network at {@code path} with the given mapping ({@link FieldMapping#DEFAULT} for none). */
    public static Network read(Path path, FieldMapping mapping) throws InputException {
        throw new UnsupportedOperationException("not yet built");
    }
}
