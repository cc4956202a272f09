package org.thermion.bench;

import org.thermion.model.Machine;
import org.thermion.power.startup.DrawMode;
import org.thermion.power.startup.PowerUpOptions;
import org.thermion.power.startup.ResistorSweep;
import org.thermion.power.startup.SoftStartSizing;
import org.thermion.power.startup.StartupNetwork;
import org.thermion.power.startup.ThermalAssumptions;

import java.util.List;

/**
 * Power-up rows on a machine of our own: {@code tubes} 6AU6 inverters, heaters four to a string
 * on 24 V, no soft start. The solve integrates one trajectory per string (no sharing of identical
 * strings), so every tube's wire and cathode are states; the sizing sweep is 20 resistors by
 * 20 bypass times on that network, on one thread and on two.
 */
final class PowerUpBench {
    static final double SOLVE_SECONDS = 0.2;
    static final double SWEEP_SECONDS = 5;
    static final double SPEED_UP = 1.5;

    private PowerUpBench() {
    }

    static String text(int tubes) {
        return """
                rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
                rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
                rail heat  { voltage 24 V; source 0.05 ohm; limit 60 A }
                heaters on heat { series 4 of 6AU6 across machine }
                realize { not pentode_inverter }
                module chain {
                  in a
                  out y
                  net n[%d]
                  n[0] = !a
                  for k in 1..%d { n[k] = !n[k - 1] }
                  y = !n[%d]
                }
                machine bench_inverters {
                  clock { phases 1; period 100 us }
                  top chain
                  inputs a
                  outputs y
                }
                """.formatted(tubes - 1, tubes - 2, tubes - 2);
    }

    static void rows(List<BenchRow> rows, boolean quick, java.util.function.Consumer<String> progress) {
        progress.accept("measuring powerup on 100 tubes");
        Machine m = new Measure.Source("inverters100", null, text(100)).elaborate();
        ThermalAssumptions a = ThermalAssumptions.standard();
        PowerUpOptions o = PowerUpOptions.defaults().withSeconds(30);
        StartupNetwork each = StartupNetwork.unshared(m, a, DrawMode.HIGHEST);
        double solve = BenchSuite.best(() -> each.solve(o), quick ? 1 : 3);
        rows.add(BenchRow.target("inverters100", "powerup: solve 30 s, " + each.heaterStates()
                + " heater trajectories x 2 bodies", solve, "s", SOLVE_SECONDS, true, "0.2 s"));
        StartupNetwork net = each;   // the same worst case: every string its own trajectory
        double[] ohms = ResistorSweep.range(0.25, 5, 0.25);
        double[] times = SoftStartSizing.times(1, 20, 1);
        int rail = m.railIndex("heat");
        double one = BenchSuite.best(() -> SoftStartSizing.run(net, o, rail, ohms, times, 1), quick ? 1 : 3);
        double two = BenchSuite.best(() -> SoftStartSizing.run(net, o, rail, ohms, times, 2), quick ? 1 : 3);
        rows.add(BenchRow.info("inverters100", "powerup: 20 x 20 sizing sweep, 1 thread", one, "s"));
        rows.add(BenchRow.target("inverters100", "powerup: 20 x 20 sizing sweep, 2 threads", two, "s", SWEEP_SECONDS,
                true, "5 s"));
        int cores = Runtime.getRuntime().availableProcessors();
        BenchRow up = BenchRow.target("inverters100", "powerup: sizing speed-up 1 -> 2 threads", one / two, "x",
                SPEED_UP, false, "1.5 x");
        double load = java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
        if (cores < 2) {
            up = up.withNote("only " + cores + " core available");
        } else if (load > cores) {
            up = up.withNote(String.format(java.util.Locale.ROOT, "load average %.1f on %d cores while measured: "
                    + "other work held the second core", load, cores));
        }
        rows.add(up);
    }
}
