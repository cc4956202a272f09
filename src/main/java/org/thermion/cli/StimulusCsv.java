package org.thermion.cli;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.lang.Span;
import org.thermion.model.Machine;
import org.thermion.model.Port;
import org.thermion.power.ProgramRun;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads a stimulus: RFC 4180 CSV whose header row is {@code cycle} and then machine input
 * names; each further row gives a cycle (0-based, not decreasing) and, per named input, 0
 * or 1 from that cycle on (an empty field keeps the value). Inputs start at 0.
 */
final class StimulusCsv {
    private StimulusCsv() {
    }

    /** The input changes, or null after reporting errors into {@code diags}. */
    static List<ProgramRun.InputChange> read(Path file, Machine m, SourceSet sources, Diagnostics diags) {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            diags.error(new Span(file, 0, 0, 0, 0), "cannot read stimulus file " + file + ": " + e.getMessage(), null);
            return null;
        }
        sources.put(file, text);
        String[] lines = text.split("\r?\n", -1);
        int[] inputs = null;
        long last = -1;
        List<ProgramRun.InputChange> out = new ArrayList<>();
        for (int ln = 0; ln < lines.length; ln++) {
            String line = lines[ln];
            if (line.isBlank()) {
                continue;
            }
            List<int[]> at = new ArrayList<>();
            List<String> cells = split(line, at);
            if (cells == null) {
                diags.error(span(file, ln, line.indexOf('"'), 1), "unterminated quoted field", "close it with '\"'");
                return null;
            }
            if (inputs == null) {
                if (!cells.get(0).trim().equals("cycle")) {
                    diags.error(span(file, ln, at.get(0)[0], Math.max(1, at.get(0)[1])), "the header must start with `cycle`",
                            "e.g. `cycle," + String.join(",", m.inputs().stream().map(Port::name).toList()) + "`");
                    return null;
                }
                inputs = new int[cells.size() - 1];
                for (int c = 1; c < cells.size(); c++) {
                    String name = cells.get(c).trim();
                    inputs[c - 1] = indexOf(m, name);
                    if (inputs[c - 1] < 0) {
                        diags.error(span(file, ln, at.get(c)[0], Math.max(1, at.get(c)[1])), "no machine input named '" + name + "'",
                                m.inputs().isEmpty() ? "this machine has no inputs"
                                        : "its inputs are " + String.join(" ", m.inputs().stream().map(Port::name).toList()));
                    }
                }
                continue;
            }
            if (cells.size() > inputs.length + 1) {
                int[] p = at.get(inputs.length + 1);
                diags.error(span(file, ln, p[0], Math.max(1, p[1])), "more fields than the header names", null);
                continue;
            }
            long cycle;
            try {
                cycle = Long.parseLong(cells.get(0).trim());
            } catch (NumberFormatException e) {
                cycle = -1;
            }
            if (cycle < 0 || cycle < last) {
                diags.error(span(file, ln, at.get(0)[0], Math.max(1, at.get(0)[1])),
                        cycle < 0 ? "expected a cycle number (0, 1, 2 ...)" : "cycles must not go backwards (last was " + last + ")",
                        null);
                continue;
            }
            last = cycle;
            for (int c = 1; c < cells.size(); c++) {
                String v = cells.get(c).trim();
                if (v.isEmpty() || inputs[c - 1] < 0) {
                    continue;
                }
                if (!v.equals("0") && !v.equals("1")) {
                    diags.error(span(file, ln, at.get(c)[0], Math.max(1, at.get(c)[1])), "expected 0 or 1, not '" + v + "'", null);
                    continue;
                }
                out.add(new ProgramRun.InputChange(cycle, inputs[c - 1], v.equals("1")));
            }
        }
        if (inputs == null) {
            diags.error(new Span(file, 1, 1, 1, 1), "empty stimulus file", "start with a header row `cycle,INPUT,...`");
        }
        return diags.hasErrors() ? null : out;
    }

    private static int indexOf(Machine m, String name) {
        for (int i = 0; i < m.inputs().size(); i++) {
            if (m.inputs().get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    private static Span span(Path file, int line0, int col0, int length) {
        return new Span(file, line0 + 1, Math.max(0, col0) + 1, line0 + 1, Math.max(0, col0) + 1 + length);
    }

    /** Splits one record; {@code at} gets each field's start column and length. Null on an open quote. */
    private static List<String> split(String line, List<int[]> at) {
        List<String> cells = new ArrayList<>();
        int i = 0;
        while (true) {
            int start = i;
            StringBuilder b = new StringBuilder();
            if (i < line.length() && line.charAt(i) == '"') {
                i++;
                while (true) {
                    if (i >= line.length()) {
                        return null;
                    }
                    char c = line.charAt(i);
                    if (c == '"') {
                        if (i + 1 < line.length() && line.charAt(i + 1) == '"') {
                            b.append('"');
                            i += 2;
                            continue;
                        }
                        i++;
                        break;
                    }
                    b.append(c);
                    i++;
                }
                while (i < line.length() && line.charAt(i) != ',') {
                    i++;
                }
            } else {
                while (i < line.length() && line.charAt(i) != ',') {
                    b.append(line.charAt(i++));
                }
            }
            cells.add(b.toString());
            at.add(new int[] {start, i - start});
            if (i >= line.length()) {
                return cells;
            }
            i++;
        }
    }
}
