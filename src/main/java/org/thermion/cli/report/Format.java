package org.thermion.cli.report;

import java.io.PrintWriter;

/** The output formats of every report command ({@code --format}). */
public enum Format {
    text, csv, json;

    /** Writes {@code report} in this format. */
    public void write(PrintWriter out, Report report) {
        switch (this) {
            case csv -> CsvWriter.write(out, report);
            case json -> JsonWriter.write(out, report);
            default -> TextWriter.write(out, report);
        }
    }
}
