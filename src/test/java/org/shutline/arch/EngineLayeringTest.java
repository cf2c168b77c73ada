package org.shutline.arch;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The trace and analysis packages import only from layers above them, and nothing from Swing or AWT. */
class EngineLayeringTest {

    @ParameterizedTest
    @CsvSource({
        "trace, plan analysis render report app ui cli",
        "analysis, render report app ui cli"
    })
    void importsOnlyFromHigherLayers(String pkg, String forbidden) throws IOException {
        Path dir = Path.of("src/main/java/org/shutline", pkg);
        List<String> bad = new ArrayList<>();
        try (Stream<Path> files = Files.walk(dir)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                for (String line : Files.readAllLines(f, StandardCharsets.UTF_8)) {
                    if (!line.startsWith("import ")) continue;
                    if (line.contains("javax.swing") || line.contains("java.awt")) bad.add(f + ": " + line);
                    for (String layer : forbidden.split(" ")) {
                        if (line.contains("org.shutline." + layer + ".")) bad.add(f + ": " + line);
                    }
                }
            }
        }
        assertThat(bad).isEmpty();
    }
}
