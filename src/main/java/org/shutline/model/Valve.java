package org.shutline.model;

import java.time.LocalDate;
import org.locationtech.jts.geom.Point;

/** A valve on a main of its system; {@code checked} is the last inspection date, null when unknown. */
public record Valve(String id, String systemId, ValveKind kind, NormalPosition normal,
                    Operability operable, LocalDate checked, Point geometry) implements Feature {
}
