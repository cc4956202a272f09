package org.thermion.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import org.thermion.asm.Assembler;
import org.thermion.asm.Assembly;
import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;
import org.thermion.testing.Golden;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

/**
 * The demo machine and pump.asm in a session, shown on a Lanterna virtual terminal: tests
 * press keys, draw, and read the screen back as text.
 */
final class UiFixture {
    static final Path MACHINE = Path.of("examples", "pumpstation", "pumpstation.machine");
    static final Path PROGRAM = Path.of("programs", "pump.asm");

    final Session session;
    final DefaultVirtualTerminal terminal;
    final TerminalScreen screen;
    final TerminalUi ui;

    UiFixture(int cols, int rows) throws IOException {
        this(session(new InitMode.Zero()), cols, rows);
    }

    UiFixture(Session session, int cols, int rows) throws IOException {
        this(session, cols, rows, PROGRAM.getFileName().toString());
    }

    /** A fixture whose title line names {@code program}. */
    UiFixture(Session session, int cols, int rows, String program) throws IOException {
        this.session = session;
        terminal = new DefaultVirtualTerminal(new TerminalSize(cols, rows));
        screen = new TerminalScreen(terminal);
        screen.startScreen();
        ui = new TerminalUi(screen, session, program, new PowerUpView(session.machine()));
        ui.draw();
    }

    /** The demo and pump.asm, elaborated and assembled once for all tests: both are immutable. */
    private static final class Demo {
        static final Machine MACHINE = elaborate();
        static final Assembly PUMP = program(MACHINE);
    }

    static Machine machine() {
        return Demo.MACHINE;
    }

    private static Machine elaborate() {
        SourceSet src = new SourceSet();
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(src, d).elaborate(MACHINE);
        if (m == null || d.hasErrors()) {
            StringWriter w = new StringWriter();
            new DiagnosticPrinter(src).print(d, new PrintWriter(w));
            throw new AssertionError("demo machine does not elaborate:\n" + w);
        }
        return m;
    }

    static Assembly program(Machine m) {
        Diagnostics d = new Diagnostics();
        Assembly a = Assembler.assemble(m, PROGRAM, d);
        if (a == null || d.hasErrors()) {
            throw new AssertionError("pump.asm does not assemble: " + d);
        }
        return a;
    }

    static Session session(InitMode init) {
        return new Session(Demo.MACHINE, Demo.PUMP, DecodeLamp.DEFAULT_NAME, init, null);
    }

    /** Presses each character of {@code keys} in turn, then draws. */
    UiFixture type(String keys) throws IOException {
        for (char c : keys.toCharArray()) {
            ui.handle(new KeyStroke(c, false, false));
        }
        ui.draw();
        return this;
    }

    UiFixture press(KeyType t) throws IOException {
        ui.handle(new KeyStroke(t));
        ui.draw();
        return this;
    }

    UiFixture resize(int cols, int rows) throws IOException {
        terminal.setTerminalSize(new TerminalSize(cols, rows));
        ui.draw();
        return this;
    }

    /** The terminal's characters, one line per row, trailing blanks kept off. */
    String text() {
        TerminalSize size = terminal.getTerminalSize();
        StringBuilder b = new StringBuilder();
        for (int row = 0; row < size.getRows(); row++) {
            StringBuilder line = new StringBuilder();
            for (int col = 0; col < size.getColumns(); col++) {
                line.append(terminal.getCharacter(col, row).getCharacterString());
            }
            b.append(line.toString().stripTrailing()).append('\n');
        }
        return b.toString();
    }

    /** The status line: cycle, phase, the instruction at the PC, running or why stopped. */
    String status() {
        String[] rows = text().split("\n", -1);
        return rows[terminal.getTerminalSize().getRows() - 2];
    }

    /** The row of the screen holding {@code needle}, or "" when none does. */
    String line(String needle) {
        for (String l : text().split("\n")) {
            if (l.contains(needle)) {
                return l;
            }
        }
        return "";
    }

    /** Compares the screen with a golden file under src/test/resources/org/thermion/tui/ ({@link Golden}). */
    void assertGolden(String name) throws IOException {
        Golden.assertMatches(Path.of("src", "test", "resources", "org", "thermion", "tui", name), text());
    }
}
