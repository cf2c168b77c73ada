package org.shutline.ui;

import javax.swing.AbstractAction;
import javax.swing.KeyStroke;

/**
 * Base of the window's menu and toolbar actions: a name and, when given, the menu
 * shortcut (the menu item takes it from {@link #ACCELERATOR_KEY}). Each action runs on
 * the event thread and hands any long work to {@link WindowContext#run}.
 */
abstract class WindowAction extends AbstractAction {
    WindowAction(String name, KeyStroke key) {
        super(name);
        if (key != null) putValue(ACCELERATOR_KEY, key);
    }

    /** The platform's menu shortcut (Ctrl; Command on a Mac) with {@code key}. */
    static KeyStroke menuKey(int key) {
        return KeyStroke.getKeyStroke(key, GraphicsSafe.menuMask());
    }

    /** An action that runs {@code r}; for the one-line actions of a small group. */
    static WindowAction of(String name, KeyStroke key, Runnable r) {
        return new WindowAction(name, key) {
            @Override public void actionPerformed(java.awt.event.ActionEvent e) {
                r.run();
            }
        };
    }
}
