package org.thermion.cli;

import org.thermion.cli.report.Format;
import picocli.CommandLine.Option;

/** A subcommand whose answer is a report in one of the {@link Format}s, chosen by {@code --format}. */
abstract class ReportCommand extends CommandBase {
    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "text, csv or json (default: ${DEFAULT-VALUE}).")
    Format format;
}
