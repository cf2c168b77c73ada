package org.shutline.topology;

import java.util.List;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.index.strtree.STRtree;
import org.shutline.model.Station;

/**
 * Which stations lie near a point: used to exempt a station's own location from the
 * {@code systems-touching} finding. A station counts when it lies within the point
 * tolerance (inclusive) and links the two systems concerned, in either direction.
 */
final class StationNear {
    private final List<Station> stations;
    private final STRtree tree = new STRtree();
    private final double radius;

    StationNear(List<Station> stations, boolean[] usable, double radius) {
        this.stations = stations;
        this.radius = radius;
        for (int i = 0; i < stations.size(); i++) {
            if (!usable[i]) continue;
            Point p = stations.get(i).geometry();
            tree.insert(new Envelope(p.getX(), p.getX(), p.getY(), p.getY()), i);
        }
        tree.build();
    }

    boolean linksNear(String a, String b, double x, double y) {
        boolean[] found = {false};
        tree.query(new Envelope(x - radius, x + radius, y - radius, y + radius), item -> {
            Station s = stations.get((Integer) item);
            double dx = s.geometry().getX() - x;
            double dy = s.geometry().getY() - y;
            if (Math.sqrt(dx * dx + dy * dy) > radius) return;
            String in = InputCheck.key(s.inSys());
            String out = InputCheck.key(s.outSys());
            if ((in.equals(a) && out.equals(b)) || (in.equals(b) && out.equals(a))) found[0] = true;
        });
        return found[0];
    }
}
