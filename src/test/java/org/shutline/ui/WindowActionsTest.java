package org.shutline.ui;

import org.shutline.app.Workspace;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.prefs.Preferences;
import javax.swing.JComponent;
import javax.swing.SwingUtilities;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Geometry;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.io.FieldMapping;
import org.shutline.io.NetworkReader;
import org.shutline.model.Finding;
import org.shutline.model.Progress;
import org.shutline.render.MapOverlays;
import org.shutline.topology.NetworkBuilder;
import org.shutline.trace.NetworkState;

/**
 * The window's actions without a window (headless): each is driven through a
 * {@link WindowContext} and a {@link FileAsk} that answer as a user would, and checked
 * for what it hands on. The sample's read errors that a mapping removes (the status word
 * 'actve' on M-N-0001, V-OFF 5 m off its main) are listed in sample-gis/README.md.
 */
class WindowActionsTest {
    @TempDir Path dir;
    private Preferences prefs;

    @BeforeEach
    void prefs() {
        prefs = Preferences.userRoot().node("org/shutline/test/window-actions-" + System.nanoTime());
    }

    @AfterEach
    void dropPrefs() throws Exception {
        prefs.removeNode();
    }

    @Test
    void openWithMappingHandsTheMappingToTheWorkspaceLoad() throws Exception {
        Path mapping = mappingFile();
        Answers ask = new Answers(SampleWorkspace.NETWORK, mapping);
        Context ctx = new Context(true);
        AtomicReference<Workspace> loaded = new AtomicReference<>();
        AtomicReference<Path> loadedFrom = new AtomicReference<>();
        CountDownLatch done = new CountDownLatch(1);
        NetworkOpener opener = new NetworkOpener(ctx, () -> true, (w, network, plan, planFile) -> {
            loaded.set(w);
            loadedFrom.set(network);
            done.countDown();
        });
        SwingUtilities.invokeAndWait(() -> new OpenWithMappingAction(ask, opener).actionPerformed(null));
        assertThat(done.await(60, TimeUnit.SECONDS)).as("network loaded; failure: %s", ctx.failure).isTrue();

        // asked first for the network (a file or a folder), then for a YAML mapping file, each in its own remembered folder
        assertThat(ask.asked).containsExactly("lastNetworkDir OPEN_FILE_OR_FOLDER", "lastMappingDir OPEN_FILE [yaml, yml]");
        // the load ran in a background task, not on the event thread
        assertThat(ctx.tasks).hasSize(1);
        assertThat(ctx.tasks.get(0).name()).isEqualTo("open tallowmere.gpkg");
        assertThat(ctx.messages.get(0)).contains("with mapping mapping.yaml");
        // the workspace was read through the mapping, with its tolerances: the findings of `check --mapping`
        Workspace w = loaded.get();
        assertThat(loadedFrom.get()).isEqualTo(SampleWorkspace.NETWORK);
        assertThat(w.mapping()).isEqualTo(mapping);
        assertThat(codes(w.findings())).doesNotContain("unknown-value", "valve-off-main");
        FieldMapping m = FieldMapping.load(mapping);
        var cli = NetworkBuilder.build(NetworkReader.read(SampleWorkspace.NETWORK, m), m.tolerances(), Progress.NONE);
        assertThat(w.findings().stream().map(Finding::message).toList())
                .isEqualTo(cli.findings().stream().map(Finding::message).toList());
    }

    @Test
    void openNetworkReadsWithOurOwnNames() throws Exception {
        Context ctx = new Context(true);
        AtomicReference<Workspace> loaded = new AtomicReference<>();
        CountDownLatch done = new CountDownLatch(1);
        NetworkOpener opener = new NetworkOpener(ctx, () -> true, (w, network, plan, planFile) -> {
            loaded.set(w);
            done.countDown();
        });
        Answers ask = new Answers(SampleWorkspace.NETWORK);
        SwingUtilities.invokeAndWait(() -> new OpenNetworkAction(ask, opener).actionPerformed(null));
        assertThat(done.await(60, TimeUnit.SECONDS)).as("network loaded; failure: %s", ctx.failure).isTrue();
        assertThat(ask.asked).containsExactly("lastNetworkDir OPEN_FILE_OR_FOLDER");
        assertThat(loaded.get().mapping()).isNull();
        // without the mapping the sample's flaws stay errors
        assertThat(codes(loaded.get().findings())).contains("unknown-value", "valve-off-main");
    }

