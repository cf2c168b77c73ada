package org.shutline.ui;

import java.awt.Component;
import java.awt.event.ActionEvent;
import java.util.function.BooleanSupplier;
import javax.swing.JOptionPane;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import org.shutline.model.Caution;

/** Help &gt; About Shutline: the version, what the program does, the caution, and a warning when the open plan raises critical hazards. */
final class AboutAction extends WindowAction {
    private final Component parent;
    private final BooleanSupplier critical;

    AboutAction(Component parent, BooleanSupplier critical) {
        super("About Shutline", null);
        this.parent = parent;
        this.critical = critical;
    }

    /** The text shown. */
    String text() {
        return "Shutline 0.1.0\nGas distribution outage zoning: network check, feed trace, valve isolation, work plans, maps.\n\n"
                + Caution.TEXT + (critical.getAsBoolean() ? "\n\nThe open work plan raises CRITICAL hazards: see the Work plan panel." : "");
    }

    @Override public void actionPerformed(ActionEvent e) {
        JTextArea a = new JTextArea(text(), 10, 50);
        a.setLineWrap(true);
        a.setWrapStyleWord(true);
        a.setEditable(false);
        JOptionPane.showMessageDialog(parent, new JScrollPane(a), "About Shutline", JOptionPane.INFORMATION_MESSAGE);
    }
}
