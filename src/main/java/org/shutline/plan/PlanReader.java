package org.shutline.plan;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.LocalDateTime;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.shutline.model.PressureUnit;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;

/**
 * Reads a work plan from YAML (docs/plan-format.md). Strict: an unknown key, a
 * missing field, a value of the wrong shape, a bad date or duration is a
 * {@link PlanException} whose message starts with {@code file:line:} and says what is
 * wrong. Feature ids are checked against a network by {@link PlanValidator}, not here.
 */
public final class PlanReader {
    private static final Set<String> TOP_KEYS = Set.of("project", "network", "pressure_unit", "phases");
    private static final Set<String> PHASE_KEYS = Set.of("name", "start", "end", "steps");
    private static final Set<String> STEP_EXTRA = Set.of("note", "duration", "ordered");
    private static final Pattern DURATION = Pattern.compile("(?:(\\d+(?:\\.\\d+)?)\\s*h)?\\s*(?:(\\d+)\\s*m(?:in)?)?");

    private final String fileName;
    private int stepNumber;

    private PlanReader(String fileName) {
        this.fileName = fileName;
    }

    /** Largest plan file read: 8 MB (a plan of thousands of steps is well under 1 MB). */
    public static final long MAX_BYTES = 8L << 20;

    public static Plan read(Path file) throws PlanException {
        String text;
        try {
            text = org.shutline.io.SmallTextFile.read(file, "plan file", MAX_BYTES);
        } catch (org.shutline.io.InputException e) {
            throw new PlanException(e.getMessage(), 0);
        }
        return parse(text, file.getFileName().toString());
    }

    /** Parse plan text; {@code fileName} is used in messages. */
    public static Plan parse(String text, String fileName) throws PlanException {
        return new PlanReader(fileName).parseText(text);
    }

    private Plan parseText(String text) throws PlanException {
        Node root;
        try (Reader r = new StringReader(text)) {
            LoaderOptions opts = new LoaderOptions();
            opts.setAllowDuplicateKeys(false);
            // a plan uses no aliases and little nesting: refuse alias bombs and deep nests at once
            opts.setMaxAliasesForCollections(20);
            opts.setAllowRecursiveKeys(false);
            opts.setNestingDepthLimit(40);
            opts.setCodePointLimit((int) Math.min(Integer.MAX_VALUE, MAX_BYTES));
            root = new Yaml(opts).compose(r);
        } catch (MarkedYAMLException e) {
            int line = e.getProblemMark() == null ? 0 : e.getProblemMark().getLine() + 1;
            throw error(line, "not valid YAML: " + e.getProblem());
        } catch (IOException | RuntimeException e) {
            throw error(0, "not valid YAML: " + e.getMessage());
        }
        if (root == null) throw error(1, "the plan file is empty");
        Map<String, Node> top = mapping(root, "plan", TOP_KEYS);
        String project = requiredText(top, "project", root);
        String network = optionalText(top, "network");
        PressureUnit unit = PressureUnit.KPA;
        if (top.containsKey("pressure_unit")) {
            Node n = top.get("pressure_unit");
            unit = PressureUnit.parse(scalar(n, "pressure_unit"))
                    .orElseThrow(() -> error(line(n), "pressure_unit must be one of kPa, psi, in_wc, mbar"));
        }
        Node phasesNode = top.get("phases");
        if (phasesNode == null) throw error(line(root), "missing key 'phases'");
        List<Phase> phases = new ArrayList<>();
        for (Node pn : sequence(phasesNode, "phases")) phases.add(phase(pn, phases.size()));
        if (phases.isEmpty()) throw error(line(phasesNode), "a plan needs at least one phase");
        return new Plan(project, network, unit, phases);
    }

    private Phase phase(Node node, int index) throws PlanException {
        Map<String, Node> m = mapping(node, "phase", PHASE_KEYS);
        String name = requiredText(m, "name", node);
        LocalDateTime start = dateTime(m.get("start"), "start");
        LocalDateTime end = dateTime(m.get("end"), "end");
        if (start != null && end != null && end.isBefore(start)) {
            throw error(line(m.get("end")), "phase '" + name + "' ends before it starts");
        }
        Node stepsNode = m.get("steps");
        if (stepsNode == null) throw error(line(node), "phase '" + name + "' has no 'steps'");
        List<Step> steps = new ArrayList<>();
        for (Node sn : sequence(stepsNode, "steps")) steps.add(step(sn, index));
        return new Phase(name, start, end, steps, line(node));
    }

    private Step step(Node node, int phase) throws PlanException {
        if (!(node instanceof MappingNode mn)) throw error(line(node), "a step must be a mapping such as 'close: V-1'");
        Map<String, Node> m = new LinkedHashMap<>();
        String kind = null;
        for (NodeTuple t : mn.getValue()) {
            String key = scalar(t.getKeyNode(), "key");
            m.put(key, t.getValueNode());
            if (STEP_EXTRA.contains(key)) continue;
            if (!StepKinds.KEYS.contains(key)) {
                throw error(line(t.getKeyNode()), "unknown key '" + key + "' in step; step kinds are " + StepKinds.KEYS
                        + ", extra keys " + STEP_EXTRA);
            }
            if (kind != null) throw error(line(t.getKeyNode()), "a step has one kind; found both '" + kind + "' and '" + key + "'");
            kind = key;
        }
        if (kind == null) throw error(line(node), "step has no kind; step kinds are " + StepKinds.KEYS);
        if (m.containsKey("ordered") && !kind.equals("close")) throw error(line(m.get("ordered")), "'ordered' applies to 'close' steps only");
        boolean ordered = true;
        if (m.containsKey("ordered")) ordered = bool(m.get("ordered"), "ordered");
        StepAction action = new StepKinds(this).action(kind, m.get(kind), ordered);
        String note = optionalText(m, "note");
        Duration duration = m.containsKey("duration") ? duration(m.get("duration")) : null;
        return new Step(++stepNumber, phase, action, note, duration, line(node));
    }

