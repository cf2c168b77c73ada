package org.shutline.ui;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.FlatLightLaf;
import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Rectangle;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.awt.event.MouseEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import java.util.prefs.Preferences;
import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.JButton;
import javax.swing.JCheckBoxMenuItem;
import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.JToolBar;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import javax.swing.Timer;
import javax.swing.UIManager;
import javax.swing.WindowConstants;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.app.Workspace;
import org.shutline.io.FieldMapping;
import org.shutline.io.NetworkReader;
import org.shutline.model.Caution;
import org.shutline.model.ContextLayer;
import org.shutline.model.Network;
import org.shutline.plan.Plan;
import org.shutline.plan.PlanReader;
import org.shutline.plan.PlanWriter;
import org.shutline.render.GridReference;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapStyle;

/**
 * The Shutline window: map in the middle, layers and feature facts on the left, the
 * panels (network check, station feeds, work plan, incident) on the right, a status
 * line with the cursor position (network CRS and US National Grid), the caution when
 * a plan with critical hazards is open, and a progress bar with cancel for the work
 * running in the background. Window size, split positions, theme and recent files are
 * kept in {@link Preferences} (node {@code shutline.prefs}, default {@code org/shutline/ui}).
 */
public final class MainWindow extends JFrame {
    private static final int RECENT_MAX = 6;

    private final Preferences prefs;
    private final MapView map = new MapView();
    private final LayersPanel layers;
    private final JTextArea facts = new JTextArea(12, 24);
    private final FindingsPanel findings;
    private final FeedsPanel feeds;
    private final PlanPanel plan;
    private final IncidentPanel incident;
    private final JTabbedPane tabs = new JTabbedPane();
    private final JLabel message = new JLabel("Ready");
    private final JLabel coords = new JLabel(" ");
    private final JLabel grid = new JLabel(" ");
    private final JLabel caution = new JLabel(" ");
    private final JProgressBar bar = new JProgressBar();
    private final JButton cancel = new JButton("Cancel");
    private final JTextField search = new JTextField(16);
    private final JMenu recent = new JMenu("Recent");
    private final JCheckBoxMenuItem dark = new JCheckBoxMenuItem("Dark theme");
    private final JSplitPane left;
    private final JSplitPane centre;
    private final JSplitPane right;
    private final List<Task<?>> tasks = new ArrayList<>();
    private Workspace ws;
    private Pick selected;
    private List<Geometry> selection = List.of();
    private List<Geometry> panelHighlight = List.of();
    private boolean critical;
    /** Asks Save / Discard / Cancel for unsaved plan changes; a JOptionPane answer code. Replaced by the window tests. */
    private java.util.function.IntSupplier discardPrompt = () -> JOptionPane.showConfirmDialog(this,
            "The work plan has unsaved changes. Save them?", "Shutline", JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE);

