package org.shutline.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.shutline.model.Operability;
import org.shutline.model.Service;
import org.shutline.model.ValveKind;
import org.shutline.render.GeoTransform;
import org.shutline.render.GridReference;

/**
 * The two lists that go to the field with a map: the valve operation list and the
 * affected-customer list, as a header and rows of text (for {@link TableSheets} and
 * {@link Csv}).
 *
 * <p>Valve list, one row per valve to operate in the view's order: order number (for an
 * incident the field order along the crews' routes), crew (empty for a plan step),
 * valve id, US National Grid reference at the given precision (digits truncated; empty
 * when the CRS is unknown), location from the street layer ({@link StreetLocator}),
 * valve kind, operability (with "past inspection" when overdue), last inspection date
 * (empty when none recorded), action (close/open) and, for a doubtful valve, the whole
 * instruction if it will not close (the valves to add and what they add, or the
 * station to stop).
 *
 * <p>Customer list, one row per service off gas: critical customers first, then by map
 * sheet, then service id; columns service id, address, class, meters, critical kind,
 * map-book sheet (empty when the service lies on no sheet).
 */
public final class FieldLists {
    public static final List<String> VALVE_HEADER = List.of("order", "crew", "valve", "grid reference (USNG)", "location", "kind",
            "operable", "last inspection", "action", "if it will not close");
    public static final List<String> CUSTOMER_HEADER = List.of("service", "address", "class", "meters", "critical",
            "sheet");

    private FieldLists() {}

    public static List<List<String>> valveRows(ReportView view, GeoTransform geo, GridReference.Precision precision,
                                               StreetLocator streets) {
        List<List<String>> rows = new ArrayList<>();
        for (ReportView.OperatedValve v : view.valves()) {
            rows.add(List.of(Integer.toString(v.order()), v.crew() == 0 ? "" : Integer.toString(v.crew()), v.valveId(),
                    grid(geo, v.x(), v.y(), precision), streets.describe(v.x(), v.y()), word(v.valveKind()),
                    operable(v.operable(), v.overdue()), v.checked() == null ? "" : v.checked().toString(),
                    v.close() ? "close" : "open", v.ifFails()));
        }
        return rows;
    }

    /** The grid reference of a point, or empty when there is no transform or no reference there. */
    public static String grid(GeoTransform geo, double x, double y, GridReference.Precision p) {
        if (geo == null) return "";
        try {
            return geo.gridReference(x, y).format(p);
        } catch (IllegalArgumentException e) {
            return "";
        }
    }

    private static String word(ValveKind k) {
        return k == null ? "" : k.name().toLowerCase(Locale.ROOT);
    }

    private static String operable(Operability o, boolean overdue) {
        String w = o == null ? "" : o.name().toLowerCase(Locale.ROOT);
        return overdue ? w + ", past inspection" : w;
    }

    public static List<List<String>> customerRows(ReportView view, MapBook book) {
        List<Service> svc = view.state().network().services();
        List<Service> off = new ArrayList<>();
        var set = view.servicesOff();
        for (int i = set.nextSetBit(0); i >= 0; i = set.nextSetBit(i + 1)) off.add(svc.get(i));
        off.sort(Comparator.comparing((Service s) -> !s.isCritical())
                .thenComparingInt(s -> sheetSortKey(book, s))
                .thenComparing(Service::id));
        List<List<String>> rows = new ArrayList<>();
        for (Service s : off) {
            int sheet = sheetOf(book, s);
            String crit = s.isCritical() ? (s.critical() == null || s.critical().isBlank() ? "critical" : s.critical()) : "";
            rows.add(List.of(s.id(), s.address() == null ? "" : s.address(),
                    s.serviceClass() == null ? "" : s.serviceClass().name().toLowerCase(Locale.ROOT),
                    Integer.toString(s.meters()), crit, sheet == 0 ? "" : Integer.toString(sheet)));
        }
        return rows;
    }

    static int sheetOf(MapBook book, Service s) {
        if (book == null || s.geometry() == null) return 0;
        return book.sheetOf(s.geometry().getX(), s.geometry().getY());
    }

    private static int sheetSortKey(MapBook book, Service s) {
        int n = sheetOf(book, s);
        return n == 0 ? Integer.MAX_VALUE : n;
    }
}
