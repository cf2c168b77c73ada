package org.shutline.ui;

import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.nio.file.Path;

/** File &gt; Open network... (Ctrl+O): asks for a .gpkg or a folder of shapefiles and opens it with our own names. */
final class OpenNetworkAction extends WindowAction {
    static final String TITLE = "Open network (.gpkg or a folder of shapefiles)";

    private final FileAsk ask;
    private final NetworkOpener opener;

    OpenNetworkAction(FileAsk ask, NetworkOpener opener) {
        super("Open network...", menuKey(KeyEvent.VK_O));
        this.ask = ask;
        this.opener = opener;
    }

    @Override public void actionPerformed(ActionEvent e) {
        Path network = ask.ask("lastNetworkDir", TITLE, FileAsk.Mode.OPEN_FILE_OR_FOLDER, null);
        if (network != null) opener.open(network, null, null);
    }
}
