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
            return new Decoded(mainsOf(LayerDecoder.decode(Schema.MAINS, mainsStarted, mapping, own)), own);
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
                List<LayerDecoder.Row> r = LayerDecoder.decode(l, adopted, mapping, own);
                Object records = switch (l.name()) {
                    case "valves" -> valves(r);
                    case "stations" -> stations(r);
                    case "sense_taps" -> taps(r);
                    case "services" -> services(r);
                    case "sources" -> sources(r);
                    default -> throw new IllegalStateException("no model records for layer " + l.name());
                };
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

    private static List<Main> mainsOf(List<LayerDecoder.Row> rows) {
        Schema.Layer s = Schema.MAINS;
        List<Main> out = new ArrayList<>(rows.size());
        for (LayerDecoder.Row r : rows) {
            Integer yr = r.get(s, "install_yr");
            out.add(new Main(r.id(), r.get(s, "system_id"), (MainStatus) r.get(s, "status"), r.get(s, "material"),
                    r.get(s, "diam_mm"), r.get(s, "maop_kpa"), yr, r.geometry()));
        }
        return out;
    }

    private static List<Valve> valves(List<LayerDecoder.Row> rows) {
        Schema.Layer s = Schema.VALVES;
        List<Valve> out = new ArrayList<>(rows.size());
        for (LayerDecoder.Row r : rows) {
            LocalDate checked = r.get(s, "checked");
            out.add(new Valve(r.id(), r.get(s, "system_id"), (ValveKind) r.get(s, "kind"),
                    (NormalPosition) r.get(s, "normal"), (Operability) r.get(s, "operable"), checked, (Point) r.geometry()));
        }
        return out;
    }

    private static List<Station> stations(List<LayerDecoder.Row> rows) {
        Schema.Layer s = Schema.STATIONS;
        List<Station> out = new ArrayList<>(rows.size());
        for (LayerDecoder.Row r : rows) {
            out.add(new Station(r.id(), r.get(s, "in_sys"), r.get(s, "out_sys"), r.get(s, "set_kpa"),
                    r.get(s, "monitor_kpa"), r.get(s, "relief_kpa"), r.get(s, "name"), (Point) r.geometry(),
                    ((Schema.YesNo) r.get(s, "relief_full")).value()));
        }
        return out;
    }

    private static List<SenseTap> taps(List<LayerDecoder.Row> rows) {
        Schema.Layer s = Schema.SENSE_TAPS;
        List<SenseTap> out = new ArrayList<>(rows.size());
        for (LayerDecoder.Row r : rows) {
            out.add(new SenseTap(r.id(), r.get(s, "station_id"), (TapDevice) r.get(s, "device"), (Point) r.geometry()));
        }
        return out;
    }

    private static List<Service> services(List<LayerDecoder.Row> rows) {
        Schema.Layer s = Schema.SERVICES;
        List<Service> out = new ArrayList<>(rows.size());
        for (LayerDecoder.Row r : rows) {
            Integer meters = r.get(s, "meters");
            out.add(new Service(r.id(), r.get(s, "system_id"), (ServiceClass) r.get(s, "class"),
                    meters == null ? 1 : meters, r.get(s, "critical"), r.get(s, "main_id"), r.get(s, "address"),
                    (Point) r.geometry()));
        }
        return out;
    }

    private static List<Source> sources(List<LayerDecoder.Row> rows) {
        Schema.Layer s = Schema.SOURCES;
        List<Source> out = new ArrayList<>(rows.size());
        for (LayerDecoder.Row r : rows) {
            out.add(new Source(r.id(), r.get(s, "system_id"), r.get(s, "kpa"), (Point) r.geometry()));
        }
        return out;
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
