package org.shutline;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The package layering of DEVELOPERS.md and docs/architecture.md, for every source file
 * of {@code src/main/java} including sub-packages ({@code io.sample},
 * {@code analysis.hazard}, which belong to their parent's layer): a package refers only
 * to packages above it in {@link #LAYERS}, and the engine ({@code model} to
 * {@code analysis}) refers to no Swing or AWT, and nothing below {@code ui} refers to Swing
 * ({@code render} draws with Java2D only). A reference is any
 * {@code org.shutline.<layer>} or {@code java.awt} / {@code javax.swing} name in the
 * code, whether in an import line (static or not) or written fully qualified inline;
 * comments and string literals are not code and are skipped.
 */
class LayeringTest {
    /** Lowest first. {@code app} (use cases shared by both front ends) may not exist yet in a tree; it is allowed all the same. */
    static final List<String> LAYERS = List.of("model", "io", "topology", "trace", "plan", "analysis", "render", "report", "app",
            "ui", "cli");
    /** The last layer that must stay free of Swing and AWT. */
    private static final int ENGINE_TOP = LAYERS.indexOf("analysis");
    /** The first layer that may use Swing. */
    private static final int SWING_FROM = LAYERS.indexOf("ui");
    private static final Path SRC = Path.of("src/main/java/org/shutline");
    private static final Pattern PACKAGE = Pattern.compile("^\\s*package\\s+org\\.shutline\\.([\\w.]+)\\s*;", Pattern.MULTILINE);
    private static final Pattern OURS = Pattern.compile("\\borg\\s*\\.\\s*shutline\\s*\\.\\s*(\\w+)");
    private static final Pattern GUI = Pattern.compile("\\b(java\\s*\\.\\s*awt|javax\\s*\\.\\s*swing)\\b");
    private static final Pattern SWING = Pattern.compile("\\bjavax\\s*\\.\\s*swing\\b");

    @Test
    void everyPackageRefersOnlyToLayersAboveItAndTheEngineHasNoSwingOrAwt() throws IOException {
        List<String> violations = new ArrayList<>();
        Set<String> packagesSeen = new TreeSet<>();
        int files = 0;
        try (Stream<Path> all = Files.walk(SRC)) {
            for (Path f : (Iterable<Path>) all.filter(p -> p.toString().endsWith(".java"))::iterator) {
                files++;
                String text = Files.readString(f);
                Matcher pm = PACKAGE.matcher(text);
                if (!pm.find()) {
                    violations.add(f + ": no org.shutline package declaration");
                    continue;
                }
                packagesSeen.add(pm.group(1));
                for (String v : violations(pm.group(1), text)) violations.add(f + ": " + v);
            }
        }
        assertThat(violations).isEmpty();
        // the walk reached the sub-packages and every layer that exists in this tree
        assertThat(packagesSeen).contains("io.sample", "analysis.hazard", "model", "io", "topology", "trace", "plan",
                "analysis", "render", "report", "ui", "cli");
        assertThat(files).isGreaterThan(200);
    }

    /** The checker itself on small sources: what it must catch and what it must let pass. */
    @Test
    void checkerCatchesImportsAndInlineNamesButNotCommentsOrStrings() {
        assertThat(violations("trace", "package org.shutline.trace;\nimport org.shutline.analysis.Isolation;\nclass A {}"))
                .singleElement().asString().contains("analysis");
        assertThat(violations("trace", "package org.shutline.trace;\nimport static org.shutline.cli.Main.run;\nclass A {}"))
                .singleElement().asString().contains("cli");
        assertThat(violations("analysis", "package org.shutline.analysis;\nclass A { Object o = new org.shutline.ui.MapView(); }"))
                .singleElement().asString().contains("ui");
        assertThat(violations("analysis.hazard", "package org.shutline.analysis.hazard;\nclass A { java.awt.Color c; }"))
                .singleElement().asString().contains("java.awt");
        assertThat(violations("io.sample", "package org.shutline.io.sample;\nclass A { javax.swing.JPanel p; }"))
                .singleElement().asString().contains("javax.swing");
        assertThat(violations("io.sample", "package org.shutline.io.sample;\nclass A { org.shutline.topology.Graph g; }"))
                .singleElement().asString().contains("topology");
        assertThat(violations("model", "package org.shutline.model;\nclass A { org.shutline.whatever.X x; }"))
                .singleElement().asString().contains("not in the layer list");
        // allowed: same or lower layers, the GUI above the engine, names in comments and strings
        assertThat(violations("analysis.hazard", "package org.shutline.analysis.hazard;\nimport org.shutline.analysis.Isolation;\n"
                + "import org.shutline.io.sample.SampleTown;\nclass A { org.shutline.trace.NetworkState s; }")).isEmpty();
        assertThat(violations("render", "package org.shutline.render;\nimport java.awt.Color;\nclass A { org.shutline.analysis.Zone z; }"))
                .isEmpty();
        assertThat(violations("render", "package org.shutline.render;\nimport javax.swing.JComponent;\nclass A {}"))
                .singleElement().asString().contains("only ui and cli");
        assertThat(violations("ui", "package org.shutline.ui;\nclass A { org.shutline.app.Session s; javax.swing.JFrame f; }")).isEmpty();
        assertThat(violations("trace", "package org.shutline.trace;\n/** Not {@link org.shutline.ui.MapView}; no java.awt. */\n"
                + "class A { String s = \"org.shutline.cli.Main java.awt\"; char c = '\"'; // org.shutline.ui.X\n}")).isEmpty();
    }

    /** Violations of the layering in the source text of a file of package {@code org.shutline.<pkg>}. */
    static List<String> violations(String pkg, String source) {
        List<String> out = new ArrayList<>();
        int rank = LAYERS.indexOf(pkg.split("\\.")[0]);
        if (rank < 0) return List.of("package " + pkg + " is not in the layer list");
        String code = codeOnly(source);
        Matcher m = OURS.matcher(code);
        while (m.find()) {
            String target = m.group(1);
            int t = LAYERS.indexOf(target);
            if (t < 0) out.add("refers to org.shutline." + target + ", which is not in the layer list");
            else if (t > rank) out.add("refers to org.shutline." + target + " (a higher layer than " + pkg + ")");
        }
        if (rank <= ENGINE_TOP) {
            Matcher g = GUI.matcher(code);
            while (g.find()) out.add("refers to " + g.group(1).replaceAll("\\s", "") + " (the engine must stay free of Swing and AWT)");
        } else if (rank < SWING_FROM) {
            Matcher g = SWING.matcher(code);
            while (g.find()) out.add("refers to javax.swing (only ui and cli may use Swing)");
        }
        return out;
    }

    /** The source with comments, string and character literals (text blocks included) blanked out. */
    static String codeOnly(String s) {
        StringBuilder out = new StringBuilder(s.length());
        int i = 0, n = s.length();
        while (i < n) {
            char c = s.charAt(i);
            if (c == '/' && i + 1 < n && s.charAt(i + 1) == '/') {
                while (i < n && s.charAt(i) != '\n') i++;
            } else if (c == '/' && i + 1 < n && s.charAt(i + 1) == '*') {
                int end = s.indexOf("*/", i + 2);
                i = end < 0 ? n : end + 2;
                out.append(' ');
            } else if (s.startsWith("\"\"\"", i)) {
                int end = s.indexOf("\"\"\"", i + 3);
                i = end < 0 ? n : end + 3;
                out.append("\"\"");
            } else if (c == '"' || c == '\'') {
                i++;
                while (i < n && s.charAt(i) != c) i += s.charAt(i) == '\\' ? 2 : 1;
                i++;
                out.append(c).append(c);
            } else {
                out.append(c);
                i++;
            }
        }
        return out.toString();
    }
}
