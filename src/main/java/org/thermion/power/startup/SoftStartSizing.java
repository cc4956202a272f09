package org.thermion.power.startup;


/**
 * Sizes a soft start for a rail that has none: a resistor and a timed bypass, as a two-way table
 * of the larger of the two current peaks (switch-on, bypass). One run per resistor, with the relay
 * held open, serves every bypass time: the state at each bypass time gives the switch-on peak so far
 * and the current the instant after closing ({@link TransientRun#probe}). Resistors are shared out
 * over a pool of threads ({@link SweepPool}).
 */
public final class SoftStartSizing {
    private SoftStartSizing() {
    }

    /** One cell: a resistor and a bypass time. */
    public record Cell(double switchOnPeak, double bypassPeak, double neededWatts, boolean withinLimit) {
        public double worstPeak() {
            return Math.max(switchOnPeak, bypassPeak);
        }
    }

    /**
     * The table: {@code cells[i][j]} for {@code ohms[i]} and {@code seconds[j]}; the balance point is the
     * cell of the smallest larger peak within the supply's limit ({@code bestOhm}, {@code bestTime}: -1
     * when none), with the E24 value nearest its resistor and the commonly sold wattage it asks.
     */
    public record Table(String rail, double limitAmps, double[] ohms, double[] seconds, Cell[][] cells, int bestOhm,
                        int bestTime, double preferredOhms, double preferredWatts, int threads) {
        public Cell best() {
            return bestOhm < 0 ? null : cells[bestOhm][bestTime];
        }
    }

    /** Sizes a timed soft start in {@code rail} over {@code ohms} x {@code seconds} on {@code threads} threads. */
    public static Table run(StartupNetwork base, PowerUpOptions o, int rail, double[] ohms, double[] seconds, int threads) {
        return run(base, o, rail, ohms, seconds, threads, done -> { });
    }

    /** As {@link #run(StartupNetwork, PowerUpOptions, int, double[], double[], int)}, telling {@code progress} each resistor done. */
    public static Table run(StartupNetwork base, PowerUpOptions o, int rail, double[] ohms, double[] seconds, int threads,
                            java.util.function.IntConsumer progress) {
        for (double s : seconds) {
            if (!(s > 0) || s > o.seconds()) {
                throw new IllegalArgumentException("bypass times must lie within the simulated time (0 to "
                        + StartupNetwork.fmt(o.seconds()) + " s)");
            }
        }
        StartupNetwork net = base.withTimedSoftStart(rail);
        int k = net.softs.size() - 1;
        double[] times = seconds.clone();
        java.util.Arrays.sort(times);
        double end = Math.min(o.seconds(), times[times.length - 1] + 1e-3);
        PowerUpOptions held = o.withHoldBypass(true).withSampleSeconds(0).withSeconds(Math.max(PowerUpOptions.MIN_SECONDS, end));
        double limit = net.machine.rails().get(rail).limitAmps();
        Cell[][] cells = SweepPool.map(ohms.length, threads, i -> {
            double r = ohms[i];
            TransientRun run = new TransientRun(net, held.withResistor(StartupNetwork.SIZING, r));
            BypassProbe probe = run.probe(k, times);
            run.run();
            double[] on = probe.switchOn(), by = probe.bypass(), w = probe.watts();
            Cell[] row = new Cell[times.length];
            for (int j = 0; j < times.length; j++) {
                row[j] = new Cell(on[j], r == 0 ? on[j] : by[j], r == 0 ? 0 : w[j], !(Math.max(on[j], by[j]) >= limit));
            }
            return row;
        }, progress).toArray(new Cell[0][]);
        int bi = -1, bj = -1;
        for (int i = 0; i < ohms.length; i++) {
            for (int j = 0; j < times.length; j++) {
                Cell c = cells[i][j];
                if (c.withinLimit() && (bi < 0 || c.worstPeak() < cells[bi][bj].worstPeak())) {
                    bi = i;
                    bj = j;
                }
            }
        }
        double pv = Double.NaN, pw = Double.NaN;
        if (bi >= 0 && ohms[bi] > 0) {
            pv = PreferredValues.nearestE24(ohms[bi]);
            pw = ResistorRating.commonWatts(cells[bi][bj].neededWatts());
        }
        return new Table(net.machine.rails().get(rail).name(), limit, ohms.clone(), times, cells, bi, bj, pv, pw,
                Math.max(1, threads));
    }

    /** The time values {@code from, from + step, ...} up to {@code to}. */
    public static double[] times(double from, double to, double step) {
        return ResistorSweep.range(from, to, step);
    }
}
