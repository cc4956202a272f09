package org.thermion.model;

import java.util.List;
import java.util.Set;
import java.util.TreeSet;

/**
 * What an instruction's meaning (its {@link Transfer} statements and {@link Rtl} expressions)
 * touches, asked by more than one later stage (the assembler to pick an operand, the verifier
 * to pick the words it checks), so every stage reads the meaning the same way. Both branches
 * of an {@code if} count, whatever the condition.
 */
public final class Meanings {
    private Meanings() {
    }

    /** True when the meaning reads or writes the bit the select field addresses. */
    public static boolean usesSelected(List<Transfer> body) {
        for (Transfer t : body) {
            if (t instanceof Transfer.ToSelected) {
                return true;
            }
            if (t instanceof Transfer.ToState s && readsSelected(s.value())) {
                return true;
            }
            if (t instanceof Transfer.When w
                    && (readsSelected(w.cond()) || usesSelected(w.then()) || usesSelected(w.otherwise()))) {
                return true;
            }
        }
        return false;
    }

    /** True when the meaning writes the selected bit (a store-like instruction). */
    public static boolean writesSelected(List<Transfer> body) {
        for (Transfer t : body) {
            if (t instanceof Transfer.ToSelected) {
                return true;
            }
            if (t instanceof Transfer.When w && (writesSelected(w.then()) || writesSelected(w.otherwise()))) {
                return true;
            }
        }
        return false;
    }

    /** True when the expression reads the selected bit. */
    public static boolean readsSelected(Rtl e) {
        if (e instanceof Rtl.Selected) {
            return true;
        }
        if (e instanceof Rtl.Not n) {
            return readsSelected(n.operand());
        }
        if (e instanceof Rtl.And a) {
            return readsSelected(a.left()) || readsSelected(a.right());
        }
        if (e instanceof Rtl.Or o) {
            return readsSelected(o.left()) || readsSelected(o.right());
        }
        if (e instanceof Rtl.Xor x) {
            return readsSelected(x.left()) || readsSelected(x.right());
        }
        return false;
    }

    /** The field of the first {@code pc <- field} in statement order (then-branch first), or -1. */
    public static int firstJumpField(List<Transfer> body) {
        for (Transfer t : body) {
            if (t instanceof Transfer.ToPc p) {
                return p.field();
            }
            if (t instanceof Transfer.When w) {
                int f = firstJumpField(w.then());
                if (f < 0) {
                    f = firstJumpField(w.otherwise());
                }
                if (f >= 0) {
                    return f;
                }
            }
        }
        return -1;
    }

    /** The first {@code pc <- pc +/- field} in statement order (then-branch first), or null. */
    public static Transfer.PcStep firstRelativeJump(List<Transfer> body) {
        for (Transfer t : body) {
            if (t instanceof Transfer.PcStep p && p.field() >= 0) {
                return p;
            }
            if (t instanceof Transfer.When w) {
                Transfer.PcStep f = firstRelativeJump(w.then());
                if (f == null) {
                    f = firstRelativeJump(w.otherwise());
                }
                if (f != null) {
                    return f;
                }
            }
        }
        return null;
    }

    /** True when the meaning assigns the PC anywhere (a jump, a skip or a relative jump). */
    public static boolean writesPc(List<Transfer> body) {
        for (Transfer t : body) {
            if (t instanceof Transfer.ToPc || t instanceof Transfer.PcStep) {
                return true;
            }
            if (t instanceof Transfer.When w && (writesPc(w.then()) || writesPc(w.otherwise()))) {
                return true;
            }
        }
        return false;
    }

    /** Fields the meaning jumps to (their indices, ascending), empty when it never jumps. */
    public static Set<Integer> jumpFields(List<Transfer> body) {
        Set<Integer> s = new TreeSet<>();
        for (Transfer t : body) {
            if (t instanceof Transfer.ToPc p) {
                s.add(p.field());
            } else if (t instanceof Transfer.PcStep p && p.field() >= 0) {
                s.add(p.field());
            } else if (t instanceof Transfer.When w) {
                s.addAll(jumpFields(w.then()));
                s.addAll(jumpFields(w.otherwise()));
            }
        }
        return s;
    }
}
