package org.shutline.ui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.Component;
import java.awt.Container;
import java.awt.EventQueue;
import java.awt.GraphicsEnvironment;
import java.awt.Point;
import java.awt.Robot;
import java.awt.event.InputEvent;
import java.awt.geom.Point2D;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
import java.util.prefs.Preferences;
import javax.imageio.ImageIO;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JTextArea;
import javax.swing.ListModel;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;

/**
 * The real window on a display (run under {@code xvfb-run -a mvn -B verify -Pdisplay}):
 * opens the sample network with the Elder Street test plan, selects the step that
 * abandons the cast-iron main, and checks what the work-plan panel and the status line
 * show; clicks a valve with java.awt.Robot and checks the feature facts; the event-thread
 * watch must have seen no dispatch over its threshold while the test drove the window.
 * Skipped (visibly) when headless. With {@code -Dshutline.screenshot=PATH} it also
 * writes the window with the hazard step selected to PATH.
 */
@Tag("display")
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class MainWindowDisplayTest {
    private static MainWindow win;
    private static EdtWatch watch;
    /** A dispatch this long means work on the event thread, not a busy machine. */
    static final double BLOCKED_MS = 750;
    private static String prefsNode;
    private static Path planCopy;

    @BeforeEach
    void open() throws Exception {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: window tests skipped (run them under xvfb-run -a with -Pdisplay)");
        if (win != null) return;
        prefsNode = "org/shutline/uitest-" + ProcessHandle.current().pid();
        System.setProperty("shutline.prefs", prefsNode);
        watch = EdtWatch.install(EdtWatch.thresholdFromProperty(), true);
        // the window saves the plan it edits: give it a copy, never the test resource
        Path dir = java.nio.file.Files.createTempDirectory("shutline-window-test");
        planCopy = dir.resolve("elder-street-plan.yaml");
        java.nio.file.Files.copy(SampleWorkspace.PLAN, planCopy);
        win = MainWindow.showOn(SampleWorkspace.NETWORK, planCopy);
        EventQueue.invokeAndWait(() -> {
            win.setBounds(0, 0, 1600, 1000);
            win.validate();
        });
        waitFor("plan evaluated", () -> win.planPanel().result() != null);
        waitFor("map drawn", () -> win.map().isSettled());
    }

    @AfterAll
    static void close() throws Exception {
        if (win != null) EventQueue.invokeAndWait(() -> win.dispose());
        if (prefsNode != null) Preferences.userRoot().node(prefsNode).removeNode();
    }

    @Test
    @Order(1)
    void theHazardStepShowsServicesOffTheHazardAndTheCaution() throws Exception {
        // warm-up: class loading, JIT and the first paint of each step (as after a minute of use);
        // from then on the event thread must stay responsive
        for (int i = 0; i < 3; i++) {
            int k = i;
            onEdt(() -> {
                win.planPanel().selectStep(k);
                return null;
            });
            waitFor("map drawn", () -> win.map().isSettled());
            Thread.sleep(200);
        }
        watch.reset();
        onEdt(() -> {
            win.planPanel().selectStep(2);
            return null;
        });
        waitFor("map drawn", () -> win.map().isSettled());
        String summary = onEdt(() -> ((JLabel) find(win, "planSummary")).getText());
        // abandoning M-CI-01 without transferring its services takes off exactly the services attached to it
        var ws = win.workspace();
        int ci = ws.mainIndex("M-CI-01");
        int attached = 0;
        long meters = 0;
        for (int s = 0; s < ws.base().serviceCount(); s++) {
            int e = ws.base().serviceEdge(s);
            if (e >= 0 && ws.base().edgeFeature(e) == ci) {
                attached++;
                meters += ws.network().services().get(s).meters();
            }
        }
        assertThat(attached).isPositive();
        assertThat(summary).contains("Step 3: " + attached + " services off, " + meters + " meters off, 1 critical customer off");
        List<String> hazards = onEdt(() -> ((FindingTable) find(win, "planHazards")).rowTexts());
        assertThat(hazards).anyMatch(h -> h.startsWith("critical | tap-on-dead-main") && h.contains("T-S1-W"));
        // the window's one list of findings holds the plan's hazards beside the network's data findings
        assertThat(onEdt(() -> ((FindingTable) find(win, "findingsTable")).rowTexts()))
                .anyMatch(h -> h.startsWith("critical | tap-on-dead-main | 3 |") && h.contains("T-S1-W"));
        assertThat(onEdt(() -> win.cautionText())).startsWith("CRITICAL hazards in this plan.");
        assertThat(onEdt(() -> win.map().overlays().hazards())).anyMatch(h -> h.text().equals("tap-on-dead-main"));
        // next step with the keyboard shortcut's action: back to step 2, nothing off
        onEdt(() -> {
            win.stepBy(-1);
            return null;
        });
        assertThat(onEdt(() -> ((JLabel) find(win, "planSummary")).getText())).contains("Step 2: 0 services off");
        waitFor("map drawn", () -> win.map().isSettled());
        // The 100 ms target itself is measured with the watch's debug mode on a quiet machine (docs/ui.md);
        // a test on a shared CI machine asserts only that nothing blocks the event thread for long:
        // loading or evaluating on it would take seconds.
        assertThat(watch.longDispatches()).as("event-thread dispatches over %.0f ms (logged)", watch.thresholdMs())
                .allSatisfy(d -> assertThat(d.millis()).as(d.event()).isLessThan(BLOCKED_MS));
    }

    @Test
    @Order(2)
    void editingThePlanReEvaluatesShowsErrorsAndSavesARoundTrippingFile() throws Exception {
        // abandon M-CI-01 a second time, after step 3: the applier refuses, the error line says so
        onEdt(() -> {
            win.findNow("M-CI-01");
            win.planPanel().selectStep(2);
            win.planPanel().addForSelection("abandon");
            return null;
        });
        waitFor("error shown", () -> win.planPanel().errorText().startsWith("elder-street-plan.yaml:"));
        assertThat(onEdt(() -> win.planPanel().errorText())).contains("step 4");
        // remove it again; add a close step for an open valve instead: pick valve V-001 and add a close step
        onEdt(() -> {
            win.planPanel().removeStep();
            win.findNow("V-001");
            win.planPanel().selectStep(0);
            win.planPanel().addForSelection("close");
            return null;
        });
        waitFor("evaluated", () -> win.planPanel().result() != null && win.planPanel().result().steps().size() == 4);
        assertThat(onEdt(() -> win.planPanel().errorText())).isEmpty();
        assertThat(onEdt(() -> win.planPanel().isDirty())).isTrue();
        assertThat(onEdt(() -> win.savePlan())).isTrue();
        assertThat(onEdt(() -> win.planPanel().isDirty())).isFalse();
        var saved = org.shutline.plan.PlanReader.read(planCopy);
        assertThat(saved.steps()).extracting(st -> st.describe())
                .containsExactly("take station ST-N2 out of service", "close V-001", "return station ST-N2 to service", "abandon M-CI-01");
        assertThat(saved.steps().get(0).note()).isEqualTo("check the grid holds on ST-N1");
        // back to the plan as it was, for the other tests
        onEdt(() -> {
            win.planPanel().selectStep(1);
            win.planPanel().removeStep();
            return null;
        });
        waitFor("evaluated", () -> win.planPanel().result() != null && win.planPanel().result().steps().size() == 3);
    }

    @Test
    @Order(3)
    void clickingAValveWithTheMouseShowsItsFacts() throws Exception {
        Robot robot = new Robot();
        robot.setAutoDelay(30);
        var ws = win.workspace();
        var v = ws.network().valves().get(ws.valveIndex("V-039")).geometry();
        onEdt(() -> {
            win.map().zoomTo(new org.locationtech.jts.geom.Envelope(v.getX() - 80, v.getX() + 80, v.getY() - 80, v.getY() + 80), 160);
            return null;
        });
        waitFor("map drawn", () -> win.map().isSettled());
        Point onScreen = onEdt(() -> {
            Point2D p = win.map().viewport().screenOf(v.getX(), v.getY());
            Point base = win.map().getLocationOnScreen();
            return new Point(base.x + (int) Math.round(p.getX()), base.y + (int) Math.round(p.getY()));
        });
        robot.mouseMove(onScreen.x, onScreen.y);
        robot.mousePress(InputEvent.BUTTON1_DOWN_MASK);
        robot.mouseRelease(InputEvent.BUTTON1_DOWN_MASK);
        robot.waitForIdle();
        waitFor("facts shown", () -> ((JTextArea) find(win, "facts")).getText().startsWith("valve V-039"));
        String facts = onEdt(() -> ((JTextArea) find(win, "facts")).getText());
        assertThat(facts).contains("normal: closed", "valve segment #", "valves bounding it: ");
        assertThat(onEdt(() -> ((JLabel) find(win, "coords")).getText())).startsWith("E ");
        assertThat(onEdt(() -> ((JLabel) find(win, "gridRef")).getText())).startsWith("15T");
    }

    @Test
    @Order(5)
    void mouseDragPansWheelZoomsKeysStepAndTheThemeAndRecentFilesAreKept() throws Exception {
        Robot robot = new Robot();
        robot.setAutoDelay(20);
        onEdt(() -> {
            win.map().zoomToExtent();
            win.planPanel().selectStep(0);
            return null;
        });
        waitFor("map drawn", () -> win.map().isSettled());
        var before = onEdt(() -> win.map().viewport());
        Point c = onEdt(() -> {
            Point base = win.map().getLocationOnScreen();
            return new Point(base.x + win.map().getWidth() / 2, base.y + win.map().getHeight() / 2);
        });
        robot.mouseMove(c.x, c.y);
        robot.mousePress(InputEvent.BUTTON1_DOWN_MASK);
        for (int i = 1; i <= 10; i++) robot.mouseMove(c.x + 10 * i, c.y);
        robot.mouseRelease(InputEvent.BUTTON1_DOWN_MASK);
        robot.waitForIdle();
        var panned = onEdt(() -> win.map().viewport());
        // dragging 100 px to the right moves the content right: the centre goes 100 px west
        assertThat(panned.centerX()).isCloseTo(before.centerX() - 100 * before.scale(), org.assertj.core.data.Offset.offset(2 * before.scale()));
        assertThat(panned.scale()).isEqualTo(before.scale());
        robot.mouseWheel(-2);
        robot.waitForIdle();
        waitFor("zoomed", () -> win.map().viewport().scale() < panned.scale());
        assertThat(onEdt(() -> win.map().viewport().scale())).isCloseTo(panned.scale() / 1.5625, org.assertj.core.data.Offset.offset(panned.scale() * 0.01));
        onEdt(() -> {
            win.setDark(true);
            return null;
        });
        assertThat(onEdt(() -> win.map().style())).isEqualTo(org.shutline.render.MapStyle.DARK);
        assertThat(onEdt(() -> javax.swing.UIManager.getLookAndFeel().getName())).containsIgnoringCase("dark");
        onEdt(() -> {
            win.setDark(false);
            return null;
        });
        assertThat(onEdt(() -> win.recentList())).anyMatch(r -> r.startsWith(SampleWorkspace.NETWORK.toAbsolutePath().toString()));
    }

    @Test
    @Order(6)
    void functionKeysStepThroughThePlan() throws Exception {
        onEdt(() -> {
            win.toFront();
            win.map().requestFocusInWindow();
            win.planPanel().selectStep(0);
            return null;
        });
        long end = System.nanoTime() + 3_000_000_000L;
        while (!onEdt(() -> win.isFocused()) && System.nanoTime() < end) Thread.sleep(50);
        org.junit.jupiter.api.Assumptions.assumeTrue(onEdt(() -> win.isFocused()),
                "the window did not get the keyboard focus (no window manager on this display): key test skipped");
        Robot robot = new Robot();
        robot.setAutoDelay(20);
        key(robot, java.awt.event.KeyEvent.VK_DOWN);
        waitFor("next step (Alt+Down)", () -> win.planPanel().selectedStep() == 1);
        key(robot, java.awt.event.KeyEvent.VK_UP);
        waitFor("previous step (Alt+Up)", () -> win.planPanel().selectedStep() == 0);
        // Ctrl+0: zoom to the extent
        onEdt(() -> {
            win.map().zoomIn();
            return null;
        });
        var zoomedIn = onEdt(() -> win.map().viewport().scale());
        robot.keyPress(java.awt.event.KeyEvent.VK_CONTROL);
        robot.keyPress(java.awt.event.KeyEvent.VK_0);
        robot.keyRelease(java.awt.event.KeyEvent.VK_0);
        robot.keyRelease(java.awt.event.KeyEvent.VK_CONTROL);
        robot.waitForIdle();
        waitFor("zoom to extent (Ctrl+0)", () -> win.map().viewport().scale() > zoomedIn);
    }

    private static void key(Robot robot, int code) {
        robot.keyPress(java.awt.event.KeyEvent.VK_ALT);
        robot.keyPress(code);
        robot.keyRelease(code);
        robot.keyRelease(java.awt.event.KeyEvent.VK_ALT);
        robot.waitForIdle();
    }

    @Test
    @Order(6)
    void theMenusAndToolbarCarryTheActionsWithTheirKeys() throws Exception {
        // the menus as docs/ui.md lists them (Mouse and keys), each item an action class registered by the window
        List<String> menus = onEdt(() -> {
            List<String> l = new ArrayList<>();
            javax.swing.JMenuBar mb = win.getJMenuBar();
            for (int i = 0; i < mb.getMenuCount(); i++) {
                javax.swing.JMenu m = mb.getMenu(i);
                for (int k = 0; k < m.getItemCount(); k++) {
                    javax.swing.JMenuItem it = m.getItem(k);
                    if (it == null) continue;
                    javax.swing.KeyStroke ks = it.getAccelerator();
                    l.add(m.getText() + " > " + it.getText() + (ks == null ? "" : " [" + ks + "]"));
                }
            }
            return l;
        });
        assertThat(menus).containsExactly(
                "File > Open network... [ctrl pressed O]",
                "File > Open network with field mapping...",
                "File > Open work plan... [ctrl pressed P]",
                "File > New work plan",
                "File > Add context layer... [ctrl pressed L]",
                "File > Recent",
                "File > Save work plan [ctrl pressed S]",
                "File > Export selected step...",
                "File > Quit [ctrl pressed Q]",
                "View > Zoom to extent [ctrl pressed 0]",
                "View > Zoom in [ctrl pressed EQUALS]",
                "View > Zoom out [ctrl pressed MINUS]",
                "View > Zoom to selection [ctrl pressed E]",
                "View > Dark theme [shift ctrl pressed D]",
                "Tools > Identify (click a feature) [ctrl pressed I]",
                "Tools > Incident at a point [ctrl pressed K]",
                "Tools > Find... [ctrl pressed F]",
                "Plan > Next step [alt pressed DOWN]",
                "Plan > Previous step [alt pressed UP]",
                "Help > About Shutline");
        List<String> buttons = onEdt(() -> {
            List<String> l = new ArrayList<>();
            for (Component c : ((Container) win.getContentPane().getComponent(0)).getComponents()) {
                if (c instanceof javax.swing.JButton b) l.add(b.getText());
            }
            return l;
        });
        assertThat(buttons).containsExactly("Extent", "In", "Out", "Selection", "Previous step", "Next step");
        // choosing items: incident mode brings its panel forward, identify leaves it, next step moves the plan on
        onEdt(() -> {
            menuItem("Tools", "Incident at a point").doClick(0);
            return null;
        });
        assertThat(onEdt(() -> win.incidentPanel().picking())).isTrue();
        assertThat(onEdt(() -> win.tabs().getSelectedComponent())).isSameAs(win.incidentPanel());
        onEdt(() -> {
            menuItem("Tools", "Identify (click a feature)").doClick(0);
            win.planPanel().selectStep(0);
            menuItem("Plan", "Next step").doClick(0);
            return null;
        });
        assertThat(onEdt(() -> win.incidentPanel().picking())).isFalse();
        assertThat(onEdt(() -> win.planPanel().selectedStep())).isEqualTo(1);
        assertThat(onEdt(() -> win.tabs().getSelectedComponent())).isSameAs(win.planPanel());
    }

    private static javax.swing.JMenuItem menuItem(String menu, String item) {
        javax.swing.JMenuBar mb = win.getJMenuBar();
        for (int i = 0; i < mb.getMenuCount(); i++) {
            if (!mb.getMenu(i).getText().equals(menu)) continue;
            for (int k = 0; k < mb.getMenu(i).getItemCount(); k++) {
                javax.swing.JMenuItem it = mb.getMenu(i).getItem(k);
                if (it != null && it.getText().equals(item)) return it;
            }
        }
        throw new AssertionError("no menu item " + menu + " > " + item);
    }

    @Test
    @Order(7)
    void closingWithUnsavedChangesAsksAndSavesOnYes() throws Exception {
        Path copy = planCopy;
        var before = org.shutline.plan.PlanReader.read(copy);
        List<String> expected = before.steps().stream().skip(1).map(st -> st.describe()).toList();
        onEdt(() -> {
            win.planPanel().open(before, copy);
            return null;
        });
        waitFor("plan evaluated", () -> win.planPanel().result() != null && win.planPanel().result().steps().size() == before.steps().size());
        onEdt(() -> {
            win.planPanel().selectStep(0);
            win.planPanel().removeStep();
            return null;
        });
        assertThat(onEdt(() -> win.planPanel().isDirty())).isTrue();
        int[] asked = new int[1];
        onEdt(() -> {
            win.setDiscardPrompt(() -> {
                asked[0]++;
                return javax.swing.JOptionPane.CANCEL_OPTION;
            });
            win.closeWindow();
            return null;
        });
        assertThat(asked[0]).isEqualTo(1);
        assertThat(onEdt(() -> win.isDisplayable())).as("Cancel keeps the window open").isTrue();
        onEdt(() -> {
            win.setDiscardPrompt(() -> {
                asked[0]++;
                return javax.swing.JOptionPane.YES_OPTION;
            });
            win.closeWindow();
            return null;
        });
        assertThat(asked[0]).isEqualTo(2);
        assertThat(onEdt(() -> win.isDisplayable())).as("Yes saves and closes").isFalse();
        assertThat(org.shutline.plan.PlanReader.read(copy).steps()).extracting(st -> st.describe()).isEqualTo(expected);
        assertThat(expected).isNotEmpty();
        win = null;
    }

    @Test
    @Order(4)
    void theBundledSamplePlanShowsItsCriticalHazardStep() throws Exception {
        Path samplePlan = Path.of("sample-gis/tallowmere-plan.yaml");
        org.junit.jupiter.api.Assumptions.assumeTrue(java.nio.file.Files.exists(samplePlan), "no sample plan in sample-gis: skipped");
        Path copy = planCopy.resolveSibling("tallowmere-plan.yaml");
        java.nio.file.Files.copy(samplePlan, copy, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        var plan = org.shutline.plan.PlanReader.read(copy);
        onEdt(() -> {
            win.planPanel().open(plan, copy);
            return null;
        });
        waitFor("plan evaluated", () -> win.planPanel().result() != null && win.planPanel().result().steps().size() == plan.steps().size());
        int hazardStep = onEdt(() -> {
            var steps = win.planPanel().result().steps();
            for (int i = 0; i < steps.size(); i++) if (steps.get(i).hasCritical()) return i;
            return -1;
        });
        assertThat(hazardStep).as("the sample plan has a step with a critical hazard").isNotNegative();
        onEdt(() -> {
            win.planPanel().selectStep(hazardStep);
            win.findNow(win.planPanel().result().steps().get(hazardStep).hazards().stream()
                    .filter(h -> h.severity() == org.shutline.model.Severity.CRITICAL).findFirst().orElseThrow().features().get(0));
            return null;
        });
        List<String> hazards = onEdt(() -> ((FindingTable) find(win, "planHazards")).rowTexts());
        assertThat(hazards).anyMatch(h -> h.startsWith("critical | "));
        assertThat(onEdt(() -> win.cautionText())).startsWith("CRITICAL hazards in this plan.");
        // the File menu's export of the selected step writes the field package with the export command's code
        Path out = java.nio.file.Files.createTempDirectory("shutline-window-export");
        onEdt(() -> {
            win.exportStepTo(out);
            return null;
        });
        waitFor("step exported", () -> java.nio.file.Files.exists(out.resolve("customers.csv")));
        try (org.apache.pdfbox.pdmodel.PDDocument pdf = org.apache.pdfbox.Loader.loadPDF(out.resolve("report.pdf").toFile())) {
            String text = new org.apache.pdfbox.text.PDFTextStripper().getText(pdf);
            assertThat(text).contains("Step " + (hazardStep + 1)).contains("tap-on-dead-main").contains("CAUTION");
        }
        if (System.getProperty("shutline.screenshot") != null) {
            // the picture for docs/screenshot-main.png: the work area in view around the first critical hazard
            onEdt(() -> {
                var h = win.planPanel().result().steps().get(hazardStep).hazards().stream()
                        .filter(x -> x.severity() == org.shutline.model.Severity.CRITICAL).findFirst().orElseThrow();
                win.map().zoomTo(new org.locationtech.jts.geom.Envelope(h.x() - 260, h.x() + 260, h.y() - 200, h.y() + 200), 400);
                return null;
            });
            waitFor("map drawn", () -> win.map().isSettled());
            Thread.sleep(300);
            screenshotIfAsked();
        }
    }

    @Test
    @Order(0)
    void anIncidentPickIsPlacedAnsweredAndRefusedFarAway() throws Exception {
        // the data errors of the network read are counted on the check tab (the same rule as every command)
        long errors = win.workspace().findings().stream().filter(f -> f.severity().compareTo(org.shutline.model.Severity.ERROR) >= 0).count();
        String title = onEdt(() -> win.tabs().getTitleAt(0));
        assertThat(title).isEqualTo(errors == 0 ? "Findings" : "Findings (" + org.shutline.model.Plural.of(errors, "data error") + ")");
        javax.swing.JTextArea text = (javax.swing.JTextArea) onEdt(() -> find(win, "incidentText"));
        onEdt(() -> {
            win.tabs().setSelectedComponent(win.incidentPanel());
            win.incidentPanel().at(512470, 4890150);
            return null;
        });
        waitFor("incident answered", () -> text.getText().contains("Services off"));
        String t = onEdt(() -> text.getText());
        // the same answer as `shutline incident --at 512470,4890150` (FieldOrderCommandsTest): placed, field order, fallback
        assertThat(t).contains("Placed on main").contains("1. V-015  crew 1").contains("if it will not close")
                .contains("Work packages (one per crew");
        waitFor("map drawn", () -> win.map().isSettled());
        if (System.getProperty("shutline.incidentScreenshot") != null) {
            onEdt(() -> {
                win.map().zoomTo(new org.locationtech.jts.geom.Envelope(512470 - 300, 512470 + 300, 4890150 - 220, 4890150 + 220), 400);
                return null;
            });
            waitFor("map drawn", () -> win.map().isSettled());
            Thread.sleep(300);
            screenshotTo(System.getProperty("shutline.incidentScreenshot"));
        }
        // 500 m east of the east-most main: refused with the distance, nothing isolated
        onEdt(() -> {
            win.incidentPanel().at(514003, 4890500);
            return null;
        });
        waitFor("far click refused", () -> text.getText().startsWith("Refused:"));
        assertThat(onEdt(() -> text.getText())).contains("500 m from the nearest active main");
    }

    private static void screenshotTo(String out) throws Exception {
        BufferedImage img = onEdt(() -> {
            BufferedImage b = new BufferedImage(win.getRootPane().getWidth(), win.getRootPane().getHeight(), BufferedImage.TYPE_INT_RGB);
            var g = b.createGraphics();
            win.getRootPane().paint(g);
            g.dispose();
            return b;
        });
        ImageIO.write(img, "png", Path.of(out).toFile());
    }

    private static void screenshotIfAsked() throws Exception {
        String out = System.getProperty("shutline.screenshot");
        if (out == null || out.isBlank()) return;
        screenshotTo(out);
    }

    private static Component find(Container c, String name) {
        for (Component k : c.getComponents()) {
            if (name.equals(k.getName())) return k;
            if (k instanceof Container kc) {
                Component f = find(kc, name);
                if (f != null) return f;
            }
        }
        return null;
    }

    private static List<String> items(ListModel<?> m) {
        List<String> l = new ArrayList<>();
        for (int i = 0; i < m.getSize(); i++) l.add(String.valueOf(m.getElementAt(i)));
        return l;
    }

    private static <T> T onEdt(Callable<T> c) throws Exception {
        AtomicReference<T> r = new AtomicReference<>();
        AtomicReference<Exception> e = new AtomicReference<>();
        EventQueue.invokeAndWait(() -> {
            try {
                r.set(c.call());
            } catch (Exception x) {
                e.set(x);
            }
        });
        if (e.get() != null) throw e.get();
        return r.get();
    }

    private static void waitFor(String what, Callable<Boolean> c) throws Exception {
        long end = System.nanoTime() + 60_000_000_000L;
        while (System.nanoTime() < end) {
            if (Boolean.TRUE.equals(onEdt(c))) return;
            Thread.sleep(50);
        }
        throw new AssertionError("timed out waiting: " + what);
    }
}
