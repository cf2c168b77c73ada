package org.shutline.ui;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.FlatLightLaf;
import java.awt.event.ActionEvent;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.util.prefs.Preferences;
import javax.swing.KeyStroke;
import org.shutline.render.MapStyle;

/**
 * View &gt; Dark theme (Ctrl+Shift+D), a check box: switches the look and feel and the
 * map style between light and dark and keeps the choice in the preferences
 * ({@code dark}); {@code restyled} then redraws what depends on the style (highlights,
 * legend swatches).
 */
final class ThemeAction extends WindowAction {
    private final WindowContext ctx;
    private final Preferences prefs;
    private final Runnable restyled;

    ThemeAction(WindowContext ctx, Preferences prefs, Runnable restyled) {
        super("Dark theme", KeyStroke.getKeyStroke(KeyEvent.VK_D, GraphicsSafe.menuMask() | InputEvent.SHIFT_DOWN_MASK));
        this.ctx = ctx;
        this.prefs = prefs;
        this.restyled = restyled;
        putValue(SELECTED_KEY, prefs.getBoolean("dark", false));
    }

    @Override public void actionPerformed(ActionEvent e) {
        // the check box has already changed its state; from elsewhere the action toggles
        apply(e != null && e.getSource() instanceof javax.swing.AbstractButton b ? b.isSelected() : !dark());
    }

    /** Whether the dark theme is chosen. */
    boolean dark() {
        return Boolean.TRUE.equals(getValue(SELECTED_KEY));
    }

    /** The map style of the chosen theme. */
    MapStyle style() {
        return dark() ? MapStyle.DARK : MapStyle.LIGHT;
    }

    /** Switches to the dark ({@code on}) or light theme. */
    void apply(boolean on) {
        putValue(SELECTED_KEY, on);
        if (on) FlatDarkLaf.setup();
        else FlatLightLaf.setup();
        FlatLaf.updateUI();
        ctx.map().setStyle(on ? MapStyle.DARK : MapStyle.LIGHT);
        prefs.putBoolean("dark", on);
        restyled.run();
    }
}
