package org.thermion.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** `check` as a user meets it: exit codes, where errors go, no stack traces. */
class CheckCommandTest {
    record Result(int code, String out, String err) {
    }

    static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = Main.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute(args);
        return new Result(code, out.toString(), err.toString());
    }

    @Test
    void demoPrintsItsSummaryAndExitsOneExactlyWhenItsCircuitsFail() {
        Result r = run("check", "examples/pumpstation/pumpstation.machine");
        assertThat(r.out()).contains("machine pumpstation", "stage instances", "tubes:", "12AU7", "heater strings (");
        // electrical findings are errors at the stage use; the description itself is sound
        assertThat(r.code()).isEqualTo(r.err().contains(": error: ") ? ExitCodes.CHECK_FAILED : ExitCodes.OK);
        assertThat(r.err()).doesNotContain("Exception");
    }

    @Test
    void aLampDriverOnALowRailIsAnErrorAtItsUseWithTheNumbersAndTheFix(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("lamp.machine");
        Files.writeString(f, """
                rail bplus { voltage 24 V }
                rail bias { voltage -12 V }
                rail heat { voltage 12.6 V }
                heaters on heat { parallel 12AU7 }
                module top {
                  in a
                  out lit
                  lit = lamp_driver(a)
                }
                machine lamp { top top; inputs a; outputs lit }
                """);
        Result r = run("check", f.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.CHECK_FAILED);
        // the library's 12 V, 6.5 mA lamp, sized for a 48 V B+, in a 12AU7 pair's plates on 24 V cannot reach its rating
        assertThat(r.err()).contains(f + ":8:", "lamp of 'lit' (lamp_driver) gets", "against its rated 6.50 mA",
                "under-driven", "^", "= ");
    }

    @Test
    void brokenDescriptionExitsTwoWithPlaceAndCaret(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("bad.machine");
        Files.writeString(f, """
                rail heat { voltage 12.6 V }
                module top {
                  in a
                  out y
                  y = a &
                }
                """);
        Result r = run("check", f.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains(f + ":5:").contains("^").doesNotContain("Exception").doesNotContain("\tat ");
    }

    @Test
    void missingFileIsBadInputNotACrash() {
        Result r = run("check", "no/such/file.machine");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("cannot read").contains("no such file");
    }

    @Test
    void unknownOptionIsUsageError() {
        Result r = run("check", "--frobnicate", "x.machine");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("error:");
    }

    private static final String MODULES_ONLY = "src/test/resources/org/thermion/cli/reports/modules-only.machine";

    @Test
    void aFileOfModulesOnlyIsCheckedModuleByModule() {
        Result r = run("check", MODULES_ONLY);
        assertThat(r.code()).isZero();
        // majority: three ANDs and one OR; parity_latch: two inverters, two ANDs, one OR and its latch
        assertThat(r.out()).contains("modules only (no machine block, so").containsPattern("majority +4 +0")
                .containsPattern("parity_latch +5 +1");
    }

    private static final String LIBRARY_STAGES = "src/test/resources/org/thermion/cli/reports/modules-library-stages.machine";

    @Test
    void aFileOfModulesWithoutRealizeOrRailsIsCheckedAsIfItHadTheLibraryStagesItNames(@TempDir Path dir) throws Exception {
        Result alone = run("check", LIBRARY_STAGES);
        assertThat(alone.code()).isZero();
        assertThat(alone.err()).isEmpty();
        String text = alone.out().replace("\n  ", " ");
        String realize = text.substring(text.indexOf("`realize {") + 1, text.indexOf("}`") + 1);
        assertThat(realize).contains("not pentode_inverter", "latch triode_flipflop");
        assertThat(text).contains("Rails taken as the including machine's (not declared here): bias, bplus.");
        // The same modules with the realize block and rails the report names: nothing assumed, the same counts.
        Path explicit = dir.resolve("explicit.machine");
        Files.writeString(explicit, "rail bplus { voltage 48 V }\nrail bias { voltage -24 V }\n" + realize + "\n"
                + Files.readString(Path.of(LIBRARY_STAGES)));
        Result written = run("check", explicit.toString());
        assertThat(written.code()).isZero();
        assertThat(written.out()).doesNotContain("parts library's first stage", "Rails taken");
        assertThat(table(written.out())).isEqualTo(table(alone.out())).contains("half_adder", "lamp_select");
    }

    @Test
    void theExampleDecoderFileMeantForIncludeChecksWithoutErrors() {
        // examples/pumpstation/decoder.machine has modules only; the pump station supplies realize and rails
        Result r = run("check", "examples/pumpstation/decoder.machine");
        assertThat(r.err()).doesNotContain("error");
        assertThat(r.code()).isZero();
        assertThat(r.out().replace("\n  ", " ")).startsWith("examples/pumpstation/decoder.machine: modules only")
                .contains("as if it had `realize {");
    }

    private static String table(String out) {
        return out.substring(out.indexOf("modules:"));
    }

    @Test
    void otherCommandsOnAFileOfModulesOnlySayWhatTheyNeed() {
        Result r = run("budget", MODULES_ONLY);
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("no machine block", "`check` checks them", "machine NAME { top MODULE");
    }

    @Test
    void aFileWithNeitherModulesNorMachineIsStillAnError(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("rails.machine");
        Files.writeString(f, "rail bplus { voltage 48 V }\n");
        Result r = run("check", f.toString());
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("no machine block in rails.machine");
    }
}
