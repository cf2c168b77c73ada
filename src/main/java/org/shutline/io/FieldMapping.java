package org.shutline.io;

import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collections;
import java.util.HashMap;
import java.util.Iterator;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.shutline.model.Tolerances;

/**
 * Maps a user's own layer names, field names and value words to Shutline's
 * (see docs/mapping.md). {@link #DEFAULT} maps every name to itself.
 *
 * <p>A mapping file is YAML with two optional top-level keys: {@code layers} (for
 * each of our six layer names: {@code name} their layer name, {@code fields} our
 * field name to theirs, {@code values} per our field their word to ours) and
 * {@code tolerances} ({@code snap_m}, {@code point_m}, {@code service_m}). Any other
 * key, an unknown layer, an unknown field of a layer, or a value word that is not one
 * of ours makes {@link #load} throw an {@link InputException} naming the file and the
 * key. An unquoted {@code yes} or {@code no} as a target word (a YAML boolean) is
 * taken as the word. Their layer and field names are matched case-insensitively by the reader;
 * their value words are matched case-insensitively here. Immutable.
 */
public final class FieldMapping {
    public static final FieldMapping DEFAULT = new FieldMapping(Map.of(), Map.of(), Map.of(), null);

    private static final Set<String> TOP_KEYS = Set.of("layers", "tolerances");
    private static final Set<String> LAYER_KEYS = Set.of("name", "fields", "values");
    private static final Set<String> TOLERANCE_KEYS = Set.of("snap_m", "point_m", "service_m");

    /** our layer -> their layer name. */
    private final Map<String, String> layers;
    /** "layer/field" -> their field name. */
    private final Map<String, String> fields;
    /** "layer/field" -> (their word, lower case) -> our word. */
    private final Map<String, Map<String, String>> values;
    private final Tolerances tolerances;

    private FieldMapping(Map<String, String> layers, Map<String, String> fields,
                         Map<String, Map<String, String>> values, Tolerances tolerances) {
        this.layers = Map.copyOf(layers);
        this.fields = Map.copyOf(fields);
        this.values = Map.copyOf(values);
        this.tolerances = tolerances;
    }

    /** Their name of our layer {@code ours} (ours itself when not mapped). */
    public String layerName(String ours) {
        return layers.getOrDefault(ours, ours);
    }

    /** Their name of our field {@code field} in our layer {@code layer} (the field itself when not mapped). */
    public String fieldName(String layer, String field) {
        return fields.getOrDefault(layer + "/" + field, field);
    }

    /**
     * Our word for their value {@code word} of our field {@code field} in our layer
     * {@code layer}, matched ignoring case and surrounding blanks; the word itself when not mapped.
     */
    public String valueWord(String layer, String field, String word) {
        if (word == null) return null;
        Map<String, String> m = values.get(layer + "/" + field);
        if (m == null) return word;
        return m.getOrDefault(word.trim().toLowerCase(Locale.ROOT), word);
    }

    /** Tolerances given in the file, or null when it gives none (use {@link Tolerances#DEFAULT}). */
    public Tolerances tolerances() {
        return tolerances;
    }

    /** Largest mapping file read: 1 MB (a full mapping is a few KB). */
    public static final long MAX_BYTES = 1L << 20;

    /** Read a mapping file (YAML), at most {@link #MAX_BYTES}, lines at most {@link SmallTextFile#MAX_LINE} characters. */
    public static FieldMapping load(Path file) throws InputException {
        JsonNode root;
        try {
            ObjectMapper yaml = new ObjectMapper(new YAMLFactory());
            yaml.enable(com.fasterxml.jackson.core.JsonParser.Feature.STRICT_DUPLICATE_DETECTION);
            root = yaml.readTree(SmallTextFile.read(file, "mapping file", MAX_BYTES));
        } catch (JacksonException e) {
            throw new InputException(file + ": not a readable YAML mapping file: " + e.getOriginalMessage());
        } catch (IOException e) {
            throw new InputException(file + ": cannot read mapping file: " + e.getMessage(), e);
        }
        if (root == null || root.isNull() || root.isMissingNode()) return DEFAULT;
        Parser p = new Parser(file);
        p.object(root, "(top level)");
        p.checkKeys(root, TOP_KEYS, "");
        if (root.has("layers")) p.layers(root.get("layers"));
        Tolerances t = root.has("tolerances") ? p.tolerances(root.get("tolerances")) : null;
        return new FieldMapping(p.layers, p.fields, p.values, t);
    }

    /** The walk over the YAML tree, collecting the maps; knows the file for messages. */
    private static final class Parser {
        private final Path file;
        private final Map<String, String> layers = new HashMap<>();
        private final Map<String, String> fields = new HashMap<>();
        private final Map<String, Map<String, String>> values = new HashMap<>();

