package org.shutline.ui;

import org.shutline.analysis.ValveDoubt;
import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import org.junit.jupiter.api.Test;
import org.shutline.analysis.IncidentResponse;
import org.shutline.analysis.ResponseSettings;
import org.shutline.analysis.WorkPackages;
import org.shutline.analysis.Zone;
import org.shutline.app.Workspace;

/**
 * The window's incident text on the sample town: the command line's defaults (crews
 * computed), the same field order and the whole fallback under each doubtful valve
 * (compare FieldOrderCommandsTest, the same point through {@code shutline incident}).
 */
class IncidentPanelTextTest {
    @Test
    void sameOrderFallbacksAndPackagesAsTheCommandLine() throws Exception {
        Workspace ws = SampleWorkspace.get();
        ResponseSettings s = ResponseSettings.DEFAULT;
        assertThat(s.crewsGiven()).as("the window's default is the command line's: crews computed").isFalse();
        // the window's own path: placement, response, packages and the re-trace, then the text
        IncidentPanel.Outcome o = new IncidentPanel(null).locate(ws, 512470, 4890150, 100,
                ValveDoubt.Settings.defaults(LocalDate.of(2026, 12, 1)), s);
        WorkPackages.Result wp = o.packages();
        String text = IncidentPanel.describe(o.response(), wp, (org.shutline.analysis.Placement.Placed) o.placement(), s);
        assertThat(text).contains("Placed on main").containsPattern("1\\. V-015  crew 1 .*\\n +if it will not close \\(operability unknown\\): crew 1 then closes V-024, V-023, V-022, V-021, V-020")
                .contains("5. V-026  crew 2")
                .contains("valves alone cannot isolate: stop station ST-S1 Weir Lane Station (close V-013, V-004); adds 387 services, 497 meters")
                .contains("crews: 2 (computed from the target)")
                .contains("Work packages (one per crew");
        assertThat(wp.packages()).hasSize(2);
    }
}
