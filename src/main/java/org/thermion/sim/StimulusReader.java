package org.thermion.sim;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Names;
import org.thermion.lang.SourceSet;
import org.thermion.lang.SourceText;
import org.thermion.lang.Span;
import org.thermion.model.Machine;
import org.thermion.model.Port;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads a stimulus in RFC 4180 CSV: a header {@code cycle,NAME,...} naming machine inputs,
 * then rows {@code CYCLE,VALUE,...} with values 0 or 1 (empty keeps the previous value), in
 * increasing cycle order. Fields may be quoted; records end with CRLF or LF. Errors name
 * file:line:col and say what was expected.
 */
public final class StimulusReader {
    private final Machine machine;
    private final SourceSet sources;
    private final Diagnostics diags;

    public StimulusReader(Machine machine, SourceSet sources, Diagnostics diags) {
        this.machine = machine;
        this.sources = sources;
        this.diags = diags;
    }

    /** Reads a stimulus file; null when errors were reported. */
    public Stimulus read(Path file) {
        String text = SourceText.read(file, "stimulus file", sources, diags);
        if (text == null) {
            return null;
        }
        return parse(file, text);
    }

    /** Parses stimulus text as if read from {@code file}; null when errors were reported. */
    public Stimulus parse(Path file, String text) {
        sources.put(file, text);
        int before = diags.errorCount();
        List<List<Field>> records = new CsvScanner(file, text, diags).records();
        if (diags.errorCount() > before) {
            return null;
        }
        if (records.isEmpty()) {
            diags.error(new Span(file, 1, 1, 1, 2), "empty stimulus: expected a header line",
                    "the first line is 'cycle' followed by input names, e.g. cycle," + exampleInputs());
            return null;
        }
        List<Field> header = records.get(0);
        int[] inputs = readHeader(header);
        if (inputs == null) {
            return null;
        }
        List<Stimulus.Row> rows = new ArrayList<>();
        long last = -1;
        for (int r = 1; r < records.size(); r++) {
            List<Field> rec = records.get(r);
            Field first = rec.get(0);
            if (rec.size() != header.size()) {
                Field at = rec.size() > header.size() ? rec.get(header.size()) : rec.get(rec.size() - 1);
                Span s = rec.size() > header.size() ? at.span() : at.endSpan();
                diags.error(s, "expected " + header.size() + " fields (cycle and " + (header.size() - 1)
                        + (header.size() == 2 ? " input" : " inputs") + ", as in the header), found " + rec.size(), null);
                continue;
            }
            long cycle = readCycle(first, last);
            if (cycle < 0) {
                continue;
            }
            last = cycle;
            byte[] values = new byte[inputs.length];
            boolean ok = true;
            for (int k = 0; k < inputs.length; k++) {
                Field f = rec.get(k + 1);
                String v = f.text().strip();
                if (v.equals("0")) {
                    values[k] = 0;
                } else if (v.equals("1")) {
                    values[k] = 1;
                } else if (v.isEmpty()) {
                    values[k] = Stimulus.KEEP;
                } else {
                    diags.error(f.span(), "expected 0 or 1 for input '" + header.get(k + 1).text().strip()
                            + "', found '" + v + "'", "leave the field empty to keep the previous value");
                    ok = false;
                }
            }
            if (ok) {
                rows.add(new Stimulus.Row(cycle, first.span().line(), values));
            }
        }
        return diags.errorCount() > before ? null : new Stimulus(inputs, List.copyOf(rows));
    }

    private String exampleInputs() {
        List<String> names = machine.inputs().stream().map(Port::name).limit(2).toList();
        return String.join(",", names);
    }

    private int[] readHeader(List<Field> header) {
        Field first = header.get(0);
        boolean ok = true;
        if (!first.text().strip().equals("cycle")) {
            diags.error(first.span(), "expected 'cycle' as the first column of the header, found '"
                    + first.text().strip() + "'", "the header is 'cycle' followed by input names, e.g. cycle,"
                    + exampleInputs());
            ok = false;
        }
        List<String> names = machine.inputs().stream().map(Port::name).toList();
        Map<String, Field> seen = new HashMap<>();
        int[] inputs = new int[header.size() - 1];
        for (int k = 1; k < header.size(); k++) {
            Field f = header.get(k);
            String name = f.text().strip();
            int idx = names.indexOf(name);
            if (name.isEmpty()) {
                diags.error(f.span(), "expected an input name in the header, found an empty field", null);
                ok = false;
            } else if (idx < 0) {
                String hint = Names.didYouMean(name, names);
                diags.error(f.span(), "expected an input of machine " + machine.name() + ", found '" + name + "'",
                        hint != null ? hint : "its inputs are " + String.join(", ", names));
                ok = false;
            } else if (seen.containsKey(name)) {
                Span prev = seen.get(name).span();
                diags.error(f.span(), "input '" + name + "' has a column already",
                        "first at column " + prev.col() + "; give each input one column");
                ok = false;
            } else {
                seen.put(name, f);
                inputs[k - 1] = idx;
            }
        }
        return ok ? inputs : null;
    }

