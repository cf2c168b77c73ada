package org.shutline.ui;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.event.MouseWheelEvent;
import java.awt.geom.AffineTransform;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;
import javax.swing.AbstractAction;
import javax.swing.JComponent;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import org.locationtech.jts.geom.Envelope;
import org.shutline.app.Workspace;
import org.shutline.model.Caution;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapScene;
import org.shutline.trace.NetworkState;
import org.shutline.render.MapStyle;
import org.shutline.render.ScaleBar;
import org.shutline.render.Viewport;

/**
 * The map view. The map picture is painted by {@link MapComposer} into an image on a
 * render thread of its own, never on the event thread: each change (viewport, layers,
 * overlays, highlight, theme) asks for a new picture, requests coalesce (only the
 * newest is drawn), and until it arrives the last picture is shown moved and scaled
 * to the new viewport, so pan and zoom follow the hand at once. The scale bar, the
 * selection rectangle and the caution line are drawn over it on the event thread.
 *
 * <p>Mouse: drag pans; wheel zooms by 1.25 per notch around the cursor; a click is
 * passed to the {@link Listener} with a pick tolerance of 6 px; shift-drag draws a
 * selection rectangle. Keys: arrows pan by a quarter view, + and - zoom about the centre.
 */
public final class MapView extends JComponent {
    /** What the window wants to hear from the map. */
    public interface Listener {
        default void clicked(double x, double y, double toleranceWorld, MouseEvent e) {}

        default void rectangle(Envelope world) {}

        default void cursor(double x, double y) {}
    }

    private record Snapshot(Viewport viewport, Workspace ws, MapScene scene, MapStyle style, MapLayers layers,
                            MapOverlays overlays, List<MapComposer.Highlight> highlights, long generation) {}

    private record Frame(BufferedImage image, Viewport viewport, long generation) {}

    static final double PICK_PX = 6;

