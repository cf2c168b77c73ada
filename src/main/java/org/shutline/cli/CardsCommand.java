package org.shutline.cli;

import org.shutline.analysis.ValveDoubt;
import org.shutline.model.Plural;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.shutline.analysis.EmergencyCards;
import org.shutline.analysis.IncidentResponse;
import org.shutline.analysis.Isolation;
import org.shutline.analysis.OverpressureShutoff;
import org.shutline.analysis.ResponseSettings;
import org.shutline.analysis.ValveOrder;
import org.shutline.analysis.ValveRoute;
import org.shutline.io.InputException;
import org.shutline.model.Caution;
import org.shutline.model.Network;
import org.shutline.plan.PlanApplier;
import org.shutline.plan.PlanException;
import org.shutline.plan.PlanReader;
import org.shutline.plan.PlanStates;
import org.shutline.report.DocumentExport;
import org.shutline.report.PageFormat;
import org.shutline.report.Paper;
import org.shutline.report.Sheet;
import org.shutline.report.TableSheets;
import org.shutline.app.AnalysisSettings;
import org.shutline.app.Workspace;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code shutline cards NETWORK PLAN [--out DIR] [--format text|json]}: one emergency card
 * per phase of a work plan ({@link EmergencyCards}): in the state after the phase, the
 * valves that stop gas at the work site if gas blows at the excavation (with
 * fallbacks), and for each pressure system the phase touches the over-pressure
 * shut-off (station inlet valves, upstream fallback, services at risk). Prints the
 * cards and writes {@code emergency-cards.pdf} (per phase a map page of the excavation isolation, when there is one, and a text page; the caution at
 * the foot; map pages are not drawn yet) into DIR. Exit 0, or 2 when the network or
 * plan cannot be read or the PDF cannot be written.
 */
@Command(name = "cards", mixinStandardHelpOptions = true,
    description = "Emergency cards per plan phase: shut-off at the work site and for over-pressure, for briefings and the fire department.")
public final class CardsCommand implements Callable<Integer>, WriteGuard.Writes {
    @Spec private CommandSpec spec;

    @Mixin private NetworkOptions input;

