package org.thermion.cli;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.thermion.testing.Golden;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Golden output of every report command in text, CSV and JSON. The cases are the
 * {@code *.args} files of {@code src/test/resources/org/thermion/cli/reports} (found by
 * listing the folder): a line {@code exit N} and one command line (without {@code --format}),
 * run from the project folder, and optionally a line {@code stderr}: standard error (the same in
 * every format) is then compared with {@code NAME.err}, else it must be empty. Each format's output is compared with {@code NAME.txt},
 * {@code NAME.csv} and {@code NAME.json} (rewrite with {@code -Dgolden.update=true}) and
 * checked for its shape: text width, CSV records, JSON against the command's schema.
 */
class ReportGoldenTest {
    static final Path DIR = Path.of("src", "test", "resources", "org", "thermion", "cli", "reports");

    @TestFactory
    List<DynamicTest> everyCaseInEveryFormat() throws IOException {
        List<DynamicTest> tests = new ArrayList<>();
        for (Path args : Golden.corpus(DIR, ".args")) {
            String base = args.getFileName().toString().replace(".args", "");
            int exit = -1;
            boolean stderr = false;
            List<String> command = null;
            for (String line : Files.readAllLines(args, StandardCharsets.UTF_8)) {
                if (line.startsWith("exit ")) {
                    exit = Integer.parseInt(line.substring(5).trim());
                } else if (line.trim().equals("stderr")) {
                    stderr = true;
                } else if (!line.isBlank() && !line.startsWith("#")) {
                    command = new ArrayList<>(Arrays.asList(line.trim().split("\\s+")));
                }
            }
            assertThat(command).as("%s holds a command line", args).isNotNull();
            int code = exit;
            List<String> cmd = command;
            boolean err = stderr;
            for (String format : List.of("text", "csv", "json")) {
                tests.add(DynamicTest.dynamicTest(base + " as " + format, () -> check(base, cmd, format, code, err)));
            }
        }
        return tests;
    }

    private static void check(String base, List<String> command, String format, int exit, boolean stderr) {
        List<String> a = new ArrayList<>(command);
        a.add("--format");
        a.add(format);
        ReportChecks.Result r = ReportChecks.run(a.toArray(String[]::new));
        if (stderr) {
            Golden.assertMatches(DIR.resolve(base + ".err"), r.err());
        } else {
            assertThat(r.err()).as("standard error of %s", a).isEmpty();
        }
        assertThat(r.code()).as("exit code of %s", a).isEqualTo(exit);
        String ext = format.equals("text") ? "txt" : format;
        Golden.assertMatches(DIR.resolve(base + "." + ext), r.out());
        switch (format) {
            case "text" -> ReportChecks.assertText(r.out());
            case "csv" -> ReportChecks.assertCsv(r.out());
            default -> ReportChecks.assertJson(r.out());
        }
    }
}
