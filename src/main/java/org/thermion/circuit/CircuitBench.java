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

    /** Runs the workload at the library's rails (48 V B+, −12 V bias, 24 V relay). */
    public static Result run(int n, long seed) {
        TubeLibrary tubes = new TubeLibrary();
        Map<String, StageCircuit> lib = LibraryCircuits.of(tubes);
        List<StageCircuit> drivers = List.of(lib.get("pentode_inverter"), lib.get("triode_nor2"),
                lib.get("cathode_follower"), lib.get("diode_and"), lib.get("diode_or"), lib.get("triode_flipflop"));
        List<StageCircuit> receivers = List.of(lib.get("pentode_inverter"), lib.get("triode_nor2"));
        StageSolver solver = new StageSolver(RailSet.volts("bplus", 48, "bias", -12, "relay", 24));
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

    /** Prints a measurement: {@code java -cp thermion.jar org.thermion.circuit.CircuitBench [n]}. */
    public static void main(String[] args) {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 10_000;
        List<Result> runs = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            runs.add(run(n, 1));
        }
        for (Result r : runs) {
            System.out.printf("%d stages: %.3f s, %d distinct solves, %d without a solution%n", r.stages(),
                    r.seconds(), r.distinctSolves(), r.unsolved());
        }
    }
}
