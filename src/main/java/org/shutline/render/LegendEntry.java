package org.shutline.render;

import java.util.Comparator;
import java.util.Objects;
import org.shutline.model.MainStatus;
import org.shutline.model.NormalPosition;
import org.shutline.model.Operability;

/**
 * One symbol drawn on a map, as listed in its legend, with a short label ("Main LP,
 * proposed", "Valve closed, operable": the normal position and operability). Mains carry their system's rank
 * (0 = highest pressure, which picks colour and width) and status; valves their normal
 * position and operability; other kinds only a label. Fields a kind does not use are
 * null (rank -1). Entries sort in legend order ({@link #ORDER}).
 */
public record LegendEntry(LegendKind kind, int rank, MainStatus status, NormalPosition normal,
                          Operability operable, String label) {

    /** Legend order: kind, then system rank, status, normal position, operability, label. */
    public static final Comparator<LegendEntry> ORDER = Comparator
            .comparing(LegendEntry::kind)
            .thenComparingInt(LegendEntry::rank)
            .thenComparing(LegendEntry::status, Comparator.nullsFirst(Comparator.naturalOrder()))
            .thenComparing(LegendEntry::normal, Comparator.nullsFirst(Comparator.naturalOrder()))
            .thenComparing(LegendEntry::operable, Comparator.nullsFirst(Comparator.naturalOrder()))
            .thenComparing(LegendEntry::label);

    public LegendEntry {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(label, "label");
    }

    public static LegendEntry main(int rank, String systemId, MainStatus status) {
        String word = switch (status) {
            case ACTIVE -> "active";
            case PROPOSED -> "proposed";
            case ABANDONED -> "abandoned";
        };
        return new LegendEntry(LegendKind.MAIN, rank, status, null, null, "Main " + systemId + ", " + word);
    }

    public static LegendEntry valve(NormalPosition normal, Operability operable) {
        String pos = normal == NormalPosition.CLOSED ? "closed" : "open";
        String op = switch (operable) {
            case YES -> "operable";
            case NO -> "inoperable";
            case UNKNOWN -> "unknown";
        };
        return new LegendEntry(LegendKind.VALVE, -1, null, normal, operable, "Valve " + pos + ", " + op);
    }

    public static LegendEntry simple(LegendKind kind, String label) {
        if (kind == LegendKind.MAIN || kind == LegendKind.VALVE) {
            throw new IllegalArgumentException("use main(...) or valve(...) for " + kind);
        }
        return new LegendEntry(kind, -1, null, null, null, label);
    }
}
