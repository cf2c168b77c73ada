package org.shutline.io;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.time.ZoneId;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.shutline.model.Finding;
import org.shutline.model.Findings;
import org.shutline.model.Severity;
import org.shutline.model.Words;

/**
 * Applies the data model ({@link Schema}) and a {@link FieldMapping} to one
 * {@link RawLayer} of a network layer, giving typed {@link Row}s and findings.
 *
 * <p>Exact behaviour, in order:
 * <ol>
 * <li>Fields are found by their mapped name ignoring case; for shapefile layers a
 *   name longer than 10 characters also matches its first 10 (dBASE's limit). A
 *   missing key field is an {@link InputException} naming file, layer and field; a
 *   missing optional field is one WARNING {@code missing-field} and its default.</li>
 * <li>No features: one WARNING {@code empty-layer} and nothing else (its fields
 *   are not checked). Features of more than one
 *   geometry class (line, point, polygon, other): one WARNING
 *   {@code mixed-geometry-types}.</li>
 * <li>A feature is skipped with an ERROR finding when its geometry is absent or
 *   empty ({@code empty-geometry}), of the wrong class for the layer
 *   ({@code wrong-geometry-type}), not readable or with non-finite or too few
 *   distinct coordinates ({@code invalid-geometry}), its id is empty
 *   ({@code missing-id}) or repeats an earlier id ({@code duplicate-id}).</li>
 * <li>Values: text is trimmed, empty means null, numbers in a text field are
 *   written without trailing zeros. A real or int field takes numbers and text
 *   that parses as a number; anything else is an ERROR {@code bad-value} and null
 *   (an int field also rejects fractions). A date takes a date value or ISO
 *   {@code yyyy-mm-dd} text (a time part after it is ignored); else {@code bad-value}
 *   and null. A value word is first mapped, then parsed ignoring case; an unknown
 *   word is an ERROR {@code unknown-value} and the enum's DEFAULT; an empty one is
 *   the DEFAULT without a finding.</li>
 * </ol>
 * Time O(features x fields).
 */
final class LayerDecoder {
    private final Schema.Layer layer;
    private final RawLayer raw;
    private final FieldMapping mapping;
    private final Findings findings;
    private final int[] column;
    /** Per WORD field: each word met (and "" for the default) with its value, so each word is parsed once. */
    private final Map<String, Map<String, Enum<?>>> words = new HashMap<>();

    /** One decoded feature: its geometry and typed values indexed like the schema's fields. */
    record Row(String id, Geometry geometry, List<Object> values) {
        /** {@code values} must be a list no one else changes (each caller builds a fresh one): wrapped, not copied. */
        Row {
            values = Collections.unmodifiableList(values);
        }

        @SuppressWarnings("unchecked")
        <T> T get(Schema.Layer l, String field) {
            for (int i = 0; i < l.fields().size(); i++) {
                if (l.fields().get(i).name().equals(field)) return (T) values.get(i);
            }
            throw new IllegalArgumentException("no field " + field + " in layer " + l.name());
        }
    }

    private LayerDecoder(Schema.Layer layer, RawLayer raw, FieldMapping mapping, Findings findings) {
        this.layer = layer;
        this.raw = raw;
        this.mapping = mapping;
        this.findings = findings;
        this.column = new int[layer.fields().size()];
    }

    static List<Row> decode(Schema.Layer layer, RawLayer raw, FieldMapping mapping, Findings findings) throws InputException {
        return decode(layer, raw, mapping, findings, r -> r, false);
    }

    /**
     * Decodes the layer and hands each row to {@code make} at once, keeping only what
     * it returns (the model record), so no list of rows is held. With {@code release}
     * each raw feature is dropped from {@code raw} once used (the caller must be the
     * layer's only reader). Findings are the same, in the same order, as {@link #decode}.
     */
    static <T> List<T> decode(Schema.Layer layer, RawLayer raw, FieldMapping mapping, Findings findings,
                              java.util.function.Function<Row, T> make, boolean release) throws InputException {
        if (raw.features().isEmpty()) {
            findings.add(Finding.of("empty-layer", Severity.WARNING, layer.name(), "layer " + raw.name() + " (" + raw.where()
                    + ") has no features"));
            return List.of();
        }
        LayerDecoder d = new LayerDecoder(layer, raw, mapping, findings);
        d.resolveFields();
        return d.rows(make, release);
    }

