package org.shutline.app;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.shutline.analysis.ResponseRates;
import org.shutline.analysis.ResponseSettings;
import org.shutline.analysis.ValveRoute;
import org.shutline.io.InputException;
import org.shutline.model.PressureUnit;
import org.shutline.model.Tolerances;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;

/**
 * Reads a settings file (YAML, docs/settings.md) into {@link AnalysisSettings}: top-level
 * keys {@code as_of}, {@code inspection_months}, {@code pressure_unit},
 * {@code low_pressure_limit}, {@code sensing_line_m}, and the sections
 * {@code tolerances} and {@code response}. A key left out keeps its default. The file
 * is read whole, at most {@link #MAX_BYTES} bytes, UTF-8; duplicate keys, aliases
 * beyond a handful, an unknown key, a value of the wrong kind or out of range are each
 * refused with an {@link InputException} whose message names the file, the line and
 * the key ("settings.yaml:4: unknown key 'response.crew' (keys there: ...)"). An empty
 * file gives the defaults. The file is opened read-only and never changed.
 */
public final class SettingsFile {
    /** Largest settings file read: 64 KiB (a settings file is a few hundred bytes). */
    public static final int MAX_BYTES = 64 * 1024;

    /** The top-level keys, in the order docs/settings.md lists them. */
    public static final List<String> TOP_KEYS =
            List.of("as_of", "inspection_months", "pressure_unit", "low_pressure_limit", "sensing_line_m", "tolerances", "response");
    /** The keys of the {@code tolerances} section. */
    public static final List<String> TOLERANCE_KEYS = List.of("snap_m", "point_m", "service_m", "near_miss_factor");
    /** The keys of the {@code response} section. */
    public static final List<String> RESPONSE_KEYS = List.of("crews", "target_hours", "relight_hours", "valve_minutes", "speed_kmh",
            "detour", "shutoffs_per_tech_hour", "relights_per_tech_hour", "second_visit_fraction", "techs_per_crew", "shift_hours");

    /** Lower bound of a value that must be more than zero. */
    private static final double POS = Double.MIN_VALUE;

    private final Path file;

    private SettingsFile(Path file) {
        this.file = file;
    }

