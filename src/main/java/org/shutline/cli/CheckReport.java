package org.shutline.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.shutline.model.ContextLayer;
import org.shutline.model.Finding;
import org.shutline.report.FindingSection;
import org.shutline.model.Main;
import org.shutline.model.Network;
import org.shutline.model.Service;
import org.shutline.model.Severity;

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
        if (!findings.isEmpty()) b.append('\n').append(FindingSection.text(findings, EXAMPLES, "  "));
        b.append('\n').append(hasErrors() ? "Result: errors found (exit 1)" : "Result: no errors (exit 0)").append('\n');
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
        for (Finding f : findings) FindingSection.json(fs, f);
        root.put("errors", hasErrors());
        try {
            return om.writeValueAsString(root) + "\n";
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException("JSON tree could not be written", e);
        }
    }
}
