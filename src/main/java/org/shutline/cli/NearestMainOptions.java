package org.shutline.cli;

import picocli.CommandLine.Option;

/** How a point given with {@code --at} is placed on a main ({@code isolate}, {@code export}): {@code --system}, {@code --max-distance-m}. */
final class NearestMainOptions {
    @Option(names = "--system", paramLabel = "ID", description = "with --at: take the nearest active main of this system")
    String system;

    @Option(names = "--max-distance-m", paramLabel = "M", defaultValue = "100", converter = Locations.PositiveMetres.class,
        description = "with --at: refuse a point farther than this from every active main (default: ${DEFAULT-VALUE})")
    double maxDistanceM;
}