    private void resolveFields() throws InputException {
        for (int i = 0; i < column.length; i++) {
            Schema.Field f = layer.fields().get(i);
            String theirs = mapping.fieldName(layer.name(), f.name());
            column[i] = find(theirs);
            if (column[i] >= 0) continue;
            String named = theirs.equals(f.name()) ? f.name() : f.name() + " (mapped to " + theirs + ")";
            if (f.key()) {
                throw new InputException(raw.where() + ": layer " + raw.name() + " has no key field " + named);
            }
            findings.add(Finding.of("missing-field", Severity.WARNING, layer.name(), "layer " + raw.name()
                    + " has no field " + named + "; every feature takes the default (" + defaultText(f) + ")"));
        }
    }

    private int find(String name) {
        List<String> fs = raw.fields();
        for (int j = 0; j < fs.size(); j++) if (fs.get(j).equalsIgnoreCase(name)) return j;
        if (raw.dbf() && name.length() > 10) {
            String cut = name.substring(0, 10);
            for (int j = 0; j < fs.size(); j++) if (fs.get(j).equalsIgnoreCase(cut)) return j;
        }
        return -1;
    }

    private <T> List<T> rows(java.util.function.Function<Row, T> make, boolean release) {
        checkMixed();
        List<RawLayer.Feature> features = raw.features();
        int n = features.size();
        List<T> out = new ArrayList<>(n);
        Set<String> ids = new HashSet<>(n * 4 / 3 + 16);
        for (int k = 0; k < n; k++) {
            RawLayer.Feature f = features.get(k);
            if (release) raw.release(k);
            Object idRaw = column[0] < 0 ? null : f.value(column[0]);
            String id = text(idRaw);
            Where at = new Where(raw, f.fid(), id);
            if (!geometryOk(f, at, id)) continue;
            Geometry c = f.geometry();
            if (id == null) {
                findings.add(Finding.at("missing-id", Severity.ERROR, layer.name(), c.getCoordinate().x, c.getCoordinate().y,
                        at + ": field " + layer.idField().name() + " is empty; feature skipped"));
                continue;
            }
            if (!ids.add(id)) {
                findings.add(Finding.at("duplicate-id", Severity.ERROR, layer.name(), c.getCoordinate().x, c.getCoordinate().y,
                        at + ": " + layer.idField().name() + " " + id + " is used by an earlier feature; this one skipped", id));
                continue;
            }
            Object[] vals = new Object[column.length];
            vals[0] = id;
            for (int i = 1; i < column.length; i++) {
                Schema.Field field = layer.fields().get(i);
                vals[i] = value(field, column[i] < 0 ? null : f.value(column[i]), at, id, c);
            }
            out.add(make.apply(new Row(id, f.geometry(), Arrays.asList(vals))));
        }
        return out;
    }

    private void checkMixed() {
        Set<String> kinds = new LinkedHashSet<>();
        for (RawLayer.Feature f : raw.features()) if (f.geometry() != null) kinds.add(kind(f.geometry()));
        if (kinds.size() > 1) {
            findings.add(Finding.of("mixed-geometry-types", Severity.WARNING, layer.name(), "layer " + raw.name()
                    + " mixes geometry types (" + String.join(", ", kinds) + "); features that are not "
                    + (layer.shape() == Schema.Shape.LINE ? "lines" : "points") + " are skipped"));
        }
    }

    static String kind(Geometry g) {
        return switch (g.getGeometryType()) {
            case "LineString", "MultiLineString", "LinearRing" -> "line";
            case "Point" -> "point";
            case "Polygon", "MultiPolygon" -> "polygon";
            default -> g.getGeometryType();
        };
    }

