package org.shutline.ui;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLightLaf;
import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Rectangle;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import java.util.function.IntSupplier;
import java.util.prefs.Preferences;
import javax.swing.Action;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JCheckBoxMenuItem;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JOptionPane;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.JToolBar;
import javax.swing.SwingUtilities;
import javax.swing.UIManager;
import javax.swing.WindowConstants;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.app.Workspace;
import org.shutline.model.Network;
import org.shutline.model.Plural;
import org.shutline.model.Severity;
import org.shutline.plan.Plan;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapStyle;
import org.shutline.trace.NetworkState;

/**
 * The Shutline window: map in the middle, layers and feature facts on the left, the
 * panels (network check, station feeds, work plan, incident) on the right, a status
 * line ({@link StatusBar}) with the cursor position (network CRS and US National Grid),
 * the caution when a plan with critical hazards is open, and a progress bar with cancel
 * for the work running in the background. Window size, split positions, theme and
 * recent files are kept in {@link Preferences} (node {@code shutline.prefs}, default
 * {@code org/shutline/ui}).
 *
 * <p>The window holds the frame, the layout, the open workspace and the selection. The
 * panels and the menu and toolbar actions (one class per action or small group, such as
 * {@link OpenNetworkAction}, {@link SavePlanAction}, {@link ZoomActions}) reach it only
 * through {@link WindowContext}; the window registers the actions in the menus and the
 * toolbar.
 */
public final class MainWindow extends JFrame {
    private final Preferences prefs;
    private final Context ctx = new Context();
    private final MapView map = new MapView();
    private final StatusBar status = new StatusBar();
    private final JTextArea facts = new JTextArea(12, 24);
    private final JTabbedPane tabs = new JTabbedPane();
    private final LayersPanel layers;
    private final FindingsPanel findings;
    private final FeedsPanel feeds;
    private final PlanPanel plan;
    private final IncidentPanel incident;
    private final JSplitPane left;
    private final JSplitPane centre;
    private final JSplitPane right;

    private final NetworkOpener opener;
    private final RecentFiles recent;
    private final OpenNetworkAction openNetwork;
    private final OpenWithMappingAction openWithMapping;
    private final OpenPlanAction openPlan;
    private final NewPlanAction newPlan;
    private final AddContextLayerAction addLayer;
    private final SavePlanAction savePlan;
    private final ExportStepAction exportStep;
    private final QuitAction quit;
    private final ZoomActions zoom;
    private final ThemeAction theme;
    private final ModeActions modes;
    private final FindAction find;
    private final PlanStepActions steps;
    private final AboutAction about;

    private Workspace ws;
    private Pick selected;
    private List<Geometry> selection = List.of();
    private List<Geometry> panelHighlight = List.of();

