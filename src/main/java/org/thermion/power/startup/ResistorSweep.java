package org.thermion.power.startup;

import java.util.List;

/**
 * Solves the transient for a range of soft-start resistor values and recommends the one that
 * makes the larger of the two current peaks (switch-on, bypass) smallest, among the values whose
 * supply stays within its current limit and whose resistor stays within its rating (mean
 * dissipation while in circuit) and actually gets bypassed within the run. Values run on a pool
 * of threads ({@link SweepPool}); the earliest of equal peaks wins, whatever the finishing order.
 */
public final class ResistorSweep {
    private ResistorSweep() {
    }

    /** One resistor value. */
    public record Row(double ohms, double switchOnPeak, double bypassPeak, double bypassTime, double peakDemand,
                      double meanWatts, double peakWatts, double joules, boolean withinLimit, boolean withinRating,
                      boolean bypassed) {
        public double worstPeak() {
            return Double.isNaN(bypassPeak) ? switchOnPeak : Math.max(switchOnPeak, bypassPeak);
        }

        public boolean feasible() {
            return withinLimit && withinRating && bypassed;
        }
    }

    /**
     * The table and the recommendation ({@code best} is -1 when no value is feasible); {@code preferred}
     * is the recommendation moved to the nearest E24 value (IEC 60063) and solved again (null without one),
     * with {@code preferredWatts} the commonly sold rating its temperature rise asks.
     */
    public record Result(String softStart, String rail, double limitAmps, double ratedWatts, List<Row> rows, int best,
                         Row preferred, double preferredWatts) {
        public Row recommended() {
            return best < 0 ? null : rows.get(best);
        }
    }

    /** The values {@code from, from + step, ...} up to {@code to} (inclusive, allowing for rounding). */
    public static double[] range(double from, double to, double step) {
        if (!(step > 0) || !(to >= from) || !(from >= 0)) {
            throw new IllegalArgumentException("a sweep needs 0 <= from <= to and a positive step");
        }
        long count = (long) Math.floor((to - from) / step + 1e-9) + 1;
        if (count > 10_000) {
            throw new IllegalArgumentException("a sweep of " + count + " values is too many (at most 10000)");
        }
        double[] v = new double[(int) count];
        for (int i = 0; i < count; i++) {
            v[i] = from + i * step;
        }
        return v;
    }

    /** Runs the sweep on soft start {@code softStart} of {@code net}, on every core. */
    public static Result run(StartupNetwork net, PowerUpOptions base, String softStart, double[] ohms) {
        return run(net, base, softStart, ohms, Runtime.getRuntime().availableProcessors(), done -> { });
    }

    /**
     * As {@link #run(StartupNetwork, PowerUpOptions, String, double[])}, on {@code threads} threads
     * ({@link SweepPool}), telling {@code progress} how many values are done.
     */
    public static Result run(StartupNetwork net, PowerUpOptions base, String softStart, double[] ohms, int threads,
                             java.util.function.IntConsumer progress) {
        int k = net.softStartNames().indexOf(softStart);
        if (k < 0) {
            throw new IllegalArgumentException("no soft start named '" + softStart + "'");
        }
        StartupNetwork.Soft soft = net.softs.get(k);
        int rail = soft.rail();
        PowerUpOptions o = base.withSampleSeconds(0);
        List<Row> rows = SweepPool.map(ohms.length, threads, i -> row(net, o, k, rail, ohms[i]), progress);
        int best = -1;
        for (int i = 0; i < rows.size(); i++) {
            Row row = rows.get(i);
            if (row.feasible() && (best < 0 || row.worstPeak() < rows.get(best).worstPeak())) {
                best = i;
            }
        }
        Row preferred = null;
        double watts = Double.NaN;
        if (best >= 0 && rows.get(best).ohms() > 0) {
            double pv = PreferredValues.nearestE24(rows.get(best).ohms());
            preferred = row(net, o, k, rail, pv);
            watts = ResistorRating.commonWatts(net.solve(o.withResistor(softStart, pv)).softStarts().get(k).neededWatts());
        }
        return new Result(softStart, net.machine.rails().get(rail).name(), net.machine.rails().get(rail).limitAmps(),
                soft.ratedWatts(), List.copyOf(rows), best, preferred, watts);
    }

    private static Row row(StartupNetwork net, PowerUpOptions o, int k, int rail, double r) {
        PowerUpResult res = net.solve(o.withResistor(net.softs.get(k).name(), r));
        RailTransient rt = res.rail(rail);
        SoftStartResult sr = res.softStarts().get(k);
        boolean bypassed = r == 0 || sr.bypassed();
        return new Row(r, rt.switchOnPeak(), rt.bypassPeak(), sr.bypassTime(), rt.peakDemand(), sr.meanWatts(),
                sr.peakWatts(), sr.joules(), rt.withinLimit(), sr.withinRating(), bypassed);
    }
}
