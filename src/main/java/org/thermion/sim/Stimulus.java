package org.thermion.sim;

import java.util.List;

/**
 * Input values over time, read from a stimulus file: each row sets the inputs of its
 * columns from its cycle on. A column left empty in a row keeps its previous value.
 *
 * @param inputs machine input index of every column (after the cycle column)
 * @param rows   rows in increasing cycle order
 */
public record Stimulus(int[] inputs, List<Row> rows) {

    /** Value codes in {@link Row#values()}. */
    public static final byte KEEP = -1;

    /** One row: from {@code cycle} on, column k holds {@code values[k]} (0, 1 or {@link #KEEP}). */
    public record Row(long cycle, int line, byte[] values) {
    }

    /** The cycle of the last row, or -1 when there are none. */
    public long lastCycle() {
        return rows.isEmpty() ? -1 : rows.get(rows.size() - 1).cycle();
    }

    /** Walks the rows in cycle order. */
    public Cursor cursor() {
        return new Cursor();
    }

    /** Applies rows as the run reaches their cycles. */
    public final class Cursor {
        private int next;

        /**
         * Applies every row whose cycle is at most {@code cycle} to {@code values} (indexed by
         * machine input); returns true when any input changed.
         */
        public boolean advance(long cycle, boolean[] values) {
            boolean changed = false;
            while (next < rows.size() && rows.get(next).cycle() <= cycle) {
                byte[] v = rows.get(next).values();
                for (int k = 0; k < v.length; k++) {
                    if (v[k] != KEEP) {
                        boolean b = v[k] == 1;
                        changed |= values[inputs[k]] != b;
                        values[inputs[k]] = b;
                    }
                }
                next++;
            }
            return changed;
        }

        /** True while rows for later cycles remain. */
        public boolean pending() {
            return next < rows.size();
        }
    }
}
