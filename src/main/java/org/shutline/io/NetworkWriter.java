package org.shutline.io;

import static org.shutline.io.WriteLayer.ColumnType.DATE;
import static org.shutline.io.WriteLayer.ColumnType.INTEGER;
import static org.shutline.io.WriteLayer.ColumnType.REAL;
import static org.shutline.io.WriteLayer.ColumnType.TEXT;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Geometry;
import org.shutline.model.ContextLayer;
import org.shutline.model.Main;
import org.shutline.model.Network;
import org.shutline.model.Progress;
import org.shutline.model.SenseTap;
import org.shutline.model.Service;
import org.shutline.model.Source;
import org.shutline.model.Station;
import org.shutline.model.Valve;
import org.shutline.model.Words;
import org.shutline.io.WriteLayer.Column;
import org.shutline.io.WriteLayer.GeometryKind;

/**
 * Writes a {@link Network} in Shutline's input data model (docs/design.md): the six
 * layers {@code mains}, {@code valves}, {@code stations}, {@code sense_taps},
 * {@code services}, {@code sources} with the default field names and types, then
 * each context layer. Value words are written in lower case; null numbers and dates
 * as empty fields. Context layer columns are the union of the items' attribute names
 * in order of first appearance, typed from the first non-null value (Integer/Long:
 * INTEGER, other numbers: REAL, LocalDate: DATE, anything else: TEXT).
 *
 * <p>What is read back equals what was written, except that shapefile field names
 * are cut to 10 characters ({@code monitor_kpa} is {@code monitor_kp} there).
 */
public final class NetworkWriter {
    private NetworkWriter() {}

    /** Write {@code network} to a new GeoPackage at {@code file}. */
    public static void writeGeoPackage(Network network, Path file) throws IOException {
        GeoPackageWriter.write(file, network.crs(), layers(network), Progress.NONE);
    }

    /** Write {@code network} as shapefiles into {@code folder}. */
    public static void writeShapefiles(Network network, Path folder) throws IOException {
        ShapefileWriter.write(folder, network.crs(), layers(network), Progress.NONE);
    }

    /** The layers of {@code network} as written: the six network layers, then the context layers. */
    public static List<WriteLayer> layers(Network n) {
        List<WriteLayer> out = new ArrayList<>();
        out.add(mains(n.mains()));
        out.add(valves(n.valves()));
        out.add(stations(n.stations()));
        out.add(taps(n.taps()));
        out.add(services(n.services()));
        out.add(sources(n.sources()));
        for (ContextLayer c : n.context()) out.add(context(c));
        return out;
    }

    private static List<Column> cols(Object... nameType) {
        List<Column> c = new ArrayList<>();
        for (int i = 0; i < nameType.length; i += 2) {
            c.add(new Column((String) nameType[i], (WriteLayer.ColumnType) nameType[i + 1]));
        }
        return c;
    }

    static WriteLayer mains(List<Main> m) {
        return new WriteLayer("mains", GeometryKind.LINE,
            cols("main_id", TEXT, "system_id", TEXT, "status", TEXT, "material", TEXT,
                "diam_mm", REAL, "maop_kpa", REAL, "install_yr", INTEGER),
            m.size(), i -> m.get(i).geometry(), (i, c) -> {
                Main x = m.get(i);
                return switch (c) {
                    case 0 -> x.id();
                    case 1 -> x.systemId();
                    case 2 -> Words.word(x.status());
                    case 3 -> x.material();
                    case 4 -> x.diamMm();
                    case 5 -> x.maopKpa();
                    default -> x.installYr();
                };
            });
    }

    static WriteLayer valves(List<Valve> v) {
        return new WriteLayer("valves", GeometryKind.POINT,
            cols("valve_id", TEXT, "system_id", TEXT, "kind", TEXT, "normal", TEXT, "operable", TEXT, "checked", DATE),
            v.size(), i -> v.get(i).geometry(), (i, c) -> {
                Valve x = v.get(i);
                return switch (c) {
                    case 0 -> x.id();
                    case 1 -> x.systemId();
                    case 2 -> Words.word(x.kind());
                    case 3 -> Words.word(x.normal());
                    case 4 -> Words.word(x.operable());
                    default -> x.checked();
                };
            });
    }

