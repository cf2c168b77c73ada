package org.shutline.report;

import org.shutline.model.Plural;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.jfree.chart.JFreeChart;
import org.locationtech.jts.geom.Envelope;
import org.shutline.analysis.PlanEvaluation;
import org.shutline.model.Finding;
import org.shutline.io.GeoPackageWriter;
import org.shutline.io.OutputPackage;
import org.shutline.io.WriteLayer;
import org.shutline.model.Network;
import org.shutline.trace.NetworkState;
import org.shutline.model.Progress;
import org.shutline.model.Service;
import org.shutline.render.GasOffArea;
import org.shutline.render.GeoTransform;
import org.shutline.render.GridReference;
import org.shutline.render.HazardMark;
import org.shutline.render.MapOverlays;
import org.shutline.render.MapPainter;
import org.shutline.render.MapScene;
import org.shutline.render.UsngGrid;

/**
 * Builds and writes the field package of one view (a plan step or an incident): the
 * PDF report, the map as PNG and SVG, the result layers as GeoPackage and GeoJSON, and
 * the valve and customer lists as CSV. The public entry point for the command line
 * ({@code shutline export}) and the desktop window's export menu.
 *
 * <p>The PDF holds, in this order: the overview map (the view fitted to its area of
 * interest, with the map-book sheet index drawn on it when the book has more than one
 * sheet), one map-book sheet per cell of the {@link MapBook} (each with "continued on
 * sheet N" at edges shared with another sheet and the valves and critical customers on
 * it), the valve operation list, the affected-customer list, the hazards with their
 * actions, and, for a plan, the charts of services and meters off per step and
 * customer-hours per phase. Every page carries the safety caution and "page k of n"
 * of the whole document at its top right.
 *
 * <p>Files written in the output folder: {@code report.pdf}, {@code map.png},
 * {@code map.svg}, {@code results.gpkg}, one {@code <layer>.geojson} per result layer
 * ({@link ResultLayers}), {@code valves.csv}, {@code customers.csv}, and for a plan
 * {@code chart-steps.png/.svg} and {@code chart-phases.png/.svg}: only those of the
 * chosen formats; then, last, the manifest {@code shutline-manifest.txt} that tells the
 * package is whole ({@link OutputPackage}). A target path that is the input network or plan file is refused
 * ({@link IOException}) before anything is written.
 *
 * <p>A builder is immutable once made and keeps no Swing state: build it and call
 * {@link #write} on a worker thread (it checks the progress's cancellation between
 * files and while writing the GeoPackage); the sheets it returns may be painted on
 * any thread, one painting at a time per graphics target.
 */
public final class ReportBuilder {
    /** Output formats. */
    public enum Format {
        PDF, PNG, SVG, GPKG, GEOJSON, CSV;

        /** Parses "pdf", "geojson", ... (any case). */
        public static Optional<Format> parse(String s) {
            for (Format f : values()) if (f.name().equalsIgnoreCase(s.trim())) return Optional.of(f);
            return Optional.empty();
        }
    }

    /**
     * Settings: page format, PNG resolution, formats, who prepared the maps, when (the
     * title block's date), the most map-book sheets, and the grid-reference precision of
     * the valve list.
     */
    public record Options(PageFormat page, int dpi, Set<Format> formats, String preparedBy, LocalDateTime made,
                          int maxBookSheets, GridReference.Precision listPrecision) {
        public Options {
            Objects.requireNonNull(page, "page");
            formats = formats.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(formats));
            preparedBy = preparedBy == null ? "" : preparedBy;
            Objects.requireNonNull(made, "made");
            if (dpi < 10 || dpi > 1200) throw new IllegalArgumentException("dpi must be 10..1200, was " + dpi);
            if (maxBookSheets < 1) throw new IllegalArgumentException("maxBookSheets must be at least 1");
        }

        /** Letter landscape, 150 dpi, every format, made now, at most 9 book sheets, references to 10 m. */
        public static Options defaults() {
            return new Options(PageFormat.LETTER_LANDSCAPE, 150, EnumSet.allOf(Format.class), "", LocalDateTime.now(), 9,
                    GridReference.Precision.M10);
        }

        public Options withPage(PageFormat p) {
            return new Options(p, dpi, formats, preparedBy, made, maxBookSheets, listPrecision);
        }

        public Options withDpi(int d) {
            return new Options(page, d, formats, preparedBy, made, maxBookSheets, listPrecision);
        }

        public Options withFormats(Set<Format> f) {
            return new Options(page, dpi, f, preparedBy, made, maxBookSheets, listPrecision);
        }

