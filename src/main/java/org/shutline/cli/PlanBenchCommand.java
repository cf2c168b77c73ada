package org.shutline.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.concurrent.Callable;
import org.shutline.analysis.GasOffExtent;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.analysis.hazard.HazardChecks;
import org.shutline.analysis.hazard.StepContext;
import org.shutline.model.MainStatus;
import org.shutline.model.Network;
import org.shutline.model.Progress;
import org.shutline.plan.Phase;
import org.shutline.plan.Plan;
import org.shutline.plan.PlanApplier;
import org.shutline.plan.PlanStates;
import org.shutline.plan.Step;
import org.shutline.plan.StepAction;
import org.shutline.plan.XY;
import org.shutline.topology.Topology;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code shutline bench-plan NETWORK [--steps 50] [--seed S]}: times a work plan of N
 * steps on a network (for example a large generated one): a seeded mix of valve
 * closings and openings, cuts of active mains at their middle, and abandonments,
 * applied and evaluated step by step with every hazard rule. Prints the time to
 * apply and to evaluate.
 */
@Command(name = "bench-plan", mixinStandardHelpOptions = true,
    description = "Time the evaluation of an N-step work plan on a network.")
public final class PlanBenchCommand implements Callable<Integer> {
    @Spec private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "NETWORK", description = "a .gpkg file or a folder of shapefiles")
    private Path network;

    @Option(names = "--steps", defaultValue = "50", description = "number of steps (default: ${DEFAULT-VALUE})")
    private int steps;

    @Option(names = "--seed", defaultValue = "11", description = "random seed (default: ${DEFAULT-VALUE})")
    private long seed;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        long t0 = System.nanoTime();
        Topology t = NetworkInput.load(network, null, org.shutline.app.AnalysisSettings.defaults(), Progress.NONE).topology();
        double load = (System.nanoTime() - t0) / 1e6;
        Plan plan = plan(t.network());
        t0 = System.nanoTime();
        PlanStates ps = PlanApplier.apply(plan, t, "generated");
        double apply = (System.nanoTime() - t0) / 1e6;
        t0 = System.nanoTime();
        PlanEvaluation.Result r = PlanEvaluation.evaluate(ps, HazardChecks.discover(), StepContext.Settings.defaults(LocalDate.of(2026, 12, 1)),
                GasOffExtent.DEFAULT_BUFFER_M, Progress.NONE);
        double eval = (System.nanoTime() - t0) / 1e6;
        long hazards = r.steps().stream().mapToLong(s -> s.hazards().size()).sum();
        out.printf(Locale.ROOT, "%s: %d mains, %d services; %d-step plan: load+topology %.0f ms, apply %.0f ms, evaluate %.0f ms (%.0f ms a step); %d hazards raised%n",
                network, t.network().mains().size(), t.network().services().size(), steps, load, apply, eval, eval / steps, hazards);
        out.flush();
        return 0;
    }

    private Plan plan(Network net) {
        Random rnd = new Random(seed);
        List<Step> list = new ArrayList<>();
        List<String> closed = new ArrayList<>();
        java.util.Set<String> gone = new java.util.HashSet<>();
        for (int i = 1; i <= steps; i++) {
            int kind = rnd.nextInt(10);
            StepAction a;
            if (kind < 5 || net.mains().isEmpty()) {
                String v = net.valves().get(rnd.nextInt(net.valves().size())).id();
                a = new StepAction.CloseValves(List.of(v), true);
                closed.add(v);
            } else if (kind < 7 && !closed.isEmpty()) {
                a = new StepAction.OpenValves(List.of(closed.remove(rnd.nextInt(closed.size()))));
            } else {
                var m = net.mains().get(rnd.nextInt(net.mains().size()));
                while (m.status() != MainStatus.ACTIVE || gone.contains(m.id())) m = net.mains().get(rnd.nextInt(net.mains().size()));
                if (kind < 9) {
                    var c = m.geometry().getGeometryN(0).getCentroid();
                    var lil = new org.locationtech.jts.linearref.LengthIndexedLine(m.geometry().getGeometryN(0));
                    var p = lil.extractPoint(lil.project(c.getCoordinate()));
                    a = new StepAction.CutMain(m.id(), new XY(p.x, p.y));
                } else {
                    a = new StepAction.AbandonMain(m.id());
                }
                gone.add(m.id());
            }
            list.add(new Step(i, 0, a, null, null, i));
        }
        LocalDateTime start = LocalDateTime.of(2027, 5, 3, 7, 0);
        return new Plan("benchmark plan", network.toString(), org.shutline.model.PressureUnit.KPA,
                List.of(new Phase("all", start, start.plusHours(steps), list, 1)));
    }
}
