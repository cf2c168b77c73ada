package org.shutline.topology;

import org.shutline.model.Network;
import org.shutline.model.Tolerances;

/**
 * Builds the topology of a network by the connectivity rules (docs/connectivity.md).
 * (Placeholder: the topology work fills this in.)
 */
public final class NetworkBuilder {
    private NetworkBuilder() {}

    /** Build with tolerances given in metres; they are converted to the network's CRS unit. */
    public static Topology build(Network network, Tolerances tolerancesMetres) {
        throw new UnsupportedOperationException("not yet built");
    }
}
