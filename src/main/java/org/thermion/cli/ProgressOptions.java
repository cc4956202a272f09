package org.thermion.cli;

import picocli.CommandLine.Option;

/** {@code --progress} and {@code --quiet}: the long commands' say over their progress bar. */
final class ProgressOptions {
    @Option(names = "--progress", description = "Show a progress bar on standard error even when it is not a terminal.")
    boolean progress;

    @Option(names = "--quiet", description = "Show no progress bar (wins over --progress).")
    boolean quiet;

    ProgressBar.Mode mode() {
        return quiet ? ProgressBar.Mode.NEVER : progress ? ProgressBar.Mode.ALWAYS : ProgressBar.Mode.AUTO;
    }
}