    @Parameters(index = "1", paramLabel = "PLAN", description = "the work plan (YAML)")
    private Path planFile;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = ".", description = "folder for emergency-cards.pdf (default: the current folder)")
    private Path out;

    @Option(names = "--no-pdf", description = "do not write the PDF")
    private boolean noPdf;

    @Option(names = "--pit-radius", defaultValue = "2", description = "radius in metres of the excavation around a cut or tie-in point (default: ${DEFAULT-VALUE})")
    private double pitRadius;

    @Mixin private SettingsOptions settingsOptions;
    @Mixin private ResponseOptions responseOptions;
    @Mixin private Formats.TextJson format;

    @Override
    public List<Path> outputs() {
        return noPdf ? List.of() : List.of(out.resolve("emergency-cards.pdf"));
    }

    @Override
    public Path outputFolder() {
        return noPdf ? null : out;
    }

    @Override
    public Integer call() throws InputException, PlanException {
        PrintWriter o = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        OptionRange.PIT_RADIUS.check("cards", pitRadius);
        AnalysisSettings s = responseOptions.apply(settingsOptions.settings());
        Workspace t = input.open(s);
        PlanStates ps = PlanApplier.apply(PlanReader.read(planFile), t.base(), planFile.getFileName().toString());
        ResponseSettings settings = s.response();
        ValveDoubt.Settings options = s.isolation();
        List<EmergencyCards.Card> cards = EmergencyCards.build(ps, options, settings, pitRadius);
        org.shutline.analysis.InstructionCheck.verify(ps, cards, "cards " + planFile.getFileName());
        GridSheets grid = GridSheets.of(t.network().crs());
        if (!noPdf) {
            List<Sheet> sheets = new ArrayList<>();
            PageFormat pf = new PageFormat(Paper.LETTER, false);
            for (EmergencyCards.Card c : cards) {
                Sheet map = cardMap(ps, c, pf);
                if (map != null) sheets.add(map);
                sheets.addAll(TableSheets.layout("Emergency card: phase " + (c.phase() + 1) + " " + c.name(),
                        ps.plan().project() + " | " + t.network().sourceName() + " | state after the phase's steps",
                        List.of("item", "detail"), wrap(rows(t.network(), ps, c, grid), 54), pf));
            }
            try {
                org.shutline.io.OutputPackage pkg = OutputFolder.start(out, spec, err);
                DocumentExport.pdf(sheets, pf, new DocumentExport.Info("Emergency cards: " + ps.plan().project(),
                        "Shut-off per phase", "Shutline"), pkg.file("emergency-cards.pdf"));
                pkg.add(pkg.file("emergency-cards.pdf"));
                pkg.commit();
            } catch (IOException e) {
                return NetworkInput.badInput(err, "cards: cannot write " + out.resolve("emergency-cards.pdf") + ": " + e.getMessage());
            }
        }
        o.print(format.format() == Formats.Format.json ? Json.write(json(t.network(), ps, cards, grid, settings)) : text(t.network(), ps, cards, grid, settings));
        o.flush();
        return 0;
    }

    /** Long details split at blanks into continuation rows (the table would cut them with an ellipsis). */
    static List<List<String>> wrap(List<List<String>> rows, int width) {
        List<List<String>> out = new ArrayList<>();
        for (List<String> r : rows) {
            String item = r.get(0), rest = r.get(1);
            while (rest.length() > width) {
                int cut = rest.lastIndexOf(' ', width);
                if (cut <= 0) cut = width;
                out.add(List.of(item, rest.substring(0, cut).trim()));
                item = "";
                rest = rest.substring(cut).trim();
            }
            out.add(List.of(item, rest));
        }
        return out;
    }

    /** The card as item/detail rows for the PDF page. */
    /**
     * The map page of a card: the state after the phase, the excavation isolation at the
     * phase's first work point (valves numbered, gas-off extent, the initial isolation
     * circle of ERG Guide 115), drawn by the export's map sheet; null when the phase has no
     * work point or nothing to isolate.
     */
    private Sheet cardMap(PlanStates ps, EmergencyCards.Card c, PageFormat pf) {
        if (c.site() == null) return null;
        org.shutline.plan.WorkPoint wp = null;
        for (org.shutline.plan.StepState st : ps.steps()) {
            if (st.step().phase() == c.phase() && !st.workPoints().isEmpty()) {
                wp = st.workPoints().get(0);
                break;
            }
        }
        if (wp == null) return null;
        org.shutline.report.ReportView view = org.shutline.report.ReportView.ofIncident(ps.afterPhase(c.phase()), c.site(),
                "Emergency card: phase " + (c.phase() + 1) + " " + c.name() + ": gas blowing at the " + wp.kind() + " on " + wp.mainId(),
                wp.x(), wp.y(), org.shutline.report.ReportView.ERG_115_ISOLATION_M, org.shutline.analysis.GasOffExtent.DEFAULT_BUFFER_M);
        return org.shutline.report.ReportBuilder.of(view, input.network, org.shutline.report.ReportBuilder.Options.defaults().withPage(pf)).mapSheet();
    }

    static List<List<String>> rows(Network net, PlanStates ps, EmergencyCards.Card c, GridSheets grid) {
        List<List<String>> rows = new ArrayList<>();
        rows.add(List.of("Work site", c.siteDescription()));
        IncidentResponse.Result site = c.site();
        if (site != null) {
            Isolation.Result iso = site.isolation();
            rows.add(List.of("GAS BLOWING AT THE EXCAVATION", iso.isolable() ? "close these valves in this order" : "NOT isolable by valves alone"));
            if (!iso.isolable()) rows.add(List.of("  why", iso.reason()));
            for (ValveOrder.Step v : site.order().steps()) {
                rows.add(List.of("  " + v.order() + ". " + v.valveId(), "crew " + v.crew() + "; operable " + v.operable().name().toLowerCase(Locale.ROOT)
                        + (v.overdue() ? ", past inspection interval" : "")
                        + (grid.reference(v.x(), v.y()).isEmpty() ? "" : "; USNG " + grid.reference(v.x(), v.y()))
                        + (v.stationInlet() ? "; " + v.stopLabel() : "")));
                if (v.fallback() != null) {
                    rows.add(List.of("     if it will not close", "(" + v.fallback().why() + ") " + v.fallback().text()));
                }
            }
            if (!iso.stationsToStop().isEmpty()) {
                rows.add(List.of("  stop stations", String.join(", ", iso.stationsToStop()) + " (inlet valves "
                        + (iso.stationInletValves().isEmpty() ? "none recorded" : String.join(", ", iso.stationInletValves())) + ")"));
            }
            iso.alternative().ifPresent(a -> rows.add(List.of("  fewer valves", String.join(", ", a.valves()) + " (adds "
                    + Plural.of(a.addedServices().size(), "service") + ")")));
            ValveRoute.Result r = site.route();
            if (!r.crews().isEmpty()) rows.add(List.of("  valve time", String.format(Locale.ROOT, "%.0f min with %d crew(s)", r.elapsedMinutes(), r.crews().size())));
            rows.add(List.of("  customers off", Plural.of(iso.serviceIdsOff().size(), "service") + ", " + Plural.of(iso.metersOff(), "meter")));
            if (!site.restoration().criticalShutOff().isEmpty()) rows.add(List.of("  critical off", String.join(", ", site.restoration().criticalShutOff())));
            rows.add(List.of("  initial isolation", String.format(Locale.ROOT, "%.0f m in all directions (ERG Guide 115); no ignition sources",
                    IncidentResponse.INITIAL_ISOLATION_M)));
        }
        for (OverpressureShutoff.Result op : c.overpressure()) {
            rows.add(List.of("OVER-PRESSURE OF " + op.systemId(), "stop the inflow"));
            for (OverpressureShutoff.Feed f : op.feeds()) {
                if (!f.isStation()) {
                    rows.add(List.of("  source " + f.id(), "shut the supply at the source"));
                    continue;
                }
                rows.add(List.of("  station " + f.id(), "stop it: " + (f.inletValves().isEmpty() ? "no valve to close" : "close " + String.join(", ", f.inletValves()))
                        + (f.stop().stoppable() ? "" : " (valves alone cannot stop it)") + (f.name() == null ? "" : " (" + f.name() + ")")));
                if (!f.stop().note().isEmpty()) rows.add(List.of("    note", f.stop().note()));
                rows.add(List.of("    also", (f.stop().alsoStopped().isEmpty() ? "stops no other station" : "stops " + String.join(", ", f.stop().alsoStopped()))
                        + "; " + Plural.of(f.stop().otherOff().cardinality(), "service") + " off besides the station's own district"));
                for (Isolation.Fallback x : f.fallbacks()) {
                    rows.add(List.of("    if " + x.valveId() + " will not close", "(" + x.why() + ") " + org.shutline.report.ReportView.fallbackText(x)));
                }
            }
            rows.add(List.of("  at risk", Plural.of(op.atRisk().cardinality(), "service") + ", " + Plural.of(op.atRiskMeters(), "meter") + "; check each before relight"));
            if (!op.criticalAtRisk().isEmpty()) rows.add(List.of("  critical at risk", String.join(", ", op.criticalAtRisk())));
            rows.add(List.of("  off after shut-off", Plural.of(op.off().cardinality(), "service") + "; relight " + Plural.of(op.restoration().metersRelight(), "meter")
                    + String.format(Locale.ROOT, " (%.0f technician-hours)", op.restoration().sizing().relightTechHours())));
        }
        return rows;
    }

    private static String text(Network net, PlanStates ps, List<EmergencyCards.Card> cards, GridSheets grid, ResponseSettings s) {
        StringBuilder sb = new StringBuilder();
        sb.append("Emergency cards: ").append(ps.plan().project()).append("\nNetwork: ").append(net.sourceName()).append("\n");
        for (EmergencyCards.Card c : cards) {
            sb.append("\n=== Phase ").append(c.phase() + 1).append(": ").append(c.name()).append(" (state after the phase) ===\n");
            sb.append("Work site: ").append(c.siteDescription()).append('\n');
            if (c.site() != null) {
                sb.append("If gas blows at the excavation:\n");
                EmergencyReport.leakText(sb, ps.afterPhase(c.phase()), c.site(), grid);
            }
            for (OverpressureShutoff.Result op : c.overpressure()) {
                sb.append('\n');
                EmergencyReport.overpressureText(sb, net, op);
            }
        }
        sb.append('\n').append(Caution.TEXT).append('\n');
        return sb.toString();
    }

    private static ObjectNode json(Network net, PlanStates ps, List<EmergencyCards.Card> cards, GridSheets grid, ResponseSettings s) {
        ObjectNode root = Json.object();
        root.put("project", ps.plan().project());
        root.put("network", net.sourceName());
        ArrayNode a = root.putArray("cards");
        for (EmergencyCards.Card c : cards) {
            ObjectNode o = a.addObject();
            o.put("phase", c.phase() + 1);
            o.put("name", c.name());
            o.put("work_site", c.siteDescription());
            o.set("site_mains", Json.strings(c.siteMains()));
            if (c.site() != null) {
                ObjectNode site = o.putObject("excavation");
                EmergencyReport.leakJson(site, ps.afterPhase(c.phase()), c.site(), grid);
                site.set("response", EmergencyReport.responseJson(c.site().restoration(), s));
            }
            ArrayNode ops = o.putArray("overpressure");
            for (OverpressureShutoff.Result op : c.overpressure()) {
                ObjectNode x = ops.addObject();
                EmergencyReport.overpressureJson(x, net, op);
                x.set("response", EmergencyReport.responseJson(op.restoration(), s));
            }
            o.put("caution", c.caution());
        }
        root.put("caution", Caution.TEXT);
        return root;
    }
}
