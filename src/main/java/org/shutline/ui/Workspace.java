package org.shutline.ui;

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
 * A network opened in the window, with everything computed once on load (in a worker):
 * the topology, the drawing scene (network layers only; context layers are kept
 * apart so that each has its own visibility and order), the feed trace and valve
 * segments of the network as recorded, the CRS transform (when the CRS is known) and
 * id lookups. Immutable; adding a context layer gives a new workspace.
 */
public final class Workspace {
    private final Path file;
    private final Topology topology;
    private final MapScene scene;
    private final List<ContextLayer> context;
    private final List<MapScene> contextScenes;
    private final NetworkState base;
    private final FeedTrace.Result trace;
    private final ValveSegments segments;
    private final GeoTransform geo;
    private final Map<String, Integer> mainIndex;
    private final Map<String, Integer> valveIndex;
    private final Map<String, Integer> serviceIndex;
    private final Map<String, Integer> stationIndex;

    private Workspace(Path file, Topology topology, List<ContextLayer> context, Progress progress) {
        this.file = file;
        this.topology = topology;
        Network n = topology.network();
        this.context = List.copyOf(context);
        this.scene = new MapScene(withoutContext(n));
        List<MapScene> cs = new ArrayList<>();
        for (ContextLayer c : this.context) {
            cs.add(new MapScene(new Network(c.name(), n.crs(), List.of(), List.of(), List.of(), List.of(), List.of(),
                    List.of(), List.of(c), List.of())));
        }
        this.contextScenes = List.copyOf(cs);
        this.base = NetworkState.of(topology);
        progress.checkCancelled();
        this.trace = FeedTrace.run(base);
        progress.checkCancelled();
        this.segments = ValveSegments.build(base, progress);
        this.geo = GeoTransform.forCrs(n.crs()).orElse(null);
        this.mainIndex = index(n.mains().stream().map(m -> m.id()).toList());
        this.valveIndex = index(n.valves().stream().map(v -> v.id()).toList());
        this.serviceIndex = index(n.services().stream().map(s -> s.id()).toList());
        this.stationIndex = index(n.stations().stream().map(s -> s.id()).toList());
    }

    /** Reads and builds the network at {@code file} (a .gpkg or a shapefile folder) with our own names and the default tolerances. */
    public static Workspace load(Path file, Progress progress) throws InputException {
        return load(file, null, progress);
    }

    /**
     * Reads and builds the network at {@code file} through the field-mapping file
     * {@code mapping} (null: our own names), with the mapping's tolerances when it gives
     * them: the same read as the command line's {@code --mapping}, so the window shows the
     * same findings as {@code check} with that file.
     */
    public static Workspace load(Path file, Path mapping, Progress progress) throws InputException {
        if (!Files.exists(file)) throw new InputException("cannot read " + file + ": no such file or folder");
        if (mapping != null && !Files.isReadable(mapping)) {
            throw new InputException("cannot read mapping file " + mapping + ": no such file or not readable");
        }
        progress.begin("read " + file.getFileName(), 0);
        FieldMapping m = mapping == null ? FieldMapping.DEFAULT : FieldMapping.load(mapping);
        Network n = NetworkReader.read(file, m);
        progress.checkCancelled();
        Topology t = NetworkBuilder.build(n, m.tolerances() == null ? Tolerances.DEFAULT : m.tolerances(), progress);
        Workspace w = new Workspace(file, t, n.context(), progress);
        w.mapping = mapping;
        return w;
    }

    private Path mapping;

    /** The field-mapping file the network was read with; null for our own names. */
    public Path mapping() {
        return mapping;
    }

    /** A workspace over an already built topology (tests, generated networks). */
    public static Workspace of(Path file, Topology t) {
        return new Workspace(file, t, t.network().context(), Progress.NONE);
    }

    /** The same network with one more context layer, drawn on top of the others. */
    public Workspace withContext(ContextLayer layer) {
        List<ContextLayer> c = new ArrayList<>(context);
        c.add(layer);
        Workspace w = new Workspace(file, topology, c, Progress.NONE);
        w.mapping = mapping;
        return w;
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

    public Path file() { return file; }
    public Topology topology() { return topology; }
    public Network network() { return topology.network(); }
    public MapScene scene() { return scene; }
    public List<ContextLayer> context() { return context; }
    public NetworkState base() { return base; }

    /** A drawing scene holding only context layer {@code i}, so that each context layer is drawn on its own. */
    public MapScene contextScene(int i) { return contextScenes.get(i); }
    public FeedTrace.Result trace() { return trace; }
    public ValveSegments segments() { return segments; }
    public Optional<GeoTransform> geo() { return Optional.ofNullable(geo); }

    /** Index of the main with this id in the network's list, or -1. */
    public int mainIndex(String id) { return mainIndex.getOrDefault(id, -1); }
    public int valveIndex(String id) { return valveIndex.getOrDefault(id, -1); }
    public int serviceIndex(String id) { return serviceIndex.getOrDefault(id, -1); }
    public int stationIndex(String id) { return stationIndex.getOrDefault(id, -1); }

    /** Read findings then connectivity findings (as the topology keeps them). */
    public List<Finding> findings() {
        return topology.findings();
    }
}
