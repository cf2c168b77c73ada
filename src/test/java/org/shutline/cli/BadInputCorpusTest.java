package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Runs the bad-input corpus ({@link BadInputCorpus}, at least 40 cases made from the
 * sample): each case's exit code is one of those allowed and never 3 (internal error),
 * stderr holds the located message fragments, nothing on stdout or stderr (ours or the
 * JVM's) looks like a stack trace or a library log line, no case runs past a minute
 * (a hang guard, not a speed target), and every input file (and the committed sample)
 * has the same SHA-256 afterwards.
 */
class BadInputCorpusTest {
    @TempDir static Path dir;

    @TestFactory
    Stream<DynamicTest> corpus() throws Exception {
        // one line per case (name, exit, first message line) for reading the corpus: target/bad-input-corpus.txt
        Files.deleteIfExists(Path.of("target/bad-input-corpus.txt"));
        List<BadInputCorpus.Case> cases = BadInputCorpus.build(dir);
        assertThat(cases).hasSizeGreaterThanOrEqualTo(40);
        assertThat(cases.stream().map(BadInputCorpus.Case::name).distinct().count()).isEqualTo(cases.size());
        return cases.stream().map(c -> DynamicTest.dynamicTest(c.name(), () -> run(c)));
    }

    private static void run(BadInputCorpus.Case c) throws Exception {
        Assumptions.assumeTrue(c.disabled() == null, c.disabled());
        List<Path> watched = new ArrayList<>(c.inputs());
        watched.add(BadInputCorpus.SAMPLE);
        watched.add(BadInputCorpus.SAMPLE_PLAN);
        Map<Path, String> before = sums(watched);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        ByteArrayOutputStream jvmOut = new ByteArrayOutputStream();
        ByteArrayOutputStream jvmErr = new ByteArrayOutputStream();
        PrintStream oldOut = System.out;
        PrintStream oldErr = System.err;
        int code;
        try {
            System.setOut(new PrintStream(jvmOut, true, StandardCharsets.UTF_8));
            System.setErr(new PrintStream(jvmErr, true, StandardCharsets.UTF_8));
            code = Assertions.assertTimeoutPreemptively(Duration.ofSeconds(60), () -> {
                CommandLine cl = Main.commandLine();
                cl.setOut(new PrintWriter(out));
                cl.setErr(new PrintWriter(err));
                return cl.execute(c.args().toArray(String[]::new));
            }, c.name() + " did not finish in 60 s");
        } finally {
            System.setOut(oldOut);
            System.setErr(oldErr);
        }
        String all = out + "\n" + err + "\n" + jvmOut.toString(StandardCharsets.UTF_8) + "\n" + jvmErr.toString(StandardCharsets.UTF_8);
        String first = err.toString().lines().filter(l -> !l.startsWith("shutline: data errors")).findFirst().orElse("");
        Files.writeString(Path.of("target/bad-input-corpus.txt"), c.name() + " | exit " + code + " | " + first + "\n",
                java.nio.file.StandardOpenOption.CREATE, java.nio.file.StandardOpenOption.APPEND);
        String what = c.name() + " " + c.args() + " exit " + code + "\nstderr:\n" + err + "\njvm stderr:\n" + jvmErr;
        assertThat(code).as(what).isNotEqualTo(Main.INTERNAL_ERROR).isIn(c.exits());
        for (String f : c.fragments()) assertThat(err.toString()).as(what).contains(f);
        assertThat(all).as(what).doesNotContain("\tat ", "    at org.", "Exception:", "SEVERE:", "WARNING: ", "internal error");
        assertThat(sums(watched)).as(c.name() + ": inputs unchanged").isEqualTo(before);
    }

    private static Map<Path, String> sums(List<Path> files) throws IOException, NoSuchAlgorithmException {
        Map<Path, String> m = new LinkedHashMap<>();
        for (Path f : files) {
            MessageDigest d = MessageDigest.getInstance("SHA-256");
            m.put(f, Files.exists(f) ? HexFormat.of().formatHex(d.digest(Files.readAllBytes(f))) : "absent");
        }
        return m;
    }
}
