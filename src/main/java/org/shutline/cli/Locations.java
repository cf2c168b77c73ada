package org.shutline.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.shutline.analysis.Placement;
import org.shutline.analysis.Zone;
import org.shutline.model.Network;
import org.shutline.model.Service;
import picocli.CommandLine;

/**
 * Where an incident or isolation is, from the location options ({@code --at},
 * {@code --usng}, {@code --main}, {@code --address}), placed on the network by
 * {@link Placement} with the same refusal rule for every command: a point farther
 * than {@code --max-distance-m} from every active main is refused (exit 2) with the
 * distance and the network's extent; a grid reference is placed at its cell's centre
 * and refused when the cell is larger than that distance or lies outside the network.
 * Numbers that are not finite are refused when the command line is read
 * ({@link FiniteNumber}).
 */
final class Locations {
    private Locations() {}

    /**
     * A placed location: the placement and the text naming what was given. {@code x, y}
     * is the point the incident is at (the point given, the grid cell's centre or the
     * service), NaN for a whole main.
     */
    record Located(Placement.Placed placed, String label) {
        Zone zone() {
            return placed.zone();
        }

        double x() {
            return placed.x();
        }

        double y() {
            return placed.y();
        }

        /** "Placed on main M-IP-007 (IP-1), moved 2.9 m to 512547.0, 4890600.0" or "Placed on main M-IP-007 (IP-1)". */
        String placedText() {
            Placement.Placed p = placed;
            if (p.edge() < 0) return "Placed " + p.describe();
            return "Placed " + p.describe() + String.format(Locale.ROOT, " to %.1f, %.1f", p.snappedX(), p.snappedY());
        }
    }

    /** Thrown for a location that is refused; the message says why. */
    static final class Refusal extends Exception {
        Refusal(String message) {
            super(message);
        }
    }

    static Located at(Placement pl, double[] at, String system, double maxM) throws Refusal {
        if (at.length != 2) throw new Refusal("--at takes X,Y");
        return point(pl, at[0], at[1], system, maxM, String.format(Locale.ROOT, "point %.1f,%.1f", at[0], at[1]));
    }

    static Located main(Placement pl, String mainId) throws Refusal {
        return placed(pl.main(mainId), "main " + mainId, "main " + mainId);
    }

    /**
     * A grid reference: the centre of its cell, refused when the cell is larger than
     * {@code maxM} (its centre may then be that far from the incident) or the centre is
     * not near the network.
     */
    static Located usng(Placement pl, GridSheets grid, String text, String system, double maxM) throws Refusal {
        GridSheets.Cell c;
        try {
            c = grid.locate(text);
        } catch (IllegalArgumentException e) {
            throw new Refusal(e.getMessage());
        }
        String label = "USNG " + text.trim();
        if (c.sizeM() == Integer.MAX_VALUE) {
            throw new Refusal(label + " names a whole grid zone (6 by 8 degrees), not a place; give the 100 km square and"
                    + " digits to " + Placement.metres(maxM) + " or finer");
        }
        if (c.sizeM() > maxM) {
            throw new Refusal(label + " names a cell of " + Placement.metres(c.sizeM()) + ", larger than the refusal distance of "
                    + Placement.metres(maxM) + ": the incident could be anywhere in it; give more digits");
        }
        if (!Double.isFinite(c.x()) || !Double.isFinite(c.y())) {
            throw new Refusal(label + " cannot be converted to the network's coordinate system");
        }
        return point(pl, c.x(), c.y(), system, maxM, label + String.format(Locale.ROOT, " (centre of its %s cell)",
                Placement.metres(c.sizeM())));
    }

    /**
     * A service address: the one service it names, placed where that service is
     * attached; null when it names several (they are listed on {@code err}).
     */
    static Located address(Placement pl, Network net, String text, String cmd, PrintWriter err) throws Refusal {
        List<Integer> found = Addresses.find(net, text);
        if (found.isEmpty()) throw new Refusal("no service with an address matching '" + text + "'");
        if (found.size() > 1) {
            err.println(cmd + ": the address '" + text + "' matches " + found.size() + " services; give one of:");
            for (int i = 0; i < Math.min(found.size(), 30); i++) {
                Service s = net.services().get(found.get(i));
                err.println("  " + s.id() + "  " + s.address());
            }
            if (found.size() > 30) err.println("  ... and " + (found.size() - 30) + " more");
            err.flush();
            return null;
        }
        Service s = net.services().get(found.get(0));
        String label = "address " + s.address() + " (service " + s.id() + ")";
        return placed(pl.service(found.get(0)), label, label);
    }

    private static Located point(Placement pl, double x, double y, String system, double maxM, String label) throws Refusal {
        return placed(pl.point(x, y, system, maxM), label, label);
    }

    private static Located placed(Placement.Result r, String label, String what) throws Refusal {
        if (r instanceof Placement.Refused f) {
            String hint = Double.isFinite(f.nearestM()) ? " (--max-distance-m sets the limit)" : "";
            throw new Refusal("refused: " + f.reason() + hint);
        }
        return new Located((Placement.Placed) r, label);
    }

    /** A command-line number that must be finite: NaN and infinities are refused when the line is read (exit 2). */
    static final class FiniteNumber implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            double d;
            try {
                d = Double.parseDouble(value.trim());
            } catch (NumberFormatException e) {
                throw new CommandLine.TypeConversionException("'" + value + "' is not a number");
            }
            if (!Double.isFinite(d)) throw new CommandLine.TypeConversionException("'" + value + "' is not a finite number");
            return d;
        }
    }

    /** A distance in metres that must be positive and finite. */
    static final class PositiveMetres implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            double d = new FiniteNumber().convert(value);
            if (!(d > 0) || d > OptionRange.MAX_DISTANCE_M.max()) {
                throw new CommandLine.TypeConversionException("'" + value + "' is not a distance in metres more than 0 and at most "
                        + OptionRange.num(OptionRange.MAX_DISTANCE_M.max()));
            }
            return d;
        }
    }
}