    // ---- small typed accessors, each naming the line on error ----

    PlanException error(int line, String message) {
        return new PlanException(fileName + ":" + line + ": " + message, line);
    }

    static int line(Node n) {
        return n == null ? 0 : n.getStartMark().getLine() + 1;
    }

    Map<String, Node> mapping(Node node, String what, Set<String> allowed) throws PlanException {
        if (!(node instanceof MappingNode mn)) throw error(line(node), what + " must be a mapping");
        Map<String, Node> m = new LinkedHashMap<>();
        for (NodeTuple t : mn.getValue()) {
            String key = scalar(t.getKeyNode(), "key");
            if (!allowed.contains(key)) {
                throw error(line(t.getKeyNode()), "unknown key '" + key + "' in " + what + "; allowed: " + new java.util.TreeSet<>(allowed));
            }
            if (m.put(key, t.getValueNode()) != null) {
                // the composer does not apply the loader's duplicate-key rule: a repeated key would silently win
                throw error(line(t.getKeyNode()), "key '" + key + "' is given twice in " + what);
            }
        }
        return m;
    }

    List<Node> sequence(Node node, String what) throws PlanException {
        if (!(node instanceof SequenceNode sn)) throw error(line(node), what + " must be a list");
        return sn.getValue();
    }

    String scalar(Node node, String what) throws PlanException {
        if (!(node instanceof ScalarNode sn)) throw error(line(node), what + " must be a single value");
        return sn.getValue().trim();
    }

    String requiredText(Map<String, Node> m, String key, Node owner) throws PlanException {
        Node n = m.get(key);
        if (n == null) throw error(line(owner), "missing key '" + key + "'");
        String v = scalar(n, key);
        if (v.isEmpty()) throw error(line(n), "'" + key + "' is empty");
        return v;
    }

    String optionalText(Map<String, Node> m, String key) throws PlanException {
        Node n = m.get(key);
        return n == null ? null : scalar(n, key);
    }

    /** A scalar id or a list of ids. */
    List<String> ids(Node node, String what) throws PlanException {
        List<String> out = new ArrayList<>();
        if (node instanceof SequenceNode sn) {
            for (Node n : sn.getValue()) out.add(scalar(n, what));
        } else {
            out.add(scalar(node, what));
        }
        for (String s : out) if (s.isEmpty()) throw error(line(node), what + ": empty id");
        if (out.isEmpty()) throw error(line(node), what + ": no ids given");
        return out;
    }

    XY point(Node node, String what) throws PlanException {
        List<Node> xs = sequence(node, what + " (as [x, y])");
        if (xs.size() != 2) throw error(line(node), what + " must be [x, y]");
        return new XY(number(xs.get(0), what), number(xs.get(1), what));
    }

    double number(Node n, String what) throws PlanException {
        String s = scalar(n, what);
        try {
            double d = Double.parseDouble(s);
            if (!Double.isFinite(d)) throw new NumberFormatException();
            return d;
        } catch (NumberFormatException e) {
            throw error(line(n), what + ": '" + s + "' is not a number");
        }
    }

    boolean bool(Node n, String what) throws PlanException {
        String s = scalar(n, what).toLowerCase(Locale.ROOT);
        if (s.equals("true") || s.equals("yes")) return true;
        if (s.equals("false") || s.equals("no")) return false;
        throw error(line(n), what + " must be true or false");
    }

    private LocalDateTime dateTime(Node n, String what) throws PlanException {
        if (n == null) return null;
        String s = scalar(n, what).replace(' ', 'T');
        try {
            return LocalDateTime.parse(s);
        } catch (DateTimeParseException e) {
            throw error(line(n), what + ": '" + s + "' is not a date-time like 2027-05-03T07:00");
        }
    }

    private Duration duration(Node n) throws PlanException {
        String s = scalar(n, "duration").toLowerCase(Locale.ROOT).replace(" ", "");
        try {
            if (s.startsWith("pt")) return Duration.parse(s.toUpperCase(Locale.ROOT));
        } catch (DateTimeParseException e) {
            throw error(line(n), "duration: '" + s + "' is not a duration like 45m, 2h, 1h30m");
        }
        Matcher mt = DURATION.matcher(s);
        if (s.isEmpty() || !mt.matches() || (mt.group(1) == null && mt.group(2) == null)) {
            throw error(line(n), "duration: '" + s + "' is not a duration like 45m, 2h, 1h30m");
        }
        long minutes = 0;
        if (mt.group(1) != null) minutes += Math.round(Double.parseDouble(mt.group(1)) * 60);
        if (mt.group(2) != null) minutes += Long.parseLong(mt.group(2));
        return Duration.ofMinutes(minutes);
    }
}
