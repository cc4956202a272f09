package org.thermion.sim;

import org.thermion.model.Gate;
import org.thermion.model.Netlist;

import java.util.List;

/**
 * The three-valued settle (power-up state unknown): one opcode per gate in the netlist's
 * levelized order, each over a value word and an unknown word per net, by Kleene's rules
 * (0 AND X = 0, 1 OR X = 1, X XOR anything = X). Two-input forms avoid the operand list.
 */
final class ThreeValuedSettle {
    // Opcodes of the compiled gates; two-input forms avoid the operand list.
    private static final int OP_BUF = 0;
    private static final int OP_NOT = 1;
    private static final int OP_AND2 = 2;
    private static final int OP_OR2 = 3;
    private static final int OP_NAND2 = 4;
    private static final int OP_NOR2 = 5;
    private static final int OP_XOR2 = 6;
    private static final int OP_AND = 7;
    private static final int OP_OR = 8;
    private static final int OP_NAND = 9;
    private static final int OP_NOR = 10;
    private static final int OP_XOR = 11;
    private static final int OP_AND3 = 12;
    private static final int OP_OR3 = 13;
    private static final int OP_AND4 = 14;
    private static final int OP_OR4 = 15;

    private final int gateCount;
    private final int[] op;
    private final int[] in0;
    private final int[] in1;
    private final int[] listStart;
    private final int[] listEnd;
    private final int[] list;
    private final int[] out;

    /** Compiles the gates of {@code nl} with every net at {@code sl[net]} in the value words. */
    ThreeValuedSettle(Netlist nl, int[] sl) {
        List<Gate> gates = nl.gates();
        gateCount = gates.size();
        op = new int[gateCount];
        in0 = new int[gateCount];
        in1 = new int[gateCount];
        listStart = new int[gateCount];
        listEnd = new int[gateCount];
        out = new int[gateCount];
        int total = 0;
        for (Gate g : gates) {
            total += g.arity();
        }
        list = new int[total];
        int at = 0;
        for (int i = 0; i < gateCount; i++) {
            Gate g = gates.get(i);
            int[] ins = g.inputs();
            out[i] = sl[g.output()];
            listStart[i] = at;
            for (int n : ins) {
                list[at++] = sl[n];
            }
            listEnd[i] = at;
            in0[i] = ins.length > 0 ? sl[ins[0]] : Netlist.CONST0;
            in1[i] = ins.length > 1 ? sl[ins[1]] : Netlist.CONST0;
            op[i] = opcode(g, ins.length);
        }
    }

    private static int opcode(Gate g, int n) {
        if (n == 0) {
            // Never produced by the elaborator; the list forms give the empty function's value.
            return switch (g.fn()) {
                case AND -> OP_AND;
                case OR -> OP_OR;
                case NAND -> OP_NAND;
                case NOR -> OP_NOR;
                case XOR -> OP_XOR;
                case BUF -> OP_BUF;
                case NOT -> OP_NOT;
            };
        }
        return switch (g.fn()) {
            case BUF -> OP_BUF;
            case NOT -> OP_NOT;
            case AND -> n == 1 ? OP_BUF : n == 2 ? OP_AND2 : n == 3 ? OP_AND3 : n == 4 ? OP_AND4 : OP_AND;
            case OR -> n == 1 ? OP_BUF : n == 2 ? OP_OR2 : n == 3 ? OP_OR3 : n == 4 ? OP_OR4 : OP_OR;
            case NAND -> n == 1 ? OP_NOT : n == 2 ? OP_NAND2 : OP_NAND;
            case NOR -> n == 1 ? OP_NOT : n == 2 ? OP_NOR2 : OP_NOR;
            case XOR -> n == 1 ? OP_BUF : n == 2 ? OP_XOR2 : OP_XOR;
        };
    }

    // Three-valued settle. Invariant: val has 0 wherever unk has 1, so "known 1" is just val.
    /** Evaluates every gate in netlist order over values {@code v} and unknown marks {@code x}. */
    void settle(long[] v, long[] x) {
        for (int g = 0, n = gateCount; g < n; g++) {
            long rv;
            long rx;
            int code = op[g];
            switch (code) {
                case OP_BUF:
                    rv = v[in0[g]];
                    rx = x[in0[g]];
                    break;
                case OP_NOT:
                    rx = x[in0[g]];
                    rv = ~v[in0[g]] & ~rx;
                    break;
                case OP_AND2:
                case OP_NAND2: {
                    int p = in0[g];
                    int q = in1[g];
                    long one = v[p] & v[q];
                    long zero = (~v[p] & ~x[p]) | (~v[q] & ~x[q]);
                    rx = ~zero & ~one;
                    rv = code == OP_AND2 ? one : zero;
                    break;
                }
                case OP_OR2:
                case OP_NOR2: {
                    int p = in0[g];
                    int q = in1[g];
                    long one = v[p] | v[q];
                    long zero = ~v[p] & ~x[p] & ~v[q] & ~x[q];
                    rx = ~zero & ~one;
                    rv = code == OP_OR2 ? one : zero;
                    break;
                }
                case OP_XOR2: {
                    rx = x[in0[g]] | x[in1[g]];
                    rv = (v[in0[g]] ^ v[in1[g]]) & ~rx;
                    break;
                }
                case OP_AND3:
                case OP_AND4:
                case OP_AND:
                case OP_NAND: {
                    long one = -1L;
                    long zero = 0L;
                    for (int k = listStart[g], e = listEnd[g]; k < e; k++) {
                        int p = list[k];
                        one &= v[p];
                        zero |= ~v[p] & ~x[p];
                    }
                    rx = ~zero & ~one;
                    rv = code == OP_NAND ? zero : one;
                    break;
                }
                case OP_OR3:
                case OP_OR4:
                case OP_OR:
                case OP_NOR: {
                    long one = 0L;
                    long zero = -1L;
                    for (int k = listStart[g], e = listEnd[g]; k < e; k++) {
                        int p = list[k];
                        one |= v[p];
                        zero &= ~v[p] & ~x[p];
                    }
                    rx = ~zero & ~one;
                    rv = code == OP_NOR ? zero : one;
                    break;
                }
                case OP_XOR: {
                    long r = 0L;
                    long u = 0L;
                    for (int k = listStart[g], e = listEnd[g]; k < e; k++) {
                        r ^= v[list[k]];
                        u |= x[list[k]];
                    }
                    rx = u;
                    rv = r & ~u;
                    break;
                }
                default:
                    rv = 0;
                    rx = 0;
                    break;
            }
            v[out[g]] = rv;
            x[out[g]] = rx;
        }
    }
}
