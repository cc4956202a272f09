package org.thermion.cli;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.lang.SourceText;
import org.thermion.lang.Span;
import org.thermion.sim.StimulusReader.CsvScanner;
import org.thermion.sim.StimulusReader.Field;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A current measured on the bench at switch-on ({@code powerup --fit FILE}), in RFC 4180 CSV: a
 * header naming a time column ({@code time_seconds}, {@code time_s} or {@code time_ms}) and one or
 * more current columns ({@code NAME_amps}, {@code NAME_a} or {@code NAME_ma}), then one row per
 * reading with time increasing. The time series {@code powerup --csv} writes reads as a trace.
 * Errors name file:line:col; every row is checked, so one run reports all of them.
 */
record PowerUpTrace(Path file, String column, double[] t, double[] amps) {
    /** Fewer readings than this cannot fix six figures with any confidence. */
    static final int MIN_ROWS = 10;

    /**
     * Reads {@code file}, taking the current column for {@code rail} ({@code RAIL_amps}) when there is
     * one, else {@code current_amps} or the only current column; null when errors were reported.
     */
    static PowerUpTrace read(Path file, String rail, SourceSet sources, Diagnostics diags) {
        String text = SourceText.read(file, "trace file", sources, diags);
        if (text == null) {
            return null;
        }
        sources.put(file, text);
        int before = diags.errorCount();
        List<List<Field>> records = new CsvScanner(file, text, diags).records();
        if (diags.errorCount() > before) {
            return null;
        }
        if (records.isEmpty()) {
            diags.error(new Span(file, 1, 1, 1, 2), "empty trace: expected a header line",
                    "the first line names the columns, e.g. time_seconds,current_amps");
            return null;
        }
        List<Field> head = records.get(0);
        double timeScale = timeScale(head.get(0).text().strip());
        if (Double.isNaN(timeScale)) {
            diags.error(head.get(0).span(), "expected a time column first (time_seconds, time_s or time_ms), found '"
                    + head.get(0).text().strip() + "'", "the first line names the columns, e.g. time_seconds,current_amps");
            return null;
        }
        int col = -1;
        double ampScale = Double.NaN;
        List<Integer> currents = new ArrayList<>();
        for (int k = 1; k < head.size(); k++) {
            String name = head.get(k).text().strip().toLowerCase(Locale.ROOT);
            if (!Double.isNaN(ampScale(name))) {
                currents.add(k);
                if (rail != null && name.startsWith(PowerUpSeries.identifier(rail) + "_") || rail == null && name.startsWith("current_")) {
                    col = k;
                }
            }
        }
        if (col < 0 && currents.size() == 1) {
            col = currents.get(0);
        }
        if (col < 0) {
            Field at = head.size() > 1 ? head.get(1) : head.get(0);
            diags.error(currents.isEmpty() ? at.endSpan() : at.span(), currents.isEmpty()
                    ? "expected a current column (NAME_amps, NAME_a or NAME_ma) after the time column"
                    : "several current columns and none for " + (rail == null ? "'current_amps'" : "rail " + rail),
                    currents.isEmpty() ? "e.g. time_seconds,current_amps" : "name the rail measured with --trace-rail");
            return null;
        }
        ampScale = ampScale(head.get(col).text().strip().toLowerCase(Locale.ROOT));
        List<double[]> rows = new ArrayList<>();
        double last = Double.NaN;
        int lastLine = 0;
        for (int r = 1; r < records.size(); r++) {
            List<Field> rec = records.get(r);
            if (rec.size() != head.size()) {
                Field at = rec.size() > head.size() ? rec.get(head.size()) : rec.get(rec.size() - 1);
                diags.error(rec.size() > head.size() ? at.span() : at.endSpan(), "expected " + head.size()
                        + " fields, as in the header, found " + rec.size(), null);
                continue;
            }
            double time = number(rec.get(0), "a time", diags);
            double amps = number(rec.get(col), "a current", diags);
            if (Double.isNaN(time) || Double.isNaN(amps)) {
                continue;
            }
            time *= timeScale;
            if (!Double.isNaN(last) && !(time > last)) {
                diags.error(rec.get(0).span(), "time must increase from row to row: " + org.thermion.cli.report.Numbers.plain(time)
                        + " s follows " + org.thermion.cli.report.Numbers.plain(last) + " s (line " + lastLine + ")",
                        "sort the rows by time and remove repeated readings");
                continue;
            }
            last = time;
            lastLine = rec.get(0).span().line();
            rows.add(new double[] {time, amps * ampScale});
        }
        if (diags.errorCount() > before) {
            return null;
        }
        if (rows.size() < MIN_ROWS) {
            Field at = records.get(records.size() - 1).get(0);
            diags.error(at.span(), "a trace needs at least " + MIN_ROWS + " readings to fit the model, found " + rows.size(),
                    "record the current through the whole warm-up, e.g. every 10 ms for 20 s");
            return null;
        }
        double[] t = new double[rows.size()], a = new double[rows.size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = rows.get(i)[0];
            a[i] = rows.get(i)[1];
        }
        return new PowerUpTrace(file, head.get(col).text().strip(), t, a);
    }

    private static double number(Field f, String what, Diagnostics diags) {
        String s = f.text().strip();
        try {
            double v = Double.parseDouble(s);
            if (Double.isFinite(v) && !s.isEmpty() && !Character.isLetter(s.charAt(s.length() - 1))) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        diags.error(f.span().isKnown() ? f.span() : f.endSpan(), "expected " + what + " as a finite decimal number, found '"
                + s + "'", "readings are plain numbers in the unit the header names");
        return Double.NaN;
    }

    private static double timeScale(String name) {
        return switch (name.toLowerCase(Locale.ROOT)) {
            case "time_seconds", "time_s" -> 1;
            case "time_ms" -> 1e-3;
            default -> Double.NaN;
        };
    }

    private static double ampScale(String name) {
        if (name.endsWith("_amps") || name.endsWith("_a")) {
            return 1;
        }
        return name.endsWith("_ma") ? 1e-3 : Double.NaN;
    }
}
