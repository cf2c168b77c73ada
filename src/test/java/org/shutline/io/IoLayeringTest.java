package org.shutline.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** io imports only model (and libraries): no later Shutline package, no Swing or AWT (design.md, shape of the code). */
class IoLayeringTest {
    @Test
    void ioImportsNothingFromLaterPackagesOrTheGui() throws Exception {
        Path src = Path.of("src/main/java/org/shutline/io");
        List<String> bad = new ArrayList<>();
        try (Stream<Path> files = Files.list(src)) {
            for (Path f : (Iterable<Path>) files.filter(p -> p.toString().endsWith(".java"))::iterator) {
                for (String line : Files.readAllLines(f)) {
                    String l = line.trim();
                    if (!l.startsWith("import ")) continue;
                    boolean gui = l.contains(" java.awt") || l.contains(" javax.swing");
                    boolean later = l.matches("import (static )?org\\.shutline\\.(?!model\\.|io\\.).*");
                    if (gui || later) bad.add(f.getFileName() + ": " + l);
                }
            }
        }
        assertThat(bad).isEmpty();
    }
}
