package org.shutline.io;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.math.BigDecimal;
import org.locationtech.jts.geom.Point;
import org.shutline.model.ContextLayer;
import org.shutline.model.Finding;
import org.shutline.model.Findings;
import org.shutline.model.Main;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;
import org.shutline.model.SenseTap;
import org.shutline.model.Service;
import org.shutline.model.ServiceClass;
import org.shutline.model.Severity;
import org.shutline.model.Source;
import org.shutline.model.Station;
import org.shutline.model.TapDevice;
import org.shutline.model.Valve;
import org.shutline.model.ValveKind;

/**
 * Reads a network from one GeoPackage ({@code .gpkg}) or one folder of shapefiles.
 *
 * <p>A path whose name ends {@code .gpkg} (any case) is read as a GeoPackage, a
 * folder as shapefiles; anything else is an {@link InputException}. Our layers
 * (mains, valves, stations, sense_taps, services, sources) are found by their
 * mapped names ignoring case; only {@code mains} is required. Every other layer is
 * a {@link ContextLayer} by its own name. All layers end in one projected CRS
 * ({@link CrsResolver}); fields, defaults and findings follow {@link LayerDecoder}
 * and docs/input-data.md. Input files are only read, never opened for writing.
 */
public final class NetworkReader {
    private NetworkReader() {}

