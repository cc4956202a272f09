package org.thermion.cli;

import org.thermion.build.BuildDocuments;
import org.thermion.build.Designations;
import org.thermion.cli.report.Report;
import org.thermion.model.Machine;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

import java.io.PrintWriter;
import java.util.concurrent.Callable;

/**
 * One {@code sheets} selection that is a report: loads the machine, builds the report, writes it
 * in the chosen format. A selection whose output is not a report implements {@code Callable} itself.
 */
abstract class SheetsDocument implements Callable<Integer> {
    /** Raised with any key of any selection: they share one schema, {@code sheets.schema.json}. */
    static final int VERSION = 7;

    @Mixin
    SheetsOptions options;

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    /** The designators file beside the machine (read before {@link #report}). */
    Designations designations = Designations.NONE;

    /** The machine's build documents, parts keeping the designators recorded beside it. */
    BuildDocuments documents(Machine m) {
        return BuildDocuments.of(m, designations);
    }

    /** The document for {@code m}; null after printing why it cannot be made (exit 2). */
    abstract Report report(Machine m, PrintWriter err);

    /** Exit code once the report is written: 1 where a check in it failed. */
    int exitCode() {
        return ExitCodes.OK;
    }

    @Override
    public final Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Machine m = options.load(err);
        if (m == null) {
            return ExitCodes.BAD_INPUT;
        }
        designations = options.designations(err);
        if (designations == null) {
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        Report r = report(m, err);
        err.flush();
        if (r == null) {
            return ExitCodes.BAD_INPUT;
        }
        options.format.write(out, r);
        out.flush();
        return exitCode();
    }

    /** A report of this family with its common fields. */
    static Report start(Machine m, String document) {
        return new Report("sheets", VERSION).field("machine", m.name()).field("document", document);
    }

    /** A module's path, or "top" for the machine's top module (whose path is empty). */
    static String moduleName(Machine m, int module) {
        String path = m.modules().get(module).path();
        return path.isEmpty() ? "top" : path;
    }
}
