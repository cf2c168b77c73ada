package org.shutline.topology;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** The topology package imports only model, io and itself (plus JTS and the JDK), and no Swing or AWT. */
class TopologyLayeringTest {
    private static final List<String> FORBIDDEN = List.of("java.awt", "javax.swing", "org.shutline.trace",
            "org.shutline.plan", "org.shutline.analysis", "org.shutline.render", "org.shutline.report",
            "org.shutline.ui", "org.shutline.cli");

    @Test
    void importsRespectTheLayers() throws IOException {
        Path dir = Path.of("src/main/java/org/shutline/topology");
        assertThat(dir).isDirectory();
        try (Stream<Path> files = Files.list(dir)) {
            List<Path> java = files.filter(p -> p.toString().endsWith(".java")).toList();
            assertThat(java).isNotEmpty();
            for (Path p : java) {
                for (String line : Files.readAllLines(p)) {
                    if (!line.startsWith("import ")) continue;
                    for (String f : FORBIDDEN) {
                        assertThat(line).as(p.getFileName() + " imports " + line).doesNotContain(" " + f + ".")
                                .doesNotContain("static " + f + ".");
                    }
                }
            }
        }
    }
}
