package org.thermion.cli;

import picocli.CommandLine;

/** Turns an unexpected exception into exit code 3 and one line, with the trace only under --debug. */
final class Failures implements CommandLine.IExecutionExceptionHandler {
    @Override
    public int handleExecutionException(Exception ex, CommandLine cl, CommandLine.ParseResult parsed) {
        if (ex instanceof BadInput b) {
            cl.getErr().println(b.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        boolean debug = parsed.expandedArgs().contains("--debug");
        cl.getErr().println("internal error: " + ex + (debug ? "" : " (run with --debug for details)"));
        if (debug) {
            ex.printStackTrace(new java.io.PrintWriter(cl.getErr(), true));
        }
        return ExitCodes.INTERNAL;
    }

    /** A usage or input problem already explained in its message. */
    static final class BadInput extends RuntimeException {
        BadInput(String message) {
            super(message, null, false, false);
        }
    }
}