    /** Reads {@code file} over {@code base}: what the file gives replaces base's value; {@code source} becomes the file. */
    public static AnalysisSettings read(Path file, AnalysisSettings base) throws InputException {
        if (!Files.isRegularFile(file) || !Files.isReadable(file)) {
            throw new InputException("cannot read settings file " + file + ": no such file or not readable");
        }
        String text;
        try {
            long size = Files.size(file);
            if (size > MAX_BYTES) {
                throw new InputException(file + ": a settings file is at most " + MAX_BYTES + " bytes; this one has " + size
                        + " (is it the right file?)");
            }
            text = StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(Files.readAllBytes(file))).toString();
        } catch (CharacterCodingException e) {
            throw new InputException(file + ": not a settings file: not UTF-8 text");
        } catch (IOException e) {
            throw new InputException("cannot read settings file " + file + ": " + e.getMessage(), e);
        }
        return new SettingsFile(file).parse(text, base).withSource(file);
    }

    private AnalysisSettings parse(String text, AnalysisSettings s) throws InputException {
        Node root;
        try (Reader r = new StringReader(text)) {
            LoaderOptions opts = new LoaderOptions();
            opts.setAllowDuplicateKeys(false);
            opts.setMaxAliasesForCollections(10);
            opts.setCodePointLimit(MAX_BYTES);
            root = new Yaml(opts).compose(r);
        } catch (MarkedYAMLException e) {
            int line = e.getProblemMark() == null ? 0 : e.getProblemMark().getLine() + 1;
            throw new InputException(file + ":" + line + ": not valid YAML: " + e.getProblem());
        } catch (IOException | RuntimeException e) {
            throw new InputException(file + ": not valid YAML: " + e.getMessage());
        }
        if (root == null) return s;
        Map<String, Node> top = mapping(root, "(top level)", "", TOP_KEYS);
        if (top.containsKey("as_of")) s = s.withAsOf(date(top.get("as_of"), "as_of"));
        if (top.containsKey("inspection_months")) {
            int months = integer(top.get("inspection_months"), "inspection_months", 1, 120);
            s = s.withInspectionMonths(months);
        }
        if (top.containsKey("pressure_unit")) {
            Node n = top.get("pressure_unit");
            s = s.withPressureUnit(PressureUnit.parse(scalar(n, "pressure_unit"))
                    .orElseThrow(() -> error(n, "pressure_unit", "must be one of kPa, psi, in_wc, mbar")));
        }
        if (top.containsKey("low_pressure_limit")) {
            Node n = top.get("low_pressure_limit");
            String v = scalar(n, "low_pressure_limit");
            var p = AnalysisSettings.parsePressure(v).filter(x -> x.pascals() > 0).orElseThrow(() -> error(n, "low_pressure_limit",
                    "takes a positive value and a unit (0.5psi, 14in_wc, 3.45kPa, 34.5mbar), not '" + v + "'"));
            s = s.withLowPressureLimit(p);
        }
        if (top.containsKey("sensing_line_m")) s = s.withSensingLineM(number(top.get("sensing_line_m"), "sensing_line_m", 0, 10_000));
        if (top.containsKey("tolerances")) s = s.withTolerances(tolerances(top.get("tolerances")));
        if (top.containsKey("response")) s = s.withResponse(response(top.get("response"), s.response()));
        return s;
    }

    private Tolerances tolerances(Node node) throws InputException {
        Map<String, Node> m = mapping(node, "tolerances", "tolerances.", TOLERANCE_KEYS);
        Tolerances d = Tolerances.DEFAULT;
        return new Tolerances(num(m, "tolerances.", "snap_m", d.snapM(), 0, 100), num(m, "tolerances.", "point_m", d.pointM(), 0, 1000),
                num(m, "tolerances.", "service_m", d.serviceM(), 0, 10_000),
                num(m, "tolerances.", "near_miss_factor", d.nearMissFactor(), 1, 100));
    }

    private ResponseSettings response(Node node, ResponseSettings base) throws InputException {
        Map<String, Node> m = mapping(node, "response", "response.", RESPONSE_KEYS);
        String at = "response.";
        ResponseRates r = base.rates();
        ValveRoute.Settings v = base.valves();
        ResponseRates rates = new ResponseRates(num(m, at, "shutoffs_per_tech_hour", r.shutoffsPerTechHour(), POS, 1000),
                num(m, at, "relights_per_tech_hour", r.relightsPerTechHour(), POS, 1000),
                num(m, at, "second_visit_fraction", r.secondVisitFraction(), 0, 1),
                m.containsKey("techs_per_crew") ? integer(m.get("techs_per_crew"), at + "techs_per_crew", 1, 100) : r.techsPerCrew(),
                num(m, at, "shift_hours", r.shiftHours(), POS, 24));
        ValveRoute.Settings valves = new ValveRoute.Settings(num(m, at, "valve_minutes", v.minutesPerValve(), 0, 24 * 60),
                num(m, at, "speed_kmh", v.speedKmh(), POS, 300), num(m, at, "detour", v.detourFactor(), 1, 10));
        ResponseSettings out = new ResponseSettings(rates, valves, base.crews(), base.crewsGiven(),
                num(m, at, "target_hours", base.targetHours(), POS, 24 * 30), num(m, at, "relight_hours", base.relightTargetHours(), POS, 24 * 90));
        if (m.containsKey("crews")) out = out.withCrews(integer(m.get("crews"), at + "crews", 1, 10_000));
        return out;
    }

    private Map<String, Node> mapping(Node node, String what, String prefix, List<String> keys) throws InputException {
        if (!(node instanceof MappingNode mn)) {
            throw new InputException(file + ":" + line(node) + ": " + what + " must be a set of 'key: value' lines");
        }
        Map<String, Node> out = new LinkedHashMap<>();
        for (NodeTuple t : mn.getValue()) {
            String key = t.getKeyNode() instanceof ScalarNode k ? k.getValue() : null;
            if (key == null || !keys.contains(key)) {
                throw new InputException(file + ":" + line(t.getKeyNode()) + ": unknown key '" + prefix + (key == null ? "(not a name)" : key)
                        + "' (keys " + (prefix.isEmpty() ? "at the top level" : "in " + what) + ": " + String.join(", ", keys)
                        + "; see docs/settings.md)");
            }
            // the composer keeps both of a repeated key: which one was meant is not clear
            if (out.containsKey(key)) throw new InputException(file + ":" + line(t.getKeyNode()) + ": key '" + prefix + key + "' given twice");
            out.put(key, t.getValueNode());
        }
        return out;
    }

    private double num(Map<String, Node> m, String prefix, String key, double dflt, double min, double max) throws InputException {
        return m.containsKey(key) ? number(m.get(key), prefix + key, min, max) : dflt;
    }

    private double number(Node n, String key, double min, double max) throws InputException {
        String v = scalar(n, key);
        double d;
        try {
            d = Double.parseDouble(v.trim());
        } catch (NumberFormatException e) {
            throw error(n, key, "must be a number, not '" + v + "'");
        }
        if (!(d >= min && d <= max)) {
            throw error(n, key, (min == POS ? "must be more than 0 and at most " : "must be from " + plain(min) + " to ") + plain(max)
                    + ", not " + v);
        }
        return d;
    }

    private int integer(Node n, String key, int min, int max) throws InputException {
        String v = scalar(n, key);
        int i;
        try {
            i = Integer.parseInt(v.trim());
        } catch (NumberFormatException e) {
            throw error(n, key, "must be a whole number, not '" + v + "'");
        }
        if (i < min || i > max) throw error(n, key, "must be from " + min + " to " + max + ", not " + i);
        return i;
    }

    private LocalDate date(Node n, String key) throws InputException {
        String v = scalar(n, key);
        try {
            return LocalDate.parse(v.trim());
        } catch (DateTimeParseException e) {
            throw error(n, key, "must be a date written YYYY-MM-DD, not '" + v + "'");
        }
    }

    private String scalar(Node n, String key) throws InputException {
        if (n instanceof ScalarNode s) return s.getValue();
        throw error(n, key, "must be a single value");
    }

    private InputException error(Node n, String key, String what) {
        return new InputException(file + ":" + line(n) + ": key '" + key + "' " + what);
    }

    private static int line(Node n) {
        return n == null || n.getStartMark() == null ? 0 : n.getStartMark().getLine() + 1;
    }

    private static String plain(double d) {
        return d == Math.rint(d) ? Long.toString((long) d) : Double.toString(d);
    }
}
