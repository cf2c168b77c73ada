package org.shutline.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.shutline.model.Finding;
import org.shutline.model.Severity;

/**
 * Data problems reach every command. When the network a command reads gave
 * error-level findings (severity ERROR or CRITICAL: features skipped, values defaulted,
 * parts left out of the network; the same test as {@code check}'s exit 1), the command
 * prints one line naming them on stderr, before its result, and its exit code 0 becomes 1
 * ({@link Main}'s execution strategy): an answer from incomplete data must not look clean.
 * Notes and warnings do neither. {@code check} reports findings itself and is left out.
 *
 * <p>One run of the command line is one thread; the state is per thread, set up and read
 * by {@link Main#commandLine()}'s execution strategy.
 */
final class DataErrors {
    private static final ThreadLocal<DataErrors> RUN = new ThreadLocal<>();

    private final PrintWriter err;
    private int errors;

    private DataErrors(PrintWriter err) {
        this.err = err;
    }

    /** Starts recording for one command run; the summary goes to {@code err}. */
    static void begin(PrintWriter err) {
        RUN.set(new DataErrors(err));
    }

    /** Ends the run: the number of error-level findings the command's network(s) gave. */
    static int end() {
        DataErrors d = RUN.get();
        RUN.remove();
        return d == null ? 0 : d.errors;
    }

    /** The error-level findings recorded so far in the current run (0 outside a run). */
    static int current() {
        DataErrors d = RUN.get();
        return d == null ? 0 : d.errors;
    }

    /** Leaves the current run out (check reports its findings and sets its exit code itself). */
    static void exempt() {
        RUN.remove();
    }

    /** The error-level findings of {@code findings}, counted per code in code order. */
    static Map<String, Integer> countsByCode(List<Finding> findings) {
        Map<String, Integer> by = new TreeMap<>();
        for (Finding f : findings) if (f.severity().compareTo(Severity.ERROR) >= 0) by.merge(f.code(), 1, Integer::sum);
        return by;
    }

    /**
     * The one-line summary for {@code source}, or null when there is no error-level finding:
     * "data errors in NAME: 4 error findings (duplicate-id 1, ...): features skipped or
     * values defaulted, results may be incomplete; run shutline check NAME".
     */
    static String summary(String source, List<Finding> findings) {
        Map<String, Integer> by = countsByCode(findings);
        if (by.isEmpty()) return null;
        int n = by.values().stream().mapToInt(Integer::intValue).sum();
        StringBuilder sb = new StringBuilder();
        sb.append("shutline: data errors in ").append(source).append(": ").append(n).append(n == 1 ? " error finding (" : " error findings (");
        boolean first = true;
        for (Map.Entry<String, Integer> e : by.entrySet()) {
            if (!first) sb.append(", ");
            sb.append(e.getKey()).append(' ').append(e.getValue());
            first = false;
        }
        return sb.append("): features skipped or values defaulted, results may be incomplete; exit 1; run `shutline check ")
                .append(source).append("` for each one").toString();
    }

    /** Records the findings of a network a command has read, printing the summary when there are errors. */
    static void record(String source, List<Finding> findings) {
        DataErrors d = RUN.get();
        if (d == null) return;
        String line = summary(source, findings);
        if (line == null) return;
        d.errors += countsByCode(findings).values().stream().mapToInt(Integer::intValue).sum();
        d.err.println(line);
        d.err.flush();
    }

}
