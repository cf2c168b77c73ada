package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;
import org.shutline.analysis.UnverifiedInstructionException;
import picocli.CommandLine;

/** An answer that fails its re-trace is an internal error: exit 3, the query named, nothing printed as an instruction. */
class UnverifiedExitTest {
    @Test
    void aFailedReTraceExitsWithThreeNamingTheQuery() throws Exception {
        CommandLine cl = Main.commandLine();
        StringWriter err = new StringWriter(), out = new StringWriter();
        cl.setErr(new PrintWriter(err));
        cl.setOut(new PrintWriter(out));
        int code = cl.getExecutionExceptionHandler().handleExecutionException(
                new UnverifiedInstructionException("incident --kind overpressure at point 1,2", "valves [V-9]: re-trace puts off 3 services, the answer says 2"),
                cl, null);
        assertThat(code).isEqualTo(Main.INTERNAL_ERROR).isEqualTo(3);
        assertThat(err.toString()).contains("incident --kind overpressure at point 1,2").contains("failed its re-trace check")
                .contains("no instruction was printed");
        assertThat(out.toString()).isEmpty();
    }
}
