package org.shutline.io;

import java.nio.file.Path;

/**
 * Maps a user's own layer names, field names and value words to Shutline's
 * (see docs/mapping.md). {@link #DEFAULT} maps every name to itself.
 * (Placeholder: the reader work fills this in.)
 */
public final class FieldMapping {
    public static final FieldMapping DEFAULT = new FieldMapping();

    private FieldMapping() {}

    /** Read a mapping file (YAML). */
    public static FieldMapping load(Path file) throws InputException {
        throw new UnsupportedOperationException("not yet built");
    }
}
