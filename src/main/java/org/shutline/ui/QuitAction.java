package org.shutline.ui;

import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;

/** File &gt; Quit (Ctrl+Q): closes the window as its close box does (unsaved plan changes are asked about first). */
final class QuitAction extends WindowAction {
    private final Runnable close;

    QuitAction(Runnable close) {
        super("Quit", menuKey(KeyEvent.VK_Q));
        this.close = close;
    }

    @Override public void actionPerformed(ActionEvent e) {
        close.run();
    }
}