    public MainWindow() {
        super("Shutline");
        prefs = Preferences.userRoot().node(System.getProperty("shutline.prefs", "org/shutline/ui"));
        FileAsk ask = FileAsk.swing(this, prefs);
        addLayer = new AddContextLayerAction(ctx, ask, this::replaceWorkspace);
        layers = new LayersPanel(ctx, addLayer);
        findings = new FindingsPanel(ctx);
        feeds = new FeedsPanel(ctx);
        plan = new PlanPanel(ctx, this::savePlan);
        incident = new IncidentPanel(ctx);
        opener = new NetworkOpener(ctx, this::mayDiscard, this::loaded);
        recent = new RecentFiles(prefs, opener);
        openNetwork = new OpenNetworkAction(ask, opener);
        openWithMapping = new OpenWithMappingAction(ask, opener);
        openPlan = new OpenPlanAction(ctx, ask, this::mayDiscard, plan, recent);
        newPlan = new NewPlanAction(ctx, this::mayDiscard, plan);
        savePlan = new SavePlanAction(ctx, ask, plan, recent, this);
        exportStep = new ExportStepAction(ctx, ask, plan);
        quit = new QuitAction(this::closeWindow);
        zoom = new ZoomActions(ctx);
        theme = new ThemeAction(ctx, prefs, this::restyled);
        modes = new ModeActions(ctx, incident);
        find = new FindAction(ctx);
        steps = new PlanStepActions(ctx, plan);
        about = new AboutAction(this, status::critical);

        facts.setEditable(false);
        facts.setLineWrap(true);
        facts.setWrapStyleWord(true);
        facts.setName("facts");
        tabs.addTab("Findings", findings);
        tabs.addTab("Station feeds", feeds);
        tabs.addTab("Work plan", plan);
        tabs.addTab("Incident", incident);
        JScrollPane factsScroll = new JScrollPane(facts);
        factsScroll.setBorder(BorderFactory.createTitledBorder("Feature"));
        left = new JSplitPane(JSplitPane.VERTICAL_SPLIT, layers, factsScroll);
        left.setResizeWeight(0.5);
        right = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, map, tabs);
        right.setResizeWeight(1.0);
        centre = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, left, right);
        setLayout(new BorderLayout());
        add(toolbar(), BorderLayout.NORTH);
        add(centre, BorderLayout.CENTER);
        add(status, BorderLayout.SOUTH);
        setJMenuBar(menus());
        map.setListener(new MapMouse(ctx, incident, status));
        setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        addWindowListener(new WindowAdapter() {
            @Override public void windowClosing(WindowEvent e) {
                closeWindow();
            }
        });
        restoreLayout();
    }

    /** Sets up FlatLaf (light or dark, as last chosen) before the first window. */
    public static void setupLookAndFeel() {
        Preferences p = Preferences.userRoot().node(System.getProperty("shutline.prefs", "org/shutline/ui"));
        if (p.getBoolean("dark", false)) FlatDarkLaf.setup();
        else FlatLightLaf.setup();
    }

    // ---- menus and toolbar: the actions registered ----

    private JMenuBar menus() {
        JMenuBar mb = new JMenuBar();
        JMenu file = menu("File", openNetwork, openWithMapping, openPlan, newPlan, addLayer);
        file.add(recent.menu());
        file.addSeparator();
        file.add(savePlan);
        file.add(exportStep);
        file.addSeparator();
        file.add(quit);
        JMenu view = menu("View", zoom.extent, zoom.in, zoom.out, zoom.selection);
        view.addSeparator();
        view.add(new JCheckBoxMenuItem(theme));
        mb.add(file);
        mb.add(view);
        mb.add(menu("Tools", modes.identify, modes.incidentAt, find));
        mb.add(menu("Plan", steps.next, steps.previous));
        mb.add(menu("Help", about));
        return mb;
    }

    private static JMenu menu(String name, Action... actions) {
        JMenu m = new JMenu(name);
        for (Action a : actions) m.add(a);
        return m;
    }

    private JToolBar toolbar() {
        JToolBar tb = new JToolBar();
        tb.setFloatable(false);
        tb.add(button(zoom.extent, "Extent"));
        tb.add(button(zoom.in, "In"));
        tb.add(button(zoom.out, "Out"));
        tb.add(button(zoom.selection, "Selection"));
        tb.addSeparator();
        tb.add(button(steps.previous, "Previous step"));
        tb.add(button(steps.next, "Next step"));
        tb.addSeparator();
        tb.add(new JLabel(" Find id or address: "));
        JTextField search = find.field();
        search.setMaximumSize(search.getPreferredSize());
        tb.add(search);
        return tb;
    }

    /** A toolbar button for {@code a} with a shorter label than its menu item. */
    private static JButton button(Action a, String label) {
        JButton b = new JButton(a);
        b.setText(label);
        b.setFocusable(false);
        return b;
    }

    // ---- the open network, the selection and the marks ----

    /** A network (and perhaps a plan) was opened by the {@link NetworkOpener}. */
    private void loaded(Workspace w, Path network, Plan pl, Path planFile) {
        show(w);
        recent.add(network, planFile);
        if (pl != null) {
            plan.open(pl, planFile);
            tabs.setSelectedComponent(plan);
        }
    }

    private void show(Workspace w) {
        ws = w;
        selected = null;
        selection = List.of();
        panelHighlight = List.of();
        map.setWorkspace(w);
        map.setStyle(theme.style());
        map.setOverlays(MapOverlays.NONE);
        pushHighlights();
        layers.refresh();
        findings.show(w.findings());
        feeds.show(w);
        Network n = w.network();
        setTitle("Shutline - " + n.sourceName());
        // data problems reach the window as they reach every command: error-level findings are
        // counted on the status line and on the check tab, so no answer looks clean by default
        long errors = w.findings().stream().filter(f -> f.severity().compareTo(Severity.ERROR) >= 0).count();
        tabs.setTitleAt(tabs.indexOfComponent(findings), errors == 0 ? "Findings" : "Findings (" + Plural.of(errors, "data error") + ")");
        status.message(String.format(Locale.ROOT, "%s: %d mains, %d valves, %d stations, %d services; CRS %s%s",
                n.sourceName(), n.mains().size(), n.valves().size(), n.stations().size(), n.services().size(), n.crs().name(),
                errors == 0 ? "" : "; " + Plural.of(errors, "data error")
                        + " (features skipped or values defaulted, results may be incomplete: see Network check)"));
    }

    /** The same network with context layers added ({@link AddContextLayerAction}). */
    private void replaceWorkspace(Workspace w, MapLayers l) {
        ws = w;
        map.replaceWorkspace(w, l);
        layers.refresh();
    }

    private void pushHighlights() {
        Color sel = MapComposer.selectionColour(map.style());
        Color panel = new Color(MapStyle.OI_ORANGE.getRed(), MapStyle.OI_ORANGE.getGreen(), MapStyle.OI_ORANGE.getBlue(), 130);
        map.setHighlights(List.of(new MapComposer.Highlight(panelHighlight, panel), new MapComposer.Highlight(selection, sel)));
    }

    /** After a theme change: the highlight colours and the legend swatches follow the style. */
    private void restyled() {
        pushHighlights();
        layers.refresh();
    }

    /** What the panels and actions may ask of the window. */
    private final class Context implements WindowContext {
        @Override public Workspace workspace() {
            return ws;
        }

        @Override public MapView map() {
            return map;
        }

        @Override public Pick selected() {
            return selected;
        }

        @Override public void status(String text) {
            status.message(text);
        }

        @Override public void run(Task<?> task) {
            status.run(task);
        }

        @Override public void failed(String what, Throwable t) {
            if (t instanceof CancellationException) {
                status.message(what + ": cancelled");
                return;
            }
            status.message(what + ": " + t.getMessage());
            JOptionPane.showMessageDialog(MainWindow.this, what + ":\n" + t.getMessage(), "Shutline", JOptionPane.ERROR_MESSAGE);
        }

        @Override public void select(Pick first, List<Pick> all) {
            selected = first;
            List<Geometry> g = new ArrayList<>();
            for (Pick p : all) if (p.geometry() != null) g.add(p.geometry());
            selection = g;
            pushHighlights();
            StringBuilder sb = new StringBuilder();
            if (first != null) {
                for (String s : Identify.attributes(first)) sb.append(s).append('\n');
                sb.append('\n');
                for (String s : Identify.facts(ws, first)) sb.append(s).append('\n');
            }
            if (all.size() > 1) {
                sb.append('\n').append(all.size()).append(" features selected:\n");
                for (int i = 0; i < Math.min(all.size(), 50); i++) sb.append("  ").append(all.get(i).label()).append('\n');
            }
            facts.setText(sb.toString());
            facts.setCaretPosition(0);
        }

        @Override public void zoomToSelection() {
            Envelope e = new Envelope();
            for (Geometry g : selection) e.expandToInclude(g.getEnvelopeInternal());
            if (!e.isNull()) map.zoomTo(e, 80);
        }

        @Override public void zoomToPoint(double x, double y, String text) {
            map.zoomTo(new Envelope(x - 60, x + 60, y - 60, y + 60), 120);
            status.message(text);
        }

        @Override public void showPanelMarks(MapOverlays o, List<Geometry> highlight, NetworkState state) {
            panelHighlight = List.copyOf(highlight);
            map.setState(state);
            map.setOverlays(o);
            pushHighlights();
        }

        @Override public void showPanel(JComponent panel) {
            tabs.setSelectedComponent(panel);
        }

        @Override public void planEvaluated(PlanEvaluation.Result r) {
            status.planEvaluated(r);
            findings.showPlan(r);
        }
    }

    // ---- opening, saving and closing ----

    /** Opens a network (and optionally a plan) in the background. */
    public void open(Path network, Path planFile) {
        opener.open(network, null, planFile);
    }

    /** Opens a network read through a field-mapping file (null: our own names), and optionally a plan, in the background. */
    public void open(Path network, Path mapping, Path planFile) {
        opener.open(network, mapping, planFile);
    }

    private boolean mayDiscard() {
        return savePlan.mayDiscard();
    }

    /** Saves the plan to its file (asks for one when new); returns false when not saved. */
    boolean savePlan() {
        return savePlan.save();
    }

    /** Asks about unsaved changes, saves the layout and closes. */
    void closeWindow() {
        if (!mayDiscard()) return;
        status.cancelAll();
        saveLayout();
        dispose();
    }

    private void restoreLayout() {
        int w = prefs.getInt("w", 1400);
        int h = prefs.getInt("h", 900);
        int x = prefs.getInt("x", Integer.MIN_VALUE);
        int y = prefs.getInt("y", Integer.MIN_VALUE);
        setSize(new Dimension(w, h));
        if (x == Integer.MIN_VALUE) setLocationRelativeTo(null);
        else setLocation(x, y);
        left.setDividerLocation(prefs.getInt("leftDivider", 330));
        centre.setDividerLocation(prefs.getInt("centreDivider", 270));
        right.setDividerLocation(prefs.getInt("rightDivider", Math.max(400, w - 270 - 480)));
    }

    private void saveLayout() {
        Rectangle b = getBounds();
        prefs.putInt("x", b.x);
        prefs.putInt("y", b.y);
        prefs.putInt("w", b.width);
        prefs.putInt("h", b.height);
        prefs.putInt("leftDivider", left.getDividerLocation());
        prefs.putInt("centreDivider", centre.getDividerLocation());
        prefs.putInt("rightDivider", right.getDividerLocation());
        prefs.putBoolean("dark", theme.dark());
    }

    // ---- for the window tests ----

    MapView map() { return map; }
    Workspace workspace() { return ws; }
    PlanPanel planPanel() { return plan; }
    IncidentPanel incidentPanel() { return incident; }
    JTabbedPane tabs() { return tabs; }
    String cautionText() { return status.cautionText(); }
    List<String> recentList() { return recent.list(); }
    void stepBy(int d) { steps.stepBy(d); }
    void setDark(boolean on) { theme.apply(on); }
    void findNow(String text) { find.findNow(text); }
    void exportStepTo(Path dir) { exportStep.exportTo(dir); }
    void setDiscardPrompt(IntSupplier prompt) { savePlan.setDiscardPrompt(prompt); }

    /** Opens the window on the event thread (used by the open command). */
    public static MainWindow showOn(Path network, Path planFile) {
        return showOn(network, null, planFile);
    }

    /** Opens the window on the event thread with the network read through {@code mapping} (null: our own names). */
    public static MainWindow showOn(Path network, Path mapping, Path planFile) {
        MainWindow[] w = new MainWindow[1];
        try {
            SwingUtilities.invokeAndWait(() -> {
                setupLookAndFeel();
                w[0] = new MainWindow();
                w[0].setVisible(true);
                if (network != null) w[0].open(network, mapping, planFile);
            });
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while opening the window", e);
        } catch (java.lang.reflect.InvocationTargetException e) {
            throw new IllegalStateException("cannot open the window: " + e.getCause(), e.getCause());
        }
        return w[0];
    }

    static {
        UIManager.put("SplitPane.dividerSize", 6);
    }
}
