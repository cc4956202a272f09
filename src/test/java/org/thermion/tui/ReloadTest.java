package org.thermion.tui;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.thermion.asm.Assembler;
import org.thermion.asm.Assembly;
import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Edit and see: the UI reads the description and program again when one is saved. A good file
 * gives a new machine that goes on from where the old one stood (latches and switches by name,
 * PC, cycle count, breakpoints and cursor by source line) with a notice of what changed; a bad
 * one leaves the old machine running and shows the located errors. Files are copies of the demo
 * under target/ so the golden screens name a fixed path.
 */
class ReloadTest {
    static final Path DIR = Path.of("target", "reload-test");
    static final Path MACHINE = DIR.resolve("pumpstation.machine");
    static final Path PROGRAM = DIR.resolve("pump.asm");

    /** Reads the copies the way the ui command does: elaborate, assemble, errors as printed lines. */
    static final class CopyReloader implements Reloader {
        @Override
        public Set<Path> files() {
            return Set.of(MACHINE, PROGRAM, DIR.resolve("decoder.machine"));
        }

        @Override
        public Result load() {
            SourceSet src = new SourceSet();
            Diagnostics d = new Diagnostics();
            Machine m = new Elaborator(src, d).elaborate(MACHINE);
            Assembly a = m == null || d.hasErrors() ? null : Assembler.assemble(m, PROGRAM, src, d);
            if (d.hasErrors() || a == null) {
                StringWriter w = new StringWriter();
                new DiagnosticPrinter(src).print(d, new PrintWriter(w));
                return new Failed(w.toString().lines().toList(), files());
            }
            return new Loaded(new Session(m, a, DecodeLamp.DEFAULT_NAME, new InitMode.Zero(), null), files());
        }
    }

    UiFixture f;

    @BeforeEach
    void copyTheDemo() throws IOException {
        Files.createDirectories(DIR);
        Files.copy(UiFixture.MACHINE, MACHINE, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        Files.copy(UiFixture.MACHINE.resolveSibling("decoder.machine"), DIR.resolve("decoder.machine"),
                java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        Files.copy(UiFixture.PROGRAM, PROGRAM, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        Reloader r = new CopyReloader();
        f = new UiFixture(((Reloader.Loaded) r.load()).session(), 100, 30);
        f.ui.reloadOnSave(r);
    }

    private void edit(Path file, String from, String to) throws IOException {
        String text = Files.readString(file);
        assertThat(text).contains(from);
        Files.writeString(file, text.replace(from, to));
    }

    @Test
    void aSavedProgramKeepsTheMachineWhereItStood() throws IOException {
        // Three cycles, the hand switch on, a breakpoint on the cursor line (the PC's).
        f.type("ccc3.b");
        String pcBefore = f.ui.session().pc() + "";
        assertThat(f.ui.session().breakpointCount()).isEqualTo(1);
        // A comment line above everything moves every source line down by one, no word changes.
        Files.writeString(PROGRAM, "; a note added while the machine stood at cycle 3\n" + Files.readString(PROGRAM));
        f.ui.reload("pump.asm");
        f.ui.draw();
        Session now = f.ui.session();
        assertThat(now.cycle()).isEqualTo(3);
        assertThat(now.pc() + "").isEqualTo(pcBefore);
        assertThat(now.input(2)).isTrue();
        assertThat(now.breakpointCount()).isEqualTo(1);
        assertThat(f.text()).contains("no change to the logic, the instruction set or the program")
                .contains("kept: cycle 3, PC 03, ").contains("6 switches, 1 breakpoint");
        f.assertGolden("reload-program-100x30.txt");
        // The next key closes the notice and still steps.
        f.type("c");
        assertThat(f.text()).doesNotContain("reloaded after");
        assertThat(f.ui.session().cycle()).isEqualTo(4);
    }

    @Test
    void aChangedDescriptionSaysWhatChanged() throws IOException {
        f.type("cc");
        edit(MACHINE, "period 300 us", "period 50 us");
        f.ui.reload("pumpstation.machine");
        f.ui.draw();
        assertThat(f.text()).contains("clock: 2 phases, 300 us a cycle \u2192 2 phases, 50 us a cycle");
        assertThat(f.ui.session().cycle()).isEqualTo(2);
        assertThat(f.ui.session().machine().clock().periodSeconds()).isCloseTo(50e-6, org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void aBadSaveLeavesTheMachineRunningAndShowsWhereTheErrorIs() throws IOException {
        f.type("cc");
        Session before = f.ui.session();
        int line = 1 + Files.readAllLines(MACHINE).stream().takeWhile(l -> !l.contains("latch acc on phase 2")).toList().size();
        edit(MACHINE, "latch acc on phase 2", "latch acc on phase two");
        f.ui.reload("pumpstation.machine");
        f.ui.draw();
        assertThat(f.ui.session()).isSameAs(before);
        assertThat(f.text()).contains("pumpstation.machine has errors").contains("pumpstation.machine:" + line + ":");
        f.assertGolden("reload-error-100x30.txt");
        // The old machine still steps; saving a good file again reloads.
        f.type("c");
        assertThat(f.ui.session().cycle()).isEqualTo(3);
        edit(MACHINE, "latch acc on phase two", "latch acc on phase 2");
        f.ui.reload("pumpstation.machine");
        assertThat(f.ui.session()).isNotSameAs(before);
        assertThat(f.ui.session().cycle()).isEqualTo(3);
    }

    @Test
    void aSaveIsSeenByPollingOnceTheFileHoldsStill() throws IOException, InterruptedException {
        long t = System.nanoTime();
        edit(MACHINE, "period 300 us", "period 80 us");
        // First poll sees it change, the next (one poll later) sees it held still and reloads.
        for (int i = 1; i <= 3; i++) {
            f.ui.pollFiles(t + i * FileStamps.POLL_MILLIS * 1_000_000L);
        }
        assertThat(f.ui.session().machine().clock().periodSeconds()).isCloseTo(80e-6, org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void namesAreListedShortAndCountedNounsAgree() {
        assertThat(Words.list(List.of("a", "b", "c", "d", "e", "f"))).isEqualTo("a, b, c, d and 2 more");
        assertThat(Notice.wrap(List.of("file:1:2: error: expected a clock phase here"), 20))
                .containsExactly("file:1:2: error:", "    expected a clock", "    phase here");
    }
}
