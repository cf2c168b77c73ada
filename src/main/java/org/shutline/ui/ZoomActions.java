package org.shutline.ui;

import java.awt.event.KeyEvent;

/** View &gt; Zoom to extent (Ctrl+0), Zoom in (Ctrl+=), Zoom out (Ctrl+-), Zoom to selection (Ctrl+E); also on the toolbar. */
final class ZoomActions {
    final WindowAction extent;
    final WindowAction in;
    final WindowAction out;
    final WindowAction selection;

    ZoomActions(WindowContext ctx) {
        extent = WindowAction.of("Zoom to extent", WindowAction.menuKey(KeyEvent.VK_0), () -> ctx.map().zoomToExtent());
        in = WindowAction.of("Zoom in", WindowAction.menuKey(KeyEvent.VK_EQUALS), () -> ctx.map().zoomIn());
        out = WindowAction.of("Zoom out", WindowAction.menuKey(KeyEvent.VK_MINUS), () -> ctx.map().zoomOut());
        selection = WindowAction.of("Zoom to selection", WindowAction.menuKey(KeyEvent.VK_E), ctx::zoomToSelection);
    }
}
