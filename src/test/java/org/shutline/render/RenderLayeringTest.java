package org.shutline.render;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The render package draws with Java2D only: it imports nothing from the packages
 * below it in the layering (report, ui, cli) and no Swing.
 */
class RenderLayeringTest {
    private static final Pattern FORBIDDEN =
            Pattern.compile("^import\\s+(static\\s+)?(org\\.shutline\\.(report|ui|cli)\\b|javax\\.swing\\b)", Pattern.MULTILINE);

    @Test
    void renderImportsOnlyFromAboveItAndNoSwing() throws IOException {
        Path dir = Path.of("src", "main", "java", "org", "shutline", "render");
        List<Path> files;
        try (Stream<Path> s = Files.list(dir)) {
            files = s.filter(p -> p.toString().endsWith(".java")).toList();
        }
        assertThat(files).hasSizeGreaterThan(10);
        for (Path f : files) {
            assertThat(FORBIDDEN.matcher(Files.readString(f)).find()).as("forbidden import in %s", f).isFalse();
        }
    }
}