    @Test
    void cancellingEitherQuestionOrKeepingUnsavedChangesOpensNothing() throws Exception {
        Context ctx = new Context(false);
        NetworkOpener opener = new NetworkOpener(ctx, () -> true, (w, n, p, f) -> { });
        SwingUtilities.invokeAndWait(() -> {
            new OpenWithMappingAction(new Answers(SampleWorkspace.NETWORK, null), opener).actionPerformed(null);
            new OpenWithMappingAction(new Answers((Path) null), opener).actionPerformed(null);
            new OpenNetworkAction(new Answers((Path) null), opener).actionPerformed(null);
        });
        assertThat(ctx.tasks).isEmpty();
        // the user answered Cancel to "save the plan's changes?": nothing is read
        NetworkOpener refused = new NetworkOpener(ctx, () -> false, (w, n, p, f) -> { });
        SwingUtilities.invokeAndWait(() -> new OpenWithMappingAction(new Answers(SampleWorkspace.NETWORK, mappingFileUnchecked()), refused)
                .actionPerformed(null));
        assertThat(ctx.tasks).isEmpty();
        assertThat(ctx.messages).isEmpty();
    }

    @Test
    void recentFilesKeepTheSixNewestPairsAndReopenThem() throws Exception {
        Context ctx = new Context(false);
        RecentFiles recent = new RecentFiles(prefs, new NetworkOpener(ctx, () -> true, (w, n, p, f) -> { }));
        assertThat(recent.menu().isEnabled()).isFalse();
        for (int i = 0; i < 8; i++) recent.add(dir.resolve("n" + i + ".gpkg"), i % 2 == 0 ? null : dir.resolve("p" + i + ".yaml"));
        recent.add(dir.resolve("n4.gpkg"), null);
        List<String> l = recent.list();
        assertThat(l).hasSize(RecentFiles.MAX);
        // n4 again moves to the front; n0 and n1 fell off the end
        assertThat(l.get(0)).isEqualTo(dir.resolve("n4.gpkg").toAbsolutePath().toString());
        assertThat(l.get(1)).isEqualTo(dir.resolve("n7.gpkg").toAbsolutePath() + "\n" + dir.resolve("p7.yaml").toAbsolutePath());
        assertThat(String.join(" ", l)).doesNotContain("n0.gpkg", "n1.gpkg");
        assertThat(recent.menu().getItemCount()).isEqualTo(RecentFiles.MAX);
        assertThat(recent.menu().getItem(1).getText()).isEqualTo("n7.gpkg + p7.yaml");
        // a fresh list over the same preferences reads the same entries; choosing one opens it in a task
        RecentFiles again = new RecentFiles(prefs, new NetworkOpener(ctx, () -> true, (w, n, p, f) -> { }));
        assertThat(again.list()).isEqualTo(l);
        SwingUtilities.invokeAndWait(() -> again.menu().getItem(1).doClick(0));
        assertThat(ctx.tasks).extracting(Task::name).containsExactly("open n7.gpkg");
    }

    @Test
    void findSelectsWhatItFindsAndZoomsToIt() throws Exception {
        Context ctx = new Context(false);
        ctx.ws = SampleWorkspace.get();
        FindAction find = new FindAction(ctx);
        SwingUtilities.invokeAndWait(() -> find.findNow("v-off"));
        assertThat(ctx.selected.id()).isEqualTo("V-OFF");
        assertThat(ctx.selected.kind()).isEqualTo(Pick.Kind.VALVE);
        assertThat(ctx.zooms).isEqualTo(1);
        assertThat(ctx.messages).last().asString().startsWith("1 found for 'v-off'");
        SwingUtilities.invokeAndWait(() -> find.findNow("no-such-feature-xyz"));
        assertThat(ctx.messages).last().isEqualTo("Nothing found for 'no-such-feature-xyz'");
        assertThat(ctx.zooms).as("no zoom when nothing is found").isEqualTo(1);
        // Enter in the find field searches in a background task
        SwingUtilities.invokeAndWait(() -> {
            find.field().setText("V-001");
            find.field().postActionEvent();
        });
        assertThat(ctx.tasks).extracting(Task::name).containsExactly("find V-001");
    }

