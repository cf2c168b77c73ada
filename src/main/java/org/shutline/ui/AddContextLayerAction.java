package org.shutline.ui;

import org.shutline.app.Workspace;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.io.IOException;
import java.nio.file.Path;
import java.util.function.BiConsumer;
import org.shutline.io.FieldMapping;
import org.shutline.io.NetworkReader;
import org.shutline.model.ContextLayer;
import org.shutline.model.Network;

/**
 * File &gt; Add context layer... (Ctrl+L) and the layers list's Add...: reads another
 * GeoPackage or shapefile folder with the network reader in a background task and adds
 * all its non-network layers, named {@code file:layer}, on top of the others. A file in
 * another EPSG code than the network is refused (no re-projection of context layers).
 */
final class AddContextLayerAction extends WindowAction {
    private final WindowContext ctx;
    private final FileAsk ask;
    private final BiConsumer<Workspace, MapLayers> replace;

    /** @param replace puts the workspace with the added layers, and the map's layer list with them, in place of the old one */
    AddContextLayerAction(WindowContext ctx, FileAsk ask, BiConsumer<Workspace, MapLayers> replace) {
        super("Add context layer...", menuKey(KeyEvent.VK_L));
        this.ctx = ctx;
        this.ask = ask;
        this.replace = replace;
    }

    @Override public void actionPerformed(ActionEvent e) {
        if (ctx.workspace() == null) return;
        Path f = ask.ask("lastLayerDir", "Add context layers from a .gpkg or shapefile folder", FileAsk.Mode.OPEN_FILE_OR_FOLDER, null);
        if (f != null) addFrom(f);
    }

    /** Reads the context layers of {@code f} in a background task and adds them (nothing when the network changed meanwhile). */
    void addFrom(Path f) {
        Workspace w0 = ctx.workspace();
        if (w0 == null) return;
        ctx.run(new Task<>("read layers", p -> {
            Network n = NetworkReader.read(f, FieldMapping.DEFAULT);
            if (n.crs().epsg() != 0 && w0.network().crs().epsg() != 0 && n.crs().epsg() != w0.network().crs().epsg()) {
                throw new IOException(f.getFileName() + " is in EPSG:" + n.crs().epsg() + ", the network in EPSG:"
                        + w0.network().crs().epsg() + "; re-project it first");
            }
            Workspace w = w0;
            for (ContextLayer c : n.context()) w = w.withContext(new ContextLayer(f.getFileName() + ":" + c.name(), c.items()));
            return w;
        }, w -> {
            if (ctx.workspace() != w0) return;
            MapLayers l = ctx.map().layers();
            for (int i = w0.context().size(); i < w.context().size(); i++) l = l.withContext(w.context().get(i).name(), i);
            replace.accept(w, l);
            ctx.status("Added " + (w.context().size() - w0.context().size()) + " context layer(s) from " + f.getFileName());
        }, t -> ctx.failed("Cannot add layers from " + f.getFileName(), t)));
    }
}
