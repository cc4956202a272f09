package org.thermion.cli;

import org.thermion.build.Designations;
import org.thermion.build.Part;
import org.thermion.build.PartClass;
import org.thermion.build.Wiring;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.model.Machine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static org.thermion.cli.report.ReportUnit.TEXT;

/**
 * {@code sheets designators MACHINE [--save]}: every part's designator and whether it comes from
 * the designators file beside the machine; {@code --save} records them there.
 */
@Command(name = "designators", mixinStandardHelpOptions = true,
        description = {"Reference designators (IEEE 315 class letters, numbered per board) of every part but the "
                + "sockets (XV3 holds V3), and where each comes from: kept from the file NAME.designators beside the "
                + "machine, or new. Every sheets selection reads that file, so parts that did not change keep their "
                + "designators when others are added or removed.",
                "--save writes the file (the parts of a previous save that are gone stay in it as retired, their "
                        + "numbers not given out again); without --save nothing is written."})
final class SheetsDesignators extends SheetsDocument {
    @Option(names = "--save", description = "Record the designators in NAME.designators beside the machine.")
    boolean save;

    @Option(names = OutputFiles.REPLACE, description = "With --save: replace that file even when it was not written by --save.")
    boolean replace;

    private int code = ExitCodes.OK;

    @Override
    Report report(Machine m, PrintWriter err) {
        Wiring w = documents(m).wiring();
        Path file = Designations.beside(options.machineFile);
        Table t = new Table("designators", "Designators")
                .column("designator", "ref", TEXT).column("board", "board", TEXT).column("part", "part", TEXT)
                .column("source", "from", TEXT, "file: kept from " + file.getFileName() + "; new: numbered now; "
                        + "retired: in the file, no longer in the machine");
        Set<String> present = new HashSet<>();
        int kept = 0;
        for (Part p : w.parts()) {
            if (p.cls() == PartClass.SOCKET) {
                continue;
            }
            boolean fromFile = designations.records(p.ref());
            kept += fromFile ? 1 : 0;
            present.add(p.ref());
            t.row(p.ref(), w.boards().get(p.board()), p.role(), fromFile ? "file" : "new");
        }
        for (Map.Entry<String, String> e : designations.byRole().entrySet()) {
            if (!present.contains(e.getValue())) {
                t.row(e.getValue(), "", e.getKey(), "retired");
            }
        }
        for (Map.Entry<String, String> e : designations.retired().entrySet()) {
            if (!present.contains(e.getKey())) {
                    t.row(e.getKey(), "", e.getValue(), "retired");
            }
        }
        Report r = start(m, "designators").field("file", file.toString()).field("kept", kept).table(t);
        if (save) {
            OutputFiles.Refusal no = OutputFiles.check(file, OutputFiles.Kind.DESIGNATORS, replace,
                    List.of(options.machineFile), null);
            if (no != null) {
                code = no.print(err);
                return null;
            }
            try {
                OutputFiles.write(file, designations.write(m.name(), w), StandardCharsets.UTF_8);
            } catch (IOException e) {
                err.println("error: cannot write " + file + ": " + e.getMessage());
                return null;
            }
            r.text("saved to " + file);
        } else {
            r.text("not saved: run with --save to record these designators in " + file);
        }
        return r;
    }

    @Override
    int exitCode() {
        return code;
    }
}
