package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Data problems reach every command (issue: "a plan on a network with 39 skipped mains
 * exits 0 with no critical hazard"). The networks are copies of the bundled sample edited
 * with plain SQL (sqlite-jdbc): a clean copy (its four deliberate errors removed, which
 * {@code check} confirms with exit 0), the clean copy with 39 main ids blanked (a main
 * without an id is skipped: an error-level finding, as {@code check} counts it), and one
 * whose every main is abandoned (no usable main: refused).
 */
class DataErrorsCommandTest {
    static final String PLAN = "sample-gis/tallowmere-plan-corrected.yaml";
    @TempDir Path dir;

    private Path copy(String name, String... sql) throws Exception {
        Path p = dir.resolve(name);
        Files.copy(Path.of("sample-gis/tallowmere.gpkg"), p);
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + p); Statement s = c.createStatement()) {
            for (String q : sql) s.executeUpdate(q);
        }
        return p;
    }

    private Path clean(String name, String... more) throws Exception {
        String[] fix = {
            // the sample's four deliberate errors (SampleTown): the second V-017, SV-FAR, 'actve', V-OFF
            "DELETE FROM valves WHERE valve_id = 'V-017' AND fid = (SELECT MAX(fid) FROM valves WHERE valve_id = 'V-017')",
            "DELETE FROM services WHERE service_id = 'SV-FAR'",
            "UPDATE mains SET status = 'active' WHERE status = 'actve'",
            "DELETE FROM valves WHERE valve_id = 'V-OFF'"};
        String[] all = new String[fix.length + more.length];
        System.arraycopy(fix, 0, all, 0, fix.length);
        System.arraycopy(more, 0, all, fix.length, more.length);
        return copy(name, all);
    }

    @Test
    void aCleanNetworkGivesNoLineAndExitZero() throws Exception {
        Path net = clean("clean.gpkg");
        assertThat(CommandsTest.run("check", net.toString()).code()).as("check finds no error in the clean copy").isZero();
        CommandsTest.Run r = CommandsTest.run("plan", net.toString(), PLAN, "--as-of", "2026-12-01");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.err()).doesNotContain("data errors");
        assertThat(r.out()).contains("Result: no critical hazard raised by the plan (exit 0).");
    }

    @Test
    void skippedMainsMakeEveryCommandSayItAndExitOne() throws Exception {
        // 39 mains of the east district (LP-EAST, not touched by the plan) lose their ids
        Path net = clean("skipped.gpkg",
                "UPDATE mains SET main_id = '' WHERE fid IN (SELECT fid FROM mains WHERE main_id LIKE 'M-E-0%' ORDER BY fid LIMIT 39)");
        CommandsTest.Run check = CommandsTest.run("check", net.toString());
        assertThat(check.code()).isEqualTo(1);
        assertThat(check.out()).contains("missing-id  ERROR  (39)");

        CommandsTest.Run plan = CommandsTest.run("plan", net.toString(), PLAN, "--as-of", "2026-12-01");
        assertThat(plan.code()).as(plan.err()).isEqualTo(1);
        assertThat(plan.err()).startsWith("shutline: data errors in skipped.gpkg: ").contains("missing-id 39")
                .contains("features skipped or values defaulted, results may be incomplete");
        assertThat(plan.out()).contains("Result: no critical hazard raised by the plan; the network read gave ")
                .contains("(exit 1).");
        assertThat(plan.out()).doesNotContain("(exit 0)");
        // JSON on stdout stays clean JSON; the count is in it as well
        CommandsTest.Run json = CommandsTest.run("plan", net.toString(), PLAN, "--as-of", "2026-12-01", "--format", "json");
        assertThat(json.code()).isEqualTo(1);
        assertThat(new com.fasterxml.jackson.databind.ObjectMapper().readTree(json.out()).get("data_errors").asInt()).isGreaterThanOrEqualTo(39);

        for (String[] args : new String[][] {
            {"trace", net.toString()},
            {"isolate", net.toString(), "--main", "M-IP-007"},
            {"incident", net.toString(), "--main", "M-IP-007"},
            {"risk", net.toString(), "--no-map", "--out", dir.resolve("risk").toString()},
            {"cards", net.toString(), PLAN, "--no-pdf", "--out", dir.resolve("cards").toString()}}) {
            CommandsTest.Run r = CommandsTest.run(args);
            assertThat(r.code()).as(String.join(" ", args) + ": " + r.err()).isEqualTo(1);
            assertThat(r.err()).as(args[0]).contains("data errors in skipped.gpkg").contains("missing-id 39");
        }
    }

    @Test
    void aNetworkWithNoUsableMainIsRefused() throws Exception {
        Path net = copy("abandoned.gpkg", "UPDATE mains SET status = 'abandoned'");
        CommandsTest.Run r = CommandsTest.run("incident", net.toString(), "--at", "512547,4890597");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("no usable mains in").contains("abandoned.gpkg").contains("none active with a geometry");
        assertThat(CommandsTest.run("plan", net.toString(), PLAN).code()).isEqualTo(2);
        // check still reports what it read (it judges the data, it does not trace)
        assertThat(CommandsTest.run("check", net.toString()).code()).isNotEqualTo(2);
    }
}
