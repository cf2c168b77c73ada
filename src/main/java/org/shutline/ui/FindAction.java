package org.shutline.ui;

import org.shutline.app.Workspace;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.util.List;
import javax.swing.JTextField;

/**
 * Tools &gt; Find... (Ctrl+F) puts the cursor in the toolbar's find field; Enter there
 * searches every layer for an id (any case) or part of an address in a background task
 * (a large network has hundreds of thousands of addresses), then selects what was found
 * and zooms to it.
 */
final class FindAction extends WindowAction {
    private final WindowContext ctx;
    private final JTextField field = new JTextField(16);

    FindAction(WindowContext ctx) {
        super("Find...", menuKey(KeyEvent.VK_F));
        this.ctx = ctx;
        field.setName("search");
        field.addActionListener(e -> find(field.getText()));
    }

    /** The find field of the toolbar. */
    JTextField field() {
        return field;
    }

    @Override public void actionPerformed(ActionEvent e) {
        field.requestFocusInWindow();
    }

    /** Searches in a background task, then selects and zooms (nothing when the network changed meanwhile). */
    void find(String text) {
        Workspace w0 = ctx.workspace();
        if (w0 == null) return;
        ctx.run(new Task<>("find " + text, p -> Identify.search(w0, text), found -> {
            if (ctx.workspace() != w0) return;
            show(text, found);
        }, t -> ctx.failed("Find", t)));
    }

    /** Searches on the calling thread (tests, small networks) and shows the result. */
    void findNow(String text) {
        Workspace ws = ctx.workspace();
        if (ws != null) show(text, Identify.search(ws, text));
    }

    private void show(String text, List<Pick> found) {
        if (found.isEmpty()) {
            ctx.status("Nothing found for '" + text + "'");
            return;
        }
        ctx.select(found.get(0), found);
        ctx.zoomToSelection();
        ctx.status(found.size() + " found for '" + text + "'" + (found.size() > 1 ? "; showing " + found.get(0).label() : ""));
    }
}
