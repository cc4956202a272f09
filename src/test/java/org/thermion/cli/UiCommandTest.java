package org.thermion.cli;

import org.junit.jupiter.api.Test;
import org.thermion.tui.Session;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** The ui command where tests run: without a terminal, so it must say why it cannot start. */
class UiCommandTest {
    private static final String MACHINE = "examples/pumpstation/pumpstation.machine";
    private static final String PROGRAM = "programs/pump.asm";

    @Test
    void withoutATerminalItRefusesWithTheReasonAndExitCode2() {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine().setOut(new PrintWriter(out)).setErr(new PrintWriter(err))
                .execute("ui", MACHINE, PROGRAM);
        assertThat(code).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(err.toString()).contains("ui needs an interactive terminal").doesNotContain("Exception");
        assertThat(out.toString()).isEmpty();
    }

    @Test
    void aBadInitModeOrAMissingFileIsReportedAndGivesNoSession() {
        StringWriter err = new StringWriter();
        Session s = UiCommand.open(Path.of(MACHINE), Path.of(PROGRAM), null, "warm", "line", new PrintWriter(err));
        assertThat(s).isNull();
        assertThat(err.toString()).contains("--init").contains("zero, random:SEED or unknown");

        StringWriter err2 = new StringWriter();
        assertThat(UiCommand.open(Path.of(MACHINE), Path.of("programs/none.asm"), null, "zero", "line",
                new PrintWriter(err2))).isNull();
        assertThat(err2.toString()).contains("none.asm");
    }

    @Test
    void aStimulusFileSetsTheSwitchesAsItsCyclesCome() {
        StringWriter err = new StringWriter();
        Session s = UiCommand.open(Path.of(MACHINE), Path.of(PROGRAM), Path.of("programs/pump-day.csv"), "zero", "line",
                new PrintWriter(err));
        assertThat(s).as(err.toString()).isNotNull();
        s.toggleRun();
        s.run(170); // pump-day.csv: low wet from cycle 80, high wet too from 160
        assertThat(s.input(0)).isTrue();
        assertThat(s.input(1)).isTrue();
        assertThat(s.output(0)).as("pump stopped by the full tank").isEqualTo(org.thermion.tui.Level.OFF);
    }

    @Test
    void withoutArgumentsAndWithoutATerminalTheDemoRunsHeadless() {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine().setOut(new PrintWriter(out)).setErr(new PrintWriter(err)).execute();
        String text = out.toString();
        assertThat(text).contains("No terminal here").contains("output changes:").contains("pump")
                .contains("supply check").contains("can injure or kill");
        // pump-day.csv: the empty tank starts the pump in the first pass (ST pump at cycle 5),
        // the full tank from cycle 160 stops it within the next pass.
        assertThat(text).containsPattern("\\n\\s+5\\s+2\\s+pump\\s+1");
        assertThat(text).containsPattern("\\n\\s+16\\d\\s+2\\s+pump\\s+0");
        assertThat(code).isIn(ExitCodes.OK, ExitCodes.CHECK_FAILED);
    }
}
