package org.thermion.cli;

import org.junit.jupiter.api.Test;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.atomic.AtomicLong;

import static org.assertj.core.api.Assertions.assertThat;

class ProgressBarTest {
    @Test
    void theLineShowsShareCountRateAndTimeLeft() {
        String line = ProgressBar.line("sizing", "resistors", 5, 20, 10.0);
        assertThat(line).hasSize(ProgressBar.WIDTH);
        // 5 done in 10 s: 0.5 a second, 15 to go take 30 s
        assertThat(line).startsWith("sizing [").contains(" 25 %").contains("5 of 20 resistors").contains("0.500 resistors/s")
                .contains("30 s left");
        int full = line.indexOf(']') - line.indexOf('[') - 1;
        assertThat(line.chars().filter(c -> c == '#').count()).isEqualTo(Math.round(0.25 * full));
    }

    @Test
    void longWaitsReadInMinutesAndHours() {
        assertThat(ProgressBar.duration(200)).isEqualTo("3 min 20 s");
        assertThat(ProgressBar.duration(7500)).isEqualTo("2 h 5 min");
        assertThat(ProgressBar.line("plan", "", -1, 0, 3.2)).startsWith("plan: working, 3 s so far");
    }

    @Test
    void nothingIsDrawnInTheFirstSecondNorEverWhenOff() {
        AtomicLong now = new AtomicLong();
        StringWriter sw = new StringWriter();
        ProgressBar bar = new ProgressBar(new PrintWriter(sw), "verify", "cases", true, now::get);
        now.set(900_000_000L);
        bar.update(10, 100);
        assertThat(sw.toString()).isEmpty();
        now.set(1_500_000_000L);
        bar.update(20, 100);
        assertThat(sw.toString()).startsWith("\rverify [");
        int drawn = sw.toString().length();
        now.set(1_600_000_000L); // within a quarter second: not redrawn
        bar.update(21, 100);
        assertThat(sw.toString()).hasSize(drawn);
        bar.close();
        assertThat(sw.toString()).endsWith(" \r");

        StringWriter off = new StringWriter();
        ProgressBar quiet = new ProgressBar(new PrintWriter(off), "verify", "cases", false, now::get);
        now.set(9_000_000_000L);
        quiet.update(50, 100);
        quiet.close();
        assertThat(off.toString()).isEmpty();
    }

    @Test
    void testsRunWithoutATerminalOnStandardError() {
        // Surefire pipes the forked JVM's standard error: the automatic mode must see no terminal.
        assertThat(ProgressBar.stderrIsTerminal()).isFalse();
    }
}
