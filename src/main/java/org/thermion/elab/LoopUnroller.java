package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.ModuleStmt;

import java.util.List;

/**
 * Walks a module body in order, unrolling generator loops ({@code for k in A..B}) with the
 * loop variable bound as a constant, and passes each statement to the stage that expands it.
 * Keeps the budgets of expansion: instances times loop steps, total loop steps, nesting depth
 * (module instances and loops together, so the JVM's stack is never the limit), and the
 * thread's interrupt flag, checked every few thousand steps.
 */
final class LoopUnroller {
    /** How deep module instances and generator loops may nest, together. */
    static final int MAX_NESTING = 100;
    private static final long ITERATION_LIMIT = 10_000_000;
    private static final int CHECK_EVERY = 4096;

    private final StatementLowering statements;
    private final ConstantFolder folder;
    private final Diagnostics diags;
    private Instantiator instances;
    private long iterations;
    private long loopProduct = 1;
    private int nesting;
    private boolean stopped;

    LoopUnroller(StatementLowering statements, ConstantFolder folder, Diagnostics diags) {
        this.statements = statements;
        this.folder = folder;
        this.diags = diags;
    }

    void instancesBy(Instantiator instances) {
        this.instances = instances;
    }

    /** Opens one level of nesting; false (after an error at {@code at}) past {@link #MAX_NESTING}. */
    boolean enter(Span at, String what) {
        if (nesting >= MAX_NESTING) {
            diags.error(at, "this " + what + " would nest " + (nesting + 1) + " deep; module instances and generator loops"
                    + " nest at most " + MAX_NESTING + " deep, together", "flatten the hierarchy or the loops");
            stopped = true;
            return false;
        }
        nesting++;
        return true;
    }

    void leave() {
        nesting--;
    }

    /** One step of expansion: the work budget and the interrupt flag. */
    void step() {
        if (++iterations > ITERATION_LIMIT) {
            throw new TooLarge();
        }
        if ((iterations % CHECK_EVERY) == 0 && Thread.currentThread().isInterrupted()) {
            throw new ElaborationInterrupted();
        }
    }

    void body(Scope f, List<ModuleStmt> stmts, boolean topLevel) {
        for (ModuleStmt s : stmts) {
            if (diags.full() || stopped) {
                return;
            }
            if (s instanceof ModuleStmt.Assign a) {
                statements.assign(f, a);
            } else if (s instanceof ModuleStmt.Nets n) {
                if (!topLevel) {
                    diags.error(n.span(), "nets are declared outside generator loops", "declare the bus before the loop and index it inside");
                } else if (n.init() != null && n.nets().size() == 1) {
                    statements.netInit(f, n);
                }
            } else if (s instanceof ModuleStmt.Latch l) {
                if (!topLevel) {
                    diags.error(l.span(), "latches are declared outside generator loops", "declare the latch bus before the loop");
                } else {
                    statements.latch(f, l);
                }
            } else if (s instanceof ModuleStmt.Use u) {
                instances.use(f, u);
            } else if (s instanceof ModuleStmt.For fo) {
                generate(f, fo);
            } else if (s instanceof ModuleStmt.Ports p) {
                if (!topLevel) {
                    diags.error(p.span(), "ports are declared outside generator loops", null);
                }
            } else if (s instanceof ModuleStmt.Const c) {
                if (!topLevel) {
                    diags.error(c.span(), "constants are declared outside generator loops", null);
                }
            }
        }
    }

    private void generate(Scope f, ModuleStmt.For fo) {
        Long from = folder.value(f.consts, fo.from(), "the start of a loop range");
        Long to = folder.value(f.consts, fo.to(), "the end of a loop range");
        if (from == null || to == null) {
            return;
        }
        String var = fo.var().text();
        if (f.names.containsKey(var)) {
            diags.error(fo.var().span(), "loop variable '" + var + "' hides a net of the same name", "choose another name for the loop variable");
            return;
        }
        // Unsigned: a range from Long.MIN_VALUE to Long.MAX_VALUE does not wrap to a small count.
        long span = Math.max(from, to) - Math.min(from, to);
        if (Long.compareUnsigned(span, NetBuilder.LIMIT) >= 0 || span + 1 > NetBuilder.LIMIT / loopProduct) {
            String times = Long.compareUnsigned(span, NetBuilder.LIMIT) >= 0 ? "more than " + String.format("%,d", NetBuilder.LIMIT)
                    : String.format("%,d", (span + 1) * loopProduct);
            diags.error(fo.span(), "generator would expand " + times + " times (limit " + String.format("%,d", NetBuilder.LIMIT) + ")",
                    "check the loop's range; a machine of this size is not what was meant");
            stopped = true;
            return;
        }
        if (!enter(fo.span(), "generator loop")) {
            return;
        }
        long count = span + 1;
        Long saved = f.consts.get(var);
        f.enterLoop(var);
        loopProduct *= count;
        long step = from <= to ? 1 : -1;
        for (long k = from; ; k += step) {
            step();
            f.consts.put(var, k);
            body(f, fo.body(), false);
            if (k == to || diags.full() || stopped) {
                break;
            }
        }
        loopProduct /= count;
        f.leaveLoop();
        leave();
        if (saved == null) {
            f.consts.remove(var);
        } else {
            f.consts.put(var, saved);
        }
    }
}