    static WriteLayer stations(List<Station> s) {
        return new WriteLayer("stations", GeometryKind.POINT,
            cols("station_id", TEXT, "in_sys", TEXT, "out_sys", TEXT, "set_kpa", REAL, "monitor_kpa", REAL,
                "relief_kpa", REAL, "name", TEXT, "relief_full", TEXT),
            s.size(), i -> s.get(i).geometry(), (i, c) -> {
                Station x = s.get(i);
                return switch (c) {
                    case 0 -> x.id();
                    case 1 -> x.inSys();
                    case 2 -> x.outSys();
                    case 3 -> x.setKpa();
                    case 4 -> x.monitorKpa();
                    case 5 -> x.reliefKpa();
                    case 6 -> x.name();
                    default -> x.reliefFull() == null ? null : x.reliefFull() ? "yes" : "no";
                };
            });
    }

    static WriteLayer taps(List<SenseTap> t) {
        return new WriteLayer("sense_taps", GeometryKind.POINT, cols("tap_id", TEXT, "station_id", TEXT, "device", TEXT),
            t.size(), i -> t.get(i).geometry(), (i, c) -> {
                SenseTap x = t.get(i);
                return switch (c) {
                    case 0 -> x.id();
                    case 1 -> x.stationId();
                    default -> Words.word(x.device());
                };
            });
    }

    static WriteLayer services(List<Service> s) {
        return new WriteLayer("services", GeometryKind.POINT,
            cols("service_id", TEXT, "system_id", TEXT, "class", TEXT, "meters", INTEGER, "critical", TEXT,
                "main_id", TEXT, "address", TEXT),
            s.size(), i -> s.get(i).geometry(), (i, c) -> {
                Service x = s.get(i);
                return switch (c) {
                    case 0 -> x.id();
                    case 1 -> x.systemId();
                    case 2 -> Words.word(x.serviceClass());
                    case 3 -> x.meters();
                    case 4 -> x.critical() == null || x.critical().isEmpty() ? null : x.critical();
                    case 5 -> x.mainId();
                    default -> x.address();
                };
            });
    }

    static WriteLayer sources(List<Source> s) {
        return new WriteLayer("sources", GeometryKind.POINT, cols("source_id", TEXT, "system_id", TEXT, "kpa", REAL),
            s.size(), i -> s.get(i).geometry(), (i, c) -> {
                Source x = s.get(i);
                return switch (c) {
                    case 0 -> x.id();
                    case 1 -> x.systemId();
                    default -> x.kpa();
                };
            });
    }

    static WriteLayer context(ContextLayer layer) {
        Map<String, WriteLayer.ColumnType> types = new LinkedHashMap<>();
        GeometryKind kind = null;
        for (ContextLayer.Item it : layer.items()) {
            if (kind == null && it.geometry() != null && !it.geometry().isEmpty()) kind = kindOf(it.geometry());
            for (Map.Entry<String, Object> e : it.attributes().entrySet()) {
                WriteLayer.ColumnType t = typeOf(e.getValue());
                if (!types.containsKey(e.getKey()) || (types.get(e.getKey()) == null && t != null)) {
                    types.put(e.getKey(), t);
                }
            }
        }
        List<Column> cols = new ArrayList<>();
        for (Map.Entry<String, WriteLayer.ColumnType> e : types.entrySet()) {
            cols.add(new Column(e.getKey(), e.getValue() == null ? TEXT : e.getValue()));
        }
        List<ContextLayer.Item> items = layer.items();
        return new WriteLayer(layer.name(), kind == null ? GeometryKind.LINE : kind, cols, items.size(),
            i -> items.get(i).geometry(), (i, c) -> {
                Object v = items.get(i).attributes().get(cols.get(c).name());
                return cols.get(c).type() == TEXT && v != null ? v.toString() : v;
            });
    }

    private static GeometryKind kindOf(Geometry g) {
        return switch (g.getDimension()) {
            case 0 -> GeometryKind.POINT;
            case 1 -> GeometryKind.LINE;
            default -> GeometryKind.POLYGON;
        };
    }

    private static WriteLayer.ColumnType typeOf(Object v) {
        if (v == null) return null;
        if (v instanceof Integer || v instanceof Long || v instanceof Short) return INTEGER;
        if (v instanceof BigDecimal b) return b.scale() <= 0 ? INTEGER : REAL;
        if (v instanceof Number) return REAL;
        if (v instanceof LocalDate) return DATE;
        return TEXT;
    }
}
