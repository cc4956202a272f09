package org.thermion.sim;

import java.util.List;

/**
 * Input values over time, read from a stimulus file: each row sets the inputs of its
 * columns from its cycle and phase on. A column is one input bit or a whole bus of inputs
 * (LSB first); a column left empty in a row keeps its previous value.
 *
 * @param columns every column after the cycle (and phase) columns
 * @param rows    rows in increasing (cycle, phase) order
 */
public record Stimulus(List<Column> columns, List<Row> rows) {

    /** Value code in {@link Row#values()}: keep what the column held. */
    public static final long KEEP = -1;

    public Stimulus {
        columns = List.copyOf(columns);
        rows = List.copyOf(rows);
    }

    /** One column: its header name and the machine input index of each of its bits, LSB first. */
    public record Column(String name, int[] bits) {
        public Column {
            bits = bits.clone();
        }

        /** A column of one input bit. */
        public static Column bit(String name, int input) {
            return new Column(name, new int[] {input});
        }

        @Override
        public int[] bits() {
            return bits.clone();
        }
    }

    /**
     * One row: from the start of {@code phase} (1-based) of {@code cycle} on, column k holds
     * {@code values[k]} (a number, bit i on the column's bit i) or {@link #KEEP}.
     */
    public record Row(long cycle, int phase, int line, long[] values) {
        public Row {
            values = values.clone();
        }

        @Override
        public long[] values() {
            return values.clone();
        }

        boolean dueBy(long c, int p) {
            return cycle < c || (cycle == c && phase <= p);
        }
    }

    /** The cycle of the last row, or -1 when there are none. */
    public long lastCycle() {
        return rows.isEmpty() ? -1 : rows.get(rows.size() - 1).cycle();
    }

    /** Walks the rows in time order. */
    public Cursor cursor() {
        return new Cursor();
    }

    /** Applies rows as the run reaches their cycles and phases. */
    public final class Cursor {
        private int next;

        /**
         * Applies every row due by the start of {@code cycle} (its phase 1) to {@code values}
         * (indexed by machine input); returns true when any input changed.
         */
        public boolean advance(long cycle, boolean[] values) {
            return advance(cycle, 1, values);
        }

        /** Applies every row due by the start of phase {@code phase} of {@code cycle}; true when any input changed. */
        public boolean advance(long cycle, int phase, boolean[] values) {
            boolean changed = false;
            while (next < rows.size() && rows.get(next).dueBy(cycle, phase)) {
                Row row = rows.get(next);
                for (int k = 0; k < columns.size(); k++) {
                    long v = row.values[k];
                    if (v == KEEP) {
                        continue;
                    }
                    int[] bits = columns.get(k).bits;
                    for (int i = 0; i < bits.length; i++) {
                        boolean b = ((v >>> i) & 1) == 1;
                        changed |= values[bits[i]] != b;
                        values[bits[i]] = b;
                    }
                }
                next++;
            }
            return changed;
        }

        /** True while rows for later times remain. */
        public boolean pending() {
            return next < rows.size();
        }
    }
}
