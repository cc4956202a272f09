package org.thermion.power;

import org.thermion.model.Machine;
import org.thermion.model.StageType;
import org.thermion.sim.InitMode;
import org.thermion.sim.Simulator;
import org.thermion.sim.Stimulus;
import org.thermion.sim.compiled.Engine;
import org.thermion.sim.run.LogicLane;
import org.thermion.sim.run.RunDriver;
import org.thermion.sim.run.RunObserver;

import java.util.Arrays;
import java.util.List;
import java.util.function.IntToLongFunction;

/**
 * Plate and bias current of a running machine, per module and per rail, fed one sample
 * after every simulated phase, and each module's approximate plate dissipation
 * ({@link StageDraw#plateWatts}). Each drawing stage instance contributes its stage's draw
 * for its output value at that moment ({@link StageDraw}); the soft-start thyratron counts
 * as conducting. Heater current is not included (it does not depend on the logic state;
 * see {@link HeaterAnalysis}). Amperes, magnitudes. Every phase lasts the same time, so the
 * mean over samples is the time average. Before the first sample every reading is NaN.
 * A net the simulator holds unknown (three-valued mode) reads 0, so its stage counts at
 * its output-low draw.
 */
public final class CurrentMeter {
    /**
     * A later sample is a new peak only when it exceeds the old by more than this (amperes, or
     * watts): states that draw the same current, summed in another order, differ in the last
     * bits, and the first of them is the peak's moment.
     */
    private static final double TIE_AMPS = 1e-12;
    private final StageDraw draw;
    private final int rails;
    /** Channels per module: one per rail, then the module's plate dissipation in watts. */
    private final int channels;
    private final int modules;
    /** Draw of every module on every rail with all net-following instances low, fixed ones in their state. */
    private final double[] base;
    /** Per net-following instance: its output net, and what it adds (slot module*channels+channel, amps or watts) when high. */
    private final int[] net;
    private final int[][] deltaSlot;
    private final double[][] deltaAmps;

    private final double[] now;
    private final double[] min;
    private final double[] max;
    private final double[] sum;
    private final long[] maxCycle;
    private final int[] maxPhase;
    private final double[] railNow;
    private final double[] railMin;
    private final double[] railMax;
    private final double[] railSum;
    private final long[] railMaxCycle;
    private final int[] railMaxPhase;
    private long samples;
    private long lastCycle = -1;
    private int lastPhase;

    /**
     * Meters a program: runs {@code cycles} cycles of the machine on {@code rom} (null: no ROM image)
     * on simulator lane 0, inputs from {@code stimulus} (null: all 0), one sample after every phase.
     */
    public static CurrentMeter ofRun(Machine m, long[] rom, Stimulus stimulus, long cycles, InitMode init) {
        return ofRun(StageDraw.of(m), rom, stimulus, cycles, init);
    }

    /** As {@link #ofRun(Machine, long[], Stimulus, long, InitMode)} with these stage figures. */
    public static CurrentMeter ofRun(StageDraw draw, long[] rom, Stimulus stimulus, long cycles, InitMode init) {
        Machine m = draw.machine();
        if (cycles < 1) {
            throw new IllegalArgumentException("cycles must be at least 1, not " + cycles);
        }
        Simulator sim = Engine.DEFAULT.simulator(m, cycles);
        sim.reset(init);
        if (rom != null) {
            sim.loadRom(rom);
        }
        CurrentMeter meter = new CurrentMeter(draw);
        RunDriver driver = new RunDriver(new LogicLane(sim), m.inputs().size(), stimulus).observe(meter.observer(sim, 0));
        driver.start();
        driver.finish(driver.run(cycles));
        return meter;
    }

    /** The stage figures this meter adds up. */
    public StageDraw draw() {
        return draw;
    }

    /** Feeds this meter from {@code sim}'s lane after every phase of a {@link RunDriver} run. */
    public RunObserver observer(Simulator sim, int lane) {
        return new RunObserver() {
            @Override
            public void phaseRan(long cycle, int phase) {
                sample(sim::value, lane, cycle, phase);
            }
        };
    }

