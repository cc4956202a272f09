package org.thermion.tui;

import java.util.List;

/**
 * Input changes by cycle (from a stimulus file): before cycle {@code cycle} runs, each
 * listed input takes its value. Rows are in cycle order.
 */
public record InputSchedule(List<Row> rows) {

    /** One row: the cycle, and a value for some inputs (null where the row leaves one alone). */
    public record Row(long cycle, Boolean[] values) {
    }

    public static InputSchedule none() {
        return new InputSchedule(List.of());
    }
}
