package org.shutline.model;

import java.util.List;

/**
 * A network as read from one GeoPackage or one shapefile folder: feature lists in
 * the input's order, context layers, the CRS, where it came from, and the findings
 * made while reading (unknown words, bad geometry, re-projection notices).
 * Lists are unmodifiable.
 */
public record Network(String sourceName, CrsInfo crs, List<Main> mains, List<Valve> valves,
                      List<Station> stations, List<SenseTap> taps, List<Service> services,
                      List<Source> sources, List<ContextLayer> context, List<Finding> readFindings) {
    public Network {
        mains = List.copyOf(mains);
        valves = List.copyOf(valves);
        stations = List.copyOf(stations);
        taps = List.copyOf(taps);
        services = List.copyOf(services);
        sources = List.copyOf(sources);
        context = List.copyOf(context);
        readFindings = List.copyOf(readFindings);
    }
}
