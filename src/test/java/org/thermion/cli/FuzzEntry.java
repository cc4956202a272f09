package org.thermion.cli;

import picocli.CommandLine;

/** The command line as {@link Main} builds it, for the fuzzer in another test package. */
public final class FuzzEntry {
    private FuzzEntry() {
    }

    /** A fresh command line, exactly as {@code thermion} runs it (handlers included). */
    public static CommandLine commandLine() {
        return Main.commandLine();
    }
}
