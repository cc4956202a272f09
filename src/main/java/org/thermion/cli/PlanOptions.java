package org.thermion.cli;

import picocli.CommandLine.Option;

import java.io.PrintWriter;
import java.nio.file.Path;

/** The options that make a plan, shared by {@code plan} and {@code diagnose} so both make the same steps. */
final class PlanOptions {
    @Option(names = "--program", paramLabel = "PROGRAM.asm", description = "The program in the ROM (machines with a ROM).")
    Path program;

    @Option(names = "--distinguish",
            description = "Add steps until no group of faults the plan cannot tell apart holds more than three "
                    + "(give it to 'diagnose' too when you followed such a plan).")
    boolean distinguish;

    @Option(names = "--threads", paramLabel = "N", defaultValue = "2",
            description = "Threads for fault simulation (default: ${DEFAULT-VALUE}).")
    int threads;

    /** False, after saying why on {@code err}, when a value is out of range. */
    boolean valid(PrintWriter err) {
        if (threads < 1) {
            err.println("error: --threads must be at least 1, not " + threads);
            return false;
        }
        return true;
    }
}
