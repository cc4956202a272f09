package org.thermion.cli.report;

/**
 * A value that does not exist for a reason a word says ("not simulated", "none", "no limit").
 * Text shows the word; CSV leaves the cell empty; JSON writes null, and each command's schema
 * says what null means for that key.
 */
public record Absent(String word) {
    public static final Absent NONE = new Absent("-");
}
