package org.shutline.ui;

import java.awt.Component;
import java.nio.file.Path;
import java.util.prefs.Preferences;
import javax.swing.JFileChooser;
import javax.swing.filechooser.FileNameExtensionFilter;

/**
 * Asks the user for a file or a folder. The window's answer is a file chooser that
 * starts in the folder last used for the same purpose (kept in the preferences under
 * {@code folderKey}); tests answer with fixed paths, without a display.
 */
@FunctionalInterface
interface FileAsk {
    /** What is asked for. */
    enum Mode {
        /** an existing file or folder (a .gpkg or a shapefile folder) */
        OPEN_FILE_OR_FOLDER,
        /** an existing file */
        OPEN_FILE,
        /** a file to write */
        SAVE_FILE,
        /** a folder to write into */
        SAVE_FOLDER
    }

    /**
     * The path chosen, or null when the user cancels.
     *
     * @param folderKey the preference that remembers the folder last used for this purpose
     * @param filter the file types offered; null for all
     */
    Path ask(String folderKey, String title, Mode mode, FileNameExtensionFilter filter);

    /** File choosers over {@code parent}, starting in the remembered folders of {@code prefs}. */
    static FileAsk swing(Component parent, Preferences prefs) {
        return (key, title, mode, filter) -> {
            String dir = prefs.get(key, null);
            JFileChooser fc = dir == null ? new JFileChooser() : new JFileChooser(dir);
            fc.setDialogTitle(title);
            switch (mode) {
                case OPEN_FILE_OR_FOLDER -> fc.setFileSelectionMode(JFileChooser.FILES_AND_DIRECTORIES);
                case SAVE_FOLDER -> fc.setFileSelectionMode(JFileChooser.DIRECTORIES_ONLY);
                default -> fc.setFileSelectionMode(JFileChooser.FILES_ONLY);
            }
            if (filter != null) fc.setFileFilter(filter);
            boolean save = mode == Mode.SAVE_FILE || mode == Mode.SAVE_FOLDER;
            int answer = save ? fc.showSaveDialog(parent) : fc.showOpenDialog(parent);
            if (answer != JFileChooser.APPROVE_OPTION || fc.getSelectedFile() == null) return null;
            if (fc.getSelectedFile().getParentFile() != null) prefs.put(key, fc.getSelectedFile().getParentFile().getPath());
            return fc.getSelectedFile().toPath();
        };
    }
}
