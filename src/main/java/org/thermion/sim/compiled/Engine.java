package org.thermion.sim.compiled;

import org.thermion.model.Machine;
import org.thermion.sim.Simulator;

import java.util.Locale;

/**
 * The simulation engines a user can choose. {@code compiled} runs the logic as generated
 * straight-line bytecode (milliseconds to generate, then the JIT's warm-up); {@code array}
 * walks the flat gate arrays; {@code auto}, the default, takes the compiled engine where it
 * pays: on small netlists, whose generated code the JIT compiles at once, and on long runs,
 * which repay the warm-up of a big one, short of the very largest. All give identical results; three-valued settles
 * always run on the array engine's loop.
 */
public enum Engine {
    ARRAY, COMPILED, AUTO;

    /** The engine used when none is chosen. */
    public static final Engine DEFAULT = AUTO;

    /**
     * Netlists up to this many gates take the compiled engine whatever the run length: measured
     * on this project's synthetic machines, its warm-up stays under ~0.3 s there and it wins from
     * 10^4 cycles on (at 9376 gates the array engine still won a 10^5-cycle run).
     */
    static final int SMALL_GATES = 4000;
    /** Runs of at least this many gate evaluations take the compiled engine, up to {@link #LARGE_GATES}. */
    static final double LONG_RUN_EVALUATIONS = 2e10;
    /**
     * Past this many gates the array engine is the faster one even once warm: measured by
     * {@code bench}, the compiled engine still ran 1.26 x the array engine's cycles/s at 46,888
     * gates but 0.83 x at 93,792, where its machine code (megabytes, read once per settle)
     * streams through the instruction cache while the array engine, its nets numbered in the
     * order it reads them, keeps to the data caches.
     */
    static final int LARGE_GATES = 60_000;
    /** A run length long enough that {@code auto} compiles any netlist ({@link #forRun}). */
    public static final long LONG_RUN_CYCLES = 100_000_000L;

    /** "array", "compiled" or "auto"; IllegalArgumentException with the choices otherwise. */
    public static Engine parse(String text) {
        for (Engine e : values()) {
            if (e.word().equals(text.trim().toLowerCase(Locale.ROOT))) {
                return e;
            }
        }
        throw new IllegalArgumentException("unknown engine '" + text + "': choose auto, compiled or array");
    }

    /** The word used on the command line. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * The engine that runs {@code cycles} cycles of {@code machine} (0: length unknown): this one,
     * or for {@code auto} compiled or array as the class comment says.
     */
    public Engine forRun(Machine machine, long cycles) {
        if (this != AUTO) {
            return this;
        }
        return choose(machine.netlist().gates().size(), machine.clock().phases(), cycles);
    }

    /** What {@code auto} takes for {@code cycles} cycles of a netlist of {@code gates} gates and {@code phases} phases. */
    static Engine choose(int gates, int phases, long cycles) {
        double evaluations = (double) gates * Math.max(1, phases) * cycles;
        return gates <= SMALL_GATES || evaluations >= LONG_RUN_EVALUATIONS && gates <= LARGE_GATES ? COMPILED : ARRAY;
    }

    /** A simulator of {@code machine} on this engine, for a run of unknown length. */
    public Simulator simulator(Machine machine) {
        return simulator(machine, 0);
    }

    /** A simulator of {@code machine} on the engine {@link #forRun} picks for {@code cycles} cycles. */
    public Simulator simulator(Machine machine, long cycles) {
        if (forRun(machine, cycles) == ARRAY) {
            return new Simulator(machine);
        }
        return new Simulator(machine, StraightLineCompiler.compile(machine.netlist()), StraightLineCompiler.latchLoads(machine));
    }
}
