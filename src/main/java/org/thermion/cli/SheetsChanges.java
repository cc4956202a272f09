package org.thermion.cli;

import org.thermion.build.BuildDocuments;
import org.thermion.build.Designations;
import org.thermion.build.Rewiring;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.model.Machine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import static org.thermion.cli.report.ReportUnit.TEXT;

/** {@code sheets changes MACHINE NEW}: what to rewire to turn one revision of a machine into the next. */
@Command(name = "changes", mixinStandardHelpOptions = true,
        description = {"What to rewire between two revisions of a machine: wires to unsolder, parts to take out, "
                + "stages the packing moved to other tube sections, wires that move to another node, parts whose "
                + "value or type changes, parts to fit and wires to add.",
                "Parts are matched by what they do (plate load of x), designators read from each revision's "
                        + "NAME.designators (the new revision takes the old one's file when it has none)."})
final class SheetsChanges extends SheetsDocument {
    @Parameters(index = "1", paramLabel = "NEW", description = "The .machine file to build (MACHINE is the one as built).")
    Path newFile;

    @Override
    Report report(Machine before, PrintWriter err) {
        SheetsOptions after = new SheetsOptions();
        after.machineFile = newFile;
        Machine b = after.load(err);
        if (b == null) {
            return null;
        }
        Designations db = Files.isRegularFile(Designations.beside(newFile)) ? after.designations(err) : designations;
        if (db == null) {
            return null;
        }
        return report(b, Rewiring.between(documents(before).wiring(), BuildDocuments.of(b, db).wiring()));
    }

    private static Report report(Machine m, Rewiring r) {
        Table t = new Table("changes", "Changes, in working order")
                .column("action", "do", TEXT).column("designator", "ref", TEXT).column("pin", "pin", TEXT)
                .column("what", "what", TEXT).column("before", "from", TEXT).column("after", "to", TEXT);
        for (Rewiring.Change c : r.changes()) {
            t.row(c.action().name().toLowerCase(Locale.ROOT).replace('_', ' '), c.ref(), word(c.pin()), c.what(),
                    word(c.before()), word(c.after()));
        }
        return start(m, "changes")
                .field("parts_removed", r.count(Rewiring.Action.REMOVE_PART))
                .field("parts_added", r.count(Rewiring.Action.ADD_PART))
                .field("parts_changed", r.count(Rewiring.Action.CHANGE_PART))
                .field("stages_moved", r.count(Rewiring.Action.MOVE_STAGE))
                .field("wires_removed", r.count(Rewiring.Action.REMOVE_WIRE))
                .field("wires_moved", r.count(Rewiring.Action.MOVE_WIRE))
                .field("wires_added", r.count(Rewiring.Action.ADD_WIRE))
                .table(t);
    }

    private static Object word(String s) {
        return s.isEmpty() ? Absent.NONE : s;
    }
}
