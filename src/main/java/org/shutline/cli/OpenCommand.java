package org.shutline.cli;

import java.awt.GraphicsEnvironment;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import org.shutline.ui.EdtWatch;
import org.shutline.ui.MainWindow;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code shutline open [NETWORK [PLAN]]}: opens the desktop window on a network (a
 * .gpkg or a shapefile folder) and optionally a work plan, and waits until the window
 * is closed. Exit 0 when closed, 2 when there is no display or a file does not exist.
 * With {@code -Dshutline.edtWatch=true} long event-thread tasks are logged to stderr.
 */
@Command(name = "open", mixinStandardHelpOptions = true, description = "Open the desktop window on a network and work plan.")
public final class OpenCommand implements Callable<Integer> {
    @Spec private CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "NETWORK", description = "a .gpkg file or a folder of shapefiles")
    private Path network;

    @Parameters(index = "1", arity = "0..1", paramLabel = "PLAN", description = "a work plan (YAML)")
    private Path plan;

    @picocli.CommandLine.Option(names = "--mapping", paramLabel = "FILE", description = "field-mapping file (YAML), as for the other commands")
    private Path mapping;

    @Override
    public Integer call() throws InterruptedException {
        if (GraphicsEnvironment.isHeadless()) {
            spec.commandLine().getErr().println("open: no display available (headless); use the check, trace, isolate and plan commands");
            spec.commandLine().getErr().flush();
            return 2;
        }
        for (Path p : new Path[] {network, plan, mapping}) {
            if (p != null && !Files.exists(p)) {
                spec.commandLine().getErr().println("open: cannot read " + p + ": no such file or folder");
                spec.commandLine().getErr().flush();
                return 2;
            }
        }
        if (System.getProperty("slf4j.internal.verbosity") == null) System.setProperty("slf4j.internal.verbosity", "ERROR");
        java.awt.EventQueue.invokeLater(EdtWatch::installIfAsked);
        CountDownLatch closed = new CountDownLatch(1);
        MainWindow w = MainWindow.showOn(network, mapping, plan);
        w.addWindowListener(new java.awt.event.WindowAdapter() {
            @Override public void windowClosed(java.awt.event.WindowEvent e) {
                closed.countDown();
            }
        });
        closed.await();
        return 0;
    }

    /** The bundled sample network and plan beside the jar (or in the working folder), for {@code shutline} with no arguments. */
    static String[] sampleArgs() {
        Path base = Path.of("");
        try {
            Path jar = Path.of(OpenCommand.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            Path root = jar.getParent() == null ? null : jar.getParent().getParent();
            if (root != null && Files.exists(root.resolve("sample-gis/tallowmere.gpkg"))) base = root;
        } catch (java.net.URISyntaxException | SecurityException | IllegalArgumentException e) {
            base = Path.of("");
        }
        Path net = base.resolve("sample-gis/tallowmere.gpkg");
        Path plan = base.resolve("sample-gis/tallowmere-plan.yaml");
        return Files.exists(plan) ? new String[] {"open", net.toString(), plan.toString()} : new String[] {"open", net.toString()};
    }
}
