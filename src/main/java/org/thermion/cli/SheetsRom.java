package org.thermion.cli;

import org.thermion.build.DiodeMatrix;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.model.BuiltBlock;
import org.thermion.model.Machine;
import org.thermion.model.StageType;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.TEXT;

/**
 * {@code sheets rom MACHINE --program FILE [--was FILE]}: the ROM as a diode matrix, a grid of word
 * lines against bit lines, the list of diodes, and with {@code --was} the diodes a program change
 * adds and removes.
 */
@Command(name = "rom", mixinStandardHelpOptions = true,
        description = {"The ROM as a diode matrix: one word line per address, one bit line per data bit, a diode "
                + "(anode on the word line, cathode on the bit line) wherever the assembled word has a 1. Each "
                + "crossing has its own designator CR(address x width + bit + 1), so a diode keeps its number "
                + "whatever the program.",
                "Prints the grid (x = diode), the list of diodes and the diode count; with --was, the diodes to "
                        + "take out and to fit to turn the ROM of that program into this one."})
final class SheetsRom extends SheetsDocument {
    @Option(names = "--program", paramLabel = "FILE", required = true, description = "The program the ROM holds.")
    Path program;

    @Option(names = "--was", paramLabel = "FILE", description = "The program the ROM holds now: list the diodes to change.")
    Path was;

    @Override
    Report report(Machine m, PrintWriter err) {
        if (m.rom() == null) {
            err.println("error: machine " + m.name() + " has no ROM: its word comes from switches, so there is no "
                    + "diode matrix to build");
            return null;
        }
        long[] words = assemble(m, program, err);
        long[] before = was == null ? null : assemble(m, was, err);
        if (words == null || (was != null && before == null)) {
            return null;
        }
        DiodeMatrix matrix = DiodeMatrix.of(m.rom(), words);
        int used = Math.max(1, lastUsed(words) + 1);
        Report r = start(m, "rom")
                .field("words", m.rom().words())
                .field("width", m.rom().width())
                .field("programmed_words", used)
                .field("diodes", matrix.diodes().size());
        r.view(grid(matrix, used));
        Table list = new Table("diodes", "Diodes")
                .column("designator", "ref", TEXT).column("address", "address", COUNT)
                .column("word_line", "word line", TEXT).column("bit", "bit", COUNT).column("bit_line", "bit line", TEXT);
        for (DiodeMatrix.Diode d : matrix.diodes()) {
            list.row(d.ref(), d.address(), wordLine(d.address()), d.bit(), "D" + d.bit());
        }
        r.table(list);
        if (before != null) {
            List<DiodeMatrix.Change> changes = matrix.changesFrom(DiodeMatrix.of(m.rom(), before));
            Table t = new Table("diode_changes", "Diodes to change")
                    .column("action", "do", TEXT).column("designator", "ref", TEXT).column("address", "address", COUNT)
                    .column("word_line", "word line", TEXT).column("bit_line", "bit line", TEXT);
            for (DiodeMatrix.Change c : changes) {
                DiodeMatrix.Diode d = c.diode();
                t.row(c.add() ? "fit" : "take out", d.ref(), d.address(), wordLine(d.address()), "D" + d.bit());
            }
            r.field("diodes_to_fit", changes.stream().filter(DiodeMatrix.Change::add).count())
                    .field("diodes_to_take_out", changes.stream().filter(c -> !c.add()).count())
                    .table(t);
        }
        List<String> notes = new ArrayList<>();
        if (used < m.rom().words()) {
            notes.add("word lines " + wordLine(used) + " to " + wordLine(m.rom().words() - 1) + " hold no diodes");
        }
        BuiltBlock block = m.built().stream().filter(b -> b.block().equals("rom")).findFirst().orElse(null);
        if (block == null || !block.counted()) {
            notes.add("address decoding: " + (block == null ? "not described" : block.leftOut()));
            r.field("decoding_tubes", 0);
        } else {
            Table dec = decoding(m, block);
            r.field("decoding_tubes", tubes(block).size()).table(dec);
        }
        r.text(notes);
        return r;
    }

    /** The envelopes the block's stages are packed into. */
    private static java.util.Set<Integer> tubes(BuiltBlock block) {
        java.util.Set<Integer> envelopes = new java.util.TreeSet<>();
        for (BuiltBlock.Instances in : block.stages()) {
            for (int e : in.envelopes()) {
                envelopes.add(e);
            }
        }
        return envelopes;
    }

    /** The ROM's address decoding and drivers as its block states them: each stage, its instances and the tubes holding them. */
    private Table decoding(Machine m, BuiltBlock block) {
        java.util.Map<Integer, String> tubeRef = new java.util.HashMap<>();
        for (org.thermion.build.Wiring.Socket s : documents(m).wiring().sockets()) {
            tubeRef.put(s.envelope(), s.tubeRef());
        }
        Table t = new Table("decoding", "Address decoding and drivers (the rom block's stages)")
                .column("stage", "stage", TEXT).column("tube", "tube", TEXT).column("instances", "instances", COUNT)
                .column("tubes", "in tubes", TEXT);
        for (BuiltBlock.Instances in : block.stages()) {
            StageType st = m.stages().get(in.stage());
            java.util.Set<String> refs = new java.util.LinkedHashSet<>();
            for (int e : in.envelopes()) {
                refs.add(tubeRef.getOrDefault(e, "envelope " + (e + 1)));
            }
            t.row(st.name(), m.tubes().get(st.tube()).name(), in.count(), String.join(" ", refs));
        }
        return t;
    }

    /** Word line by word line, one column per bit line from the highest bit down, x where a diode sits. */
    private static Table grid(DiodeMatrix matrix, int used) {
        int digits = Math.max(1, (matrix.width() + 3) / 4);
        Table t = new Table("grid", "Diode matrix (x = diode, anode to the word line)")
                .column("address", "address", COUNT).column("word", "word", TEXT);
        for (int b = matrix.width() - 1; b >= 0; b--) {
            t.column("d" + b, "D" + b, TEXT);
        }
        for (int a = 0; a < used; a++) {
            Object[] row = new Object[2 + matrix.width()];
            row[0] = a;
            row[1] = String.format(Locale.ROOT, "%0" + digits + "X", matrix.word(a));
            for (int b = matrix.width() - 1; b >= 0; b--) {
                row[2 + matrix.width() - 1 - b] = matrix.has(a, b) ? "x" : ".";
            }
            t.row(row);
        }
        return t;
    }

    private static String wordLine(int address) {
        return "W" + address;
    }

    private static int lastUsed(long[] words) {
        for (int i = words.length - 1; i >= 0; i--) {
            if (words[i] != 0) {
                return i;
            }
        }
        return -1;
    }

    private long[] assemble(Machine m, Path file, PrintWriter err) {
        ProgramInput in = ProgramInput.read(m, file, null, options.loader, err);
        if (in == null) {
            return null;
        }
        long[] words = in.rom();
        if (words.length > m.rom().words()) {
            err.println("error: " + file + " assembles to " + words.length + " words; the ROM holds " + m.rom().words());
            return null;
        }
        return words;
    }
}
