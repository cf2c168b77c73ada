package org.shutline.app;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.shutline.io.FieldMapping;
import org.shutline.io.InputException;
import org.shutline.io.NetworkReader;
import org.shutline.model.ContextLayer;
import org.shutline.model.Finding;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.Progress;
import org.shutline.model.Tolerances;
import org.shutline.render.GeoTransform;
import org.shutline.render.MapScene;
import org.shutline.topology.NetworkBuilder;
import org.shutline.topology.Topology;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.trace.ValveSegments;

/**
 * A network opened once, for the window and the command line alike: the one place that
 * reads a network from a path (a .gpkg file or a shapefile folder) through a field
 * mapping and with tolerances, and builds its topology. What is derived from it is made
 * on first use and kept: the state as recorded, its feed trace, its valve segments,
 * the id lookups, the drawing scene (network layers only; context layers apart so each
 * has its own visibility and order) and the CRS transform. {@link #load} (the window's
 * open, run in a worker) makes all of them at once with progress and cancel, so the
 * event thread never waits on one.
 *
 * <p>Tolerances: those of {@link AnalysisSettings#tolerances()} (a settings file),
 * else those of the mapping file, else {@link Tolerances#DEFAULT}; when both files set
 * them differently the open is refused ({@link InputException} naming both files),
 * since it is not clear which one the user meant.
 *
 * <p>Immutable in what it shows (derived values are made once, under the object's
 * lock, and never change); adding a context layer gives a new workspace that shares the
 * topology and what is already derived.
 */
public final class Workspace {
    private final Path file;
    private final Path mapping;
    private final Topology topology;
    private final List<ContextLayer> context;

    private MapScene scene;
    private List<MapScene> contextScenes;
    private NetworkState base;
    private FeedTrace.Result trace;
    private ValveSegments segments;
    private GeoTransform geo;
    private boolean geoMade;
    private Map<String, Integer> mainIndex;
    private Map<String, Integer> valveIndex;
    private Map<String, Integer> serviceIndex;
    private Map<String, Integer> stationIndex;

    private Workspace(Path file, Path mapping, Topology topology, List<ContextLayer> context) {
        this.file = file;
        this.mapping = mapping;
        this.topology = topology;
        this.context = List.copyOf(context);
    }

    /**
     * Reads the network at {@code file} through the field-mapping file {@code mapping}
     * (null: our own names) with the tolerances of {@code settings} (see the class note)
     * and builds its topology; nothing else is made yet. Throws {@link InputException}
     * for a file or folder that does not exist or cannot be read, an unreadable mapping
     * file, or tolerances set differently in the mapping and settings files.
     */
    public static Workspace open(Path file, Path mapping, AnalysisSettings settings, Progress progress) throws InputException {
        if (!Files.exists(file)) throw new InputException("cannot read " + file + ": no such file or folder");
        if (mapping != null && !Files.isReadable(mapping)) {
            throw new InputException("cannot read mapping file " + mapping + ": no such file or not readable");
        }
        progress.begin("read " + file.getFileName(), 0);
        FieldMapping m = mapping == null ? FieldMapping.DEFAULT : FieldMapping.load(mapping);
        Tolerances tol = tolerances(m, mapping, settings);
        Network n = NetworkReader.read(file, m);
        progress.checkCancelled();
        Topology t = NetworkBuilder.build(n, tol, progress);
        return new Workspace(file, mapping, t, n.context());
    }

    private static Tolerances tolerances(FieldMapping m, Path mapping, AnalysisSettings settings) throws InputException {
        Tolerances fromSettings = settings == null ? null : settings.tolerances();
        if (fromSettings != null && m.tolerances() != null && !fromSettings.equals(m.tolerances())) {
            throw new InputException("tolerances are set both in mapping file " + mapping + " and in settings file "
                    + settings.source() + ", with different values; keep them in one of the two");
        }
        if (fromSettings != null) return fromSettings;
        return m.tolerances() == null ? Tolerances.DEFAULT : m.tolerances();
    }

    /**
     * The window's open: {@link #open} with the default settings, then every derived value
     * made at once ({@link #prepare}), so the event thread never computes one.
     */
    public static Workspace load(Path file, Path mapping, Progress progress) throws InputException {
        return open(file, mapping, null, progress).prepare(progress);
    }

    /** {@link #load} with our own names. */
    public static Workspace load(Path file, Progress progress) throws InputException {
        return load(file, null, progress);
    }

    /** A workspace over an already built topology (tests, generated networks). */
    public static Workspace of(Path file, Topology t) {
        return new Workspace(file, null, t, t.network().context());
    }

