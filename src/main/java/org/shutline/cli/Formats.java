package org.shutline.cli;

import picocli.CommandLine.Option;

/** The {@code --format} option of the commands that print a result: text or json, or also csv. */
final class Formats {
    private Formats() {}

    /** What a command prints. */
    enum Format { text, json, csv }

    /** {@code --format text|json}. */
    static final class TextJson {
        enum Choice { text, json }

        @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
        private Choice format;

        Format format() {
            return Format.valueOf(format.name());
        }
    }

    /** {@code --format text|json|csv}. */
    static final class TextJsonCsv {
        @Option(names = "--format", defaultValue = "text", description = "text, json or csv (default: ${DEFAULT-VALUE})")
        private Format format;

        Format format() {
            return format;
        }
    }
}
