package org.shutline.ui;

import java.awt.event.KeyEvent;

/**
 * Tools &gt; Identify (Ctrl+I): a map click identifies the feature under it; Tools &gt;
 * Incident at a point (Ctrl+K): a map click is an incident point for the Incident panel,
 * which comes to the front.
 */
final class ModeActions {
    final WindowAction identify;
    final WindowAction incidentAt;

    ModeActions(WindowContext ctx, IncidentPanel incident) {
        identify = WindowAction.of("Identify (click a feature)", WindowAction.menuKey(KeyEvent.VK_I), () -> {
            incident.setPicking(false);
            ctx.status("Identify: click a feature on the map; shift-drag to select by rectangle");
        });
        incidentAt = WindowAction.of("Incident at a point", WindowAction.menuKey(KeyEvent.VK_K), () -> {
            incident.setPicking(true);
            ctx.showPanel(incident);
            ctx.status("Incident: click a main on the map");
        });
    }
}
