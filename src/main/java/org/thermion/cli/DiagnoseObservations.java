package org.thermion.cli;

import org.thermion.text.Nouns;
import org.thermion.cli.report.Numbers;
import org.thermion.faults.Diagnosis;
import org.thermion.faults.ObservedLamp;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.Names;
import org.thermion.lang.SourceSet;
import org.thermion.lang.SourceText;
import org.thermion.lang.Span;
import org.thermion.sim.StimulusReader.CsvScanner;
import org.thermion.sim.StimulusReader.Field;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads what the builder saw: RFC 4180 CSV with a header {@code step,LAMP,...} naming lamps of
 * the plan, then one row per step looked at, {@code STEP,VALUE,...} with 1 (lit), 0 (dark) or
 * an empty field (not looked at). Steps may be left out or come in any order, each at most
 * once. Every error is reported at file:line:col; the result is {@code [step][lamp]} with
 * {@link Diagnosis#BLANK} wherever nothing was seen.
 */
final class DiagnoseObservations {
    private final List<ObservedLamp> lamps;
    private final int steps;
    private final String planHint;
    private final Diagnostics diags;

    /**
     * @param steps    how many steps the plan has
     * @param planHint what to say when a step lies beyond the plan (which plan was meant), or null
     */
    DiagnoseObservations(List<ObservedLamp> lamps, int steps, String planHint, Diagnostics diags) {
        this.lamps = lamps;
        this.steps = steps;
        this.planHint = planHint;
        this.diags = diags;
    }

    /** Reads {@code file}; null when errors were reported. */
    byte[][] read(Path file, SourceSet sources) {
        String text = SourceText.read(file, "observation file", sources, diags);
        if (text == null) {
            return null;
        }
        return parse(file, text, sources);
    }

    /** Parses observation text as if read from {@code file}; null when errors were reported. */
    byte[][] parse(Path file, String text, SourceSet sources) {
        sources.put(file, text);
        int before = diags.errorCount();
        List<List<Field>> records = new CsvScanner(file, text, diags).table("observation file",
                "the first line is 'step' followed by lamp names, e.g. step," + exampleLamps());
        if (records == null) {
            return null;
        }
        List<Field> header = records.get(0);
        int[] columns = readHeader(header);
        byte[][] seen = new byte[steps][lamps.size()];
        for (byte[] row : seen) {
            Arrays.fill(row, Diagnosis.BLANK);
        }
        Map<Integer, Integer> stepLine = new HashMap<>();
        for (int r = 1; r < records.size(); r++) {
            List<Field> rec = records.get(r);
            if (rec.size() != header.size()) {
                Field at = rec.size() > header.size() ? rec.get(header.size()) : rec.get(rec.size() - 1);
                Span s = rec.size() > header.size() ? at.span() : at.endSpan();
                int n = header.size() - 1;
                diags.error(s, "expected " + header.size() + " fields (the step and " + Nouns.count(n, "lamp")
                        + ", as in the header), found " + rec.size(), null);
                continue;
            }
            int step = readStep(rec.get(0), stepLine);
            for (int k = 1; k < rec.size(); k++) {
                Field f = rec.get(k);
                String v = f.text().strip();
                byte value;
                if (v.equals("0")) {
                    value = 0;
                } else if (v.equals("1")) {
                    value = 1;
                } else if (v.isEmpty()) {
                    value = Diagnosis.BLANK;
                } else {
                    diags.error(f.span(), "expected 1 (lit), 0 (dark) or nothing for lamp '"
                            + header.get(k).text().strip() + "', found '" + v + "'",
                            "leave the field empty for a lamp you did not look at");
                    continue;
                }
                if (step >= 0 && columns != null) {
                    seen[step][columns[k - 1]] = value;
                }
            }
        }
        return diags.errorCount() > before ? null : seen;
    }

    private String exampleLamps() {
        return String.join(",", lamps.stream().map(ObservedLamp::name).limit(2).toList());
    }

    private int[] readHeader(List<Field> header) {
        Field first = header.get(0);
        boolean ok = true;
        if (!first.text().strip().equals("step")) {
            diags.error(first.span(), "expected 'step' as the first column of the header, found '"
                    + first.text().strip() + "'", "the header is 'step' followed by lamp names, e.g. step,"
                    + exampleLamps());
            ok = false;
        }
        List<String> names = lamps.stream().map(ObservedLamp::name).toList();
        Map<String, Field> seen = new HashMap<>();
        int[] columns = new int[header.size() - 1];
        for (int k = 1; k < header.size(); k++) {
            Field f = header.get(k);
            String name = f.text().strip();
            int idx = names.indexOf(name);
            if (name.isEmpty()) {
                diags.error(f.span(), "expected a lamp name in the header, found an empty field", null);
                ok = false;
            } else if (idx < 0) {
                String hint = Names.didYouMean(name, names);
                diags.error(f.span(), "expected a lamp of the plan, found '" + name + "'",
                        hint != null ? hint : "the plan's lamps are " + String.join(", ", names));
                ok = false;
            } else if (seen.containsKey(name)) {
                diags.error(f.span(), "lamp '" + name + "' has a column already",
                        "first at column " + seen.get(name).span().col() + "; give each lamp one column");
                ok = false;
            } else {
                seen.put(name, f);
                columns[k - 1] = idx;
            }
        }
        return ok ? columns : null;
    }

    // The step's index (0-based), or -1 after reporting why it cannot be read.
    private int readStep(Field f, Map<Integer, Integer> stepLine) {
        String t = f.text().strip();
        if (t.isEmpty() || t.length() > 9 || !t.chars().allMatch(c -> c >= '0' && c <= '9')) {
            diags.error(f.span(), "expected a step number (1, 2, ...), found '" + t + "'", null);
            return -1;
        }
        int s = Integer.parseInt(t);
        if (s < 1) {
            diags.error(f.span(), "expected a step number from 1, found " + s, "the plan numbers its steps from 1");
            return -1;
        }
        if (s > steps) {
            diags.error(f.span(), "step " + s + " is beyond the plan, which has " + Nouns.count(steps, "step"),
                    planHint);
            return -1;
        }
        Integer prev = stepLine.putIfAbsent(s, f.span().line());
        if (prev != null) {
            diags.error(f.span(), "step " + s + " has a row already", "first on line " + prev
                    + "; give each step one row");
            return -1;
        }
        return s - 1;
    }
}
