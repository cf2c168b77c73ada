package org.shutline.ui;

import java.awt.event.ActionEvent;
import java.nio.file.Path;
import javax.swing.filechooser.FileNameExtensionFilter;

/**
 * File &gt; Open network with field mapping...: asks for the network, then for the
 * field-mapping file (YAML, docs/mapping.md), and opens the network read through it with
 * the mapping's tolerances: the command line's {@code --mapping}. Cancelling either
 * question opens nothing.
 */
final class OpenWithMappingAction extends WindowAction {
    private final FileAsk ask;
    private final NetworkOpener opener;

    OpenWithMappingAction(FileAsk ask, NetworkOpener opener) {
        super("Open network with field mapping...", null);
        this.ask = ask;
        this.opener = opener;
    }

    @Override public void actionPerformed(ActionEvent e) {
        Path network = ask.ask("lastNetworkDir", OpenNetworkAction.TITLE, FileAsk.Mode.OPEN_FILE_OR_FOLDER, null);
        if (network == null) return;
        Path mapping = ask.ask("lastMappingDir", "Field-mapping file for " + network.getFileName() + " (YAML)",
                FileAsk.Mode.OPEN_FILE, new FileNameExtensionFilter("Field mapping (.yaml, .yml)", "yaml", "yml"));
        if (mapping == null) return;
        opener.open(network, mapping, null);
    }
}