    /** A meter with the machine's stage figures computed from its circuits ({@link StageDraw#of}). */
    public CurrentMeter(Machine m) {
        this(StageDraw.of(m));
    }

    /** A meter with these stage figures (and their machine). */
    public CurrentMeter(StageDraw draw) {
        Machine m = draw.machine();
        this.draw = draw;
        rails = m.rails().size();
        channels = rails + 1;
        modules = m.modules().size();
        base = new double[modules * channels];
        List<DrawingInstance> all = DrawingInstances.of(m);
        int following = (int) all.stream().filter(DrawingInstance::followsNet).count();
        net = new int[following];
        deltaSlot = new int[following][];
        deltaAmps = new double[following][];
        int k = 0;
        for (DrawingInstance d : all) {
            StageType st = m.stages().get(d.stage());
            if (!d.followsNet()) {
                for (int r = 0; r < rails; r++) {
                    base[d.module() * channels + r] += d.unsimulated() ? draw.maxAmps(st, r) : draw.amps(st, r, d.fixedHigh());
                }
                base[d.module() * channels + rails] += d.unsimulated()
                        ? Math.max(draw.plateWatts(st, false), draw.plateWatts(st, true)) : draw.plateWatts(st, d.fixedHigh());
                continue;
            }
            int n = 0;
            int[] slots = new int[channels];
            double[] amps = new double[channels];
            for (int c = 0; c < channels; c++) {
                double low = c < rails ? draw.amps(st, c, false) : draw.plateWatts(st, false);
                double high = c < rails ? draw.amps(st, c, true) : draw.plateWatts(st, true);
                base[d.module() * channels + c] += low;
                if (high != low) {
                    slots[n] = d.module() * channels + c;
                    amps[n] = high - low;
                    n++;
                }
            }
            net[k] = d.net();
            deltaSlot[k] = Arrays.copyOf(slots, n);
            deltaAmps[k] = Arrays.copyOf(amps, n);
            k++;
        }
        now = new double[base.length];
        min = new double[base.length];
        max = new double[base.length];
        sum = new double[base.length];
        maxCycle = new long[base.length];
        maxPhase = new int[base.length];
        railNow = new double[rails];
        railMin = new double[rails];
        railMax = new double[rails];
        railSum = new double[rails];
        railMaxCycle = new long[rails];
        railMaxPhase = new int[rails];
        reset();
    }

    /** Forgets every sample. */
    public void reset() {
        samples = 0;
        lastCycle = -1;
        lastPhase = 0;
        Arrays.fill(now, Double.NaN);
        Arrays.fill(railNow, Double.NaN);
        Arrays.fill(sum, 0);
        Arrays.fill(railSum, 0);
    }

    /**
     * Records a sample from a simulator after its {@code stepPhase()}: gate outputs as they
     * settled in that phase, latch outputs as they loaded at its end. The sample is stamped
     * with the phase just run and its cycle; before any phase ran, cycle 0 phase 0.
     */
    public void sample(Simulator sim, int lane) {
        int next = sim.nextPhase();
        long cycle = sim.cycle();
        int phase;
        if (next == 1) {
            phase = cycle == 0 ? 0 : sim.phases();
            cycle = Math.max(0, cycle - 1);
        } else {
            phase = next - 1;
        }
        sample(sim::value, lane, cycle, phase);
    }

