package org.shutline.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import org.shutline.io.FieldMapping;
import org.shutline.io.InputException;
import org.shutline.io.NetworkReader;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.Progress;
import org.shutline.model.Tolerances;
import org.shutline.topology.NetworkBuilder;
import org.shutline.topology.Topology;

/** Reads a network (with an optional mapping file) and builds its topology, for the commands. */
final class NetworkInput {
    private NetworkInput() {}

    /** Reports a user's input problem on stderr (message only, no stack trace) and gives exit code 2. */
    static int badInput(java.io.PrintWriter err, String message) {
        err.println(message);
        err.flush();
        return 2;
    }

    /**
     * Reads and builds the network for a command other than {@code check}: the error-level
     * findings are reported through {@link DataErrors} (one line on stderr, exit 1), and a
     * network with no usable main (none active with a geometry, after the read skipped what
     * it had to) is refused with an {@link InputException} (exit 2) naming the file.
     */
    static Topology load(Path network, Path mapping, Progress progress) throws InputException {
        Topology t = read(network, mapping, progress);
        DataErrors.record(t.network().sourceName(), t.findings());
        long usable = t.network().mains().stream().filter(m -> m.status() == MainStatus.ACTIVE && m.geometry() != null).count();
        if (usable == 0) {
            long errors = DataErrors.countsByCode(t.findings()).values().stream().mapToInt(Integer::intValue).sum();
            throw new InputException("no usable mains in " + network + ": " + t.network().mains().size()
                    + " main(s) read, none active with a geometry" + (errors > 0 ? " (" + errors + " error finding(s) from the read)" : "")
                    + "; nothing to trace. Run `shutline check " + network + "` for the reasons.");
        }
        return t;
    }

    /** Reads and builds the network without judging it (for {@code check}, which reports every finding itself). */
    static Topology read(Path network, Path mapping, Progress progress) throws InputException {
        if (!Files.exists(network)) throw new InputException("cannot read " + network + ": no such file or folder");
        if (mapping != null && !Files.isReadable(mapping)) {
            throw new InputException("cannot read mapping file " + mapping + ": no such file or not readable");
        }
        FieldMapping m = mapping == null ? FieldMapping.DEFAULT : FieldMapping.load(mapping);
        Network n = NetworkReader.read(network, m);
        Tolerances t = m.tolerances() == null ? Tolerances.DEFAULT : m.tolerances();
        return NetworkBuilder.build(n, t, progress);
    }
}
