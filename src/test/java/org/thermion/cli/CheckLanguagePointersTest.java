package org.thermion.cli;

import org.junit.jupiter.api.Test;
import org.thermion.lang.LanguageSections;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/** Every pointer {@code check} prints with an error names a section that exists in the language reference. */
class CheckLanguagePointersTest {
    private static final Pattern POINTER = Pattern.compile("language reference: src/docs/language\\.md#([a-z0-9-]+)");

    /** The anchors of the document's headings, made as the common Markdown renderers make them. */
    static Set<String> headingAnchors() throws IOException {
        Set<String> out = new HashSet<>();
        for (String line : Files.readAllLines(Path.of(LanguageSections.DOCUMENT), StandardCharsets.UTF_8)) {
            if (line.startsWith("#")) {
                String title = line.replaceFirst("^#+\\s*", "").toLowerCase(Locale.ROOT);
                out.add(title.replaceAll("[^a-z0-9 _-]", "").replace(' ', '-'));
            }
        }
        return out;
    }

    @Test
    void everyAnchorTheMapperCanGiveIsAHeadingOfTheReference() throws IOException {
        Set<String> headings = headingAnchors();
        assertThat(headings).contains("rail", "latch-timing", "which-operand-an-instruction-takes");
        assertThat(headings).containsAll(LanguageSections.anchors());
    }

    @Test
    void everyPointerCheckPrintsForTheBadInputCorpusResolves() throws IOException {
        Set<String> headings = headingAnchors();
        List<Path> cases;
        try (Stream<Path> s = Files.list(Path.of("src/test/resources/org/thermion/badinput"))) {
            // check-* cases fail the electrical judgement of a well-formed description: no language pointer
            cases = s.filter(p -> p.toString().endsWith(".machine") && !p.getFileName().toString().startsWith("check-"))
                    .sorted().toList();
        }
        int pointers = 0;
        for (Path c : cases) {
            String err = check(c.toString());
            Matcher m = POINTER.matcher(err);
            while (m.find()) {
                assertThat(headings).as("pointer in %s", c).contains(m.group(1));
                pointers++;
            }
            long errors = err.lines().filter(l -> l.contains(": error: ") && l.startsWith(c.getParent().toString())).count();
            assertThat(err.split("language reference: ", -1).length - 1L).as("one pointer per error in %s", c)
                    .isEqualTo(errors);
        }
        assertThat(pointers).isGreaterThan(10);
    }

    @Test
    void aRailLinePointsAtRailsAndAStrayOperatorInAnExpressionAtExpressions(@org.junit.jupiter.api.io.TempDir Path dir)
            throws IOException {
        Path rail = dir.resolve("rail.machine");
        Files.writeString(rail, "rail bplus { voltage 48 V; source 2 ohm; limit 300 mA; colour blue }\n",
                StandardCharsets.UTF_8);
        assertThat(check(rail.toString())).contains("language.md#rail");
        Path expr = dir.resolve("expr.machine");
        Files.writeString(expr, "module m {\n  in a\n  out y\n  y = a + + \n}\n", StandardCharsets.UTF_8);
        assertThat(check(expr.toString())).contains("language.md#expressions");
    }

    private static String check(String file) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        Main.commandLine().setOut(new PrintWriter(out)).setErr(new PrintWriter(err)).execute("check", file);
        return err.toString();
    }
}
