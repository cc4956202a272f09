package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.MachineReader;
import org.thermion.lang.SourceSet;
import org.thermion.lang.SourceText;
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
 * in include order; reports missing files, files that are not UTF-8, include cycles and
 * includes nested deeper than {@link #MAX_INCLUDE_DEPTH}.
 */
final class SourceLoader {
    static final Path LIBRARY = Path.of("<parts>/library.machine");
    /** Most files open at once along one chain of includes (the root counts as one). */
    static final int MAX_INCLUDE_DEPTH = 64;

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
        if (stack.size() >= MAX_INCLUDE_DEPTH) {
            diags.error(from, "includes nested deeper than " + MAX_INCLUDE_DEPTH + " files",
                    "at most " + MAX_INCLUDE_DEPTH + " files may be open along one chain of includes;"
                            + " include the parts from one common file instead");
            return;
        }
        if (!done.add(file)) {
            return;
        }
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            done.remove(file);
            if (from == null) {
                diags.error(new Span(file, 0, 0, 0, 0), "cannot read " + file + ": " + SourceText.reason(file, e), null);
            } else if (e instanceof java.nio.file.NoSuchFileException) {
                diags.error(from, "include not found: " + file,
                        "include paths are relative to the file that includes them");
            } else {
                diags.error(from, "cannot read include " + file + ": " + SourceText.reason(file, e), null);
            }
            return;
        }
        String text = SourceText.decode(file, bytes, sources, diags);
        if (text == null) {
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
                Path target;
                try {
                    target = parent == null ? Path.of(inc.file()) : parent.resolve(inc.file());
                } catch (java.nio.file.InvalidPathException e) {
                    diags.error(inc.span(), "include path is not a file name: " + why(inc.file()),
                            "name the file plainly, relative to the file that includes it");
                    continue;
                }
                readFile(target.normalize(), inc.span());
            }
        }
    }

    private static String why(String path) {
        if (path.indexOf('\0') >= 0) {
            return "it holds a NUL character";
        }
        return path.isEmpty() ? "it is empty" : "the system does not accept it";
    }
}