    private boolean geometryOk(RawLayer.Feature f, Where at, String id) {
        String[] ids = id == null ? new String[0] : new String[] {id};
        if (f.geometryError() != null) {
            findings.add(Finding.of("invalid-geometry", Severity.ERROR, layer.name(), at + ": " + f.geometryError()
                    + "; feature skipped", ids));
            return false;
        }
        Geometry g = f.geometry();
        if (g == null || g.isEmpty()) {
            findings.add(Finding.of("empty-geometry", Severity.ERROR, layer.name(), at + ": no geometry; feature skipped", ids));
            return false;
        }
        Geometry c = g;
        String want = layer.shape() == Schema.Shape.LINE ? "line" : "point";
        if (!kind(g).equals(want) || g instanceof org.locationtech.jts.geom.LinearRing) {
            findings.add(Finding.at("wrong-geometry-type", Severity.ERROR, layer.name(), c.getCoordinate().x, c.getCoordinate().y, at + ": geometry is a "
                    + g.getGeometryType() + ", layer " + layer.name() + " takes "
                    + (want.equals("line") ? "LineString or MultiLineString" : "Point") + "; feature skipped", ids));
            return false;
        }
        String bad = invalid(g);
        if (bad != null) {
            findings.add(Finding.at("invalid-geometry", Severity.ERROR, layer.name(), c.getCoordinate().x, c.getCoordinate().y, at + ": " + bad
                    + "; feature skipped", ids));
            return false;
        }
        return true;
    }

    /** Why a line or point geometry is unusable, or null. Reads the coordinate sequences in place (no copies). */
    static String invalid(Geometry g) {
        int parts = g.getNumGeometries();
        for (int i = 0; i < parts; i++) {
            Geometry part = g.getGeometryN(i);
            CoordinateSequence seq = part instanceof LineString ls ? ls.getCoordinateSequence()
                    : part instanceof Point p ? p.getCoordinateSequence() : null;
            if (seq == null) {
                for (Coordinate c : part.getCoordinates()) {
                    if (!Double.isFinite(c.x) || !Double.isFinite(c.y)) return "a coordinate is not a finite number";
                }
                continue;
            }
            for (int j = 0; j < seq.size(); j++) {
                if (!Double.isFinite(seq.getX(j)) || !Double.isFinite(seq.getY(j))) return "a coordinate is not a finite number";
            }
        }
        for (int i = 0; i < parts; i++) {
            if (g.getGeometryN(i) instanceof LineString ls) {
                if (ls.getNumPoints() < 2 || !distinct(ls.getCoordinateSequence())) {
                    return "part " + (i + 1) + " has fewer than two distinct points";
                }
            }
        }
        return null;
    }

    /** True when some point differs from the first (the line has non-zero length). */
    private static boolean distinct(CoordinateSequence seq) {
        double x0 = seq.getX(0);
        double y0 = seq.getY(0);
        for (int j = 1; j < seq.size(); j++) if (seq.getX(j) != x0 || seq.getY(j) != y0) return true;
        return false;
    }

    /**
     * Where a feature is, for messages: "layer L feature ID (fid N)", built only when a
     * finding needs it (a million rows read cleanly build no text).
     */
    private static final class Where {
        private final RawLayer raw;
        private final long fid;
        private final String id;

        Where(RawLayer raw, long fid, String id) {
            this.raw = raw;
            this.fid = fid;
            this.id = id;
        }

        @Override
        public String toString() {
            return "layer " + raw.name() + " feature " + (id != null ? id : "(no id)") + " ("
                    + (raw.dbf() ? "record " : "fid ") + fid + ")";
        }
    }

    private Object value(Schema.Field f, Object v, Where at, String id, Geometry c) {
        return switch (f.type()) {
            case TEXT -> text(v);
            case REAL -> number(f, v, at, id, c, false);
            case INT -> {
                Double d = number(f, v, at, id, c, true);
                yield d == null ? null : Integer.valueOf(d.intValue());
            }
            case DATE -> date(f, v, at, id, c);
            case WORD -> word(f, v, at, id, c);
        };
    }

