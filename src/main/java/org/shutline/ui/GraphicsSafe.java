package org.shutline.ui;

import java.awt.GraphicsEnvironment;
import java.awt.Toolkit;
import java.awt.event.InputEvent;

/** Small helpers that behave in a headless test run as well as on a display. */
final class GraphicsSafe {
    private GraphicsSafe() {}

    /** The menu shortcut modifier of the platform (Ctrl; Command on a Mac), Ctrl when headless. */
    static int menuMask() {
        if (GraphicsEnvironment.isHeadless()) return InputEvent.CTRL_DOWN_MASK;
        return Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx();
    }
}