        public Options withPreparedBy(String who) {
            return new Options(page, dpi, formats, who, made, maxBookSheets, listPrecision);
        }

        public Options withMade(LocalDateTime when) {
            return new Options(page, dpi, formats, preparedBy, when, maxBookSheets, listPrecision);
        }
    }

    /** The smallest width and height of the area of interest, in metres. */
    public static final double MIN_AREA_M = 300;

    private final ReportView view;
    private final Path networkFile;
    private final PlanEvaluation.Result plan;
    private final Path planFile;
    private final Options options;
    private final Network network;
    /** The first note on a sheet of a network with no known CRS: why it has no grid or geographic labels. */
    public static final String NO_CRS_NOTE = "No CRS in the network: US National Grid references, latitude/longitude and true"
            + " north are left off; coordinates are the file's own.";
    private final GeoTransform geo;
    private final MapPainter painter;
    private final StreetLocator streets;
    private final TitleInfo title;
    private final MapBook book;
    private final Envelope areaOverride;

    private ReportBuilder(ReportView view, Path networkFile, PlanEvaluation.Result plan, Path planFile, Options options,
                          Envelope areaOverride) {
        this.areaOverride = areaOverride == null || areaOverride.isNull() ? null : new Envelope(areaOverride);
        this.view = Objects.requireNonNull(view, "view");
        this.networkFile = networkFile;
        this.plan = plan;
        this.planFile = planFile;
        this.options = Objects.requireNonNull(options, "options");
        this.network = view.state().network();
        this.geo = GeoTransform.forCrs(network.crs()).orElse(null);
        MapPainter p = new MapPainter(new MapScene(network).withState(view.state()), MapSheet.printStyle());
        this.painter = geo == null ? p : p.withGrid(new UsngGrid(geo));
        this.streets = new StreetLocator(network.context(), network.crs().unit(),
                network.mains().stream().map(org.shutline.model.Main::geometry).toList());
        this.title = new TitleInfo(plan != null ? plan.states().plan().project() : projectWithoutPlan(view, network),
                view.kind() == ReportView.Kind.STEP && !view.phase().isEmpty() && plan != null
                        ? "Phase " + phaseNumber(plan, view) + ": " + view.phase() : view.phase(),
                view.subject(), options.made(), options.preparedBy(),
                networkFile == null ? network.sourceName() : String.valueOf(networkFile.getFileName()), modified(networkFile));
        MapSheet.Layout lay = MapSheet.layout(options.page().widthPt(), options.page().heightPt());
        this.book = MapBook.plan(view.gasOff(), area(), lay.frame().getWidth(), lay.frame().getHeight(),
                network.crs().unit(), options.maxBookSheets());
    }

    /** The 1-based number of the phase of the view's step, as the command line numbers phases. */
    private static int phaseNumber(PlanEvaluation.Result plan, ReportView view) {
        for (var st : plan.states().steps()) if (st.step().number() == view.step()) return st.step().phase() + 1;
        return 0;
    }

    private static String projectWithoutPlan(ReportView v, Network n) {
        return switch (v.kind()) {
            case INCIDENT -> "Incident response: " + n.sourceName();
            case STEP -> "Work plan: " + n.sourceName();
            case STATE -> "Network map: " + n.sourceName();
        };
    }

    /** A builder for a view of an incident or a step; {@code networkFile} (may be null) names the input in the title block. */
    public static ReportBuilder of(ReportView view, Path networkFile, Options options) {
        return new ReportBuilder(view, networkFile, null, null, options, null);
    }

    /** The same with the evaluated plan the step belongs to (for the title, the charts and the input check). */
    public ReportBuilder withPlan(PlanEvaluation.Result r, Path file) {
        return new ReportBuilder(view, networkFile, r, file, options, areaOverride);
    }

    /**
     * The same with a given area of interest (network CRS), for example the extent shown
     * in the window; null goes back to the area the view itself gives ({@link #area()}).
     */
    public ReportBuilder withArea(Envelope area) {
        return new ReportBuilder(view, networkFile, plan, planFile, options, area);
    }

    private static LocalDateTime modified(Path p) {
        if (p == null || !Files.exists(p)) return null;
        try {
            return LocalDateTime.ofInstant(Files.getLastModifiedTime(p).toInstant(), ZoneId.systemDefault());
        } catch (IOException e) {
            return null;
        }
    }

    public ReportView view() {
        return view;
    }

    public MapBook book() {
        return book;
    }

    public TitleInfo title() {
        return title;
    }

    public StreetLocator streets() {
        return streets;
    }

    /**
     * The area of interest: the one given by {@link #withArea} if any; else the gas-off
     * extent, the valves to operate and the isolation circle; when there are none, the
     * hazards with a position; else the whole network. Grown to at least
     * {@link #MIN_AREA_M} metres across so the streets around show (not a given area).
     */
    public Envelope area() {
        if (areaOverride != null) return new Envelope(areaOverride);
        Envelope e = new Envelope(view.gasOff().getEnvelopeInternal());
        for (ReportView.OperatedValve v : view.valves()) e.expandToInclude(v.x(), v.y());
        if (view.ring() != null) {
            double r = network.crs().unit().fromMetres(view.ring().radiusMetres());
            e.expandToInclude(new Envelope(view.ring().centerX() - r, view.ring().centerX() + r,
                    view.ring().centerY() - r, view.ring().centerY() + r));
        }
        if (e.isNull()) {
            for (Finding h : view.hazards()) if (Double.isFinite(h.x()) && Double.isFinite(h.y())) e.expandToInclude(h.x(), h.y());
        }
        if (e.isNull()) return new MapScene(network).extent();
        double min = network.crs().unit().fromMetres(MIN_AREA_M);
        double cx = e.centre().x;
        double cy = e.centre().y;
        e.expandToInclude(cx - min / 2, cy - min / 2);
        e.expandToInclude(cx + min / 2, cy + min / 2);
        return e;
    }

    /** What is drawn over the network: gas-off extent, valves to operate, hazards at a position, isolation circle. */
    public MapOverlays overlays() {
        MapOverlays o = MapOverlays.NONE;
        if (!view.gasOff().isEmpty()) o = o.withGasOff(List.of(GasOffArea.of(view.gasOff())));
        o = o.withValvesToOperate(view.valves());
        List<HazardMark> marks = new ArrayList<>();
        for (Finding h : view.hazards()) {
            if (Double.isFinite(h.x()) && Double.isFinite(h.y())) marks.add(HazardMark.of(h.x(), h.y(), h.severity(), h.code()));
        }
        o = o.withHazards(marks);
        if (view.ring() != null) o = o.withRings(List.of(view.ring()));
        return o;
    }

    /** The map of the view fitted to its area of interest, with all valves and critical customers listed beside it. */
    public MapSheet mapSheet() {
        return MapSheet.of(painter, overlays(), area(), title, geo).withPaperName(paperName())
                .withNotes(notesHeading(), notes(null));
    }

    private String paperName() {
        String n = options.page().paper().name();
        return n.charAt(0) + n.substring(1).toLowerCase(Locale.ROOT);
    }

    private String notesHeading() {
        return view.valves().isEmpty() ? "Critical customers off gas" : "Valves to operate, critical customers off gas";
    }

    /** Lines for the side panel: valves and critical customers off gas inside {@code within} (everywhere when null). */
    private List<String> notes(Envelope within) {
        List<String> out = new ArrayList<>();
        if (geo == null) out.add(NO_CRS_NOTE);
        for (ReportView.OperatedValve v : view.valves()) {
            if (within != null && !within.contains(v.x(), v.y())) continue;
            String where = streets.describe(v.x(), v.y());
            out.add(v.order() + ". " + (v.close() ? "close " : "open ") + v.valveId() + (where.isEmpty() ? "" : ", " + where));
        }
        List<Service> svc = network.services();
        var off = view.servicesOff();
        for (int i = off.nextSetBit(0); i >= 0; i = off.nextSetBit(i + 1)) {
            Service s = svc.get(i);
            if (!s.isCritical() || s.geometry() == null) continue;
            if (within != null && !within.contains(s.geometry().getX(), s.geometry().getY())) continue;
            String kind = s.critical() == null || s.critical().isBlank() ? "critical" : s.critical();
            out.add("! " + kind + " " + s.id() + (s.address() == null ? "" : ", " + s.address()));
        }
        return out;
    }

    /** The overview (with the sheet index when the book has several sheets) and one sheet per book cell. */
    public List<Sheet> mapSheets() {
        List<Sheet> out = new ArrayList<>();
        Envelope all = area();
        if (book.size() > 1) all.expandToInclude(book.extent());
        MapSheet overview = MapSheet.of(painter, overlays(), all, title, geo).withPaperName(paperName())
                .withNotes(notesHeading(), notes(null));
        if (book.size() > 1) {
            List<MapSheet.IndexCell> idx = new ArrayList<>();
            for (MapBook.Cell c : book.cells()) idx.add(new MapSheet.IndexCell(c.number(), c.ground()));
            overview = overview.withIndex(idx).withSheetLabel("Overview and sheet index (" + book.size() + " sheets)");
        } else {
            overview = overview.withSheetLabel("Map sheet 1 of 1");
        }
        out.add(overview);
        if (book.size() <= 1) return out;
        for (MapBook.Cell c : book.cells()) {
            Envelope g = c.ground();
            Map<MapSheet.Side, Integer> nb = book.neighbours(c);
            Map<MapSheet.Side, String> edges = new java.util.EnumMap<>(MapSheet.Side.class);
            nb.forEach((side, n) -> edges.put(side, "continued on sheet " + n));
            out.add(MapSheet.of(painter, overlays(), g, title, geo).withPaperName(paperName())
                    .withScale(book.scale(), g.centre().x, g.centre().y)
                    .withSheetLabel("Sheet " + c.number() + " of " + book.size())
                    .withEdges(edges)
                    .withNotes("On sheet " + c.number() + ": valves, critical customers", notes(g)));
        }
        return out;
    }

    public List<List<String>> valveRows() {
        return FieldLists.valveRows(view, geo, options.listPrecision(), streets);
    }

    public List<List<String>> customerRows() {
        return FieldLists.customerRows(view, book.size() > 1 ? book : null);
    }

    /** Every page of report.pdf in order. */
    public List<Sheet> reportSheets() {
        PageFormat f = options.page();
        List<Sheet> out = new ArrayList<>(mapSheets());
        String sub = title.project() + " - " + view.subject();
        List<List<String>> vr = valveRows();
        if (vr.isEmpty()) vr = List.of(List.of("", "(no valves to operate in this view)"));
        out.addAll(TableSheets.layout("Valve operation list", sub, FieldLists.VALVE_HEADER, vr, f));
        List<List<String>> cr = customerRows();
        if (cr.isEmpty()) cr = List.of(List.of("", "(no customers off gas in this view)"));
        out.addAll(TableSheets.layout("Customers off gas (" + Plural.of(view.servicesOff().cardinality(), "service") + ", "
                + Plural.of(view.metersOff(), "meter") + ")", sub, FieldLists.CUSTOMER_HEADER, cr, f));
        if (!view.hazards().isEmpty()) out.addAll(TableSheets.layout("Hazards and actions", sub,
                FindingSection.HEADER, FindingSection.rows(view.hazards()), f));
        if (plan != null) {
            out.add(Charts.sheet(stepsChart(), "Services and meters off gas per step"));
            out.add(Charts.sheet(phasesChart(), "Customer-hours off gas per phase"));
        }
        return numbered(out);
    }

    /** The sheets with "page k of n" (the whole document) at the top right of each. */
    static List<Sheet> numbered(List<Sheet> sheets) {
        List<Sheet> out = new ArrayList<>(sheets.size());
        int n = sheets.size();
        for (int i = 0; i < n; i++) {
            Sheet s = sheets.get(i);
            String label = "page " + (i + 1) + " of " + n;
            out.add((g, w, h) -> {
                s.paint(g, w, h);
                g.setColor(java.awt.Color.BLACK);
                g.setFont(MapSheet.font(java.awt.Font.PLAIN, 7));
                g.drawString(label, (float) (w - MapSheet.MARGIN - g.getFontMetrics().stringWidth(label)), 16f);
            });
        }
        return out;
    }

    private JFreeChart stepsChart() {
        List<Charts.StepFigure> fs = new ArrayList<>();
        for (PlanEvaluation.StepResult s : plan.steps()) {
            fs.add(new Charts.StepFigure(s.step().number(), s.servicesOff(), (int) s.metersOff()));
        }
        return Charts.offPerStep(plan.states().plan().project(), fs);
    }

    private JFreeChart phasesChart() {
        List<Charts.PhaseFigure> fs = new ArrayList<>();
        for (PlanEvaluation.PhaseResult p : plan.phases()) fs.add(new Charts.PhaseFigure(p.phase().name(), p.customerHours()));
        return Charts.customerHoursPerPhase(plan.states().plan().project(), fs);
    }

    public List<WriteLayer> resultLayers() {
        return ResultLayers.build(view, geo, streets, book.size() > 1 ? book : null);
    }

    /**
     * Writes the chosen formats into {@code dir} (created when missing); returns the files written.
     *
     * @throws IOException when a file cannot be written or a target is an input file
     */
    public List<Path> write(Path dir, Progress progress) throws IOException {
        for (Path t : targets(dir)) refuseInput(t);
        return write(OutputPackage.start(dir, "export from the window"), progress);
    }

    /**
     * Writes the chosen formats into the package's folder and its manifest last
     * ({@link OutputPackage}); returns the files written, the manifest last.
     *
     * @throws IOException when a file cannot be written or a target is an input file
     */
    public List<Path> write(OutputPackage pkg, Progress progress) throws IOException {
        Path dir = pkg.dir();
        Set<Format> fm = options.formats();
        List<Path> targets = targets(dir);
        for (Path t : targets) refuseInput(t);
        List<Path> out = new ArrayList<>();
        PageFormat page = options.page();
        if (fm.contains(Format.PDF)) {
            progress.checkCancelled();
            Path p = dir.resolve("report.pdf");
            DocumentExport.pdf(reportSheets(), page, new DocumentExport.Info(title.project(), view.subject(),
                    options.preparedBy()), p);
            out.add(p);
        }
        if (fm.contains(Format.PNG)) {
            progress.checkCancelled();
            DocumentExport.png(mapSheet(), page, options.dpi(), add(out, dir.resolve("map.png")));
            if (plan != null) {
                DocumentExport.png(Charts.sheet(stepsChart(), "Services and meters off gas per step"), page, options.dpi(),
                        add(out, dir.resolve("chart-steps.png")));
                DocumentExport.png(Charts.sheet(phasesChart(), "Customer-hours off gas per phase"), page, options.dpi(),
                        add(out, dir.resolve("chart-phases.png")));
            }
        }
        if (fm.contains(Format.SVG)) {
            progress.checkCancelled();
            DocumentExport.svg(mapSheet(), page, add(out, dir.resolve("map.svg")));
            if (plan != null) {
                DocumentExport.svg(Charts.sheet(stepsChart(), "Services and meters off gas per step"), page,
                        add(out, dir.resolve("chart-steps.svg")));
                DocumentExport.svg(Charts.sheet(phasesChart(), "Customer-hours off gas per phase"), page,
                        add(out, dir.resolve("chart-phases.svg")));
            }
        }
        List<WriteLayer> layers = fm.contains(Format.GPKG) || fm.contains(Format.GEOJSON) ? resultLayers() : List.of();
        if (fm.contains(Format.GPKG)) {
            progress.checkCancelled();
            GeoPackageWriter.write(add(out, dir.resolve("results.gpkg")), network.crs(), layers, progress);
        }
        if (fm.contains(Format.GEOJSON)) {
            for (WriteLayer l : layers) {
                progress.checkCancelled();
                GeoJsonExport.write(add(out, dir.resolve(l.name() + ".geojson")), l, network.crs());
            }
        }
        if (fm.contains(Format.CSV)) {
            Csv.write(add(out, dir.resolve("valves.csv")), FieldLists.VALVE_HEADER, valveRows());
            Csv.write(add(out, dir.resolve("customers.csv")), FieldLists.CUSTOMER_HEADER, customerRows());
        }
        for (Path p : out) pkg.add(p);
        out.add(pkg.commit());
        return List.copyOf(out);
    }

    private static Path add(List<Path> out, Path p) {
        out.add(p);
        return p;
    }

    /** Every path {@link #write} may write into {@code dir} (the command line's input check uses it before anything is read). */
    public static List<Path> targets(Path dir) {
        List<Path> t = new ArrayList<>();
        for (String n : List.of("report.pdf", "map.png", "map.svg", "results.gpkg", "valves.csv", "customers.csv",
                "chart-steps.png", "chart-phases.png", "chart-steps.svg", "chart-phases.svg", OutputPackage.MANIFEST)) {
            t.add(dir.resolve(n));
        }
        for (String n : List.of("gas_off", "valves_to_operate", "affected_services", "hazards", "station_sheds",
                "isolation_circle")) {
            t.add(dir.resolve(n + ".geojson"));
        }
        t.add(dir);
        return t;
    }

    private void refuseInput(Path target) throws IOException {
        for (Path in : new Path[] {networkFile, planFile}) {
            if (in == null) continue;
            if (same(in, target)) {
                throw new IOException("refusing to write " + target + ": it is an input file (" + in
                        + "); choose another output folder");
            }
        }
    }

    private static boolean same(Path a, Path b) throws IOException {
        if (Files.exists(a) && Files.exists(b)) return Files.isSameFile(a, b);
        return a.toAbsolutePath().normalize().equals(b.toAbsolutePath().normalize());
    }
}
