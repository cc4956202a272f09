package org.thermion.faults;

import java.util.ArrayList;
import java.util.List;
import java.util.Queue;
import java.util.concurrent.Callable;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Parallel fault simulation: 64 faults at once, one per lane of a {@link LaneMachine}, each
 * lane with its own force masks on the one flat program; batches spread over a fixed pool of
 * threads. Every run starts from the power-up state (latches unknown, program counter 0).
 * A lamp reading is {@link #ZERO}, {@link #ONE} or {@link #UNKNOWN}; a fault is detected at a
 * step where the good machine's lamp is known and the faulty one shows the other known value.
 */
public final class FaultSimulator implements AutoCloseable {
    public static final byte ZERO = 0;
    public static final byte ONE = 1;
    public static final byte UNKNOWN = 2;

    private final FaultCircuit circuit;
    private final long[][] programs;
    private final ExecutorService pool;
    private final int threads;
    // Machines without faults, kept between calls for the workers of eachBatch (one per thread at most).
    private final Queue<LaneMachine> spare = new ConcurrentLinkedQueue<>();

    /** A simulator over {@code circuit} with program memory {@code rom} (null: none) on {@code threads} threads. */
    public FaultSimulator(FaultCircuit circuit, long[] rom, int threads) {
        this(circuit, java.util.Collections.singletonList(rom), threads);
    }

    /**
     * A simulator whose machine runs {@code programs.get(0)} from power-up; a step that restarts
     * with program k fits {@code programs.get(k)} (null entries: no ROM).
     */
    public static FaultSimulator running(FaultCircuit circuit, List<long[]> programs, int threads) {
        return new FaultSimulator(circuit, programs, threads);
    }

    private FaultSimulator(FaultCircuit circuit, List<long[]> programs, int threads) {
        this.circuit = circuit;
        this.programs = new long[programs.size()][];
        for (int k = 0; k < this.programs.length; k++) {
            this.programs[k] = programs.get(k) == null ? null : programs.get(k).clone();
        }
        this.threads = Math.max(1, threads);
        this.pool = Executors.newFixedThreadPool(this.threads, r -> {
            Thread t = new Thread(r, "fault-sim");
            t.setDaemon(true);
            return t;
        });
    }

    public FaultCircuit circuit() {
        return circuit;
    }

    public int threads() {
        return threads;
    }

    /** A simulator like this one (same threads) whose plans may also fit {@code more}, numbered after its own (close it). */
    public FaultSimulator withPrograms(List<long[]> more) {
        List<long[]> all = new ArrayList<>(java.util.Arrays.asList(programs));
        all.addAll(more);
        return new FaultSimulator(circuit, all, threads);
    }

    /** How many programs a plan may fit in turn (1 on a machine run with one). */
    public int programs() {
        return programs.length;
    }

    LaneMachine machine() {
        return new LaneMachine(circuit, programs);
    }

    /** The good machine's lamps after every step: {@code [step][lamp]}. */
    public byte[][] expected(List<Step> steps) {
        LaneMachine m = machine();
        byte[][] out = new byte[steps.size()][];
        for (int s = 0; s < steps.size(); s++) {
            apply(m, steps.get(s));
            out[s] = lamps(m, 0);
        }
        return out;
    }

    /** For each fault, the first step that detects it, or -1. Batches stop once all their faults are caught. */
    public int[] firstDetection(List<Fault> faults, List<Step> steps) {
        byte[][] good = expected(steps);
        int[] first = new int[faults.size()];
        eachBatch(faults, (m, b, n) -> {
            long live = n == 64 ? -1L : (1L << n) - 1;
            long caught = 0L;
            for (int s = 0; s < steps.size() && caught != live; s++) {
                apply(m, steps.get(s));
                long now = detected(m, good[s]) & live & ~caught;
                for (long w = now; w != 0L; w &= w - 1) {
                    first[b + Long.numberOfTrailingZeros(w)] = s;
                }
                caught |= now;
            }
            for (long w = live & ~caught; w != 0L; w &= w - 1) {
                first[b + Long.numberOfTrailingZeros(w)] = -1;
            }
        });
        return first;
    }

    /** Every fault's lamps after every step: {@code [fault][step * lamps + lamp]}. */
    public byte[][] responses(List<Fault> faults, List<Step> steps) {
        int lamps = circuit.lamps().size();
        byte[][] out = new byte[faults.size()][steps.size() * lamps];
        eachBatch(faults, (m, b, n) -> {
            for (int s = 0; s < steps.size(); s++) {
                apply(m, steps.get(s));
                for (int i = 0; i < lamps; i++) {
                    int slot = circuit.lamps().get(i).slot();
                    for (int l = 0; l < n; l++) {
                        out[b + l][s * lamps + i] = reading(m, slot, l);
                    }
                }
            }
        });
        return out;
    }

    /** What one batch does: {@code m} carries faults {@code base .. base+n-1} on lanes 0 .. n-1. */
    interface BatchJob {
        void run(LaneMachine m, int base, int n);
    }

    /**
     * Runs {@code job} on every batch of 64 faults. One worker per thread claims batches in turn
     * from a shared counter and reloads its own machine for each (a machine of the 10^4-stage
     * machine is about a megabyte: allocating one per batch cost as much as simulating it, and two
     * threads allocating at once spent their gain in the collector).
     */
    void eachBatch(List<Fault> faults, BatchJob job) {
        int batches = (faults.size() + LaneMachine.LANES - 1) / LaneMachine.LANES;
        AtomicInteger next = new AtomicInteger();
        List<Callable<Void>> workers = new ArrayList<>();
        for (int w = 0; w < Math.min(threads, batches); w++) {
            workers.add(() -> {
                LaneMachine m = spare.poll();
                m = m == null ? machine() : m;
                try {
                    for (int b = next.getAndIncrement(); b < batches; b = next.getAndIncrement()) {
                        int base = b * LaneMachine.LANES;
                        int n = Math.min(LaneMachine.LANES, faults.size() - base);
                        m.clearFaults();
                        load(m, faults, base, n);
                        job.run(m, base, n);
                    }
                } finally {
                    m.clearFaults();
                    spare.add(m);
                }
                return null;
            });
        }
        run(workers);
    }

    /** A machine at power-up with faults {@code from .. from+n-1} on lanes 0 .. n-1. */
    LaneMachine loaded(List<Fault> faults, int from, int n) {
        LaneMachine m = machine();
        load(m, faults, from, n);
        return m;
    }

    private static void load(LaneMachine m, List<Fault> faults, int from, int n) {
        for (int l = 0; l < n; l++) {
            m.inject(faults.get(from + l), 1L << l);
        }
        m.fit(0);
        m.powerUp();
    }

    static void apply(LaneMachine m, Step s) {
        m.step(s);
    }

    /** Lanes whose lamps show a known value other than the good machine's known one. */
    long detected(LaneMachine m, byte[] good) {
        long det = 0L;
        List<ObservedLamp> lamps = circuit.lamps();
        for (int i = 0; i < good.length; i++) {
            if (good[i] == UNKNOWN) {
                continue;
            }
            int slot = lamps.get(i).slot();
            long other = good[i] == ONE ? ~m.v[slot] : m.v[slot];
            det |= other & ~m.x[slot];
        }
        return det;
    }

    byte[] lamps(LaneMachine m, int lane) {
        List<ObservedLamp> lamps = circuit.lamps();
        byte[] out = new byte[lamps.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = reading(m, lamps.get(i).slot(), lane);
        }
        return out;
    }

    static byte reading(LaneMachine m, int slot, int lane) {
        if ((m.x[slot] >>> lane & 1L) != 0L) {
            return UNKNOWN;
        }
        return (byte) (m.v[slot] >>> lane & 1L);
    }

    /** Runs jobs on the pool and waits for all; a job's failure is rethrown. */
    <T> List<T> run(List<? extends Callable<T>> jobs) {
        try {
            List<T> out = new ArrayList<>(jobs.size());
            if (threads == 1) {
                for (Callable<T> j : jobs) {
                    out.add(j.call());
                }
                return out;
            }
            for (Future<T> f : pool.invokeAll(jobs)) {
                out.add(f.get());
            }
            return out;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("fault simulation interrupted", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("fault simulation failed: " + e.getCause(), e.getCause());
        } catch (Exception e) {
            throw new IllegalStateException("fault simulation failed: " + e, e);
        }
    }

    @Override
    public void close() {
        pool.shutdownNow();
    }
}
