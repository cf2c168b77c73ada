package org.shutline.cli;

import org.shutline.model.Plural;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.locationtech.jts.geom.Geometry;
import org.shutline.analysis.RiskTables;
import org.shutline.io.GeoPackageWriter;
import org.shutline.io.InputException;
import org.shutline.io.OutputPackage;
import org.shutline.io.WriteLayer;
import org.shutline.model.Caution;
import org.shutline.model.Network;
import org.shutline.model.Progress;
import org.shutline.report.Csv;
import org.shutline.trace.ValveSegments;
import org.shutline.app.Workspace;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code shutline risk NETWORK [--out DIR] [--no-map]}: the all-cases tables of the
 * network as recorded ({@link RiskTables}): {@code segments.csv}, {@code stations.csv},
 * {@code valves-to-fix.csv}, the GeoPackage layer {@code segments} in
 * {@code risk-segments.gpkg} (each segment's pipe with its figures) and the PNG map
 * {@code risk-map.png}. Prints the top rows of each table and the time taken. Every
 * file is written under a temporary name and moved into place. Exit 0, or 2 when the
 * network cannot be read or the files cannot be written. Columns: docs/cli-emergency.md.
 */
@Command(name = "risk", mixinStandardHelpOptions = true,
    description = "All-cases outage tables: every segment and station, and the valves to fix first.")
public final class RiskCommand implements Callable<Integer>, WriteGuard.Writes {
    static final List<String> SEGMENT_HEADER = List.of("rank", "segment", "system", "mains", "services_in_segment", "services_off",
            "meters_off", "critical_off", "valves_to_close", "isolable_by_valves", "also_needed");
    static final List<String> STATION_HEADER = List.of("rank", "station", "name", "in_sys", "out_sys", "in_service", "services_off",
            "meters_off", "critical_off", "inlet_valves");
    static final List<String> VALVE_HEADER = List.of("rank", "valve", "system", "operable", "growth_services",
            "services_off_when_fails", "meters_off_when_fails");

    @Spec private CommandSpec spec;

    @Mixin private NetworkOptions input;
    @Mixin private SettingsFileOption settings;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = ".", description = "folder for the tables, layer and map (default: the current folder)")
    private Path out;

    @Option(names = "--no-map", description = "do not draw risk-map.png")
    private boolean noMap;

    @Override
    public List<Path> outputs() {
        List<Path> files = new ArrayList<>();
        for (String n : List.of("segments.csv", "stations.csv", "valves-to-fix.csv", "risk-segments.gpkg", "risk-map.png")) {
            files.add(out.resolve(n));
        }
        return files;
    }

    @Override
    public Path outputFolder() {
        return out;
    }

    @Override
    public Integer call() throws InputException {
        PrintWriter o = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        long t0 = System.nanoTime();
        Workspace t = input.open(settings.load());
        long t1 = System.nanoTime();
        ValveSegments segs = t.segments();
        RiskTables tables = RiskTables.build(segs);
        long t2 = System.nanoTime();
        try {
            OutputPackage pkg = OutputFolder.start(out, spec, err);
            Csv.write(pkg.file("segments.csv"), SEGMENT_HEADER, segmentRows(tables));
            Csv.write(pkg.file("stations.csv"), STATION_HEADER, stationRows(tables));
            Csv.write(pkg.file("valves-to-fix.csv"), VALVE_HEADER, valveRows(tables));
            GeoPackageWriter.write(pkg.file("risk-segments.gpkg"), t.network().crs(), List.of(layer(tables)), Progress.NONE);
            if (!noMap) RiskMap.write(t.network(), tables, 1600, 1240, pkg.file("risk-map.png"));
            for (String f : new String[] {"segments.csv", "stations.csv", "valves-to-fix.csv", "risk-segments.gpkg"}) pkg.add(pkg.file(f));
            if (!noMap) pkg.add(pkg.file("risk-map.png"));
            pkg.commit();
        } catch (IOException e) {
            return NetworkInput.badInput(err, "risk: cannot write to " + out + ": " + e.getMessage());
        }
        long t3 = System.nanoTime();
        o.print(summary(t.network(), segs, tables));
        o.printf(Locale.ROOT, "Time: read and build %.2f s, tables %.2f s, files %.2f s%n", (t1 - t0) / 1e9, (t2 - t1) / 1e9, (t3 - t2) / 1e9);
        o.println("Wrote segments.csv, stations.csv, valves-to-fix.csv, risk-segments.gpkg" + (noMap ? "" : ", risk-map.png") + " in " + out);
        o.println();
        o.println(Caution.TEXT);
        o.flush();
        return 0;
    }

    static List<List<String>> segmentRows(RiskTables t) {
        List<List<String>> rows = new ArrayList<>();
        int rank = 1;
        for (RiskTables.SegmentRow r : t.segments()) {
            rows.add(List.of(Integer.toString(rank++), Integer.toString(r.segment()), r.systemId(), String.join(" ", r.mains()),
                    Integer.toString(r.services()), Long.toString(r.servicesOff()), Long.toString(r.metersOff()),
                    Long.toString(r.criticalOff()), Integer.toString(r.valves()), r.isolable() ? "yes" : "no",
                    r.isolable() ? "" : stopText(t, r)));
        }
        return rows;
    }

    static List<List<String>> stationRows(RiskTables t) {
        List<List<String>> rows = new ArrayList<>();
        int rank = 1;
        for (RiskTables.StationRow r : t.stations()) {
            rows.add(List.of(Integer.toString(rank++), r.stationId(), r.name() == null ? "" : r.name(), r.inSys(), r.outSys(),
                    r.inService() ? "yes" : "no", Long.toString(r.servicesOff()), Long.toString(r.metersOff()),
                    Long.toString(r.criticalOff()), String.join(" ", r.inletValves())));
        }
        return rows;
    }

    static List<List<String>> valveRows(RiskTables t) {
        List<List<String>> rows = new ArrayList<>();
        for (RiskTables.ValveRow r : t.valvesToFix()) {
            rows.add(List.of(Integer.toString(r.rank()), r.valveId(), r.systemId(), r.operable(), Long.toString(r.growth()),
                    Long.toString(r.servicesOffWhenFails()), Long.toString(r.metersOffWhenFails())));
        }
        return rows;
    }

    static WriteLayer layer(RiskTables t) {
        List<WriteLayer.Column> cols = List.of(new WriteLayer.Column("segment", WriteLayer.ColumnType.INTEGER),
                new WriteLayer.Column("system_id", WriteLayer.ColumnType.TEXT),
                new WriteLayer.Column("mains", WriteLayer.ColumnType.TEXT),
                new WriteLayer.Column("services", WriteLayer.ColumnType.INTEGER),
                new WriteLayer.Column("services_off", WriteLayer.ColumnType.INTEGER),
                new WriteLayer.Column("meters_off", WriteLayer.ColumnType.INTEGER),
                new WriteLayer.Column("critical_off", WriteLayer.ColumnType.INTEGER),
                new WriteLayer.Column("valves", WriteLayer.ColumnType.INTEGER),
                new WriteLayer.Column("isolable", WriteLayer.ColumnType.TEXT),
                new WriteLayer.Column("also_needed", WriteLayer.ColumnType.TEXT),
                new WriteLayer.Column("rank", WriteLayer.ColumnType.INTEGER));
        List<Geometry> geoms = new ArrayList<>();
        List<List<Object>> rows = new ArrayList<>();
        int rank = 1;
        for (RiskTables.SegmentRow r : t.segments()) {
            geoms.add(t.segmentGeometry(r.segment()));
            rows.add(List.of(r.segment(), r.systemId(), String.join(" ", r.mains()), r.services(), (int) r.servicesOff(),
                    (int) r.metersOff(), (int) r.criticalOff(), r.valves(), r.isolable() ? "yes" : "no",
                    r.isolable() ? "" : stopText(t, r), rank++));
        }
        return WriteLayer.of("segments", WriteLayer.GeometryKind.LINE, cols, geoms, rows);
    }

    /** What besides valves a segment's isolation needs: the stations to stop with their stop valves, or the supply to shut. */
    static String stopText(RiskTables t, RiskTables.SegmentRow r) {
        if (r.stopStations().isEmpty()) return "a source feeds it: shut the supply";
        List<String> parts = new java.util.ArrayList<>();
        for (String id : r.stopStations()) {
            RiskTables.StationRow st = t.stations().stream().filter(x -> x.stationId().equals(id)).findFirst().orElse(null);
            parts.add("stop " + id + (st == null || st.inletValves().isEmpty() ? " at the station" : " (close " + String.join(", ", st.inletValves()) + ")"));
        }
        return String.join("; ", parts);
    }

    private static String summary(Network net, ValveSegments segs, RiskTables t) {
        StringBuilder sb = new StringBuilder();
        sb.append("Outage tables of ").append(net.sourceName()).append(": ").append(t.segments().size()).append(" segments with pipe, ")
                .append(t.stations().size()).append(" stations, ").append(t.valvesToFix().size()).append(" relied-on valves\n\n");
        sb.append("Largest segment isolations:\n");
        for (RiskTables.SegmentRow r : t.segments().subList(0, Math.min(5, t.segments().size()))) {
            // the first mains by name and the count of the rest (all of them are in risk-segments.csv)
            String mains = r.mains().size() <= 4 ? String.join(" ", r.mains())
                    : String.join(" ", r.mains().subList(0, 4)) + " and " + (r.mains().size() - 4) + " more mains";
            sb.append(String.format(Locale.ROOT, "  segment %-5d %-9s %5d services %5d meters %2d valves%s  %s%n", r.segment(), r.systemId(),
                    r.servicesOff(), r.metersOff(), r.valves(), r.isolable() ? "" : " (not by valves alone: " + stopText(t, r) + ")", mains));
        }
        sb.append("Station outages:\n");
        for (RiskTables.StationRow r : t.stations()) {
            sb.append(String.format(Locale.ROOT, "  %-8s %5d services %5d meters, %d critical; stop: %s%n", r.stationId(), r.servicesOff(),
                    r.metersOff(), r.criticalOff(), r.stopNote()));
        }
        sb.append("Valves to fix first (failure enlarges an isolation most):\n");
        for (RiskTables.ValveRow r : t.valvesToFix().subList(0, Math.min(5, t.valvesToFix().size()))) {
            sb.append(String.format(Locale.ROOT, "  %2d. %-8s %-9s operable %-7s +%s (both sides off: %d)%n", r.rank(), r.valveId(),
                    r.systemId(), r.operable(), Plural.of(r.growth(), "service"), r.servicesOffWhenFails()));
        }
        return sb.toString();
    }
}
