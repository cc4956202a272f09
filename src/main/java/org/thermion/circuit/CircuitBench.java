package org.thermion.circuit;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;

/**
 * A measurement for {@code bench}: operating points (every input state) and noise margins for
 * {@code n} stage uses drawn (seeded) from the library's stages with 1 to 8 loads each, as a
 * machine of that size would ask for them, through one cache.
 */
public final class CircuitBench {
    private CircuitBench() {
    }

    /** What one run did and how long it took. */
    public record Result(int stages, long distinctSolves, long nanos, int unsolved) {
        public double seconds() {
            return nanos / 1e9;
        }
    }

    /** Runs the workload on the library's logic stages as {@code mc} declares them, at its rails. */
    public static Result run(MachineCircuits mc, int n, long seed) {
        Map<String, StageCircuit> lib = mc.circuitsByName();
        List<StageCircuit> drivers = present(lib, "pentode_inverter", "triode_nor2", "cathode_follower", "diode_and",
                "diode_or", "triode_flipflop");
        List<StageCircuit> receivers = present(lib, "pentode_inverter", "triode_nor2");
        StageSolver solver = new StageSolver(mc.rails());
        MarginAnalysis margins = new MarginAnalysis(solver);
        InputLevels levels = new InputLevels(5, 45);
        Random rnd = new Random(seed);
        int unsolved = 0;
        long t0 = System.nanoTime();
        for (int i = 0; i < n; i++) {
            StageCircuit d = drivers.get(rnd.nextInt(drivers.size()));
            StageCircuit r = receivers.get(rnd.nextInt(receivers.size()));
            NetAnalysis net = margins.net(d, levels, r, 1 + rnd.nextInt(8));
            for (DcResult p : net.points()) {
                unsolved += p.solved() ? 0 : 1;
            }
            unsolved += net.margins().problem() == null ? 0 : 1;
        }
        return new Result(n, solver.solves(), System.nanoTime() - t0, unsolved);
    }

    private static List<StageCircuit> present(Map<String, StageCircuit> lib, String... names) {
        List<StageCircuit> out = new ArrayList<>();
        for (String n : names) {
            if (lib.containsKey(n)) {
                out.add(lib.get(n));
            }
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException("none of the library's logic stages has a circuit here");
        }
        return out;
    }
}
