package org.shutline.topology;

import java.util.List;
import org.shutline.model.Finding;
import org.shutline.model.Network;
import org.shutline.model.Tolerances;

/**
 * A network with its frozen graph, the connectivity findings (read findings first,
 * then topology findings) and the tolerances used, in CRS units.
 */
public record Topology(Network network, Graph graph, List<Finding> findings, Tolerances tolerances) {
    public Topology {
        findings = List.copyOf(findings);
    }
}
