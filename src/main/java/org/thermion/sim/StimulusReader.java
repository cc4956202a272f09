package org.thermion.sim;

import org.thermion.text.Nouns;
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
 * Reads a stimulus in RFC 4180 CSV: a header {@code cycle,NAME,...} (or {@code cycle,phase,NAME,...})
 * naming machine inputs or whole buses of inputs, then rows {@code CYCLE[,PHASE],VALUE,...} in
 * increasing time order. A value is a number (decimal, {@code 0x...}, {@code 0b...}) that fits its
 * column's bits; empty keeps the previous value; a row applies from the start of its phase (1 when
 * there is no phase column). Fields may be quoted; records end with CRLF or LF. Errors name
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
        List<List<Field>> records = new CsvScanner(file, text, diags).table("stimulus",
                "the first line is 'cycle' followed by input names, e.g. cycle," + exampleInputs());
        if (records == null) {
            return null;
        }
        List<Field> header = records.get(0);
        boolean phased = header.size() > 1 && header.get(1).text().strip().equals("phase");
        int lead = phased ? 2 : 1;
        List<Stimulus.Column> columns = readHeader(header, lead);
        if (columns == null) {
            return null;
        }
        List<Stimulus.Row> rows = new ArrayList<>();
        long lastCycle = -1;
        int lastPhase = machine.clock().phases();
        for (int r = 1; r < records.size(); r++) {
            List<Field> rec = records.get(r);
            Field first = rec.get(0);
            if (rec.size() != header.size()) {
                Field at = rec.size() > header.size() ? rec.get(header.size()) : rec.get(rec.size() - 1);
                Span s = rec.size() > header.size() ? at.span() : at.endSpan();
                diags.error(s, "expected " + header.size() + " fields (" + (phased ? "cycle, phase" : "cycle") + " and "
                        + Nouns.count(header.size() - lead, "input") + ", as in the header), found "
                        + rec.size(), null);
                continue;
            }
            long cycle = readCycle(first);
            if (cycle < 0) {
                continue;
            }
            int phase = phased ? readPhase(rec.get(1)) : 1;
            if (phase < 0) {
                continue;
            }
            if (cycle < lastCycle || (cycle == lastCycle && phase <= lastPhase)) {
                Field at = cycle == lastCycle && phased ? rec.get(1) : first;
                diags.error(at.span(), phased ? "expected a time after cycle " + lastCycle + " phase " + lastPhase
                        + ", found cycle " + cycle + " phase " + phase : "expected a cycle after " + lastCycle + ", found " + cycle,
                        phased ? "rows go in increasing time order: by cycle, then by phase"
                                : "rows go in increasing cycle order, one row per cycle");
                continue;
            }
            lastCycle = cycle;
            lastPhase = phase;
            long[] values = new long[columns.size()];
            boolean ok = true;
            for (int k = 0; k < columns.size(); k++) {
                Field f = rec.get(k + lead);
                Long v = readValue(f, columns.get(k));
                if (v == null) {
                    ok = false;
                } else {
                    values[k] = v;
                }
            }
            if (ok) {
                rows.add(new Stimulus.Row(cycle, phase, first.span().line(), values));
            }
        }
        return diags.errorCount() > before ? null : new Stimulus(columns, rows);
    }

    private String exampleInputs() {
        List<String> names = machine.inputs().stream().map(Port::name).limit(2).toList();
        return String.join(",", names);
    }

    /** A value for a column: empty keeps, else a number that fits the column's bits; null after an error. */
    private Long readValue(Field f, Stimulus.Column col) {
        String v = f.text().strip();
        if (v.isEmpty()) {
            return Stimulus.KEEP;
        }
        int width = col.bits().length;
        long n = StimulusNumber.parse(v);
        if (n >= 0 && (width >= 63 || n < (1L << width))) {
            return n;
        }
        if (width == 1) {
            diags.error(f.span(), "expected 0 or 1 for input '" + col.name() + "', found '" + v + "'",
                    "leave the field empty to keep the previous value");
        } else if (n >= 0) {
            diags.error(f.span(), "value " + v + " does not fit the " + width + " bits of bus '" + col.name()
                    + "' (at most " + ((1L << width) - 1) + ")", null);
        } else {
            diags.error(f.span(), "expected a number for bus '" + col.name() + "' (decimal, 0x... or 0b...), found '" + v + "'",
                    "leave the field empty to keep the previous value");
        }
        return null;
    }

    private List<Stimulus.Column> readHeader(List<Field> header, int lead) {
        Field first = header.get(0);
        boolean ok = true;
        if (!first.text().strip().equals("cycle")) {
            diags.error(first.span(), "expected 'cycle' as the first column of the header, found '"
                    + first.text().strip() + "'", "the header is 'cycle' followed by input names, e.g. cycle,"
                    + exampleInputs());
            ok = false;
        }
        List<String> names = machine.inputs().stream().map(Port::name).toList();
        Map<String, int[]> buses = buses();
        List<String> known = new ArrayList<>(names);
        known.addAll(buses.keySet());
        Map<String, Field> seen = new HashMap<>();
        Map<Integer, String> bitOwner = new HashMap<>();
        List<Stimulus.Column> columns = new ArrayList<>();
        for (int k = lead; k < header.size(); k++) {
            Field f = header.get(k);
            String name = f.text().strip();
            int idx = names.indexOf(name);
            int[] bits = idx >= 0 ? new int[] {idx} : buses.get(name);
            if (name.isEmpty()) {
                diags.error(f.span(), "expected an input name in the header, found an empty field", null);
                ok = false;
            } else if (bits == null) {
                String hint = Names.didYouMean(name, known);
                diags.error(f.span(), "expected an input of machine " + machine.name() + ", found '" + name + "'",
                        hint != null ? hint : "its inputs are " + String.join(", ", known));
                ok = false;
            } else if (seen.containsKey(name)) {
                Span prev = seen.get(name).span();
                diags.error(f.span(), "input '" + name + "' has a column already",
                        "first at column " + prev.col() + "; give each input one column");
                ok = false;
            } else if (bits.length > 62) {
                diags.error(f.span(), "bus '" + name + "' has " + bits.length + " bits, more than one column holds (62)",
                        "give its bits their own columns, e.g. " + name + "[0]");
                ok = false;
            } else {
                seen.put(name, f);
                String clash = null;
                for (int b : bits) {
                    clash = clash == null ? bitOwner.get(b) : clash;
                    bitOwner.put(b, name);
                }
                if (clash != null) {
                    diags.error(f.span(), "column '" + name + "' sets an input that column '" + clash + "' sets too",
                            "give each input bit one column");
                    ok = false;
                }
                columns.add(new Stimulus.Column(name, bits));
            }
        }
        return ok ? columns : null;
    }

    /** Every bus of inputs ({@code word} for {@code word[0]}...), its input indices LSB first. */
    private Map<String, int[]> buses() {
        Map<String, java.util.TreeMap<Integer, Integer>> bits = new java.util.LinkedHashMap<>();
        List<Port> in = machine.inputs();
        for (int i = 0; i < in.size(); i++) {
            String bus = NetLookup.busOf(in.get(i).name());
            if (bus != null) {
                bits.computeIfAbsent(bus, b -> new java.util.TreeMap<>()).put(NetLookup.bitIndex(in.get(i).name()), i);
            }
        }
        Map<String, int[]> out = new java.util.LinkedHashMap<>();
        bits.forEach((bus, m) -> out.put(bus, m.values().stream().mapToInt(Integer::intValue).toArray()));
        return out;
    }

    private long readCycle(Field f) {
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
        return c;
    }

    /** A phase from 1 to the clock's phases (empty: 1); -1 after an error. */
    private int readPhase(Field f) {
        String t = f.text().strip();
        int phases = machine.clock().phases();
        if (t.isEmpty()) {
            return 1;
        }
        long p = StimulusNumber.parse(t);
        if (p < 1 || p > phases) {
            diags.error(f.span(), "expected a phase from 1 to " + phases + ", found '" + t + "'",
                    "the row's inputs change at the start of that phase; empty means phase 1");
            return -1;
        }
        return (int) p;
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

        /**
         * The records, the first being the header line; null once a malformed record or an empty
         * file ("empty WHAT: expected a header line", with {@code hint}) has been reported.
         */
        public List<List<Field>> table(String what, String hint) {
            int before = diags.errorCount();
            List<List<Field>> records = records();
            if (diags.errorCount() > before) {
                return null;
            }
            if (records.isEmpty()) {
                diags.error(new Span(file, 1, 1, 1, 2), "empty " + what + ": expected a header line", hint);
                return null;
            }
            return records;
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