    /** Makes every derived value now (in a worker), checking {@code progress} for cancel between them; returns this. */
    public Workspace prepare(Progress progress) {
        base();
        progress.checkCancelled();
        trace();
        progress.checkCancelled();
        segments(progress);
        progress.checkCancelled();
        scene();
        contextScenes();
        geo();
        indexes();
        return this;
    }

    /** The same network with one more context layer, drawn on top of the others. */
    public Workspace withContext(ContextLayer layer) {
        List<ContextLayer> c = new ArrayList<>(context);
        c.add(layer);
        Workspace w = new Workspace(file, mapping, topology, c);
        synchronized (this) {
            w.scene = scene;
            w.base = base;
            w.trace = trace;
            w.segments = segments;
            w.geo = geo;
            w.geoMade = geoMade;
            w.mainIndex = mainIndex;
            w.valveIndex = valveIndex;
            w.serviceIndex = serviceIndex;
            w.stationIndex = stationIndex;
        }
        return w.prepare(Progress.NONE);
    }

    /** The network or shapefile folder that was read. */
    public Path file() { return file; }

    /** The field-mapping file the network was read with; null for our own names. */
    public Path mapping() { return mapping; }

    public Topology topology() { return topology; }
    public Network network() { return topology.network(); }
    public List<ContextLayer> context() { return context; }

    /** Read findings then connectivity findings (as the topology keeps them). */
    public List<Finding> findings() {
        return topology.findings();
    }

    /** Active mains with a geometry: none means there is nothing to trace. */
    public long usableMains() {
        return network().mains().stream().filter(m -> m.status() == MainStatus.ACTIVE && m.geometry() != null).count();
    }

    /** The network as recorded (every valve in its normal position). */
    public synchronized NetworkState base() {
        if (base == null) base = NetworkState.of(topology);
        return base;
    }

    /** The feed trace of the network as recorded. */
    public synchronized FeedTrace.Result trace() {
        if (trace == null) trace = FeedTrace.run(base());
        return trace;
    }

    /** The valve segments of the network as recorded. */
    public ValveSegments segments() {
        return segments(Progress.NONE);
    }

    private synchronized ValveSegments segments(Progress progress) {
        if (segments == null) segments = ValveSegments.build(base(), progress);
        return segments;
    }

    /** The drawing scene of the network layers (context layers apart). */
    public synchronized MapScene scene() {
        if (scene == null) scene = new MapScene(withoutContext(network()));
        return scene;
    }

    /** A drawing scene holding only context layer {@code i}, so that each context layer is drawn on its own. */
    public MapScene contextScene(int i) {
        return contextScenes().get(i);
    }

    private synchronized List<MapScene> contextScenes() {
        if (contextScenes == null) {
            Network n = network();
            List<MapScene> cs = new ArrayList<>();
            for (ContextLayer c : context) {
                cs.add(new MapScene(new Network(c.name(), n.crs(), List.of(), List.of(), List.of(), List.of(), List.of(),
                        List.of(), List.of(c), List.of())));
            }
            contextScenes = List.copyOf(cs);
        }
        return contextScenes;
    }

    /** The transform to geographic co-ordinates, when the CRS is known. */
    public synchronized Optional<GeoTransform> geo() {
        if (!geoMade) {
            geo = GeoTransform.forCrs(network().crs()).orElse(null);
            geoMade = true;
        }
        return Optional.ofNullable(geo);
    }

    /** Index of the main with this id in the network's list, or -1 (the first of duplicated ids). */
    public int mainIndex(String id) { return indexes().mainIndex.getOrDefault(id, -1); }
    public int valveIndex(String id) { return indexes().valveIndex.getOrDefault(id, -1); }
    public int serviceIndex(String id) { return indexes().serviceIndex.getOrDefault(id, -1); }
    public int stationIndex(String id) { return indexes().stationIndex.getOrDefault(id, -1); }

    private synchronized Workspace indexes() {
        if (mainIndex == null) {
            Network n = network();
            valveIndex = index(n.valves().stream().map(v -> v.id()).toList());
            serviceIndex = index(n.services().stream().map(s -> s.id()).toList());
            stationIndex = index(n.stations().stream().map(s -> s.id()).toList());
            mainIndex = index(n.mains().stream().map(m -> m.id()).toList());
        }
        return this;
    }

    private static Network withoutContext(Network n) {
        return new Network(n.sourceName(), n.crs(), n.mains(), n.valves(), n.stations(), n.taps(), n.services(),
                n.sources(), List.of(), n.readFindings());
    }

    private static Map<String, Integer> index(List<String> ids) {
        Map<String, Integer> m = new HashMap<>(ids.size() * 2);
        for (int i = 0; i < ids.size(); i++) m.putIfAbsent(ids.get(i), i);
        return m;
    }
}
