package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.MachineReader;
import org.thermion.lang.SourceSet;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Decl;
import org.thermion.lang.ast.SourceFile;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Reads a file and everything it includes (paths relative to the including file),
 * in include order; reports missing files and include cycles.
 */
final class SourceLoader {
    static final Path LIBRARY = Path.of("<parts>/library.machine");

    private final SourceSet sources;
    private final Diagnostics diags;
    private final List<SourceFile> files = new ArrayList<>();
    private final Set<Path> done = new HashSet<>();
    private final Deque<Path> stack = new ArrayDeque<>();

    SourceLoader(SourceSet sources, Diagnostics diags) {
        this.sources = sources;
        this.diags = diags;
    }

    /** The parts library, parsed from the jar's resource. */
    SourceFile library() {
        try (InputStream in = SourceLoader.class.getResourceAsStream("/org/thermion/parts/library.machine")) {
            if (in == null) {
                throw new IllegalStateException("parts library missing from the build");
            }
            String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            sources.put(LIBRARY, text);
            return MachineReader.parse(LIBRARY, text, diags);
        } catch (IOException e) {
            throw new IllegalStateException("cannot read the parts library", e);
        }
    }

    /** Loads {@code root} and its includes; returns the files, includes before includers. */
    List<SourceFile> load(Path root) {
        readFile(root.normalize(), null);
        return files;
    }

    /** Loads text given directly (tests, generated machines) under a nominal path. */
    List<SourceFile> loadText(Path nominal, String text) {
        sources.put(nominal, text);
        stack.push(nominal);
        SourceFile f = MachineReader.parse(nominal, text, diags);
        followIncludes(f);
        stack.pop();
        files.add(f);
        return files;
    }

    private void readFile(Path file, Span from) {
        if (stack.contains(file)) {
            List<String> chain = new ArrayList<>();
            List<Path> order = new ArrayList<>(stack);
            java.util.Collections.reverse(order);
            boolean on = false;
            for (Path p : order) {
                on |= p.equals(file);
                if (on) {
                    chain.add(p.getFileName().toString());
                }
            }
            chain.add(file.getFileName().toString());
            diags.error(from, "include cycle: " + String.join(" -> ", chain),
                    "remove one of these includes; a file may not include itself, directly or through others");
            return;
        }
        if (!done.add(file)) {
            return;
        }
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            done.remove(file);
            if (from == null) {
                diags.error(Span.none(), "cannot read " + file + ": " + reason(e), null);
            } else {
                diags.error(from, "include not found: " + file,
                        "include paths are relative to the file that includes them");
            }
            return;
        }
        sources.put(file, text);
        stack.push(file);
        SourceFile f = MachineReader.parse(file, text, diags);
        followIncludes(f);
        stack.pop();
        files.add(f);
    }

    private void followIncludes(SourceFile f) {
        Path parent = f.path().getParent();
        for (Decl d : f.decls()) {
            if (d instanceof Decl.Include inc) {
                Path target = parent == null ? Path.of(inc.file()) : parent.resolve(inc.file());
                readFile(target.normalize(), inc.span());
            }
        }
    }

    private static String reason(IOException e) {
        if (e instanceof java.nio.file.NoSuchFileException) {
            return "no such file";
        }
        if (e instanceof java.nio.file.AccessDeniedException) {
            return "permission denied";
        }
        return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    }
}
