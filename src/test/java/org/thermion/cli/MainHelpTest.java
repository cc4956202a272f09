package org.thermion.cli;

import org.junit.jupiter.api.Test;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import static org.assertj.core.api.Assertions.assertThat;

/** The help a builder reads lists the builder's commands; developer tools stay out of it. */
class MainHelpTest {
    @Test
    void topLevelHelpListsTheBuildersCommandsButNotBench() {
        CheckCommandTest.Result r = CheckCommandTest.run("--help");
        assertThat(r.code()).isZero();
        assertThat(r.out()).containsPattern("(?m)^ +check ").contains("run ", "asm ", "budget ", "powerup ", "timing ", "verify ", "plan ", "diagnose ", "sheets ")
                .doesNotContainPattern("(?m)^ +bench ");
    }

    @Test
    void runHelpLeavesTheEngineChoiceToDevelopers() {
        CheckCommandTest.Result r = CheckCommandTest.run("run", "--help");
        assertThat(r.out()).contains("--cycles").doesNotContain("--engine");
    }

    @Test
    void theHiddenToolsStillWork() {
        assertThat(CheckCommandTest.run("bench", "--help").out()).contains("Usage: thermion bench");
        CheckCommandTest.Result r = CheckCommandTest.run("run", "examples/pumpstation/pumpstation.machine",
                "programs/pump.asm", "--engine", "array", "--cycles", "5");
        assertThat(r.code()).isZero();
    }

    @Test
    void everyCommandsHelpFormatsWithoutComplaint() {
        // A lone '%' in a description makes the help library print a warning and the raw text.
        PrintStream was = System.err;
        ByteArrayOutputStream seen = new ByteArrayOutputStream();
        try {
            System.setErr(new PrintStream(seen, true, StandardCharsets.UTF_8));
            for (String name : Main.commandLine().getSubcommands().keySet()) {
                CheckCommandTest.Result r = CheckCommandTest.run(name, "--help");
                assertThat(r.code()).as(name).isZero();
                assertThat(r.out()).as(name).contains("Usage: thermion " + name);
            }
        } finally {
            System.setErr(was);
        }
        assertThat(seen.toString(StandardCharsets.UTF_8)).doesNotContain("WARN");
    }
}