    public MainWindow() {
        super("Shutline");
        prefs = Preferences.userRoot().node(System.getProperty("shutline.prefs", "org/shutline/ui"));
        layers = new LayersPanel(this);
        findings = new FindingsPanel(this);
        feeds = new FeedsPanel(this);
        plan = new PlanPanel(this);
        incident = new IncidentPanel(this);
        facts.setEditable(false);
        facts.setLineWrap(true);
        facts.setWrapStyleWord(true);
        facts.setName("facts");
        tabs.addTab("Network check", findings);
        tabs.addTab("Station feeds", feeds);
        tabs.addTab("Work plan", plan);
        tabs.addTab("Incident", incident);
        JScrollPane factsScroll = new JScrollPane(facts);
        factsScroll.setBorder(javax.swing.BorderFactory.createTitledBorder("Feature"));
        left = new JSplitPane(JSplitPane.VERTICAL_SPLIT, layers, factsScroll);
        left.setResizeWeight(0.5);
        right = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, map, tabs);
        right.setResizeWeight(1.0);
        centre = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, left, right);
        setLayout(new BorderLayout());
        add(toolbar(), BorderLayout.NORTH);
        add(centre, BorderLayout.CENTER);
        add(statusBar(), BorderLayout.SOUTH);
        setJMenuBar(menus());
        map.setListener(new MapListener());
        setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        addWindowListener(new WindowAdapter() {
            @Override public void windowClosing(WindowEvent e) {
                closeWindow();
            }
        });
        new Timer(120, e -> updateProgress()).start();
        restoreLayout();
    }

    /** Sets up FlatLaf (light or dark, as last chosen) before the first window. */
    public static void setupLookAndFeel() {
        Preferences p = Preferences.userRoot().node(System.getProperty("shutline.prefs", "org/shutline/ui"));
        if (p.getBoolean("dark", false)) FlatDarkLaf.setup();
        else FlatLightLaf.setup();
    }

    // ---- what the panels call ----

    MapView map() { return map; }
    Workspace workspace() { return ws; }
    Pick selected() { return selected; }
    PlanPanel planPanel() { return plan; }
    IncidentPanel incidentPanel() { return incident; }
    JTabbedPane tabs() { return tabs; }
    String cautionText() { return caution.getText(); }

    void status(String text) {
        message.setText(text);
    }

    /** Runs a task in the background; the status bar shows its progress and Cancel stops it. */
    void run(Task<?> t) {
        tasks.add(t);
        t.execute();
        updateProgress();
    }

    private void updateProgress() {
        tasks.removeIf(Task::isDone);
        if (tasks.isEmpty()) {
            bar.setVisible(false);
            cancel.setVisible(false);
            return;
        }
        Task<?> t = tasks.get(tasks.size() - 1);
        bar.setVisible(true);
        cancel.setVisible(true);
        double f = t.fraction();
        bar.setIndeterminate(f < 0);
        if (f >= 0) bar.setValue((int) Math.round(f * 100));
        bar.setStringPainted(true);
        bar.setString(t.task());
    }

    /** Shows a panel's overlays and highlighted features on the map (replacing the previous panel's). */
    void showPanelMarks(MapOverlays o, List<Geometry> highlight) {
        showPanelMarks(o, highlight, null);
    }

    /** The same on the map of a network state (a plan step's; null for the network as recorded). */
    void showPanelMarks(MapOverlays o, List<Geometry> highlight, org.shutline.trace.NetworkState state) {
        panelHighlight = List.copyOf(highlight);
        map.setState(state);
        map.setOverlays(o);
        pushHighlights();
    }

    private void pushHighlights() {
        Color sel = MapComposer.selectionColour(map.style());
        Color panel = new Color(MapStyle.OI_ORANGE.getRed(), MapStyle.OI_ORANGE.getGreen(), MapStyle.OI_ORANGE.getBlue(), 130);
        map.setHighlights(List.of(new MapComposer.Highlight(panelHighlight, panel), new MapComposer.Highlight(selection, sel)));
    }

    void zoomToPoint(double x, double y, String text) {
        Envelope e = new Envelope(x - 60, x + 60, y - 60, y + 60);
        map.zoomTo(e, 120);
        status(text);
    }

    void planEvaluated(PlanEvaluation.Result r) {
        critical = r != null && r.hasCritical();
        caution.setText(critical ? "CRITICAL hazards in this plan. " + Caution.SHORT : " ");
        caution.setForeground(new Color(0xB0, 0x30, 0x00));
    }

    // ---- opening files ----

    /** Opens a network (and optionally a plan) in the background. */
    public void open(Path network, Path planFile) {
        open(network, null, planFile);
    }

    /** Opens a network read through a field-mapping file (null: our own names), and optionally a plan, in the background. */
    public void open(Path network, Path mapping, Path planFile) {
        if (!confirmDiscard()) return;
        status("Opening " + network + (mapping == null ? "" : " with mapping " + mapping.getFileName()) + " ...");
        run(new Task<>("open " + network.getFileName(), p -> {
            Workspace w = Workspace.load(network, mapping, p);
            Plan pl = planFile == null ? null : PlanReader.read(planFile);
            return new Object[] {w, pl};
        }, res -> {
            Workspace w = (Workspace) res[0];
            Plan pl = (Plan) res[1];
            show(w);
            addRecent(network, planFile);
            if (pl != null) {
                plan.open(pl, planFile);
                tabs.setSelectedComponent(plan);
            }
        }, t -> failed("Cannot open " + network.getFileName(), t)));
    }

    private void show(Workspace w) {
        ws = w;
        selected = null;
        selection = List.of();
        panelHighlight = List.of();
        map.setWorkspace(w);
        map.setStyle(dark.isSelected() ? MapStyle.DARK : MapStyle.LIGHT);
        map.setOverlays(MapOverlays.NONE);
        pushHighlights();
        layers.refresh();
        findings.show(w.findings());
        feeds.show(w);
        Network n = w.network();
        setTitle("Shutline - " + n.sourceName());
        // data problems reach the window as they reach every command: error-level findings are
        // counted on the status line and on the check tab, so no answer looks clean by default
        long errors = w.findings().stream().filter(f -> f.severity().compareTo(org.shutline.model.Severity.ERROR) >= 0).count();
        tabs.setTitleAt(tabs.indexOfComponent(findings), errors == 0 ? "Network check" : "Network check (" + org.shutline.model.Plural.of(errors, "error") + ")");
        status(String.format(Locale.ROOT, "%s: %d mains, %d valves, %d stations, %d services; CRS %s%s",
                n.sourceName(), n.mains().size(), n.valves().size(), n.stations().size(), n.services().size(), n.crs().name(),
                errors == 0 ? "" : "; " + org.shutline.model.Plural.of(errors, "data error")
                        + " (features skipped or values defaulted, results may be incomplete: see Network check)"));
    }

    private void failed(String what, Throwable t) {
        if (t instanceof CancellationException) {
            status(what + ": cancelled");
            return;
        }
        status(what + ": " + t.getMessage());
        JOptionPane.showMessageDialog(this, what + ":\n" + t.getMessage(), "Shutline", JOptionPane.ERROR_MESSAGE);
    }

    private void chooseNetwork() {
        JFileChooser fc = chooser("lastNetworkDir");
        fc.setFileSelectionMode(JFileChooser.FILES_AND_DIRECTORIES);
        fc.setDialogTitle("Open network (.gpkg or a folder of shapefiles)");
        if (fc.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) {
            remember("lastNetworkDir", fc);
            open(fc.getSelectedFile().toPath(), null);
        }
    }

    /** Open network with a field-mapping file: the network, then the mapping (the command line's --mapping). */
    private void chooseNetworkWithMapping() {
        JFileChooser fc = chooser("lastNetworkDir");
        fc.setFileSelectionMode(JFileChooser.FILES_AND_DIRECTORIES);
        fc.setDialogTitle("Open network (.gpkg or a folder of shapefiles)");
        if (fc.showOpenDialog(this) != JFileChooser.APPROVE_OPTION) return;
        remember("lastNetworkDir", fc);
        Path network = fc.getSelectedFile().toPath();
        JFileChooser mc = chooser("lastMappingDir");
        mc.setDialogTitle("Field-mapping file for " + network.getFileName() + " (YAML)");
        mc.setFileFilter(new javax.swing.filechooser.FileNameExtensionFilter("Field mapping (.yaml, .yml)", "yaml", "yml"));
        if (mc.showOpenDialog(this) != JFileChooser.APPROVE_OPTION) return;
        remember("lastMappingDir", mc);
        open(network, mc.getSelectedFile().toPath(), null);
    }

    private void choosePlan() {
        if (ws == null || !confirmDiscard()) return;
        JFileChooser fc = chooser("lastPlanDir");
        fc.setDialogTitle("Open work plan (.yaml)");
        if (fc.showOpenDialog(this) != JFileChooser.APPROVE_OPTION) return;
        remember("lastPlanDir", fc);
        Path f = fc.getSelectedFile().toPath();
        run(new Task<>("read plan", p -> PlanReader.read(f), pl -> {
            plan.open(pl, f);
            tabs.setSelectedComponent(plan);
            addRecent(ws.file(), f);
        }, t -> failed("Cannot read plan " + f.getFileName(), t)));
    }

    /**
     * Exports the selected plan step (PDF report with map, map book, lists and charts; PNG,
     * SVG, GeoPackage and GeoJSON result layers, CSV lists) into a chosen folder, in a
     * background task: the same code as {@code shutline export}.
     */
    void exportStep() {
        org.shutline.analysis.PlanEvaluation.Result r = plan.result();
        int index = plan.selectedStep();
        if (ws == null || r == null || index < 0) {
            status("Export: open a work plan and select a step first");
            return;
        }
        JFileChooser fc = chooser("lastExportDir");
        fc.setFileSelectionMode(JFileChooser.DIRECTORIES_ONLY);
        fc.setDialogTitle("Export step " + (index + 1) + " into folder");
        if (fc.showSaveDialog(this) != JFileChooser.APPROVE_OPTION) return;
        remember("lastExportDir", fc);
        exportStepTo(fc.getSelectedFile().toPath());
    }

    /** Exports the selected step into {@code dir} in a background task (see {@link #exportStep()}). */
    void exportStepTo(Path dir) {
        org.shutline.analysis.PlanEvaluation.Result r = plan.result();
        int index = plan.selectedStep();
        if (ws == null || r == null || index < 0) return;
        Path netFile = ws.file();
        Path planFile = plan.file();
        int step = r.steps().get(index).step().number();
        run(new Task<>("export step " + step, p -> {
            org.shutline.report.ReportView view = org.shutline.report.ReportView.ofStep(r, step,
                    org.shutline.analysis.Isolation.Options.defaults(java.time.LocalDate.now()));
            org.shutline.report.ReportBuilder b = org.shutline.report.ReportBuilder.of(view, netFile,
                    org.shutline.report.ReportBuilder.Options.defaults());
            if (planFile != null) b = b.withPlan(r, planFile);
            return b.write(dir, p);
        }, files -> status("Exported step " + step + ": " + files.size() + " files in " + dir),
                t -> failed("Export of step " + step, t)));
    }

    /** Adds the context layers of another GeoPackage or shapefile folder (read with the network reader). */
    void addContextLayer() {
        if (ws == null) return;
        JFileChooser fc = chooser("lastLayerDir");
        fc.setFileSelectionMode(JFileChooser.FILES_AND_DIRECTORIES);
        fc.setDialogTitle("Add context layers from a .gpkg or shapefile folder");
        if (fc.showOpenDialog(this) != JFileChooser.APPROVE_OPTION) return;
        remember("lastLayerDir", fc);
        addContextFrom(fc.getSelectedFile().toPath());
    }

    void addContextFrom(Path f) {
        Workspace w0 = ws;
        run(new Task<>("read layers", p -> {
            Network n = NetworkReader.read(f, FieldMapping.DEFAULT);
            if (n.crs().epsg() != 0 && w0.network().crs().epsg() != 0 && n.crs().epsg() != w0.network().crs().epsg()) {
                throw new IOException(f.getFileName() + " is in EPSG:" + n.crs().epsg() + ", the network in EPSG:"
                        + w0.network().crs().epsg() + "; re-project it first");
            }
            Workspace w = w0;
            for (ContextLayer c : n.context()) w = w.withContext(new ContextLayer(f.getFileName() + ":" + c.name(), c.items()));
            return w;
        }, w -> {
            if (ws != w0) return;
            MapLayers l = map.layers();
            for (int i = w0.context().size(); i < w.context().size(); i++) l = l.withContext(w.context().get(i).name(), i);
            ws = w;
            map.replaceWorkspace(w, l);
            layers.refresh();
            status("Added " + (w.context().size() - w0.context().size()) + " context layer(s) from " + f.getFileName());
        }, t -> failed("Cannot add layers from " + f.getFileName(), t)));
    }

    private JFileChooser chooser(String key) {
        String dir = prefs.get(key, null);
        return dir == null ? new JFileChooser() : new JFileChooser(dir);
    }

    private void remember(String key, JFileChooser fc) {
        if (fc.getSelectedFile() != null && fc.getSelectedFile().getParentFile() != null) {
            prefs.put(key, fc.getSelectedFile().getParentFile().getPath());
        }
    }

    // ---- saving and closing ----

    /** Saves the plan to its file (asks for one when new); returns false when not saved. */
    boolean savePlan() {
        if (!plan.hasPlan()) return true;
        Path f = plan.file();
        if (f == null) {
            JFileChooser fc = chooser("lastPlanDir");
            fc.setDialogTitle("Save work plan");
            if (fc.showSaveDialog(this) != JFileChooser.APPROVE_OPTION) return false;
            remember("lastPlanDir", fc);
            f = fc.getSelectedFile().toPath();
            if (!f.getFileName().toString().contains(".")) f = f.resolveSibling(f.getFileName() + ".yaml");
        }
        try {
            PlanWriter.write(plan.plan(), f);
            plan.saved(f);
            status("Saved " + f);
            if (ws != null) addRecent(ws.file(), f);
            return true;
        } catch (IOException e) {
            failed("Cannot save " + f, e);
            return false;
        }
    }

    private boolean confirmDiscard() {
        if (!plan.isDirty()) return true;
        int a = discardPrompt.getAsInt();
        if (a == JOptionPane.YES_OPTION) return savePlan();
        return a == JOptionPane.NO_OPTION;
    }

    void setDiscardPrompt(java.util.function.IntSupplier prompt) {
        discardPrompt = prompt;
    }

    /** Asks about unsaved changes, saves the layout and closes. */
    void closeWindow() {
        if (!confirmDiscard()) return;
        for (Task<?> t : tasks) t.cancel();
        saveLayout();
        dispose();
    }

    // ---- layout and recent files ----

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
        dark.setSelected(prefs.getBoolean("dark", false));
        refreshRecent();
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
        prefs.putBoolean("dark", dark.isSelected());
    }

    private void addRecent(Path network, Path planFile) {
        String entry = network.toAbsolutePath() + (planFile == null ? "" : "\n" + planFile.toAbsolutePath());
        List<String> list = new ArrayList<>(recentList());
        list.remove(entry);
        list.add(0, entry);
        while (list.size() > RECENT_MAX) list.remove(list.size() - 1);
        for (int i = 0; i < RECENT_MAX; i++) {
            if (i < list.size()) prefs.put("recent" + i, list.get(i));
            else prefs.remove("recent" + i);
        }
        refreshRecent();
    }

    List<String> recentList() {
        List<String> l = new ArrayList<>();
        for (int i = 0; i < RECENT_MAX; i++) {
            String s = prefs.get("recent" + i, null);
            if (s != null) l.add(s);
        }
        return l;
    }

    private void refreshRecent() {
        recent.removeAll();
        for (String r : recentList()) {
            String[] parts = r.split("\n");
            Path n = Path.of(parts[0]);
            Path p = parts.length > 1 ? Path.of(parts[1]) : null;
            JMenuItem mi = new JMenuItem(n.getFileName() + (p == null ? "" : " + " + p.getFileName()));
            mi.addActionListener(e -> open(n, p));
            recent.add(mi);
        }
        recent.setEnabled(recent.getItemCount() > 0);
    }

    // ---- menus, toolbar, status ----

    private JMenuBar menus() {
        JMenuBar mb = new JMenuBar();
        JMenu file = new JMenu("File");
        file.add(item("Open network...", KeyEvent.VK_O, e -> chooseNetwork()));
        file.add(item("Open network with field mapping...", 0, e -> chooseNetworkWithMapping()));
        file.add(item("Open work plan...", KeyEvent.VK_P, e -> choosePlan()));
        file.add(item("New work plan", 0, e -> {
            if (confirmDiscard()) {
                plan.newPlan();
                tabs.setSelectedComponent(plan);
            }
        }));
        file.add(item("Add context layer...", KeyEvent.VK_L, e -> addContextLayer()));
        file.add(recent);
        file.addSeparator();
        file.add(item("Save work plan", KeyEvent.VK_S, e -> savePlan()));
        file.add(item("Export selected step...", 0, e -> exportStep()));
        file.addSeparator();
        file.add(item("Quit", KeyEvent.VK_Q, e -> closeWindow()));
        JMenu view = new JMenu("View");
        view.add(item("Zoom to extent", KeyEvent.VK_0, e -> map.zoomToExtent()));
        view.add(item("Zoom in", KeyEvent.VK_EQUALS, e -> map.zoomIn()));
        view.add(item("Zoom out", KeyEvent.VK_MINUS, e -> map.zoomOut()));
        view.add(item("Zoom to selection", KeyEvent.VK_E, e -> zoomToSelection()));
        view.addSeparator();
        dark.setAccelerator(KeyStroke.getKeyStroke(KeyEvent.VK_D, menuMask() | java.awt.event.InputEvent.SHIFT_DOWN_MASK));
        dark.addActionListener(e -> setDark(dark.isSelected()));
        view.add(dark);
        JMenu tools = new JMenu("Tools");
        tools.add(item("Identify (click a feature)", KeyEvent.VK_I, e -> {
            incident.setPicking(false);
            status("Identify: click a feature on the map; shift-drag to select by rectangle");
        }));
        tools.add(item("Incident at a point", KeyEvent.VK_K, e -> {
            incident.setPicking(true);
            tabs.setSelectedComponent(incident);
            status("Incident: click a main on the map");
        }));
        tools.add(item("Find...", KeyEvent.VK_F, e -> search.requestFocusInWindow()));
        JMenu planMenu = new JMenu("Plan");
        // Alt+Down / Alt+Up: F6/F8 belong to the split panes and Ctrl+Page Up/Down to the tabs
        planMenu.add(keyItem("Next step", KeyStroke.getKeyStroke(KeyEvent.VK_DOWN, java.awt.event.InputEvent.ALT_DOWN_MASK), e -> stepBy(1)));
        planMenu.add(keyItem("Previous step", KeyStroke.getKeyStroke(KeyEvent.VK_UP, java.awt.event.InputEvent.ALT_DOWN_MASK), e -> stepBy(-1)));
        JMenu help = new JMenu("Help");
        help.add(item("About Shutline", 0, e -> about()));
        mb.add(file);
        mb.add(view);
        mb.add(tools);
        mb.add(planMenu);
        mb.add(help);
        return mb;
    }

    private static int menuMask() {
        return GraphicsSafe.menuMask();
    }

    private JMenuItem item(String text, int key, java.util.function.Consumer<ActionEvent> a) {
        return keyItem(text, key == 0 ? null : KeyStroke.getKeyStroke(key, menuMask()), a);
    }

    private JMenuItem keyItem(String text, KeyStroke ks, java.util.function.Consumer<ActionEvent> a) {
        Action act = new AbstractAction(text) {
            @Override public void actionPerformed(ActionEvent e) {
                a.accept(e);
            }
        };
        JMenuItem mi = new JMenuItem(act);
        if (ks != null) mi.setAccelerator(ks);
        return mi;
    }

    void stepBy(int d) {
        if (!plan.hasPlan()) return;
        tabs.setSelectedComponent(plan);
        int i = plan.selectedStep() + d;
        plan.selectStep(Math.max(0, Math.min(plan.stepCount() - 1, i)));
    }

    void setDark(boolean on) {
        if (on) FlatDarkLaf.setup();
        else FlatLightLaf.setup();
        FlatLaf.updateUI();
        map.setStyle(on ? MapStyle.DARK : MapStyle.LIGHT);
        pushHighlights();
        prefs.putBoolean("dark", on);
        layers.refresh();
    }

    private void about() {
        String text = "Shutline 0.1.0\nGas distribution outage zoning: network check, feed trace, valve isolation, work plans, maps.\n\n"
                + Caution.TEXT + (critical ? "\n\nThe open work plan raises CRITICAL hazards: see the Work plan panel." : "");
        JTextArea a = new JTextArea(text, 10, 50);
        a.setLineWrap(true);
        a.setWrapStyleWord(true);
        a.setEditable(false);
        JOptionPane.showMessageDialog(this, new JScrollPane(a), "About Shutline", JOptionPane.INFORMATION_MESSAGE);
    }

    private JToolBar toolbar() {
        JToolBar tb = new JToolBar();
        tb.setFloatable(false);
        tb.add(button("Extent", map::zoomToExtent));
        tb.add(button("In", map::zoomIn));
        tb.add(button("Out", map::zoomOut));
        tb.add(button("Selection", this::zoomToSelection));
        tb.addSeparator();
        tb.add(button("Previous step", () -> stepBy(-1)));
        tb.add(button("Next step", () -> stepBy(1)));
        tb.addSeparator();
        tb.add(new JLabel(" Find id or address: "));
        search.setMaximumSize(search.getPreferredSize());
        search.setName("search");
        search.addActionListener(e -> find(search.getText()));
        tb.add(search);
        return tb;
    }

    private static JButton button(String text, Runnable r) {
        JButton b = new JButton(text);
        b.setFocusable(false);
        b.addActionListener(e -> r.run());
        return b;
    }

    private JPanel statusBar() {
        JPanel p = new JPanel(new BorderLayout(8, 0));
        JPanel east = new JPanel(new FlowLayout(FlowLayout.RIGHT, 8, 0));
        coords.setName("coords");
        grid.setName("gridRef");
        caution.setName("caution");
        east.add(coords);
        east.add(grid);
        bar.setPreferredSize(new Dimension(180, 16));
        bar.setVisible(false);
        cancel.setVisible(false);
        cancel.addActionListener(e -> {
            for (Task<?> t : tasks) t.cancel();
        });
        east.add(bar);
        east.add(cancel);
        message.setName("message");
        p.add(message, BorderLayout.CENTER);
        p.add(east, BorderLayout.EAST);
        p.add(caution, BorderLayout.SOUTH);
        p.setBorder(javax.swing.BorderFactory.createEmptyBorder(2, 6, 2, 6));
        return p;
    }

    // ---- identify, select, search ----

    /** Searches in a worker (a large network has hundreds of thousands of addresses), then selects and zooms. */
    void find(String text) {
        if (ws == null) return;
        Workspace w0 = ws;
        run(new Task<>("find " + text, p -> Identify.search(w0, text), found -> {
            if (ws != w0) return;
            showFound(text, found);
        }, t -> failed("Find", t)));
    }

    /** Searches on the calling thread (tests, small networks) and shows the result. */
    void findNow(String text) {
        if (ws != null) showFound(text, Identify.search(ws, text));
    }

    private void showFound(String text, List<Pick> found) {
        if (found.isEmpty()) {
            status("Nothing found for '" + text + "'");
            return;
        }
        select(found.get(0), found);
        zoomToSelection();
        status(found.size() + " found for '" + text + "'" + (found.size() > 1 ? "; showing " + found.get(0).label() : ""));
    }

    void select(Pick first, List<Pick> all) {
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

    void zoomToSelection() {
        Envelope e = new Envelope();
        for (Geometry g : selection) e.expandToInclude(g.getEnvelopeInternal());
        if (!e.isNull()) map.zoomTo(e, 80);
    }

    private final class MapListener implements MapView.Listener {
        @Override public void clicked(double x, double y, double tol, MouseEvent e) {
            if (ws == null) return;
            if (incident.picking()) {
                incident.at(x, y);
                return;
            }
            Pick p = Identify.at(ws, x, y, tol);
            if (p == null) {
                select(null, List.of());
                status(String.format(Locale.ROOT, "Nothing here (%.1f, %.1f)", x, y));
            } else {
                select(p, List.of(p));
                status(p.label());
            }
        }

        @Override public void rectangle(Envelope env) {
            if (ws == null) return;
            Workspace w0 = ws;
            run(new Task<>("select", p -> Identify.in(w0, env), in -> {
                if (ws != w0) return;
                select(in.isEmpty() ? null : in.get(0), in);
                status(in.size() + " features selected");
            }, t -> failed("Select", t)));
        }

        @Override public void cursor(double x, double y) {
            if (ws == null) return;
            coords.setText(String.format(Locale.ROOT, "E %.1f  N %.1f", x, y));
            ws.geo().ifPresent(g -> {
                try {
                    GridReference r = g.gridReference(x, y);
                    grid.setText(r == null ? " " : r.format(GridReference.Precision.M1));
                } catch (IllegalArgumentException ex) {
                    grid.setText("outside the grid");
                }
            });
        }
    }

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
