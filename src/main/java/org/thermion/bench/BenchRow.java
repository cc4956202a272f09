package org.thermion.bench;

/**
 * One line of the bench report: a measurement on a machine, its unit, and the target it
 * is held to ({@code target} null when it has none; {@code met} then null too).
 * {@code value} is NaN when the measurement could not be made; {@code note} says why.
 */
public record BenchRow(String machine, String measure, double value, String unit, String target, Boolean met,
                       String note) {

    public static BenchRow info(String machine, String measure, double value, String unit) {
        return new BenchRow(machine, measure, value, unit, null, null, "");
    }

    public static BenchRow missing(String machine, String measure, String why) {
        return new BenchRow(machine, measure, Double.NaN, "", null, null, why);
    }

    /** A row held to {@code value >= min} (or {@code <= max} when {@code atMost}). */
    public static BenchRow target(String machine, String measure, double value, String unit, double bound,
                                  boolean atMost, String boundText) {
        boolean ok = atMost ? value <= bound : value >= bound;
        String t = (atMost ? "<= " : ">= ") + boundText;
        return new BenchRow(machine, measure, value, unit, t, ok, ok ? "met" : "not met");
    }

    public BenchRow withNote(String more) {
        return new BenchRow(machine, measure, value, unit, target, met, note.isEmpty() ? more : note + ": " + more);
    }
}
