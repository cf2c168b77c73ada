package org.shutline.plan;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;
import org.shutline.io.AtomicFiles;

/**
 * Writes a {@link Plan} as YAML in the format of docs/plan-format.md, so that
 * {@link PlanReader#parse} reads back an equal plan (same project, network, unit,
 * phases, steps, notes, durations; line numbers and step numbers are those of the new
 * text). Layout: block style for the top level, phases and steps, flow style for a
 * step's value ({@code close: [V-1, V-2]}, {@code cut: { main: M-1, at: [10.5, 20.0] }}).
 *
 * <p>Text is written plain when it is a simple word ({@code [A-Za-z0-9_.\-/]}, not a
 * YAML keyword or number), otherwise double-quoted with backslash escapes. Numbers are
 * written in plain decimal form of their shortest exact representation
 * ({@link BigDecimal#valueOf(double)}), so they read back to the same double.
 * Durations are written as hours and minutes ({@code 1h30m}); seconds are dropped.
 * {@link #write} goes through {@link AtomicFiles} (temp file beside the target, then a move).
 */
public final class PlanWriter {
    private static final Pattern PLAIN = Pattern.compile("[A-Za-z][A-Za-z0-9_.\\-/]*");
    private static final Set<String> KEYWORDS = Set.of("true", "false", "yes", "no", "on", "off", "null", "y", "n", "all");

    private PlanWriter() {}

    /** Writes {@code plan} to {@code file} atomically. */
    public static void write(Plan plan, Path file) throws IOException {
        AtomicFiles.writeString(file, format(plan));
    }

    /** The YAML text of {@code plan}. */
    public static String format(Plan plan) {
        StringBuilder sb = new StringBuilder();
        sb.append("project: ").append(text(plan.project())).append('\n');
        if (plan.network() != null) sb.append("network: ").append(text(plan.network())).append('\n');
        if (plan.pressureUnit() != null) sb.append("pressure_unit: ").append(unitWord(plan)).append('\n');
        sb.append("phases:\n");
        for (Phase p : plan.phases()) {
            sb.append("  - name: ").append(text(p.name())).append('\n');
            if (p.start() != null) sb.append("    start: ").append(p.start()).append('\n');
            if (p.end() != null) sb.append("    end: ").append(p.end()).append('\n');
            if (p.steps().isEmpty()) {
                sb.append("    steps: []\n");
                continue;
            }
            sb.append("    steps:\n");
            for (Step s : p.steps()) step(sb, s);
        }
        return sb.toString();
    }

    private static String unitWord(Plan plan) {
        return switch (plan.pressureUnit()) {
            case KPA -> "kPa";
            case PSI -> "psi";
            default -> plan.pressureUnit().name().toLowerCase(Locale.ROOT);
        };
    }

    private static void step(StringBuilder sb, Step s) {
        StepAction a = s.action();
        sb.append("      - ").append(a.key()).append(": ").append(value(a)).append('\n');
        if (a instanceof StepAction.CloseValves c && !c.ordered()) sb.append("        ordered: false\n");
        if (s.note() != null) sb.append("        note: ").append(text(s.note())).append('\n');
        if (s.duration() != null) sb.append("        duration: ").append(duration(s.duration())).append('\n');
    }

    /** The flow-style value of a step kind's key. */
    static String value(StepAction a) {
        if (a instanceof StepAction.CloseValves c) return ids(c.valves());
        if (a instanceof StepAction.OpenValves o) return ids(o.valves());
        if (a instanceof StepAction.CutMain c) return "{ main: " + text(c.main()) + ", at: " + xy(c.at()) + " }";
        if (a instanceof StepAction.TieIn t) {
            return "{ main: " + text(t.main()) + ", to: " + text(t.to()) + ", at: " + xy(t.at()) + " }";
        }
        if (a instanceof StepAction.ActivateMain m) return text(m.main());
        if (a instanceof StepAction.AbandonMain m) return text(m.main());
        if (a instanceof StepAction.InstallBypass b) {
            return "{ id: " + text(b.id()) + ", from: " + xy(b.from()) + ", to: " + xy(b.to())
                    + (b.valves().isEmpty() ? "" : ", valves: " + ids(b.valves())) + " }";
        }
        if (a instanceof StepAction.RemoveBypass b) return text(b.id());
        if (a instanceof StepAction.TransferServices t) {
            return "{ from: " + text(t.from()) + ", to: " + text(t.to()) + ", services: "
                    + (t.services().isEmpty() ? "all" : ids(t.services())) + " }";
        }
        if (a instanceof StepAction.MoveTap m) {
            return "{ tap: " + text(m.tap()) + ", to: " + text(m.main()) + (m.at() == null ? "" : ", at: " + xy(m.at())) + " }";
        }
        if (a instanceof StepAction.StationOut s) return text(s.station());
        if (a instanceof StepAction.StationIn s) return text(s.station());
        if (a instanceof StepAction.Attend s) {
            return s.until() == null ? text(s.station()) : "{ station: " + text(s.station()) + ", until: " + s.until() + " }";
        }
        throw new IllegalArgumentException("unknown step kind " + a);
    }

    private static String ids(List<String> ids) {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < ids.size(); i++) {
            if (i > 0) sb.append(", ");
            sb.append(text(ids.get(i)));
        }
        return sb.append(']').toString();
    }

    private static String xy(XY p) {
        return "[" + number(p.x()) + ", " + number(p.y()) + "]";
    }

    private static String number(double d) {
        String s = BigDecimal.valueOf(d).toPlainString();
        return s.contains(".") ? s : s + ".0";
    }

    static String duration(Duration d) {
        long minutes = d.toMinutes();
        long h = minutes / 60;
        long m = minutes % 60;
        if (h == 0) return m + "m";
        return m == 0 ? h + "h" : h + "h" + m + "m";
    }

    /** A YAML scalar for {@code s}: plain when safe, else double-quoted. */
    static String text(String s) {
        if (PLAIN.matcher(s).matches() && !KEYWORDS.contains(s.toLowerCase(Locale.ROOT))) return s;
        StringBuilder sb = new StringBuilder("\"");
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> sb.append("\\\"");
                case '\\' -> sb.append("\\\\");
                case '\n' -> sb.append("\\n");
                case '\t' -> sb.append("\\t");
                case '\r' -> sb.append("\\r");
                default -> {
                    if (c < 0x20) sb.append(String.format(Locale.ROOT, "\\x%02x", (int) c));
                    else sb.append(c);
                }
            }
        }
        return sb.append('"').toString();
    }
}
