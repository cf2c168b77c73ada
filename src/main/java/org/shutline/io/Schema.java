package org.shutline.io;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.shutline.model.MainStatus;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.ServiceClass;
import org.shutline.model.TapDevice;
import org.shutline.model.ValveKind;

/**
 * The input data model of design.md as data: the six network layers, their
 * expected geometry and their fields with types. Key fields (the feature id and the
 * system fields that connectivity depends on) must exist in a layer, or the layer
 * cannot be read; every other field is optional and takes its default.
 */
final class Schema {
    private Schema() {}

    /** A yes/no field; empty or not given is {@link #UNKNOWN}. */
    enum YesNo {
        YES, NO, UNKNOWN;
        public static final YesNo DEFAULT = UNKNOWN;

        Boolean value() {
            return this == UNKNOWN ? null : this == YES;
        }
    }

    /** Field value types of the data model. */
    enum Type { TEXT, REAL, INT, DATE, WORD }

    /** Geometry a network layer must have. */
    enum Shape { LINE, POINT }

    /** One field: our name, type, whether it is a key field, and for WORD the enum class. */
    record Field(String name, Type type, boolean key, Class<? extends Enum<?>> words) {
        static Field key(String name) {
            return new Field(name, Type.TEXT, true, null);
        }

        static Field of(String name, Type type) {
            return new Field(name, type, false, null);
        }

        static Field word(String name, Class<? extends Enum<?>> words) {
            return new Field(name, Type.WORD, false, words);
        }
    }

    /** One network layer: our name, geometry, fields (the first is the feature id). */
    record Layer(String name, Shape shape, List<Field> fields) {
        Layer {
            fields = List.copyOf(fields);
        }

        Field idField() {
            return fields.get(0);
        }

        Optional<Field> field(String ours) {
            for (Field f : fields) if (f.name().equals(ours)) return Optional.of(f);
            return Optional.empty();
        }
    }

    static final Layer MAINS = new Layer("mains", Shape.LINE, List.of(
            Field.key("main_id"), Field.key("system_id"), Field.word("status", MainStatus.class),
            Field.of("material", Type.TEXT), Field.of("diam_mm", Type.REAL), Field.of("maop_kpa", Type.REAL),
            Field.of("install_yr", Type.INT)));
    static final Layer VALVES = new Layer("valves", Shape.POINT, List.of(
            Field.key("valve_id"), Field.key("system_id"), Field.word("kind", ValveKind.class),
            Field.word("normal", NormalPosition.class), Field.word("operable", Operability.class),
            Field.of("checked", Type.DATE)));
    static final Layer STATIONS = new Layer("stations", Shape.POINT, List.of(
            Field.key("station_id"), Field.key("in_sys"), Field.key("out_sys"), Field.of("set_kpa", Type.REAL),
            Field.of("monitor_kpa", Type.REAL), Field.of("relief_kpa", Type.REAL), Field.of("name", Type.TEXT),
            Field.word("relief_full", YesNo.class)));
    static final Layer SENSE_TAPS = new Layer("sense_taps", Shape.POINT, List.of(
            Field.key("tap_id"), Field.key("station_id"), Field.word("device", TapDevice.class)));
    static final Layer SERVICES = new Layer("services", Shape.POINT, List.of(
            Field.key("service_id"), Field.key("system_id"), Field.word("class", ServiceClass.class),
            Field.of("meters", Type.INT), Field.of("critical", Type.TEXT), Field.of("main_id", Type.TEXT),
            Field.of("address", Type.TEXT)));
    static final Layer SOURCES = new Layer("sources", Shape.POINT, List.of(
            Field.key("source_id"), Field.key("system_id"), Field.of("kpa", Type.REAL)));

    /** The network layers in reading order; mains first. */
    static final List<Layer> LAYERS = List.of(MAINS, VALVES, STATIONS, SENSE_TAPS, SERVICES, SOURCES);

    static Optional<Layer> layer(String ours) {
        String n = ours.toLowerCase(Locale.ROOT);
        for (Layer l : LAYERS) if (l.name().equals(n)) return Optional.of(l);
        return Optional.empty();
    }
}
