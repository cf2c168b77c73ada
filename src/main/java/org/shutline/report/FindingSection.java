package org.shutline.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.shutline.model.Finding;
import org.shutline.model.Words;

/**
 * The one shape in which every front end and report shows findings (data findings of
 * the network as read, hazards of plan steps, any other review of a state): the same
 * text block, the same JSON object, the same table columns and the same result-layer
 * fields, whoever raised the finding.
 *
 * <p>Text: findings grouped by code, groups by falling severity (the group's highest)
 * then code; a heading {@code code  SEVERITY  (n)}, then one line per finding
 * ({@code [step N] features: message (at x, y)}) with its action and what mitigates it
 * on lines of their own.
 */
public final class FindingSection {
    private FindingSection() {}

    /** Table and layer columns, in order. */
    public static final List<String> HEADER = List.of("severity", "code", "step", "features", "what is wrong", "action",
            "mitigated by");

    /** Findings grouped by code: groups by falling severity (the group's highest), then code. */
    public static List<List<Finding>> groups(List<Finding> findings) {
        Map<String, List<Finding>> by = new TreeMap<>();
        for (Finding f : findings) by.computeIfAbsent(f.code(), k -> new ArrayList<>()).add(f);
        List<List<Finding>> g = new ArrayList<>(by.values());
        g.sort(Comparator.comparing((List<Finding> l) -> l.stream().map(Finding::severity)
                .max(Comparator.naturalOrder()).orElseThrow()).reversed()
                .thenComparing(l -> l.get(0).code()));
        return g;
    }

    /**
     * The text block of {@code findings}, each line starting with {@code indent}; at most
     * {@code examples} findings per code, then "... and n more".
     */
    public static String text(List<Finding> findings, int examples, String indent) {
        StringBuilder b = new StringBuilder();
        for (List<Finding> g : groups(findings)) {
            Finding first = g.get(0);
            b.append(indent).append(first.code()).append("  ").append(Words.word(severityOf(g)).toUpperCase(Locale.ROOT))
                    .append("  (").append(g.size()).append(")\n");
            for (int i = 0; i < Math.min(examples, g.size()); i++) {
                Finding f = g.get(i);
                b.append(indent).append("  ").append(line(f)).append('\n');
                if (f.action() != null) b.append(indent).append("    action: ").append(f.action()).append('\n');
                if (f.mitigated()) b.append(indent).append("    mitigated by: ").append(f.mitigatedBy()).append('\n');
            }
            if (g.size() > examples) b.append(indent).append("  ... and ").append(g.size() - examples).append(" more\n");
        }
        return b.toString();
    }

    private static org.shutline.model.Severity severityOf(List<Finding> g) {
        return g.stream().map(Finding::severity).max(Comparator.naturalOrder()).orElseThrow();
    }

    /**
     * One finding on one line: {@code [step N] [SEVERITY if it differs from the group's]
     * features: message (at x, y)}.
     */
    public static String line(Finding f) {
        StringBuilder b = new StringBuilder();
        if (f.hasStep()) b.append(f.step() == 0 ? "[as recorded] " : "[step " + f.step() + "] ");
        if (!f.features().isEmpty()) b.append(String.join(", ", f.features())).append(": ");
        b.append(f.message());
        if (f.hasLocation()) b.append(String.format(Locale.ROOT, " (at %.1f, %.1f)", f.x(), f.y()));
        return b.toString();
    }

    /** Adds the JSON object of {@code f} to {@code a}: every key always present, null when the finding has no value. */
    public static ObjectNode json(ArrayNode a, Finding f) {
        ObjectNode o = a.addObject();
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
        if (f.hasStep()) o.put("step", f.step());
        else o.putNull("step");
        o.put("action", f.action());
        o.put("mitigated_by", f.mitigatedBy());
        return o;
    }

    /** The table row of {@code f}, in {@link #HEADER} order (empty text for what it lacks). */
    public static List<String> row(Finding f) {
        return List.of(Words.word(f.severity()), f.code(), f.hasStep() ? Integer.toString(f.step()) : "",
                String.join(" ", f.features()), f.message(), f.action() == null ? "" : f.action(),
                f.mitigated() ? f.mitigatedBy() : "");
    }

    /** The rows of {@code findings}, in {@link #HEADER} order. */
    public static List<List<String>> rows(List<Finding> findings) {
        List<List<String>> out = new ArrayList<>(findings.size());
        for (Finding f : findings) out.add(row(f));
        return out;
    }
}