    @Test
    void theDarkThemeCheckBoxSwitchesTheMapStyleAndIsRemembered() throws Exception {
        javax.swing.LookAndFeel before = javax.swing.UIManager.getLookAndFeel();
        try {
            Context ctx = new Context(false);
            ctx.map = new MapView();
            int[] restyled = {0};
            ThemeAction theme = new ThemeAction(ctx, prefs, () -> restyled[0]++);
            javax.swing.JCheckBoxMenuItem item = new javax.swing.JCheckBoxMenuItem(theme);
            assertThat(item.isSelected()).isFalse();
            assertThat(item.getAccelerator()).isEqualTo(javax.swing.KeyStroke.getKeyStroke(java.awt.event.KeyEvent.VK_D,
                    java.awt.event.InputEvent.CTRL_DOWN_MASK | java.awt.event.InputEvent.SHIFT_DOWN_MASK));
            SwingUtilities.invokeAndWait(() -> item.doClick(0));
            assertThat(theme.dark()).isTrue();
            assertThat(ctx.map.style()).isEqualTo(org.shutline.render.MapStyle.DARK);
            assertThat(prefs.getBoolean("dark", false)).isTrue();
            assertThat(restyled[0]).isEqualTo(1);
            // a new window starts dark; switching from code moves the check box too
            ThemeAction next = new ThemeAction(ctx, prefs, () -> restyled[0]++);
            javax.swing.JCheckBoxMenuItem nextItem = new javax.swing.JCheckBoxMenuItem(next);
            assertThat(nextItem.isSelected()).isTrue();
            SwingUtilities.invokeAndWait(() -> next.apply(false));
            assertThat(nextItem.isSelected()).isFalse();
            assertThat(ctx.map.style()).isEqualTo(org.shutline.render.MapStyle.LIGHT);
            assertThat(prefs.getBoolean("dark", true)).isFalse();
        } finally {
            javax.swing.UIManager.setLookAndFeel(before);
        }
    }

    @Test
    void saveAsksForAFileForANewPlanWritesItAndTheDiscardQuestionFollowsTheAnswer() throws Exception {
        Context ctx = new Context(false);
        ctx.ws = SampleWorkspace.get();
        AtomicReference<PlanPanel> plan = new AtomicReference<>();
        AtomicReference<SavePlanAction> save = new AtomicReference<>();
        RecentFiles recent = new RecentFiles(prefs, new NetworkOpener(ctx, () -> true, (w, n, p, f) -> { }));
        Answers ask = new Answers(dir.resolve("valve-test"), null);
        SwingUtilities.invokeAndWait(() -> {
            plan.set(new PlanPanel(ctx, () -> save.get().save()));
            save.set(new SavePlanAction(ctx, ask, plan.get(), recent, null));
            // a new plan with one step: close the valve picked on the map
            int v = ctx.ws.valveIndex("V-001");
            ctx.selected = new Pick(Pick.Kind.VALVE, ctx.ws.network().valves().get(v), v);
            plan.get().addForSelection("close");
        });
        assertThat(plan.get().isDirty()).isTrue();
        // the user cancels Save / Discard / Cancel: the plan may not be replaced, nothing written
        save.get().setDiscardPrompt(() -> javax.swing.JOptionPane.CANCEL_OPTION);
        assertThat(onEdt(() -> save.get().mayDiscard())).isFalse();
        // Yes: saved, asking for a file (the plan is new); ".yaml" is added to a name without one
        save.get().setDiscardPrompt(() -> javax.swing.JOptionPane.YES_OPTION);
        assertThat(onEdt(() -> save.get().mayDiscard())).isTrue();
        Path written = dir.resolve("valve-test.yaml");
        assertThat(ask.asked).containsExactly("lastPlanDir SAVE_FILE");
        assertThat(written).exists();
        assertThat(plan.get().isDirty()).isFalse();
        assertThat(plan.get().file()).isEqualTo(written);
        var back = org.shutline.plan.PlanReader.read(written);
        assertThat(back.steps()).hasSize(1);
        assertThat(back.steps().get(0).action()).isEqualTo(new org.shutline.plan.StepAction.CloseValves(List.of("V-001"), true));
        assertThat(recent.list()).containsExactly(SampleWorkspace.NETWORK.toAbsolutePath() + "\n" + written.toAbsolutePath());
        assertThat(ctx.messages).last().isEqualTo("Saved " + written);
        // no unsaved changes: no question at all
        save.get().setDiscardPrompt(() -> {
            throw new AssertionError("asked although nothing changed");
        });
        assertThat(onEdt(() -> save.get().mayDiscard())).isTrue();
    }

