package org.shutline.topology;

import org.shutline.model.Findings;
import org.shutline.model.Network;
import org.shutline.model.Progress;
import org.shutline.model.Tolerances;

/**
 * Builds the topology of a network by the connectivity rules (docs/connectivity.md):
 * tolerances converted from metres to the CRS unit; input checks ({@link InputCheck});
 * end joins and tees ({@link EndJoin}); attachment of valves, stations, sources,
 * sensing taps and services ({@link PointAttach}); nodes and edges
 * ({@link GraphAssembly}); dangling ends and near misses ({@link EndChecks}); shared
 * interior vertices ({@link SharedVertexCheck}).
 *
 * <p>The result's findings are the network's read findings first, then the topology
 * findings in that order of passes. All proximity queries go through a JTS STRtree;
 * the build is O(N log N) in the number of vertices and features, no all-pairs scan.
 * Bad data never throws: it is a finding, and the feature concerned is left out or
 * attached with a warning as the rules say.
 */
public final class NetworkBuilder {
    private NetworkBuilder() {}

    /** Build with tolerances given in metres; they are converted to the network's CRS unit. */
    public static Topology build(Network network, Tolerances tolerancesMetres) {
        return build(network, tolerancesMetres, Progress.NONE);
    }

    /**
     * Build with tolerances in metres, reporting to {@code progress}.
     *
     * @throws java.util.concurrent.CancellationException when the progress asks to cancel
     */
    public static Topology build(Network network, Tolerances tolerancesMetres, Progress progress) {
        Tolerances tol = tolerancesMetres.inUnit(network.crs().unit());
        Findings findings = new Findings();
        findings.addAll(network.readFindings());

        InputCheck in = new InputCheck(network, findings);
        in.lines.index();
        progress.checkCancelled();
        StationNear stations = new StationNear(network.stations(), in.stationOk, tol.pointM());
        EndJoin ej = new EndJoin(network.mains(), in, stations, tol.snapM(), findings);
        ej.run(progress);

        PointAttach pa = new PointAttach(network, in, new NearestMain(in.lines, in, network.mains()), tol, findings);
        pa.run(progress);

        GraphAssembly ga = new GraphAssembly(in.lines, in, ej, pa, network.valves().size(),
                network.stations().size(), network.sources().size(), network.services().size(),
                network.taps().size());
        ga.run(progress);
        GraphBuilder gb = ga.gb;
        for (int i = 0; i < pa.stationIn.length; i++) {
            if (pa.stationIn[i] >= 0) gb.addStation(ga.pointNode[pa.stationIn[i]], ga.pointNode[pa.stationOut[i]], i);
        }
        for (int i = 0; i < pa.sourcePoint.length; i++) {
            if (pa.sourcePoint[i] >= 0) gb.attachSource(i, ga.pointNode[pa.sourcePoint[i]]);
        }
        for (int i = 0; i < pa.serviceLine.length; i++) {
            if (pa.serviceLine[i] >= 0) {
                gb.attachService(i, ga.pipeAt(pa.serviceLine[i], pa.serviceMeasure[i]), pa.serviceMeasure[i]);
            }
        }
        for (int i = 0; i < pa.tapLine.length; i++) {
            if (pa.tapLine[i] >= 0) gb.attachTap(i, ga.pipeAt(pa.tapLine[i], pa.tapMeasure[i]), pa.tapMeasure[i]);
        }

        EndChecks.run(network.mains(), in, ej, pa, tol, findings, progress);
        progress.checkCancelled();
        SharedVertexCheck.run(network.mains(), in.lines, findings);
        return new Topology(network, gb.freeze(), findings.list(), tol);
    }
}
