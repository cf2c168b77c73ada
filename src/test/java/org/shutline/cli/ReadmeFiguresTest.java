package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** The figures the README quotes for its leak example are the ones the program prints (the README cannot go stale). */
class ReadmeFiguresTest {
    @Test
    void theLeakExampleInTheReadmeMatchesTheCommand() throws Exception {
        String readme = Files.readString(Path.of("README.md")).replaceAll("\\s+", " ");
        Matcher m = Pattern.compile("two crews' routes \\((\\d+) minutes, (\\d+) m of driving\\), (\\d+) services and (\\d+) meters off, "
                + "([\\d.]+) technician-hours to shut off").matcher(readme);
        assertThat(m.find()).as("the README's leak example sentence").isTrue();
        // as of the README's writing (valves past their inspection interval change the field order as the years pass)
        CommandsTest.Run r = CommandsTest.run("incident", "sample-gis/tallowmere.gpkg", "--at", "512650,4890203", "--as-of", "2026-12-05");
        assertThat(r.out()).contains("Valve time: " + m.group(1) + " min with 2 crews, " + m.group(2) + " m driving")
                .contains("Services off " + m.group(3) + ", meters off " + m.group(4))
                .contains("Shut-off: " + m.group(4) + " meters, " + m.group(5) + " technician-hours");
    }
}
