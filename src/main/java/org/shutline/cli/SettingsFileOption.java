package org.shutline.cli;

import java.nio.file.Path;
import org.shutline.app.AnalysisSettings;
import org.shutline.io.InputException;
import picocli.CommandLine.Option;

/** {@code --settings FILE}: the settings file (docs/settings.md) a command reads before its own options. */
final class SettingsFileOption {
    @Option(names = "--settings", paramLabel = "FILE",
        description = "settings file (YAML, see docs/settings.md); options given on the command line override it")
    Path file;

    /** The file's settings, or the defaults when none is given. */
    AnalysisSettings load() throws InputException {
        return file == null ? AnalysisSettings.defaults() : AnalysisSettings.load(file);
    }
}
