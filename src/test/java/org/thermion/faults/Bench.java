package org.thermion.faults;

import org.thermion.asm.Assembler;
import org.thermion.asm.Assembly;
import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.function.BiFunction;

/** The machines the fault tests use: c17, the demo with its program, and machines from text. */
final class Bench {
    static final Path C17 = Path.of("src", "test", "resources", "org", "thermion", "faults", "c17.machine");
    static final Path DEMO = Path.of("examples", "pumpstation", "pumpstation.machine");
    static final Path DEMO_PROGRAM = Path.of("programs", "pump.asm");

    private Bench() {
    }

    static Machine c17() {
        return load((e, d) -> e.elaborate(C17));
    }

    static Machine demo() {
        return load(DEMO);
    }

    static Machine load(Path file) {
        return load((e, d) -> e.elaborate(file));
    }

    /** The demo's program assembled into ROM words. */
    static long[] demoRom(Machine demo) {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        return words(Assembler.assemble(demo, DEMO_PROGRAM, src, d), d);
    }

    /** A program from text assembled into ROM words. */
    static long[] rom(Machine m, String program) {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        return words(Assembler.assembleText(m, Path.of("generated.asm"), program, src, d), d);
    }

    private static long[] words(Assembly a, Diagnostics d) {
        if (a == null || d.hasErrors()) {
            throw new AssertionError("program did not assemble");
        }
        return a.words();
    }

    /** A machine from text, elaborated against the parts library. */
    static Machine text(String text) {
        return load((e, d) -> e.elaborateText(Path.of("generated.machine"), text));
    }

    private static Machine load(BiFunction<Elaborator, Diagnostics, Machine> how) {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        Machine m = how.apply(new Elaborator(src, d), d);
        if (m == null || d.hasErrors()) {
            StringWriter w = new StringWriter();
            new DiagnosticPrinter(src).print(d, new PrintWriter(w));
            throw new AssertionError("machine did not elaborate:\n" + w);
        }
        return m;
    }
}
