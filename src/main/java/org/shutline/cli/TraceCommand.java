package org.shutline.cli;

import org.shutline.model.Plural;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.shutline.io.InputException;
import org.shutline.model.Caution;
import org.shutline.model.Network;
import org.shutline.model.Service;
import org.shutline.model.Station;
import org.shutline.report.Csv;
import org.shutline.trace.FeedTrace;
import org.shutline.trace.NetworkState;
import org.shutline.app.Workspace;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code shutline trace NETWORK [--close V1,V2,...] [--format text|json|csv]}: the feed
 * trace of the network as recorded, or of the what-if state with the listed valves
 * closed. Per station: services and meters fed through it (a grid service counts for
 * each station that reaches it) and services fed through it alone; services fed by no
 * source; with {@code --close}, services and meters off against the normal state.
 */
@Command(name = "trace", mixinStandardHelpOptions = true,
    description = "Feed trace: what each station feeds; with --close, what a valve closure puts off gas.")
public final class TraceCommand implements Callable<Integer> {
    @Spec private CommandSpec spec;

    @Mixin private NetworkOptions input;
    @Mixin private SettingsFileOption settings;

    @Option(names = "--close", split = ",", paramLabel = "VALVE", description = "valve ids to close (what-if)")
    private List<String> close = new ArrayList<>();

    @Mixin private Formats.TextJsonCsv format;

    @Override
    public Integer call() throws InputException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (spec.commandLine().getParseResult() != null && spec.commandLine().getParseResult().hasMatchedOption("--close")
                && (close.isEmpty() || close.stream().anyMatch(String::isBlank))) {
            return NetworkInput.badInput(err, "trace: --close takes valve ids separated by commas; an empty id was given, so"
                    + " nothing was traced");
        }
        Workspace w = input.open(settings.load());
        Network net = w.network();
        NetworkState state = w.base();
        for (String id : close) {
            int v = w.valveIndex(id);
            if (v < 0) {
                return NetworkInput.badInput(err, "trace: no valve with id '" + id + "' in " + input.network);
            }
            state = state.withValveClosed(v, true);
        }
        FeedTrace.Result normal = w.trace();
        FeedTrace.Result tr = close.isEmpty() ? normal : FeedTrace.run(state);
        BitSet off = normal.fedServices();
        off.andNot(tr.fedServices());
        BitSet unfed = tr.unfedServices();
        switch (format.format()) {
            case json -> out.print(Json.write(json(net, tr, unfed, off)));
            case csv -> out.print(csv(net, tr));
            default -> out.print(text(net, tr, unfed, off));
        }
        out.flush();
        return 0;
    }


    private static long meters(Network net, BitSet b) {
        long m = 0;
        for (int i = b.nextSetBit(0); i >= 0; i = b.nextSetBit(i + 1)) m += net.services().get(i).meters();
        return m;
    }

    private ObjectNode json(Network net, FeedTrace.Result tr, BitSet unfed, BitSet off) {
        ObjectNode root = Json.object();
        root.put("network", net.sourceName());
        root.set("closed", Json.strings(close));
        ArrayNode sts = root.putArray("stations");
        for (int i = 0; i < net.stations().size(); i++) {
            Station s = net.stations().get(i);
            ObjectNode o = sts.addObject();
            o.put("station_id", s.id());
            o.put("name", s.name());
            o.put("in_sys", s.inSys());
            o.put("out_sys", s.outSys());
            o.put("services_fed", tr.servicesFedThrough(i).cardinality());
            o.put("meters_fed", tr.stationMeters()[i]);
            o.put("services_exclusive", tr.servicesExclusiveTo(i).cardinality());
            o.put("meters_exclusive", tr.stationExclusiveMeters()[i]);
        }
        root.put("services_fed", tr.fedServices().cardinality());
        root.put("services_unfed", unfed.cardinality());
        root.put("services_multi_fed", tr.multiFed().cardinality());
        root.set("unfed_service_ids", Json.strings(ids(net, unfed)));
        root.put("dead_mains", tr.deadMains().cardinality());
        if (!close.isEmpty()) {
            root.put("services_off", off.cardinality());
            root.put("meters_off", meters(net, off));
            root.set("service_ids_off", Json.strings(ids(net, off)));
        }
        root.put("caution", Caution.TEXT);
        return root;
    }

    private static List<String> ids(Network net, BitSet b) {
        List<String> out = new ArrayList<>();
        for (int i = b.nextSetBit(0); i >= 0; i = b.nextSetBit(i + 1)) out.add(net.services().get(i).id());
        return out;
    }

    private static String csv(Network net, FeedTrace.Result tr) {
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < net.stations().size(); i++) {
            Station s = net.stations().get(i);
            rows.add(List.of(s.id(), s.outSys(), Integer.toString(tr.servicesFedThrough(i).cardinality()),
                    Long.toString(tr.stationMeters()[i]), Integer.toString(tr.servicesExclusiveTo(i).cardinality())));
        }
        return Csv.format(List.of("station_id", "out_sys", "services_fed", "meters_fed", "services_exclusive"), rows);
    }

    private String text(Network net, FeedTrace.Result tr, BitSet unfed, BitSet off) {
        StringBuilder sb = new StringBuilder();
        sb.append("Feed trace: ").append(net.sourceName());
        sb.append(close.isEmpty() ? " (network as recorded)\n" : " with " + String.join(", ", close) + " closed\n\n");
        sb.append(String.format(Locale.ROOT, "%-10s %-28s %-10s %8s %8s %10s%n", "station", "name", "outlet", "services", "meters", "exclusive"));
        for (int i = 0; i < net.stations().size(); i++) {
            Station s = net.stations().get(i);
            sb.append(String.format(Locale.ROOT, "%-10s %-28s %-10s %8d %8d %10d%n", s.id(), s.name() == null ? "" : s.name(), s.outSys(),
                    tr.servicesFedThrough(i).cardinality(), tr.stationMeters()[i], tr.servicesExclusiveTo(i).cardinality()));
        }
        sb.append(String.format(Locale.ROOT, "%nservices fed %d, fed by more than one station %d, unfed %d; dead mains %d%n",
                tr.fedServices().cardinality(), tr.multiFed().cardinality(), unfed.cardinality(), tr.deadMains().cardinality()));
        if (!unfed.isEmpty()) sb.append("unfed: ").append(String.join(", ", first(ids(net, unfed), 20))).append('\n');
        if (!close.isEmpty()) {
            sb.append(String.format(Locale.ROOT, "%nwith %s closed: %s off, %s off%n", String.join(", ", close),
                    Plural.of(off.cardinality(), "service"), Plural.of(meters(net, off), "meter")));
            if (!off.isEmpty()) sb.append("off: ").append(String.join(", ", first(ids(net, off), 30))).append('\n');
        }
        sb.append('\n').append(Caution.TEXT).append('\n');
        return sb.toString();
    }

    static List<String> first(List<String> l, int n) {
        if (l.size() <= n) return l;
        List<String> out = new ArrayList<>(l.subList(0, n));
        out.add("... (" + (l.size() - n) + " more)");
        return out;
    }

    static String label(Service s) {
        return s.id() + (s.address() == null ? "" : " (" + s.address() + ")");
    }
}