    /** Text of a value: trimmed, null when empty; numbers without trailing zeros. */
    static String text(Object v) {
        if (v == null) return null;
        String s;
        if (v instanceof BigDecimal b) s = b.stripTrailingZeros().toPlainString();
        else if (v instanceof Double d && d == Math.rint(d) && Math.abs(d) < 1e15) s = Long.toString(d.longValue());
        else if (v instanceof Float d && d == Math.rint(d) && Math.abs(d) < 1e7) s = Long.toString(d.longValue());
        else s = v.toString();
        s = s.trim();
        return s.isEmpty() ? null : s;
    }

    private Double number(Schema.Field f, Object v, Where at, String id, Geometry c, boolean integral) {
        if (v == null) return null;
        Double d = null;
        if (v instanceof Number n) {
            d = n.doubleValue();
        } else if (v instanceof String s) {
            if (s.isBlank()) return null;
            try {
                d = Double.parseDouble(s.trim());
            } catch (NumberFormatException e) {
                d = null; // reported below as a bad value
            }
        }
        if (d != null && !Double.isFinite(d)) d = null;
        if (d != null && integral && (d != Math.rint(d) || Math.abs(d) > Integer.MAX_VALUE)) d = null;
        if (d == null) bad(f, v, at, id, c, integral ? "a whole number" : "a number");
        return d;
    }

    private LocalDate date(Schema.Field f, Object v, Where at, String id, Geometry c) {
        if (v == null) return null;
        if (v instanceof LocalDate d) return d;
        if (v instanceof java.sql.Date d) return d.toLocalDate();
        if (v instanceof java.util.Date d) return d.toInstant().atZone(ZoneId.systemDefault()).toLocalDate();
        String s = v.toString().trim();
        if (s.isEmpty()) return null;
        if (s.length() > 10 && (s.charAt(10) == 'T' || s.charAt(10) == ' ')) s = s.substring(0, 10);
        try {
            return LocalDate.parse(s);
        } catch (DateTimeParseException e) {
            bad(f, v, at, id, c, "an ISO date (yyyy-mm-dd)");
            return null;
        }
    }

    @SuppressWarnings({"unchecked", "rawtypes"})
    private Object word(Schema.Field f, Object v, Where at, String id, Geometry c) {
        Map<String, Enum<?>> known = words.computeIfAbsent(f.name(), k -> new HashMap<>());
        Enum<?> dflt = known.computeIfAbsent("", k -> defaultOf(f));
        String w = text(v);
        if (w == null) return dflt;
        Enum<?> hit = known.get(w);
        if (hit != null) return hit;
        String ours = mapping.valueWord(layer.name(), f.name(), w);
        Optional<? extends Enum> e = Words.parse((Class) f.words(), ours);
        if (e.isPresent()) {
            known.put(w, e.get());
            return e.get();
        }
        findings.add(Finding.at("unknown-value", Severity.ERROR, layer.name(), c.getCoordinate().x, c.getCoordinate().y, at + ", field " + f.name()
                + ": unknown value '" + w + "'; read as " + Words.word(dflt), id));
        return dflt;
    }

    private void bad(Schema.Field f, Object v, Where at, String id, Geometry c, String wanted) {
        findings.add(Finding.at("bad-value", Severity.ERROR, layer.name(), c.getCoordinate().x, c.getCoordinate().y, at + ", field " + f.name()
                + ": '" + v + "' is not " + wanted + "; read as empty", id));
    }

    static Enum<?> defaultOf(Schema.Field f) {
        try {
            return (Enum<?>) f.words().getField("DEFAULT").get(null);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("enum " + f.words().getSimpleName() + " lacks a DEFAULT constant", e);
        }
    }

    private static String defaultText(Schema.Field f) {
        if (f.type() == Schema.Type.WORD) return Words.word(defaultOf(f));
        if (f.name().equals("meters")) return "1";
        return "empty";
    }

    static String lower(String s) {
        return s.toLowerCase(Locale.ROOT);
    }
}
