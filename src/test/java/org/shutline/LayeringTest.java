package org.shutline;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Keeps the package layering of docs (DEVELOPERS.md): a package imports only from
 * packages above it, and the engine (model..analysis) has no Swing or AWT.
 */
class LayeringTest {
    private static final List<String> LAYERS =
            List.of("model", "io", "topology", "trace", "plan", "analysis", "render", "report", "app", "ui", "cli");
    private static final Path SRC = Path.of("src/main/java/org/shutline");
    private static final Pattern IMPORT = Pattern.compile("^import\\s+(static\\s+)?([\\w.]+)", Pattern.MULTILINE);

    @Test
    void packagesImportOnlyFromLowerLayersAndEngineHasNoSwing() throws IOException {
        List<String> violations = new ArrayList<>();
        try (Stream<Path> files = Files.walk(SRC)) {
            for (Path f : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".java"))::iterator) {
                String layer = SRC.relativize(f).getName(0).toString();
                int rank = LAYERS.indexOf(layer);
                if (rank < 0) {
                    violations.add(f + ": package " + layer + " is not in the layer list");
                    continue;
                }
                Matcher m = IMPORT.matcher(Files.readString(f));
                while (m.find()) {
                    String imp = m.group(2);
                    if (rank <= LAYERS.indexOf("analysis") && (imp.startsWith("javax.swing") || imp.startsWith("java.awt"))) {
                        violations.add(f + " imports " + imp + " (engine must stay free of Swing/AWT)");
                    }
                    if (imp.startsWith("org.shutline.")) {
                        String target = imp.substring("org.shutline.".length()).split("\\.")[0];
                        int t = LAYERS.indexOf(target);
                        if (t > rank) violations.add(f + " imports " + imp + " from higher layer " + target);
                    }
                }
            }
        }
        assertThat(violations).isEmpty();
    }
}