    /**
     * Records one sample: {@code valueOfNet} gives a net's lanes (bit i = lane i) after the
     * phase settled, {@code cycle} (0-based) and {@code phase} (1-based) say when.
     */
    public void sample(IntToLongFunction valueOfNet, int lane, long cycle, int phase) {
        if (lane < 0 || lane > 63) {
            throw new IllegalArgumentException("lane must be 0..63, not " + lane);
        }
        System.arraycopy(base, 0, now, 0, base.length);
        for (int i = 0; i < net.length; i++) {
            if ((valueOfNet.applyAsLong(net[i]) >>> lane & 1L) != 0) {
                int[] slots = deltaSlot[i];
                double[] amps = deltaAmps[i];
                for (int j = 0; j < slots.length; j++) {
                    now[slots[j]] += amps[j];
                }
            }
        }
        Arrays.fill(railNow, 0);
        for (int s = 0; s < now.length; s++) {
            int c = s % channels;
            if (c < rails) {
                railNow[c] += now[s];
            }
        }
        boolean first = samples == 0;
        for (int s = 0; s < now.length; s++) {
            double a = now[s];
            sum[s] += a;
            if (first || a < min[s]) {
                min[s] = a;
            }
            if (first || a > max[s] + TIE_AMPS) {
                max[s] = a;
                maxCycle[s] = cycle;
                maxPhase[s] = phase;
            }
        }
        for (int r = 0; r < rails; r++) {
            double a = railNow[r];
            railSum[r] += a;
            if (first || a < railMin[r]) {
                railMin[r] = a;
            }
            if (first || a > railMax[r] + TIE_AMPS) {
                railMax[r] = a;
                railMaxCycle[r] = cycle;
                railMaxPhase[r] = phase;
            }
        }
        samples++;
        lastCycle = cycle;
        lastPhase = phase;
    }

    /** Samples taken since construction or the last reset. */
    public long samples() {
        return samples;
    }

    /** Cycle (0-based) of the last sample, -1 before any. */
    public long lastCycle() {
        return lastCycle;
    }

    /** Phase (1-based) of the last sample, 0 before any. */
    public int lastPhase() {
        return lastPhase;
    }

    public double nowModule(int module, int rail) {
        return now[slot(module, rail)];
    }

    public double minModule(int module, int rail) {
        return samples == 0 ? Double.NaN : min[slot(module, rail)];
    }

    public double peakModule(int module, int rail) {
        return samples == 0 ? Double.NaN : max[slot(module, rail)];
    }

    public double meanModule(int module, int rail) {
        return samples == 0 ? Double.NaN : sum[slot(module, rail)] / samples;
    }

    /** Cycle (0-based) of a module's first peak on a rail, -1 before any sample. */
    public long peakCycleModule(int module, int rail) {
        return samples == 0 ? -1 : maxCycle[slot(module, rail)];
    }

    /** Phase (1-based) of a module's first peak on a rail, 0 before any sample. */
    public int peakPhaseModule(int module, int rail) {
        return samples == 0 ? 0 : maxPhase[slot(module, rail)];
    }

    public double nowRail(int rail) {
        return railNow[checkRail(rail)];
    }

    public double minRail(int rail) {
        return samples == 0 ? Double.NaN : railMin[checkRail(rail)];
    }

    public double peakRail(int rail) {
        return samples == 0 ? Double.NaN : railMax[checkRail(rail)];
    }

    public double meanRail(int rail) {
        return samples == 0 ? Double.NaN : railSum[checkRail(rail)] / samples;
    }

    /** Cycle (0-based) of the rail's first peak, -1 before any sample. */
    public long peakCycle(int rail) {
        return samples == 0 ? -1 : railMaxCycle[checkRail(rail)];
    }

    /** Phase (1-based) of the rail's first peak, 0 before any sample. */
    public int peakPhase(int rail) {
        return samples == 0 ? 0 : railMaxPhase[checkRail(rail)];
    }

    /** A module's time-averaged plate dissipation, the figure that heats its tubes. */
    public double meanPlateWatts(int module) {
        return samples == 0 ? Double.NaN : sum[plateSlot(module)] / samples;
    }

    public double peakPlateWatts(int module) {
        return samples == 0 ? Double.NaN : max[plateSlot(module)];
    }

    private int plateSlot(int module) {
        checkModule(module);
        return module * channels + rails;
    }

    private int slot(int module, int rail) {
        checkModule(module);
        return module * channels + checkRail(rail);
    }

    private void checkModule(int module) {
        if (module < 0 || module >= modules) {
            throw new IndexOutOfBoundsException("no module " + module);
        }
    }

    private int checkRail(int rail) {
        if (rail < 0 || rail >= rails) {
            throw new IndexOutOfBoundsException("no rail " + rail);
        }
        return rail;
    }
}
