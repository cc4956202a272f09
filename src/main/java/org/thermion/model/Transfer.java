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

    /** {@code if cond { ... } else { ... }}. */
    record When(Rtl cond, List<Transfer> then, List<Transfer> otherwise) implements Transfer {
        public When {
            then = List.copyOf(then);
            otherwise = List.copyOf(otherwise);
        }
    }
}
