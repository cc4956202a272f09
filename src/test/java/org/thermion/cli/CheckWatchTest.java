package org.thermion.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;

import static org.assertj.core.api.Assertions.assertThat;

class CheckWatchTest {
    private static void waitFor(BooleanSupplier ok) throws InterruptedException {
        while (!ok.getAsBoolean()) {
            Thread.sleep(50);
        }
    }

    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void aSaveWithAnErrorIsCheckedAgainAndShowsTheErrorThenTheFixClearsIt(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("c17.machine");
        String good = Files.readString(Path.of("src/test/resources/org/thermion/faults/c17.machine"));
        Files.writeString(f, good, StandardCharsets.UTF_8);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        Thread t = new Thread(() -> Main.commandLine().setOut(new PrintWriter(out, true)).setErr(new PrintWriter(err, true))
                .execute("check", "--watch", f.toString()));
        t.start();
        try {
            waitFor(() -> out.toString().contains("watching 1 file"));
            assertThat(err.toString()).doesNotContain("error:");
            Thread.sleep(org.thermion.tui.FileStamps.POLL_MILLIS * 2);
            Files.writeString(f, good.replace("n22 = pentode_nand2(n10, n16)", "n22 = pentode_nand2(n10, n16"),
                    StandardCharsets.UTF_8);
            waitFor(() -> err.toString().contains("error:"));
            assertThat(out.toString()).contains("changed: checking again");
            assertThat(err.toString()).contains(f + ":").contains("language.md#");
            int before = out.toString().split("watching", -1).length;
            Thread.sleep(org.thermion.tui.FileStamps.POLL_MILLIS * 2);
            Files.writeString(f, good + "\n", StandardCharsets.UTF_8);
            waitFor(() -> out.toString().split("watching", -1).length > before);
            assertThat(out.toString()).contains("machine c17");
        } finally {
            t.interrupt();
            t.join(5000);
        }
        assertThat(t.isAlive()).isFalse();
    }
}