    private final ExecutorService renderer = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "shutline-map-render");
        t.setDaemon(true);
        return t;
    });
    private final AtomicReference<Snapshot> pending = new AtomicReference<>();
    private final AtomicBoolean queued = new AtomicBoolean();
    private Listener listener = new Listener() {};
    private Workspace ws;
    private NetworkState state;
    private MapScene scene;
    private MapStyle style = MapStyle.LIGHT;
    private MapLayers layers = MapLayers.defaults(List.of());
    private MapOverlays overlays = MapOverlays.NONE;
    private List<MapComposer.Highlight> highlights = List.of();
    private Viewport viewport = new Viewport(0, 0, 1, 800, 600);
    private long generation;
    private volatile Frame frame;
    private volatile Overview overview;
    private final AtomicBoolean overviewBuilding = new AtomicBoolean();
    private final ExecutorService overviewBuilder = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "shutline-map-overview");
        t.setDaemon(true);
        t.setPriority(Thread.MIN_PRIORITY);
        return t;
    });
    private volatile double lastRenderMs;
    private Rectangle band;

    public MapView() {
        setPreferredSize(new Dimension(900, 700));
        setFocusable(true);
        setOpaque(true);
        MouseAdapter mouse = new Mouse();
        addMouseListener(mouse);
        addMouseMotionListener(mouse);
        addMouseWheelListener(mouse);
        addComponentListener(new ComponentAdapter() {
            @Override public void componentResized(ComponentEvent e) {
                if (getWidth() > 0 && getHeight() > 0) setViewport(viewport.withSize(getWidth(), getHeight()));
            }
        });
        key("LEFT", () -> setViewport(viewport.pan(viewport.width() / 4.0, 0)));
        key("RIGHT", () -> setViewport(viewport.pan(-viewport.width() / 4.0, 0)));
        key("UP", () -> setViewport(viewport.pan(0, viewport.height() / 4.0)));
        key("DOWN", () -> setViewport(viewport.pan(0, -viewport.height() / 4.0)));
        key("PLUS", this::zoomIn);
        key("EQUALS", this::zoomIn);
        key("ADD", this::zoomIn);
        key("MINUS", this::zoomOut);
        key("SUBTRACT", this::zoomOut);
    }

    private void key(String name, Runnable r) {
        getInputMap(WHEN_FOCUSED).put(KeyStroke.getKeyStroke(name), name);
        getActionMap().put(name, new AbstractAction() {
            @Override public void actionPerformed(java.awt.event.ActionEvent e) {
                r.run();
            }
        });
    }

    public void setListener(Listener l) {
        this.listener = l;
    }

    /** Shows a workspace, fitted to its extent. */
    public void setWorkspace(Workspace w) {
        this.ws = w;
        this.state = null;
        this.scene = w.scene();
        List<String> names = w.context().stream().map(c -> c.name()).toList();
        this.layers = MapLayers.defaults(names);
        this.frame = null;
        zoomToExtent();
    }

    /** Keeps the viewport and layer settings; for a workspace with one more context layer. */
    public void replaceWorkspace(Workspace w, MapLayers l) {
        this.ws = w;
        this.scene = state == null || state.network().mains() != w.network().mains() ? w.scene() : w.scene().withState(state);
        if (scene == w.scene()) state = null;
        this.layers = l;
        requestRender();
    }

    public Workspace workspace() { return ws; }
    public Viewport viewport() { return viewport; }
    public MapLayers layers() { return layers; }
    public MapStyle style() { return style; }
    public MapOverlays overlays() { return overlays; }

    public void setViewport(Viewport v) {
        viewport = v;
        requestRender();
    }

    public void setLayers(MapLayers l) {
        layers = l;
        requestRender();
    }

    public void setStyle(MapStyle s) {
        style = s;
        requestRender();
    }

    /**
     * Draws the network as it stands in {@code s} (a plan step's state: what the plan
     * added, cut, closed and abandoned); null for the network as recorded.
     */
    public void setState(NetworkState s) {
        if (ws == null) return;
        state = s;
        scene = s == null ? ws.scene() : ws.scene().withState(s);
        requestRender();
    }

    /** The scene drawn: the workspace's, or it seen through the state set by {@link #setState}. */
    public MapScene scene() { return scene == null && ws != null ? ws.scene() : scene; }

    public void setOverlays(MapOverlays o) {
        overlays = o;
        requestRender();
    }

    public void setHighlights(List<MapComposer.Highlight> h) {
        highlights = List.copyOf(h);
        requestRender();
    }

    public void zoomIn() {
        setViewport(viewport.zoomAround(viewport.width() / 2.0, viewport.height() / 2.0, 1.5));
    }

    public void zoomOut() {
        setViewport(viewport.zoomAround(viewport.width() / 2.0, viewport.height() / 2.0, 1 / 1.5));
    }

    public void zoomToExtent() {
        if (ws == null) return;
        zoomTo(ws.scene().extent(), 1);
    }

    /** Fits the view to {@code env}, grown so that it is at least {@code minSize} world units across. */
    public void zoomTo(Envelope env, double minSize) {
        if (env == null || env.isNull()) return;
        Envelope e = new Envelope(env);
        double grow = Math.max(0, minSize - Math.min(e.getWidth(), e.getHeight())) / 2;
        e.expandBy(grow);
        int w = getWidth() > 0 ? getWidth() : viewport.width();
        int h = getHeight() > 0 ? getHeight() : viewport.height();
        setViewport(Viewport.fitting(e, w, h, 24));
    }

    /** Milliseconds the last picture took to paint on the render thread. */
    public double lastRenderMillis() {
        return lastRenderMs;
    }

    /** True when the picture shown was drawn for the current viewport and settings. */
    public boolean isSettled() {
        Frame f = frame;
        return f != null && f.generation() == generation && pending.get() == null;
    }

    private void requestRender() {
        if (ws == null) {
            repaint();
            return;
        }
        pending.set(new Snapshot(viewport, ws, scene(), style, layers, overlays, highlights, ++generation));
        if (!queued.getAndSet(true)) renderer.execute(this::renderLoop);
        repaint();
    }

    private void renderLoop() {
        queued.set(false);
        Snapshot s;
        while ((s = pending.getAndSet(null)) != null) {
            long t0 = System.nanoTime();
            BufferedImage img;
            Overview ov = overview;
            // the overview picture holds the network as recorded: a state's map is always drawn in full
            boolean recorded = s.scene() == s.ws().scene();
            if (recorded && Overview.wanted(s.ws()) && ov != null && ov.serves(s.ws(), s.style(), s.layers(), s.viewport())) {
                img = ov.render(s.viewport(), s.overlays(), s.highlights());
            } else {
                img = render(s.viewport(), s.ws(), s.scene(), s.style(), s.layers(), s.overlays(), s.highlights(), true);
            }
            if (Overview.wanted(s.ws()) && (ov == null || !ov.matches(s.ws(), s.style(), s.layers()))) buildOverview(s);
            double ms = (System.nanoTime() - t0) / 1e6;
            Frame f = new Frame(img, s.viewport(), s.generation());
            SwingUtilities.invokeLater(() -> {
                Frame old = frame;
                if (old == null || old.generation() < f.generation()) frame = f;
                lastRenderMs = ms;
                repaint();
            });
        }
    }

    /** Builds the overview picture for the snapshot's settings in the background, then redraws. */
    private void buildOverview(Snapshot s) {
        if (overviewBuilding.getAndSet(true)) return;
        overviewBuilder.execute(() -> {
            try {
                overview = Overview.build(s.ws(), s.style(), s.layers());
            } finally {
                overviewBuilding.set(false);
            }
            SwingUtilities.invokeLater(this::requestRender);
        });
    }

    /** Paints a picture synchronously (the render thread, exports of the view, tests). */
    static BufferedImage render(Viewport v, Workspace ws, MapStyle style, MapLayers layers, MapOverlays overlays,
                                List<MapComposer.Highlight> highlights, boolean antialias) {
        return render(v, ws, ws.scene(), style, layers, overlays, highlights, antialias);
    }

    /** The same drawing {@code scene} (the workspace's scene seen through a state). */
    static BufferedImage render(Viewport v, Workspace ws, MapScene scene, MapStyle style, MapLayers layers,
                                MapOverlays overlays, List<MapComposer.Highlight> highlights, boolean antialias) {
        BufferedImage img = new BufferedImage(v.width(), v.height(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            MapComposer.paint(g, v, ws, scene, style, layers, overlays, highlights, antialias, true);
        } finally {
            g.dispose();
        }
        return img;
    }

    /** The current view as a picture, painted on the calling thread. */
    public BufferedImage renderNow(boolean antialias) {
        return render(viewport, ws, scene(), style, layers, overlays, highlights, antialias);
    }

    @Override
    protected void paintComponent(Graphics g0) {
        Graphics2D g = (Graphics2D) g0.create();
        try {
            g.setColor(style.background());
            g.fillRect(0, 0, getWidth(), getHeight());
            Frame f = frame;
            if (f != null) {
                AffineTransform t = viewport.toScreen();
                t.concatenate(f.viewport().toWorld());
                g.drawImage(f.image(), t, null);
            }
            furniture(g);
        } finally {
            g.dispose();
        }
    }

    private void furniture(Graphics2D g) {
        if (ws != null) {
            g.setRenderingHint(java.awt.RenderingHints.KEY_ANTIALIASING, java.awt.RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(java.awt.RenderingHints.KEY_TEXT_ANTIALIASING, java.awt.RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            Color bg = style.background();
            g.setColor(new Color(bg.getRed(), bg.getGreen(), bg.getBlue(), 210));
            g.fillRect(6, getHeight() - 70, 232, 36);
            g.fillRect(0, getHeight() - 34, getWidth(), 34);
            ScaleBar.paint(g, new Rectangle2D.Double(12, getHeight() - 66, 220, 30), viewport, ws.network().crs().unit(), style);
            g.setFont(style.font().deriveFont(10f));
            g.setColor(style.foreground());
            String c = Caution.SHORT;
            int cut = c.indexOf("; ");
            if (g.getFontMetrics().stringWidth(c) > getWidth() - 24 && cut > 0) {
                g.drawString(c.substring(0, cut + 1), 12, getHeight() - 22);
                g.drawString(c.substring(cut + 2), 12, getHeight() - 10);
            } else {
                g.drawString(c, 12, getHeight() - 10);
            }
        }
        if (band != null) {
            g.setColor(new Color(MapStyle.OI_BLUE.getRed(), MapStyle.OI_BLUE.getGreen(), MapStyle.OI_BLUE.getBlue(), 50));
            g.fill(band);
            g.setColor(MapStyle.OI_BLUE);
            g.setStroke(new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f, new float[] {4f, 3f}, 0f));
            g.draw(band);
        }
    }

    private final class Mouse extends MouseAdapter {
        private int x0;
        private int y0;
        private int lastX;
        private int lastY;
        private boolean dragged;
        private boolean selecting;

        @Override public void mousePressed(MouseEvent e) {
            requestFocusInWindow();
            x0 = lastX = e.getX();
            y0 = lastY = e.getY();
            dragged = false;
            selecting = (e.getModifiersEx() & InputEvent.SHIFT_DOWN_MASK) != 0;
        }

        @Override public void mouseDragged(MouseEvent e) {
            if (Math.abs(e.getX() - x0) + Math.abs(e.getY() - y0) > 3) dragged = true;
            if (selecting) {
                band = new Rectangle(Math.min(x0, e.getX()), Math.min(y0, e.getY()), Math.abs(e.getX() - x0), Math.abs(e.getY() - y0));
                repaint();
            } else if (SwingUtilities.isLeftMouseButton(e) || SwingUtilities.isMiddleMouseButton(e)) {
                setViewport(viewport.pan(e.getX() - lastX, e.getY() - lastY));
            }
            lastX = e.getX();
            lastY = e.getY();
            mouseMoved(e);
        }

        @Override public void mouseReleased(MouseEvent e) {
            if (selecting && band != null && dragged) {
                Envelope env = new Envelope(viewport.worldX(band.getMinX()), viewport.worldX(band.getMaxX()),
                        viewport.worldY(band.getMinY()), viewport.worldY(band.getMaxY()));
                band = null;
                repaint();
                listener.rectangle(env);
            } else if (!dragged && SwingUtilities.isLeftMouseButton(e)) {
                band = null;
                listener.clicked(viewport.worldX(e.getX()), viewport.worldY(e.getY()), PICK_PX * viewport.scale(), e);
            }
            selecting = false;
        }

        @Override public void mouseMoved(MouseEvent e) {
            listener.cursor(viewport.worldX(e.getX()), viewport.worldY(e.getY()));
        }

        @Override public void mouseWheelMoved(MouseWheelEvent e) {
            double f = Math.pow(1.25, -e.getPreciseWheelRotation());
            setViewport(viewport.zoomAround(e.getX(), e.getY(), f));
        }
    }
}
