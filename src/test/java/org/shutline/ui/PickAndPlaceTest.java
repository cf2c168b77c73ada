package org.shutline.ui;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.shutline.analysis.Placement;
import org.shutline.app.Workspace;

/**
 * Headless picks and incident clicks on the sample town (sample-gis/README.md): ST-N1
 * stands at 512 303, 4 890 598.5 with its inlet valve V-011 at 512 302, 4 890 597 under
 * its symbol; the east-most main runs at x 513 503.
 */
class PickAndPlaceTest {
    @Test
    void aClickOnAStationSymbolIdentifiesTheStationNotTheValveUnderIt() throws Exception {
        Workspace ws = SampleWorkspace.get();
        // exactly on the valve, 1.8 m from the station: within a 5 m tolerance both are under the cursor
        Pick p = Identify.at(ws, 512302, 4890597, 5);
        assertThat(p.kind()).isEqualTo(Pick.Kind.STATION);
        assertThat(p.feature().id()).isEqualTo("ST-N1");
        // with a tolerance too small to reach the station, the valve
        Pick v = Identify.at(ws, 512302, 4890597, 0.5);
        assertThat(v.kind()).isEqualTo(Pick.Kind.VALVE);
        assertThat(v.feature().id()).isEqualTo("V-011");
    }

    @Test
    void anIncidentClickFarFromEveryMainIsRefusedAsAtTheCommandLine() throws Exception {
        Workspace ws = SampleWorkspace.get();
        IncidentPanel panel = new IncidentPanel(null);
        // 513 503 + 500 = 514 003: 500 m east of the east-most main
        IncidentPanel.Outcome far = panel.locate(ws, 514003, 4890500, Placement.DEFAULT_MAX_DISTANCE_M);
        assertThat(far.isolation()).isNull();
        assertThat(((Placement.Refused) far.placement()).reason()).contains("500 m from the nearest active main")
                .contains("the network's active mains span");
        assertThat(panel.locate(ws, Double.NaN, 0, 100).placement()).isInstanceOf(Placement.Refused.class);
        // 2 m south of the intermediate-pressure main under Gorse Avenue: placed on M-IP-007 and isolated
        IncidentPanel.Outcome ok = panel.locate(ws, 512547, 4890595, Placement.DEFAULT_MAX_DISTANCE_M);
        assertThat(ok.isolation()).isNotNull();
        Placement.Placed pl = (Placement.Placed) ok.placement();
        assertThat(pl.distanceM()).isEqualTo(2.0);
        assertThat(ok.isolation().valveIds()).isNotEmpty();
    }
}
