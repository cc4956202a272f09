package org.thermion.sim;

/**
 * The array engine's two-valued settle: a {@link GateProgram}'s runs of gates of one shape, one
 * tight loop per run, over value words in the program's own net numbering.
 */
final class ArraySettle implements Simulator.Settle {
    private final GateProgram program;

    ArraySettle(GateProgram program) {
        this.program = program;
    }

    // Two-valued settle: one tight loop per run of gates of one shape (see GateProgram), each
    // loop a small method of its own so the JIT optimises it alone.
    @Override
    public void settle(long[] v) {
        final int[] c = program.code;
        final int[] shape = program.runShape;
        final int[] start = program.runStart;
        for (int r = 0, runs = shape.length; r < runs; r++) {
            int p = start[r];
            int e = start[r + 1];
            switch (shape[r]) {
                case GateProgram.BUF -> runBuf(v, c, p, e);
                case GateProgram.NOT -> runNot(v, c, p, e);
                case GateProgram.AND2 -> runAnd2(v, c, p, e);
                case GateProgram.OR2 -> runOr2(v, c, p, e);
                case GateProgram.NAND2 -> runNand2(v, c, p, e);
                case GateProgram.NOR2 -> runNor2(v, c, p, e);
                case GateProgram.XOR2 -> runXor2(v, c, p, e);
                case GateProgram.AND3 -> runAnd3(v, c, p, e);
                case GateProgram.OR3 -> runOr3(v, c, p, e);
                case GateProgram.NAND3 -> runNand3(v, c, p, e);
                case GateProgram.NOR3 -> runNor3(v, c, p, e);
                case GateProgram.AND4 -> runAnd4(v, c, p, e);
                case GateProgram.OR4 -> runOr4(v, c, p, e);
                case GateProgram.NAND4 -> runNand4(v, c, p, e);
                case GateProgram.NOR4 -> runNor4(v, c, p, e);
                default -> listRun(v, c, shape[r], p, e);
            }
        }
    }

    private static void runBuf(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 2) {
            v[c[p]] = v[c[p + 1]];
        }
    }

    private static void runNot(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 2) {
            v[c[p]] = ~v[c[p + 1]];
        }
    }

    private static void runAnd2(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 3) {
            v[c[p]] = v[c[p + 1]] & v[c[p + 2]];
        }
    }

    private static void runOr2(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 3) {
            v[c[p]] = v[c[p + 1]] | v[c[p + 2]];
        }
    }

    private static void runNand2(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 3) {
            v[c[p]] = ~(v[c[p + 1]] & v[c[p + 2]]);
        }
    }

    private static void runNor2(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 3) {
            v[c[p]] = ~(v[c[p + 1]] | v[c[p + 2]]);
        }
    }

    private static void runXor2(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 3) {
            v[c[p]] = v[c[p + 1]] ^ v[c[p + 2]];
        }
    }

    private static void runAnd3(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 4) {
            v[c[p]] = v[c[p + 1]] & v[c[p + 2]] & v[c[p + 3]];
        }
    }

    private static void runOr3(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 4) {
            v[c[p]] = v[c[p + 1]] | v[c[p + 2]] | v[c[p + 3]];
        }
    }

    private static void runNand3(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 4) {
            v[c[p]] = ~(v[c[p + 1]] & v[c[p + 2]] & v[c[p + 3]]);
        }
    }

    private static void runNor3(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 4) {
            v[c[p]] = ~(v[c[p + 1]] | v[c[p + 2]] | v[c[p + 3]]);
        }
    }

    private static void runAnd4(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 5) {
            v[c[p]] = v[c[p + 1]] & v[c[p + 2]] & v[c[p + 3]] & v[c[p + 4]];
        }
    }

    private static void runOr4(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 5) {
            v[c[p]] = v[c[p + 1]] | v[c[p + 2]] | v[c[p + 3]] | v[c[p + 4]];
        }
    }

    private static void runNand4(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 5) {
            v[c[p]] = ~(v[c[p + 1]] & v[c[p + 2]] & v[c[p + 3]] & v[c[p + 4]]);
        }
    }

    private static void runNor4(long[] v, int[] c, int p, int e) {
        for (; p < e; p += 5) {
            v[c[p]] = ~(v[c[p + 1]] | v[c[p + 2]] | v[c[p + 3]] | v[c[p + 4]]);
        }
    }

    // A run of list-shaped gates: output, operand count, operands.
    private static void listRun(long[] v, int[] c, int shape, int p, int e) {
        while (p < e) {
            int o = c[p];
            int k = p + 2;
            int end = k + c[p + 1];
            long r;
            if (shape == GateProgram.AND_N || shape == GateProgram.NAND_N) {
                r = -1L;
                for (; k < end; k++) {
                    r &= v[c[k]];
                }
            } else {
                r = 0L;
                if (shape == GateProgram.XOR_N) {
                    for (; k < end; k++) {
                        r ^= v[c[k]];
                    }
                } else {
                    for (; k < end; k++) {
                        r |= v[c[k]];
                    }
                }
            }
            v[o] = shape == GateProgram.NAND_N || shape == GateProgram.NOR_N ? ~r : r;
            p = end;
        }
    }
}
