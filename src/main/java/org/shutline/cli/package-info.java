/**
 * Command-line entry points: {@link org.shutline.cli.Main} and one class per
 * subcommand ({@code check}, {@code generate}; more are added beside them). The same
 * engine as the window; output as text or JSON (docs/cli.md). Exit codes: 0 done,
 * 1 the check found errors, 2 unreadable input or a wrong command line.
 */
package org.shutline.cli;
