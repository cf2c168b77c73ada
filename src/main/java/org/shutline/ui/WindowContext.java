package org.shutline.ui;

import org.shutline.app.Workspace;
import java.util.List;
import javax.swing.JComponent;
import org.locationtech.jts.geom.Geometry;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.render.MapOverlays;
import org.shutline.trace.NetworkState;

/**
 * What a panel or an action may ask of the window: the open workspace and the map, the
 * feature selection, the status line, work in the background and a few ways of showing
 * things. Panels and actions hold this, never the window itself; every method is called
 * on the event thread and returns at once (long work goes through {@link #run}).
 */
interface WindowContext {
    /** The open network, or null before the first one is loaded. */
    Workspace workspace();

    /** The map view (viewport, layers, style). */
    MapView map();

    /** The feature picked on the map or found, or null. */
    Pick selected();

    /** Puts a message on the status line. */
    void status(String text);

    /**
     * Runs a task in the background: its work runs off the event thread, the status bar
     * shows its progress and Cancel stops it; the outcome arrives on the event thread.
     */
    void run(Task<?> task);

    /** Reports a failure: "cancelled" on the status line for a cancelled task, else the status line and a message box. */
    void failed(String what, Throwable t);

    /** Selects features: the first one's attributes and facts in the feature box, all of them highlighted. */
    void select(Pick first, List<Pick> all);

    /** Zooms the map to the selected features (nothing when none). */
    void zoomToSelection();

    /** Zooms the map to a point (120 m square) and shows {@code text} on the status line. */
    void zoomToPoint(double x, double y, String text);

    /** Shows a panel's overlays and highlighted features on the map of the network as recorded. */
    default void showPanelMarks(MapOverlays overlays, List<Geometry> highlight) {
        showPanelMarks(overlays, highlight, null);
    }

    /** The same on the map of a network state (a plan step's; null for the network as recorded), replacing the previous panel's marks. */
    void showPanelMarks(MapOverlays overlays, List<Geometry> highlight, NetworkState state);

    /** Brings one of the window's panels (tabs) to the front. */
    void showPanel(JComponent panel);

    /** The open plan was evaluated (null: it could not be): the caution line follows its critical hazards. */
    void planEvaluated(PlanEvaluation.Result result);
}