    private long readCycle(Field f, long last) {
        String t = f.text().strip();
        long c;
        try {
            if (t.isEmpty() || !t.chars().allMatch(Character::isDigit)) {
                throw new NumberFormatException();
            }
            c = Long.parseLong(t);
        } catch (NumberFormatException e) {
            diags.error(f.span(), "expected a cycle number (0, 1, 2, ...), found '" + t + "'", null);
            return -1;
        }
        if (c <= last) {
            diags.error(f.span(), "expected a cycle after " + last + ", found " + c,
                    "rows go in increasing cycle order, one row per cycle");
            return -1;
        }
        return c;
    }

    /** One CSV field: its unquoted text and where it starts and ends in the file. */
    public record Field(String text, Span span) {
        /** The position just after the field (for a missing field). */
        public Span endSpan() {
            return new Span(span.file(), span.endLine(), span.endCol(), span.endLine(), span.endCol() + 1);
        }
    }

    /** Splits RFC 4180 text into records of fields, keeping positions for diagnostics. */
    public static final class CsvScanner {
        private final Path file;
        private final String text;
        private final Diagnostics diags;
        private int pos;
        private int line = 1;
        private int col = 1;

        public CsvScanner(Path file, String text, Diagnostics diags) {
            this.file = file;
            this.text = text.startsWith("\uFEFF") ? text.substring(1) : text;
            this.diags = diags;
        }

        /** Every record of the text (blank lines skipped); stops at the first malformed one. */
        public List<List<Field>> records() {
            List<List<Field>> out = new ArrayList<>();
            while (pos < text.length()) {
                if (atLineEnd()) {
                    // Blank lines carry no record.
                    skipLineEnd();
                    continue;
                }
                List<Field> rec = record();
                if (rec == null) {
                    return out;
                }
                out.add(rec);
            }
            return out;
        }

        private boolean atLineEnd() {
            char c = text.charAt(pos);
            return c == '\n' || (c == '\r' && pos + 1 < text.length() && text.charAt(pos + 1) == '\n') || c == '\r';
        }

        private void skipLineEnd() {
            if (text.charAt(pos) == '\r') {
                pos++;
            }
            if (pos < text.length() && text.charAt(pos) == '\n') {
                pos++;
            }
            line++;
            col = 1;
        }

        private List<Field> record() {
            List<Field> fields = new ArrayList<>();
            while (true) {
                Field f = field();
                if (f == null) {
                    return null;
                }
                fields.add(f);
                if (pos >= text.length()) {
                    return fields;
                }
                char c = text.charAt(pos);
                if (c == ',') {
                    pos++;
                    col++;
                } else if (atLineEnd()) {
                    skipLineEnd();
                    return fields;
                } else {
                    diags.error(new Span(file, line, col, line, col + 1), "expected ',' or the end of the line after "
                            + "the closing quote, found '" + c + "'", "a quoted field ends at its closing quote");
                    return null;
                }
            }
        }

        private Field field() {
            int startLine = line;
            int startCol = col;
            StringBuilder sb = new StringBuilder();
            if (pos < text.length() && text.charAt(pos) == '"') {
                pos++;
                col++;
                while (true) {
                    if (pos >= text.length()) {
                        diags.error(new Span(file, startLine, startCol, startLine, startCol + 1),
                                "expected a closing '\"' for the quoted field that starts here", null);
                        return null;
                    }
                    char c = text.charAt(pos);
                    if (c == '"') {
                        if (pos + 1 < text.length() && text.charAt(pos + 1) == '"') {
                            sb.append('"');
                            pos += 2;
                            col += 2;
                            continue;
                        }
                        pos++;
                        col++;
                        break;
                    }
                    sb.append(c);
                    pos++;
                    if (c == '\n') {
                        line++;
                        col = 1;
                    } else {
                        col++;
                    }
                }
                return new Field(sb.toString(), new Span(file, startLine, startCol, line, col));
            }
            while (pos < text.length()) {
                char c = text.charAt(pos);
                if (c == ',' || c == '\n' || c == '\r') {
                    break;
                }
                if (c == '"') {
                    diags.error(new Span(file, line, col, line, col + 1), "expected ',' or the end of the line, "
                            + "found '\"' inside an unquoted field", "quote the whole field: \"...\", "
                            + "with \"\" for a quote inside it");
                    return null;
                }
                sb.append(c);
                pos++;
                col++;
            }
            return new Field(sb.toString(), new Span(file, startLine, startCol, line, Math.max(col, startCol + 1)));
        }
    }
}