    /** Read the network at {@code path} with the given mapping ({@link FieldMapping#DEFAULT} for none). */
    public static Network read(Path path, FieldMapping mapping) throws InputException {
        List<RawLayer> layers;
        if (path.getFileName() != null && path.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".gpkg")) {
            if (!Files.isRegularFile(path)) throw new InputException(path + ": no such GeoPackage file");
            layers = GeoPackageSource.read(path);
        } else if (Files.isDirectory(path)) {
            layers = ShapefileSource.read(path);
        } else {
            throw new InputException(path + ": neither a .gpkg file nor a folder of shapefiles");
        }
        return build(path, layers, mapping);
    }

    /**
     * Decodes layer by layer into model records; each layer's raw features are dropped from
     * {@code all} as soon as it is decoded, so at most one layer is held twice.
     */
    private static Network build(Path path, List<RawLayer> all, FieldMapping mapping) throws InputException {
        Findings findings = new Findings();
        List<RawLayer> rest = all;
        String mainsName = mapping.layerName("mains");
        RawLayer mainsRaw = take(rest, mainsName);
        if (mainsRaw == null) {
            List<String> names = new ArrayList<>();
            for (RawLayer l : all) names.add(l.name());
            throw new InputException(path + ": no mains layer (looked for '" + mainsName + "'); layers found: "
                    + (names.isEmpty() ? "none" : String.join(", ", names)));
        }
        CrsResolver crs = new CrsResolver(path.toString());
        RawLayer mainsStarted = crs.start(mainsRaw, findings);
        mainsRaw = null;
        List<Main> mains;
        List<Valve> valves = List.of();
        List<Station> stations = List.of();
        List<SenseTap> taps = List.of();
        List<Service> services = List.of();
        List<Source> sources = List.of();
        // the other layers are decoded at the same time, each with its own findings, merged in layer order
        List<Schema.Layer> kinds = new ArrayList<>();
        List<java.util.concurrent.Callable<Decoded>> work = new ArrayList<>();
        kinds.add(Schema.MAINS);
        work.add(() -> {
            Findings own = new Findings();
            return new Decoded(LayerDecoder.decode(Schema.MAINS, mainsStarted, mapping, own, NetworkReader::main, true), own);
        });
        for (Schema.Layer l : Schema.LAYERS) {
            if (l == Schema.MAINS) continue;
            RawLayer raw = take(rest, mapping.layerName(l.name()));
            if (raw == null) continue;
            Findings adoptFindings = new Findings();
            RawLayer adopted = crs.adopt(raw, l.name(), adoptFindings);
            kinds.add(l);
            work.add(() -> {
                Findings own = new Findings();
                own.addAll(adoptFindings.list());
                java.util.function.Function<LayerDecoder.Row, ?> make = switch (l.name()) {
                    case "valves" -> NetworkReader::valve;
                    case "stations" -> NetworkReader::station;
                    case "sense_taps" -> NetworkReader::tap;
                    case "services" -> NetworkReader::service;
                    case "sources" -> NetworkReader::source;
                    default -> throw new IllegalStateException("no model records for layer " + l.name());
                };
                Object records = LayerDecoder.decode(l, adopted, mapping, own, make, true);
                return new Decoded(records, own);
            });
        }
        List<Decoded> decoded = inParallel(work, path);
        findings.addAll(decoded.get(0).findings().list());
        mains = cast(decoded.get(0).records());
        for (int i = 1; i < kinds.size(); i++) {
            Decoded d = decoded.get(i);
            findings.addAll(d.findings().list());
            @SuppressWarnings("unchecked")
            Object rec = d.records();
            switch (kinds.get(i).name()) {
                case "valves" -> valves = cast(rec);
                case "stations" -> stations = cast(rec);
                case "sense_taps" -> taps = cast(rec);
                case "services" -> services = cast(rec);
                case "sources" -> sources = cast(rec);
                default -> throw new IllegalStateException("no model records for layer " + kinds.get(i).name());
            }
        }
        List<ContextLayer> context = new ArrayList<>();
        for (RawLayer l : rest) context.add(context(crs.adopt(l, l.name(), findings), findings));
        String name = path.getFileName() == null ? path.toString() : path.getFileName().toString();
        return new Network(name, crs.target(), mains, valves, stations, taps, services, sources, context, findings.list());
    }

    private record Decoded(Object records, Findings findings) {}

    @SuppressWarnings("unchecked")
    private static <T> List<T> cast(Object records) {
        return (List<T>) records;
    }

    /** Runs the tasks on up to four threads; results in task order; an InputException of a task is thrown as is. */
    private static <T> List<T> inParallel(List<java.util.concurrent.Callable<T>> tasks, Path path) throws InputException {
        int threads = Math.max(1, Math.min(Math.min(4, tasks.size()), Runtime.getRuntime().availableProcessors()));
        if (threads <= 1) {
            List<T> out = new ArrayList<>();
            for (var t : tasks) {
                try {
                    out.add(t.call());
                } catch (InputException | RuntimeException e) {
                    throw e;
                } catch (Exception e) {
                    throw new IllegalStateException(e);
                }
            }
            return out;
        }
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(threads, r -> {
            Thread th = new Thread(r, "layer-decoder");
            th.setDaemon(true);
            return th;
        });
        try {
            List<java.util.concurrent.Future<T>> fs = new ArrayList<>();
            for (var t : tasks) fs.add(pool.submit(t));
            List<T> out = new ArrayList<>();
            for (var f : fs) out.add(f.get());
            return out;
        } catch (java.util.concurrent.ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof InputException ie) throw ie;
            if (c instanceof RuntimeException re) throw re;
            if (c instanceof Error er) throw er;
            throw new IllegalStateException(c);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new InputException(path + ": reading interrupted", e);
        } finally {
            pool.shutdownNow();
        }
    }

    /** Removes and returns the layer with this name (ignoring case), or null. */
    private static RawLayer take(List<RawLayer> layers, String name) {
        for (int i = 0; i < layers.size(); i++) {
            if (layers.get(i).name().equalsIgnoreCase(name)) return layers.remove(i);
        }
        return null;
    }

    /** Index of a field in the layer's schema (the decoded row's value order). */
    private static int at(Schema.Layer l, String field) {
        for (int i = 0; i < l.fields().size(); i++) if (l.fields().get(i).name().equals(field)) return i;
        throw new IllegalArgumentException("no field " + field + " in layer " + l.name());
    }

    private static final int M_SYS = at(Schema.MAINS, "system_id"), M_STATUS = at(Schema.MAINS, "status"),
            M_MATERIAL = at(Schema.MAINS, "material"), M_DIAM = at(Schema.MAINS, "diam_mm"),
            M_MAOP = at(Schema.MAINS, "maop_kpa"), M_YEAR = at(Schema.MAINS, "install_yr");

    private static Main main(LayerDecoder.Row r) {
        List<Object> v = r.values();
        return new Main(r.id(), (String) v.get(M_SYS), (MainStatus) v.get(M_STATUS), (String) v.get(M_MATERIAL),
                (Double) v.get(M_DIAM), (Double) v.get(M_MAOP), (Integer) v.get(M_YEAR), r.geometry());
    }

    private static final int V_SYS = at(Schema.VALVES, "system_id"), V_KIND = at(Schema.VALVES, "kind"),
            V_NORMAL = at(Schema.VALVES, "normal"), V_OPERABLE = at(Schema.VALVES, "operable"),
            V_CHECKED = at(Schema.VALVES, "checked");

    private static Valve valve(LayerDecoder.Row r) {
        List<Object> v = r.values();
        return new Valve(r.id(), (String) v.get(V_SYS), (ValveKind) v.get(V_KIND), (NormalPosition) v.get(V_NORMAL),
                (Operability) v.get(V_OPERABLE), (LocalDate) v.get(V_CHECKED), (Point) r.geometry());
    }

    private static final int ST_IN = at(Schema.STATIONS, "in_sys"), ST_OUT = at(Schema.STATIONS, "out_sys"),
            ST_SET = at(Schema.STATIONS, "set_kpa"), ST_MONITOR = at(Schema.STATIONS, "monitor_kpa"),
            ST_RELIEF = at(Schema.STATIONS, "relief_kpa"), ST_NAME = at(Schema.STATIONS, "name"),
            ST_FULL = at(Schema.STATIONS, "relief_full");

    private static Station station(LayerDecoder.Row r) {
        List<Object> v = r.values();
        return new Station(r.id(), (String) v.get(ST_IN), (String) v.get(ST_OUT), (Double) v.get(ST_SET),
                (Double) v.get(ST_MONITOR), (Double) v.get(ST_RELIEF), (String) v.get(ST_NAME), (Point) r.geometry(),
                ((Schema.YesNo) v.get(ST_FULL)).value());
    }

    private static final int T_STATION = at(Schema.SENSE_TAPS, "station_id"), T_DEVICE = at(Schema.SENSE_TAPS, "device");

    private static SenseTap tap(LayerDecoder.Row r) {
        List<Object> v = r.values();
        return new SenseTap(r.id(), (String) v.get(T_STATION), (TapDevice) v.get(T_DEVICE), (Point) r.geometry());
    }

    private static final int S_SYS = at(Schema.SERVICES, "system_id"), S_CLASS = at(Schema.SERVICES, "class"),
            S_METERS = at(Schema.SERVICES, "meters"), S_CRITICAL = at(Schema.SERVICES, "critical"),
            S_MAIN = at(Schema.SERVICES, "main_id"), S_ADDRESS = at(Schema.SERVICES, "address");

    private static Service service(LayerDecoder.Row r) {
        List<Object> v = r.values();
        Integer meters = (Integer) v.get(S_METERS);
        return new Service(r.id(), (String) v.get(S_SYS), (ServiceClass) v.get(S_CLASS), meters == null ? 1 : meters,
                (String) v.get(S_CRITICAL), (String) v.get(S_MAIN), (String) v.get(S_ADDRESS), (Point) r.geometry());
    }

    private static final int SRC_SYS = at(Schema.SOURCES, "system_id"), SRC_KPA = at(Schema.SOURCES, "kpa");

    private static Source source(LayerDecoder.Row r) {
        List<Object> v = r.values();
        return new Source(r.id(), (String) v.get(SRC_SYS), (Double) v.get(SRC_KPA), (Point) r.geometry());
    }

    /** A context layer: every feature with a geometry, attributes by field name (numbers as Long or Double). */
    private static ContextLayer context(RawLayer l, Findings findings) {
        List<ContextLayer.Item> items = new ArrayList<>(l.features().size());
        int skipped = 0;
        for (RawLayer.Feature f : l.features()) {
            if (f.geometry() == null || LayerDecoder.invalid(f.geometry()) != null) {
                skipped++;
                continue;
            }
            Map<String, Object> attrs = new LinkedHashMap<>();
            for (int i = 0; i < l.fields().size(); i++) attrs.put(l.fields().get(i), plain(f.values().get(i)));
            items.add(new ContextLayer.Item(f.geometry(), Collections.unmodifiableMap(attrs)));
        }
        if (skipped > 0) {
            findings.add(Finding.of("empty-geometry", Severity.WARNING, l.name(), "context layer " + l.name() + ": "
                    + skipped + " feature(s) without a usable geometry left out"));
        }
        if (l.features().isEmpty()) {
            findings.add(Finding.of("empty-layer", Severity.WARNING, l.name(), "layer " + l.name() + " has no features"));
        }
        return new ContextLayer(l.name(), items);
    }

    private static Object plain(Object v) {
        if (v instanceof BigDecimal b) {
            BigDecimal s = b.stripTrailingZeros();
            if (s.scale() <= 0 && s.abs().compareTo(BigDecimal.valueOf(Long.MAX_VALUE)) < 0) return s.longValueExact();
            return b.doubleValue();
        }
        if (v instanceof Integer i) return i.longValue();
        if (v instanceof Float f) return f.doubleValue();
        if (v instanceof String s) return s.trim().isEmpty() ? null : s.trim();
        if (v instanceof java.util.Date d && !(v instanceof java.sql.Timestamp)) {
            return d.toInstant().atZone(java.time.ZoneId.systemDefault()).toLocalDate();
        }
        return v;
    }
}
