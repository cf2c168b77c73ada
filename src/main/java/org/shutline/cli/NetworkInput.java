package org.shutline.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import org.shutline.io.FieldMapping;
import org.shutline.io.InputException;
import org.shutline.io.NetworkReader;
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

    static Topology load(Path network, Path mapping, Progress progress) throws InputException {
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
