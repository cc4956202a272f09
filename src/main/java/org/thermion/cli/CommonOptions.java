package org.thermion.cli;

import picocli.CommandLine.Option;

/** Options every command takes. */
final class CommonOptions {
    @Option(names = "--debug", description = "Show stack traces of internal errors.")
    boolean debug;
}
