package org.shutline.render;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

/** Runs an installed reference tool (GeographicLib GeoConvert, PROJ cs2cs) with text on stdin. */
final class ExternalTool {
    private ExternalTool() {}

    static boolean exists(String path) {
        return Files.isExecutable(Path.of(path));
    }

    /** The tool's standard output; fails the test when the tool fails. */
    static String run(String stdin, String... command) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(List.of(command)).redirectErrorStream(true).start();
        try (OutputStream in = p.getOutputStream()) {
            in.write(stdin.getBytes(StandardCharsets.UTF_8));
        }
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(30, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new IllegalStateException(command[0] + " did not finish");
        }
        if (p.exitValue() != 0) throw new IllegalStateException(command[0] + " failed: " + out);
        return out;
    }
}