        Parser(Path file) {
            this.file = file;
        }

        void layers(JsonNode node) throws InputException {
            object(node, "layers");
            for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                Schema.Layer layer = Schema.layer(e.getKey()).orElseThrow(() -> new InputException(
                        file + ": unknown layer key 'layers." + e.getKey() + "' (our layers: mains, valves, stations, "
                                + "sense_taps, services, sources)"));
                layer(layer, e.getValue());
            }
        }

        private void layer(Schema.Layer layer, JsonNode node) throws InputException {
            String at = "layers." + layer.name();
            object(node, at);
            checkKeys(node, LAYER_KEYS, at + ".");
            if (node.has("name")) layers.put(layer.name(), text(node.get("name"), at + ".name"));
            if (node.has("fields")) {
                JsonNode f = node.get("fields");
                object(f, at + ".fields");
                for (Iterator<Map.Entry<String, JsonNode>> it = f.fields(); it.hasNext(); ) {
                    Map.Entry<String, JsonNode> e = it.next();
                    String key = at + ".fields." + e.getKey();
                    Schema.Field field = field(layer, e.getKey(), key);
                    fields.put(layer.name() + "/" + field.name(), text(e.getValue(), key));
                }
            }
            if (node.has("values")) values(layer, node.get("values"), at + ".values");
        }

        private void values(Schema.Layer layer, JsonNode node, String at) throws InputException {
            object(node, at);
            for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                String key = at + "." + e.getKey();
                Schema.Field field = field(layer, e.getKey(), key);
                if (field.type() != Schema.Type.WORD) {
                    throw new InputException(file + ": key '" + key + "': field " + field.name()
                            + " does not take value words");
                }
                object(e.getValue(), key);
                Map<String, String> words = new HashMap<>();
                for (Iterator<Map.Entry<String, JsonNode>> w = e.getValue().fields(); w.hasNext(); ) {
                    Map.Entry<String, JsonNode> we = w.next();
                    JsonNode target = we.getValue();
                    // YAML 1.1 reads unquoted yes/no as booleans: they stand for our words "yes" and "no"
                    String ours = target.isBoolean() ? (target.booleanValue() ? "yes" : "no")
                            : text(target, key + "." + we.getKey());
                    if (org.shutline.model.Words.parse(wordsOf(field), ours).isEmpty()) {
                        throw new InputException(file + ": key '" + key + "." + we.getKey() + "': '" + ours
                                + "' is not a value of " + field.name());
                    }
                    words.put(we.getKey().trim().toLowerCase(Locale.ROOT), ours.trim().toLowerCase(Locale.ROOT));
                }
                values.put(layer.name() + "/" + field.name(), Collections.unmodifiableMap(words));
            }
        }

        @SuppressWarnings({"unchecked", "rawtypes"})
        private static Class<? extends Enum> wordsOf(Schema.Field f) {
            return (Class<? extends Enum>) f.words();
        }

        Tolerances tolerances(JsonNode node) throws InputException {
            object(node, "tolerances");
            checkKeys(node, TOLERANCE_KEYS, "tolerances.");
            Tolerances d = Tolerances.DEFAULT;
            double snap = number(node, "snap_m", d.snapM());
            double point = number(node, "point_m", d.pointM());
            double service = number(node, "service_m", d.serviceM());
            try {
                return new Tolerances(snap, point, service, d.nearMissFactor());
            } catch (IllegalArgumentException e) {
                throw new InputException(file + ": key 'tolerances': " + e.getMessage());
            }
        }

        private double number(JsonNode node, String key, double dflt) throws InputException {
            if (!node.has(key)) return dflt;
            JsonNode v = node.get(key);
            if (!v.isNumber()) throw new InputException(file + ": key 'tolerances." + key + "' must be a number");
            return v.doubleValue();
        }

        private Schema.Field field(Schema.Layer layer, String name, String key) throws InputException {
            return layer.field(name.trim().toLowerCase(Locale.ROOT)).orElseThrow(() -> new InputException(
                    file + ": unknown field key '" + key + "' (layer " + layer.name() + " has no field " + name + ")"));
        }

        void checkKeys(JsonNode node, Set<String> allowed, String prefix) throws InputException {
            for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
                String k = it.next();
                if (!allowed.contains(k)) {
                    throw new InputException(file + ": unknown key '" + prefix + k + "'");
                }
            }
        }

        void object(JsonNode node, String at) throws InputException {
            if (node == null || !node.isObject()) {
                throw new InputException(file + ": key '" + at + "' must be a mapping of keys to values");
            }
        }

        private String text(JsonNode node, String at) throws InputException {
            if (node == null || !node.isValueNode() || node.isNull() || node.asText().isBlank()) {
                throw new InputException(file + ": key '" + at + "' must be a name");
            }
            return node.asText().trim();
        }
    }
}