    private static <T> T onEdt(java.util.concurrent.Callable<T> c) throws Exception {
        AtomicReference<T> r = new AtomicReference<>();
        AtomicReference<Exception> e = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            try {
                r.set(c.call());
            } catch (Exception x) {
                e.set(x);
            }
        });
        if (e.get() != null) throw e.get();
        return r.get();
    }

    private Path mappingFile() throws Exception {
        Path mapping = dir.resolve("mapping.yaml");
        Files.writeString(mapping, """
                layers:
                  mains:
                    values:
                      status: { actve: active }
                tolerances: { point_m: 6 }
                """);
        return mapping;
    }

    private Path mappingFileUnchecked() {
        try {
            return mappingFile();
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    private static List<String> codes(List<Finding> fs) {
        return fs.stream().map(Finding::code).distinct().toList();
    }

    /** Answers the file questions in order (null: the user cancels) and records what was asked. */
    private static final class Answers implements FileAsk {
        final Deque<Path> answers = new ArrayDeque<>();
        final List<String> asked = new ArrayList<>();

        Answers(Path... answers) {
            for (Path p : answers) this.answers.add(p == null ? NONE : p);
        }

        private static final Path NONE = Path.of("/cancelled");

        @Override public Path ask(String folderKey, String title, Mode mode, FileNameExtensionFilter filter) {
            asked.add(folderKey + " " + mode + (filter == null ? "" : " " + List.of(filter.getExtensions())));
            Path p = answers.poll();
            return p == null || p == NONE ? null : p;
        }
    }

    /** The window as the actions see it: records tasks, messages, the selection and zooms. */
    private static final class Context implements WindowContext {
        final boolean execute;
        final List<Task<?>> tasks = new ArrayList<>();
        final List<String> messages = new ArrayList<>();
        volatile Throwable failure;
        Workspace ws;
        MapView map;
        Pick selected;
        int zooms;

        /** @param execute whether to run the tasks handed over (else only record them) */
        Context(boolean execute) {
            this.execute = execute;
        }

        @Override public Workspace workspace() { return ws; }
        @Override public MapView map() {
            assertThat(map).as("the map is used in this test").isNotNull();
            return map;
        }
        @Override public Pick selected() { return selected; }
        @Override public void status(String text) { messages.add(text); }

        @Override public void run(Task<?> task) {
            assertThat(SwingUtilities.isEventDispatchThread()).as("tasks are started from the event thread").isTrue();
            tasks.add(task);
            if (execute) task.execute();
        }

        @Override public void failed(String what, Throwable t) {
            failure = t;
            messages.add(what + ": " + t.getMessage());
        }

        @Override public void select(Pick first, List<Pick> all) { selected = first; }
        @Override public void zoomToSelection() { zooms++; }
        @Override public void zoomToPoint(double x, double y, String text) { zooms++; }
        @Override public void showPanelMarks(MapOverlays o, List<Geometry> highlight, NetworkState state) { }
        @Override public void showPanel(JComponent panel) { }
        @Override public void planEvaluated(PlanEvaluation.Result result) { }
    }
}
