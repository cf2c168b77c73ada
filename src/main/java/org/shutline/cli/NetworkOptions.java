package org.shutline.cli;

import java.nio.file.Path;
import org.shutline.app.AnalysisSettings;
import org.shutline.app.Workspace;
import org.shutline.io.InputException;
import org.shutline.model.Progress;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The network a command reads (first parameter) and its {@code --mapping} file; opened through {@link Workspace}. */
final class NetworkOptions {
    @Parameters(index = "0", paramLabel = "NETWORK", description = "a .gpkg file or a folder of shapefiles")
    Path network;

    @Option(names = "--mapping", paramLabel = "FILE", description = "field-mapping file (YAML)")
    Path mapping;

    /** Opens the network for a command other than {@code check} ({@link NetworkInput#load}: data errors reported, no usable main refused). */
    Workspace open(AnalysisSettings settings) throws InputException {
        return NetworkInput.load(network, mapping, settings, Progress.NONE);
    }
}
