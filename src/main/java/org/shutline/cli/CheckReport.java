package org.shutline.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.shutline.model.ContextLayer;
import org.shutline.model.Finding;
import org.shutline.model.Main;
import org.shutline.model.Network;
import org.shutline.model.Service;
import org.shutline.model.Severity;
import org.shutline.model.Words;

/**
 * The result of {@code shutline check} for one network: feature counts per layer (the
 * six network layers, then context layers, in input order), mains, services and
 * meters per pressure system (sorted by system id; a system named only by services
 * is listed too), and the findings. Text form: findings grouped by code, groups in
 * order of falling severity then code, with the first {@value #EXAMPLES} of each group.
 * JSON form: see docs/cli.md.
 */
public final class CheckReport {
    static final int EXAMPLES = 5;

    /** Per-system counts. */
    public record SystemCounts(int mains, int services, long meters) {}

    private final String source;
    private final String crs;
    private final Map<String, Integer> layers;
    private final Map<String, SystemCounts> systems;
    private final List<Finding> findings;

    private CheckReport(String source, String crs, Map<String, Integer> layers, Map<String, SystemCounts> systems,
                        List<Finding> findings) {
        this.source = source;
        this.crs = crs;
        this.layers = layers;
        this.systems = systems;
        this.findings = List.copyOf(findings);
    }

    /** Counts from {@code network}; {@code findings} are all findings (read and topology). */
    public static CheckReport of(Network network, List<Finding> findings) {
        Map<String, Integer> layers = new LinkedHashMap<>();
        layers.put("mains", network.mains().size());
        layers.put("valves", network.valves().size());
        layers.put("stations", network.stations().size());
        layers.put("sense_taps", network.taps().size());
        layers.put("services", network.services().size());
        layers.put("sources", network.sources().size());
        for (ContextLayer c : network.context()) layers.put(c.name(), c.items().size());
        Map<String, int[]> mains = new TreeMap<>();
        Map<String, long[]> svc = new TreeMap<>();
        for (Main m : network.mains()) mains.computeIfAbsent(key(m.systemId()), k -> new int[1])[0]++;
        for (Service s : network.services()) {
            long[] c = svc.computeIfAbsent(key(s.systemId()), k -> new long[2]);
            c[0]++;
            c[1] += s.meters();
        }
        Map<String, SystemCounts> systems = new TreeMap<>();
        for (String id : mains.keySet()) systems.put(id, null);
        for (String id : svc.keySet()) systems.put(id, null);
        for (String id : systems.keySet()) {
            int[] m = mains.getOrDefault(id, new int[1]);
            long[] s = svc.getOrDefault(id, new long[2]);
            systems.put(id, new SystemCounts(m[0], (int) s[0], s[1]));
        }
        String crs = network.crs().name() + (network.crs().epsg() > 0 ? " (EPSG:" + network.crs().epsg() + ")" : "")
            + ", " + network.crs().unit().symbol();
        return new CheckReport(network.sourceName(), crs, layers, systems, findings);
    }

    private static String key(String systemId) {
        return systemId == null || systemId.isBlank() ? "(none)" : systemId;
    }

    public Map<String, Integer> layers() {
        return java.util.Collections.unmodifiableMap(layers);
    }

    public Map<String, SystemCounts> systems() {
        return java.util.Collections.unmodifiableMap(systems);
    }

    public List<Finding> findings() {
        return findings;
    }

    /** True when a finding is of severity ERROR or above. */
    public boolean hasErrors() {
        return findings.stream().anyMatch(f -> f.severity().compareTo(Severity.ERROR) >= 0);
    }

    /** The exit code of {@code check}: 1 with errors, else 0. */
    public int exitCode() {
        return hasErrors() ? 1 : 0;
    }

    /** Findings grouped by code: groups by falling severity (the group's highest), then code. */
    List<List<Finding>> groups() {
        Map<String, List<Finding>> by = new TreeMap<>();
        for (Finding f : findings) by.computeIfAbsent(f.code(), k -> new ArrayList<>()).add(f);
        List<List<Finding>> g = new ArrayList<>(by.values());
        g.sort(Comparator.comparing((List<Finding> l) -> l.stream().map(Finding::severity)
            .max(Comparator.naturalOrder()).orElseThrow()).reversed()
            .thenComparing(l -> l.get(0).code()));
        return g;
    }

    public String toText() {
        StringBuilder b = new StringBuilder();
        b.append("Network: ").append(source).append('\n').append("CRS: ").append(crs).append("\n\n");
        b.append("Layers\n");
        layers.forEach((k, v) -> b.append(String.format(Locale.ROOT, "  %-14s %9d%n", k, v)));
        b.append(String.format(Locale.ROOT, "%nSystems          %9s %9s %9s%n", "mains", "services", "meters"));
        systems.forEach((k, v) -> b.append(String.format(Locale.ROOT, "  %-14s %9d %9d %9d%n", k, v.mains(),
            v.services(), v.meters())));
        int[] bySeverity = new int[Severity.values().length];
        for (Finding f : findings) bySeverity[f.severity().ordinal()]++;
        b.append(String.format(Locale.ROOT, "%nFindings: %d (%d critical, %d errors, %d warnings, %d notes)%n",
            findings.size(), bySeverity[3], bySeverity[2], bySeverity[1], bySeverity[0]));
        for (List<Finding> g : groups()) {
            b.append(String.format(Locale.ROOT, "%n  %s  %s  (%d)%n", g.get(0).code(),
                Words.word(g.get(0).severity()).toUpperCase(Locale.ROOT), g.size()));
            for (int i = 0; i < Math.min(EXAMPLES, g.size()); i++) b.append("    ").append(line(g.get(i))).append('\n');
            if (g.size() > EXAMPLES) b.append("    ... and ").append(g.size() - EXAMPLES).append(" more\n");
        }
        b.append('\n').append(hasErrors() ? "Result: errors found (exit 1)" : "Result: no errors (exit 0)").append('\n');
        return b.toString();
    }

    private static String line(Finding f) {
        StringBuilder b = new StringBuilder();
        if (!f.features().isEmpty()) b.append(String.join(", ", f.features())).append(": ");
        b.append(f.message());
        if (f.hasLocation()) b.append(String.format(Locale.ROOT, " (at %.1f, %.1f)", f.x(), f.y()));
        return b.toString();
    }

    public String toJson() {
        ObjectMapper om = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = om.createObjectNode();
        root.put("network", source);
        root.put("crs", crs);
        ObjectNode l = root.putObject("layers");
        layers.forEach(l::put);
        ObjectNode s = root.putObject("systems");
        systems.forEach((k, v) -> s.putObject(k).put("mains", v.mains()).put("services", v.services())
            .put("meters", v.meters()));
        ArrayNode fs = root.putArray("findings");
        for (Finding f : findings) {
            ObjectNode o = fs.addObject();
            o.put("code", f.code());
            o.put("severity", Words.word(f.severity()));
            ArrayNode ids = o.putArray("features");
            f.features().forEach(ids::add);
            if (f.hasLocation()) {
                o.put("x", f.x());
                o.put("y", f.y());
            } else {
                o.putNull("x");
                o.putNull("y");
            }
            o.put("message", f.message());
            o.put("layer", f.layer());
        }
        root.put("errors", hasErrors());
        try {
            return om.writeValueAsString(root) + "\n";
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException("JSON tree could not be written", e);
        }
    }
}
