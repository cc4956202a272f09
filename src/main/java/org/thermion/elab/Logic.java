package org.thermion.elab;

import java.util.List;

/** One bit of a lowered expression, before it is mapped onto stages. */
sealed interface Logic {
    record Net(int net) implements Logic {
    }

    record Const(boolean value) implements Logic {
    }

    record Not(Logic operand) implements Logic {
    }

    record And(List<Logic> operands) implements Logic {
    }

    record Or(List<Logic> operands) implements Logic {
    }

    record Xor(Logic left, Logic right) implements Logic {
    }

    record Call(int stage, List<Logic> args) implements Logic {
    }

    Logic ZERO = new Const(false);
    Logic ONE = new Const(true);
}
