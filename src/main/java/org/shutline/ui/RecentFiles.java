package org.shutline.ui;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.prefs.Preferences;
import javax.swing.JMenu;
import javax.swing.JMenuItem;

/**
 * File &gt; Recent: the six most recent network + plan pairs, newest first, kept in the
 * preferences ({@code recent0} .. {@code recent5}: the network's absolute path, then the
 * plan's on a second line when there is one). Choosing an entry opens it again through
 * the {@link NetworkOpener}. The field-mapping file is not remembered yet.
 */
final class RecentFiles {
    static final int MAX = 6;

    private final Preferences prefs;
    private final NetworkOpener opener;
    private final JMenu menu = new JMenu("Recent");

    RecentFiles(Preferences prefs, NetworkOpener opener) {
        this.prefs = prefs;
        this.opener = opener;
        refresh();
    }

    /** The menu (rebuilt after every change). */
    JMenu menu() {
        return menu;
    }

    /** Puts a network (and its plan, may be null) first in the list. */
    void add(Path network, Path planFile) {
        String entry = network.toAbsolutePath() + (planFile == null ? "" : "\n" + planFile.toAbsolutePath());
        List<String> list = new ArrayList<>(list());
        list.remove(entry);
        list.add(0, entry);
        while (list.size() > MAX) list.remove(list.size() - 1);
        for (int i = 0; i < MAX; i++) {
            if (i < list.size()) prefs.put("recent" + i, list.get(i));
            else prefs.remove("recent" + i);
        }
        refresh();
    }

    /** The entries, newest first. */
    List<String> list() {
        List<String> l = new ArrayList<>();
        for (int i = 0; i < MAX; i++) {
            String s = prefs.get("recent" + i, null);
            if (s != null) l.add(s);
        }
        return l;
    }

    void refresh() {
        menu.removeAll();
        for (String r : list()) {
            String[] parts = r.split("\n");
            Path n = Path.of(parts[0]);
            Path p = parts.length > 1 ? Path.of(parts[1]) : null;
            JMenuItem mi = new JMenuItem(n.getFileName() + (p == null ? "" : " + " + p.getFileName()));
            mi.addActionListener(e -> opener.open(n, null, p));
            menu.add(mi);
        }
        menu.setEnabled(menu.getItemCount() > 0);
    }
}
