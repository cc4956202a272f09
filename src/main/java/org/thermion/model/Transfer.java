package org.thermion.model;

import java.util.List;

/** A register-transfer statement. Right-hand sides read the state before the instruction. */
public sealed interface Transfer {

    /** {@code state <- expr}. */
    record ToState(int state, Rtl value) implements Transfer {
    }

    /** {@code [field] <- expr}: writes the bit the select field addresses. */
    record ToSelected(Rtl value) implements Transfer {
    }

    /** {@code pc <- field}: a jump. */
    record ToPc(int field) implements Transfer {
    }

    /**
     * {@code pc <- pc + offset}, {@code pc <- pc + field + offset} or {@code pc <- pc - field + offset}:
     * a skip or a relative jump from the address of the instruction itself, modulo the PC's range.
     *
     * @param field the field added or subtracted, -1 for none
     */
    record PcStep(long offset, int field, boolean minusField) implements Transfer {
        /** The next address from {@code pc} for {@code word}, before the PC's range is applied. */
        public long from(long pc, long word, List<IsaField> fields) {
            long f = field < 0 ? 0 : fields.get(field).extract(word);
            return pc + offset + (minusField ? -f : f);
        }
    }

    /** {@code if cond { ... } else { ... }}. */
    record When(Rtl cond, List<Transfer> then, List<Transfer> otherwise) implements Transfer {
        public When {
            then = List.copyOf(then);
            otherwise = List.copyOf(otherwise);
        }
    }
}
