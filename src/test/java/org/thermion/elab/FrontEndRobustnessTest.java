package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;

/**
 * Mangles the example descriptions thousands of times (lines deleted, duplicated and
 * swapped; tokens deleted, duplicated and swapped) and requires the front end to answer
 * each with diagnostics or a machine, never with an uncaught exception.
 */
class FrontEndRobustnessTest {
    static final int RUNS = 2000;

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void mutatedDescriptionsOnlyEverGiveDiagnostics() throws Exception {
        long seed = Long.getLong("fuzz.seed", 20261201L);
        Random rnd = new Random(seed);
        List<Path> files = List.of(Path.of("examples/pumpstation/pumpstation.machine"),
                Path.of("examples/pumpstation/decoder.machine"),
                Path.of("examples/decoder-board/decoder-board.machine"));
        List<String> texts = new ArrayList<>();
        for (Path f : files) {
            texts.add(Files.readString(f));
        }
        int withErrors = 0;
        for (int run = 0; run < RUNS; run++) {
            int which = rnd.nextInt(files.size());
            String mutated = mutate(texts.get(which), rnd);
            Path nominal = files.get(which);
            SourceSet sources = new SourceSet();
            Diagnostics diags = new Diagnostics();
            try {
                new Elaborator(sources, diags).elaborateText(nominal, mutated);
                StringWriter sw = new StringWriter();
                new DiagnosticPrinter(sources).print(diags, new PrintWriter(sw));
                if (diags.hasErrors()) {
                    withErrors++;
                    assertThat(sw.toString()).contains("error:");
                }
            } catch (RuntimeException | StackOverflowError e) {
                fail("run " + run + " (seed " + seed + ") threw " + e + " on:\n" + mutated, e);
            }
        }
        assertThat(withErrors).as("most mutants are broken").isGreaterThan(RUNS / 4);
    }

    static String mutate(String text, Random rnd) {
        int edits = 1 + rnd.nextInt(3);
        for (int e = 0; e < edits; e++) {
            text = rnd.nextBoolean() ? mutateLines(text, rnd) : mutateTokens(text, rnd);
        }
        return text;
    }

    private static String mutateLines(String text, Random rnd) {
        List<String> lines = new ArrayList<>(List.of(text.split("\n", -1)));
        if (lines.size() < 2) {
            return text;
        }
        int i = rnd.nextInt(lines.size());
        int j = rnd.nextInt(lines.size());
        switch (rnd.nextInt(3)) {
            case 0 -> lines.remove(i);
            case 1 -> lines.add(j, lines.get(i));
            default -> {
                String t = lines.get(i);
                lines.set(i, lines.get(j));
                lines.set(j, t);
            }
        }
        return String.join("\n", lines);
    }

    private static String mutateTokens(String text, Random rnd) {
        List<String> toks = new ArrayList<>(List.of(text.split("(?<=\\s)|(?=\\s)|(?<=[{}()\\[\\],;=&|^!])|(?=[{}()\\[\\],;=&|^!])")));
        if (toks.size() < 2) {
            return text;
        }
        int i = rnd.nextInt(toks.size());
        int j = rnd.nextInt(toks.size());
        switch (rnd.nextInt(3)) {
            case 0 -> toks.remove(i);
            case 1 -> toks.add(j, toks.get(i));
            default -> {
                String t = toks.get(i);
                toks.set(i, toks.get(j));
                toks.set(j, t);
            }
        }
        return String.join("", toks);
    }
}
