package org.shutline.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.code_intelligence.jazzer.junit.DictionaryEntries;
import com.code_intelligence.jazzer.junit.FuzzTest;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.shutline.analysis.Placement;
import org.shutline.app.Workspace;
import org.shutline.fuzz.Bounded;
import org.shutline.io.InputException;
import org.shutline.model.Progress;
import picocli.CommandLine;

/**
 * Fuzzes the location options of the emergency commands on the sample town, the way a
 * command reads them: {@code --at X,Y} (split at commas, each number through
 * {@link Locations.FiniteNumber}), {@code --usng REF} ({@link GridSheets#locate}, the
 * grid library under {@code render.GridReference}), {@code --address TEXT}
 * ({@link Addresses}) and {@code --max-distance-m} ({@link Locations.PositiveMetres}),
 * then placement by {@link Locations}.
 *
 * <p>An input is UTF-8 text {@code KIND<TAB>MAX<TAB>TEXT[<TAB>SYSTEM]}, KIND one of
 * {@code at}, {@code usng}, {@code address} (anything else is taken as {@code at}). The
 * documented refusals are picocli's {@link CommandLine.TypeConversionException} (exit 2
 * when the line is read) and {@link Locations.Refusal} (exit 2 with the reason); any
 * other exception, or an input past {@link Bounded#LIMIT_SECONDS}, is a finding. A
 * place accepted is finite and no farther from its main than the limit given.
 * Seeds: {@code LocationsFuzzTestInputs/location}.
 */
class LocationsFuzzTest {
    private static final Workspace SAMPLE = sample();
    private static final Placement PLACE = new Placement(SAMPLE.segments());
    private static final GridSheets GRID = GridSheets.of(SAMPLE.network().crs());

    @FuzzTest(maxDuration = "2m")
    @DictionaryEntries({"at\\x09", "usng\\x09", "address\\x09", "\\x09100\\x09", "\\x09IP-1", "\\x09LP-1", "15T", " WJ ", "513000,4890500",
        "1e308", "-0", "NaN", "Infinity", "0x1p3", ",", "Street", "Lane"})
    void location(byte[] data) {
        String[] f = new String(data, StandardCharsets.UTF_8).split("\t", 4);
        String kind = f[0];
        String max = f.length > 1 ? f[1] : "100";
        String text = f.length > 2 ? f[2] : "";
        String system = f.length > 3 ? f[3] : null;
        Bounded.run(() -> check(kind, max, text, system), CommandLine.TypeConversionException.class, Locations.Refusal.class);
    }

    private static void check(String kind, String max, String text, String system) throws Locations.Refusal {
        double maxM = new Locations.PositiveMetres().convert(max);
        Locations.Located loc;
        switch (kind) {
            case "usng" -> loc = Locations.usng(PLACE, GRID, text, system, maxM);
            case "address" -> loc = Locations.address(PLACE, SAMPLE.network(), text, "incident", new PrintWriter(new StringWriter()));
            default -> {
                String[] parts = text.split(",", -1);
                double[] at = new double[parts.length];
                for (int i = 0; i < parts.length; i++) at[i] = new Locations.FiniteNumber().convert(parts[i]);
                loc = Locations.at(PLACE, at, system, maxM);
            }
        }
        if (loc == null) return; // an address matching several services: listed, nothing placed
        Placement.Placed p = loc.placed();
        assertThat(Double.isFinite(p.snappedX()) && Double.isFinite(p.snappedY())).isTrue();
        if (p.edge() >= 0 && !kind.equals("address")) assertThat(p.distanceM()).isLessThanOrEqualTo(maxM);
        assertThat(loc.placedText()).startsWith("Placed");
    }

    private static Workspace sample() {
        try {
            return Workspace.load(Path.of("sample-gis/tallowmere.gpkg"), Progress.NONE);
        } catch (InputException e) {
            throw new IllegalStateException(e);
        }
    }
}
