package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.lang.Span;
import org.thermion.model.StageFunction;
import org.thermion.model.StageType;
import org.thermion.model.TubeType;

import java.nio.file.Path;
import java.util.Locale;

/**
 * The built-in parts library as the language reference lists it: every stage function, and
 * every tube and stage read from {@code library.machine} itself, so the list cannot drift
 * from the library. {@code src/docs/language.md} holds this text between markers; a test
 * keeps the two equal.
 */
public final class LibraryReference {
    /** The rails the library's stages are designed for (named in the library's header). */
    private static final String RAILS =
            "rail bplus { voltage 48 V }\nrail bias { voltage -24 V }\nrail relay { voltage 24 V }\n";

    private LibraryReference() {
    }

    /** The stage functions, tubes and stages of the built-in library as Markdown tables. */
    public static String markdown() {
        SourceSet sources = new SourceSet();
        Diagnostics diags = new Diagnostics();
        SourceLoader loader = new SourceLoader(sources, diags);
        Declarations decls = new Declarations();
        decls.add(loader.library(), true, diags);
        for (var f : loader.loadText(Path.of("rails.machine"), RAILS)) {
            decls.add(f, false, diags);
        }
        Parts parts = new Parts(decls, diags);
        StringBuilder b = new StringBuilder();
        b.append("Stage functions (the word after `:` in `stage NAME : FUNCTION`):\n\n");
        b.append("| function | role | inputs by default | its circuit conducts with |\n|---|---|---|---|\n");
        for (StageFunction f : StageFunction.values()) {
            b.append("| `").append(f.word()).append("` | ").append(lower(f.role().name()))
                    .append(" | ").append(f.defaultFanIn).append(" | ")
                    .append(lower(f.conducts().name()).replace('_', ' ')).append(" |\n");
        }
        b.append("\nTubes of the library:\n\n| tube | kind | sections |\n|---|---|---|\n");
        for (String name : decls.tubes.keySet()) {
            TubeType t = parts.tubes.get(parts.tube(name, Span.none()));
            b.append("| `").append(t.name()).append("` | ").append(lower(t.kind().name()))
                    .append(" | ").append(t.sections()).append(" |\n");
        }
        b.append("\nStages of the library:\n\n| stage | function | tube | note |\n|---|---|---|---|\n");
        for (String name : parts.stageNames()) {
            StageType s = parts.stages.get(parts.stage(name, Span.none()));
            b.append("| `").append(s.name()).append("` | `").append(s.function().word()).append("` | ")
                    .append(s.tube() < 0 ? "" : parts.tubes.get(s.tube()).name()).append(" | ")
                    .append(s.note() == null ? "" : s.note().replace("|", "\\|")).append(" |\n");
        }
        if (!diags.all().isEmpty()) {
            throw new IllegalStateException("the parts library does not read cleanly: " + diags.all());
        }
        return b.toString();
    }

    private static String lower(String s) {
        return s.toLowerCase(Locale.ROOT);
    }
}
