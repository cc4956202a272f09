package org.thermion.cli;

import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

import java.io.PrintWriter;
import java.util.concurrent.Callable;

/**
 * What every subcommand shares: the common options ({@code --debug}), its streams, and the one way
 * it answers a bad option or file: {@code error: ...}, an optional {@code = hint} line, exit code 2.
 * Internal errors are not handled here but by {@link Failures}.
 */
abstract class CommandBase implements Callable<Integer> {
    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    PrintWriter out() {
        return spec.commandLine().getOut();
    }

    PrintWriter err() {
        return spec.commandLine().getErr();
    }

    /** Prints {@code error: message} and returns the exit code for bad input. */
    int badInput(String message) {
        return badInput(message, null);
    }

    /** Prints {@code error: message} and {@code = hint} (when not null) and returns the exit code for bad input. */
    int badInput(String message, String hint) {
        PrintWriter err = err();
        err.println("error: " + message);
        if (hint != null) {
            err.println("  = " + hint);
        }
        err.flush();
        return ExitCodes.BAD_INPUT;
    }
}
