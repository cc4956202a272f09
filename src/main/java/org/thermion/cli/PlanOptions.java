package org.thermion.cli;

import picocli.CommandLine.Option;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** The options that make a plan, shared by {@code plan} and {@code diagnose} so both make the same steps. */
final class PlanOptions {
    @Option(names = "--program", paramLabel = "PROGRAM.asm", description = "The program in the ROM (machines with a ROM).")
    Path program;

    @Option(names = "--distinguish",
            description = "Add steps until no group of faults the plan cannot tell apart holds more than three "
                    + "(give it to 'diagnose' too when you followed such a plan).")
    boolean distinguish;

    @Option(names = "--next-program", paramLabel = "PROGRAM.asm",
            description = "With --distinguish, on a machine with a ROM: when the steps leave groups of more than three, "
                    + "go on with this program (switch off, fit it, switch on, more steps); may be given more than once, "
                    + "tried in turn (give the same ones to 'diagnose').")
    List<Path> nextPrograms = new ArrayList<>();

    @Option(names = "--threads", paramLabel = "N", defaultValue = "2",
            description = "Threads for fault simulation (default: ${DEFAULT-VALUE}).")
    int threads;

    /** False, after saying why on {@code err}, when a value is out of range. */
    boolean valid(PrintWriter err) {
        if (threads < 1) {
            err.println("error: --threads must be at least 1, not " + threads);
            return false;
        }
        if (!nextPrograms.isEmpty() && !distinguish) {
            err.println("error: --next-program only goes with --distinguish (it extends the plan to tell faults apart)");
            return false;
        }
        return true;
    }
}
