package org.shutline.ui;

import java.nio.file.Path;
import org.shutline.app.Workspace;
import org.shutline.io.InputException;
import org.shutline.model.Progress;
import org.shutline.plan.Plan;
import org.shutline.plan.PlanException;
import org.shutline.plan.PlanReader;

/** The bundled sample network, loaded once per test JVM, and the test plan beside these tests. */
final class SampleWorkspace {
    static final Path NETWORK = Path.of("sample-gis/tallowmere.gpkg");
    static final Path PLAN = Path.of("src/test/resources/org/shutline/ui/elder-street-plan.yaml");
    private static Workspace ws;

    private SampleWorkspace() {}

    static synchronized Workspace get() throws InputException {
        if (ws == null) ws = Workspace.load(NETWORK, Progress.NONE);
        return ws;
    }

    static Plan plan() throws PlanException {
        return PlanReader.read(PLAN);
    }
}
