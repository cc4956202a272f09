package org.thermion.timing;

import org.thermion.model.NetLabels;
import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The short-path checks of a multi-phase machine, from the earliest a change can arrive (each
 * gate adding the delay of the edge its output makes, as on the long paths; each launching latch
 * its faster edge):
 * <ul>
 * <li>hold: a flip-flop steered by its data must see the data stay put until its conducting half
 * has taken over (after that the pair holds itself), so its hold time is its own faster edge (our
 * own rule); a change launched on the very edge that loads it (by a latch of the same phase, or
 * ROM data when the program counter loads on that phase) must arrive no sooner. Machine inputs
 * are left out: they change when the outside world changes them, not on a clock edge;</li>
 * <li>minimum pulse width: each phase must last at least as long as its slowest latch takes to
 * switch (our own rule: a flip-flop steered during its phase must have settled when it ends);</li>
 * </ul>
 * The phases' overlap is judged from the long paths ({@link #overlaps}).
 */
public final class RaceChecks {
    private static final int RISE = 0;
    private static final int FALL = 1;

    /** One check: what, where, the time available and the time needed (slack = have - need). */
    public record Check(String kind, int phase, String endpoint, double have, double need, String detail) {
        public double slack() {
            return have - need;
        }

        public boolean passes() {
            return slack() >= 0;
        }
    }

    private final Machine machine;
    private final Netlist nl;
    private final StageDelay[] gates;
    private final StageDelay[] latches;
    private final double romAccess;
    private final NetLabels labels;

    public RaceChecks(Machine machine, DelayCalculator calc, double romAccessSeconds) {
        this.machine = machine;
        this.nl = machine.netlist();
        this.gates = calc.gates();
        this.latches = calc.latches();
        this.romAccess = romAccessSeconds;
        this.labels = new NetLabels(nl);
    }

    /** Every check at phase width {@code width}: hold per phase, pulse width per phase, overlap per boundary. */
    public List<Check> checks(double width) {
        int phases = Math.max(1, machine.clock().phases());
        List<Check> out = new ArrayList<>();
        for (int q = 1; q <= phases; q++) {
            double[] early = earliest(q, phases);
            Check hold = worstInto(early, q, "hold", "changes launched on the edge that loads it");
            if (hold != null) {
                out.add(hold);
            }
        }
        for (int q = 1; q <= phases; q++) {
            double need = 0;
            String slowest = "";
            for (Latch l : nl.latches()) {
                if (l.phase() == q && latches[l.id()].worst() > need) {
                    need = latches[l.id()].worst();
                    slowest = "latch " + nl.netName(l.output());
                }
            }
            if (!slowest.isEmpty()) {
                out.add(new Check("pulse width", q, slowest, width, need, "phase width against the latch's switching time"));
            }
        }
        return out;
    }

    /**
     * The clock's phases share the period with no gap and no overlap. When phase p's clock stays
     * on T into phase p + 1, its latches load and launch T late, and every path from them into the
     * latches of phase p + 1 loses T of its budget: a boundary tolerates an overlap up to the
     * slack of the worst path into phase p + 1 ({@code r}'s, at whatever corner it was taken).
     */
    public static List<Check> overlaps(TimingReport r) {
        List<Check> out = new ArrayList<>();
        if (r.phases() < 2) {
            return out;
        }
        for (PhaseTiming q : r.perPhase()) {
            if (q.hasPath()) {
                int prev = Math.floorMod(q.phase() - 2, r.phases()) + 1;
                out.add(new Check("overlap", q.phase(), q.endpoint(), q.slack(), 0, "phases " + prev + " and "
                        + q.phase() + " may overlap by at most the slack of the worst path into phase " + q.phase()));
            }
        }
        return out;
    }

    private Check worstInto(double[] early, int q, String kind, String detail) {
        Check worst = null;
        for (Latch l : nl.latches()) {
            if (l.phase() != q) {
                continue;
            }
            double hold = Math.min(latches[l.id()].rise(), latches[l.id()].fall());
            int[] ins = l.enable() >= 0 ? new int[] {l.data(), l.enable()} : new int[] {l.data()};
            for (int in : ins) {
                if (early[in] == Double.POSITIVE_INFINITY) {
                    continue;
                }
                Check c = new Check(kind, q, "latch " + nl.netName(l.output()) + (in == l.enable() ? " (enable)" : ""),
                        early[in], hold, detail + "; earliest change via " + labels.label(in));
                if (worst == null || c.slack() < worst.slack()) {
                    worst = c;
                }
            }
        }
        return worst;
    }

    /**
     * Earliest arrival at every net of a change launched at the end of phase {@code launch}
     * (infinity: none): the earlier of its rising and its falling edge. Edges are followed as the
     * long paths follow them (an inverting gate turns a falling input into a rising output), each
     * gate adding the delay of the edge its output makes: a diode AND falls fast through its diode
     * but rises only through its pull-up, so one change cannot take every gate's faster edge.
     * A launching flip-flop's output, and its free complement, count its faster edge both ways.
     */
    double[] earliest(int launch, int phases) {
        int n = nl.netCount();
        double[][] a = new double[2][n];
        Arrays.fill(a[RISE], Double.POSITIVE_INFINITY);
        Arrays.fill(a[FALL], Double.POSITIVE_INFINITY);
        for (Latch l : nl.latches()) {
            if (l.phase() == launch) {
                double t = Math.min(latches[l.id()].rise(), latches[l.id()].fall());
                a[RISE][l.output()] = t;
                a[FALL][l.output()] = t;
            }
        }
        if (machine.pc() != null && machine.rom() != null && launch == machine.pc().phase()) {
            for (int d : machine.rom().dataNets()) {
                a[RISE][d] = romAccess;
                a[FALL][d] = romAccess;
            }
        }
        for (Gate g : nl.gates()) {
            StageDelay d = gates[g.id()];
            for (int out = RISE; out <= FALL; out++) {
                double best = Double.POSITIVE_INFINITY;
                for (int in : g.inputs()) {
                    for (int edge = RISE; edge <= FALL; edge++) {
                        if (g.fn().causes(edge == RISE, out == RISE)) {
                            best = Math.min(best, a[edge][in]);
                        }
                    }
                }
                if (best < Double.POSITIVE_INFINITY) {
                    double t = best + (out == RISE ? d.rise() : d.fall());
                    a[out][g.output()] = Math.min(a[out][g.output()], t);
                }
            }
        }
        double[] first = new double[n];
        for (int i = 0; i < n; i++) {
            first[i] = Math.min(a[RISE][i], a[FALL][i]);
        }
        return first;
    }
}
