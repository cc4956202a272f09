package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.MachineReader;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Decl;
import org.thermion.lang.ast.ModuleStmt;
import org.thermion.lang.ast.SourceFile;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;

/** Rewrites a description with the top-level statements of every module in a random order. */
final class StatementShuffler {
    private StatementShuffler() {
    }

    static String shuffle(Path file, String text, Random random) {
        Diagnostics d = new Diagnostics();
        SourceFile sf = MachineReader.parse(file, text, d);
        if (d.hasErrors()) {
            throw new IllegalArgumentException("does not parse: " + d.all());
        }
        int[] lineStart = lineStarts(text);
        List<Decl.Module> modules = new ArrayList<>();
        for (Decl decl : sf.decls()) {
            if (decl instanceof Decl.Module m) {
                modules.add(m);
            }
        }
        StringBuilder out = new StringBuilder(text);
        // Last module first, so the offsets of the earlier ones stay valid.
        for (int i = modules.size() - 1; i >= 0; i--) {
            Decl.Module m = modules.get(i);
            List<String> stmts = new ArrayList<>();
            for (ModuleStmt s : m.body()) {
                stmts.add(slice(text, lineStart, s.span()));
            }
            Collections.shuffle(stmts, random);
            String body = "module " + m.name().text() + " {\n  " + String.join("\n  ", stmts) + "\n}";
            out.replace(offset(lineStart, m.span().line(), m.span().col()), offset(lineStart, m.span().endLine(), m.span().endCol()), body);
        }
        return out.toString();
    }

    private static String slice(String text, int[] lineStart, Span s) {
        return text.substring(offset(lineStart, s.line(), s.col()), offset(lineStart, s.endLine(), s.endCol()));
    }

    private static int offset(int[] lineStart, int line, int col) {
        return lineStart[line - 1] + col - 1;
    }

    private static int[] lineStarts(String text) {
        List<Integer> starts = new ArrayList<>(List.of(0));
        for (int i = 0; i < text.length(); i++) {
            if (text.charAt(i) == '\n') {
                starts.add(i + 1);
            }
        }
        return starts.stream().mapToInt(Integer::intValue).toArray();
    }
}
