package org.thermion.faults;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import java.util.Random;

/**
 * Writes a bring-up test plan. Greedy first: from the state the plan has reached, every
 * switch setting (or a sample, when there are many switches) is clocked up to
 * {@link Effort#maxCycles()} cycles for every fault still undetected, and the step that shows
 * the most of them at a lamp is taken, so the first steps test what most faults disturb (the
 * clock, the decoder) before the data path. Where no step shows anything new, a search over
 * pairs of good and faulty states ({@link StateSearch}) finds the cycles that reveal the
 * fault, or proves that none can. A machine without state gets a smallest set of settings
 * found by exact search where the switches are few.
 */
public final class PlanGenerator {
    private final FaultSimulator sim;
    private final FaultList faults;
    private final Effort effort;
    private final FaultCircuit c;
    private final List<boolean[]> settings;
    /** How many more states the faulty machine alone may visit than a pair search. */
    static final int ALONE_FACTOR = 16;

    private final boolean allSettings;
    private final boolean sequential;

    public PlanGenerator(FaultSimulator sim, FaultList faults, Effort effort) {
        this.sim = sim;
        this.faults = faults;
        this.effort = effort;
        this.c = sim.circuit();
        int n = c.inputCount();
        allSettings = n <= 10;
        settings = allSettings ? everySetting(n) : sample(n, effort.candidates());
        sequential = c.allLatchOut.length > 0 || c.hasPc;
    }

    /** Makes the plan for every collapsed fault. */
    public Plan generate() {
        List<Fault> all = faults.collapsed();
        List<Fault> targets = new ArrayList<>();
        for (Fault f : all) {
            if (!faults.dominated(f.id())) {
                targets.add(f);
            }
        }
        List<Step> steps = sequential ? greedy(targets) : smallestCover(all);
        Outcome[] outcome = new Outcome[all.size()];
        boolean[] observable = Observability.of(c);
        StateSearch search = new StateSearch(sim, settings, allSettings, effort.searchStates());
        // One machine's states are far fewer than pairs: the faulty machine alone may search further.
        StateSearch deep = new StateSearch(sim, settings, allSettings, effort.searchStates() * ALONE_FACTOR);
        StateSearch.Result[] proof = new StateSearch.Result[all.size()];
        // One search of the good machine: a fault whose wires never hold the other known value
        // anywhere reachable leaves every known lamp as it is (three-valued logic is monotone).
        long[] seen0 = new long[c.slotCount];
        long[] seen1 = new long[c.slotCount];
        boolean reached = search.reach(seen0, seen1);
        if (reached) {
            // A lamp the good machine never shows known tells nothing: detection needs a known good lamp.
            boolean[] useful = new boolean[c.lamps().size()];
            for (int i = 0; i < useful.length; i++) {
                int s = c.lamps().get(i).slot();
                useful[i] = (seen0[s] | seen1[s]) != 0L;
            }
            observable = Observability.of(c, useful);
        }
        boolean[] searched = new boolean[all.size()];
        while (true) {
            int[] first = sim.firstDetection(all, steps);
            List<Integer> open = new ArrayList<>();
            for (int i = 0; i < all.size(); i++) {
                if (first[i] >= 0) {
                    outcome[i] = Outcome.DETECTED;
                } else if (outcome[i] == null) {
                    if (!reaches(all.get(i), observable)) {
                        outcome[i] = Outcome.NOT_OBSERVABLE;
                    } else if (reached && !provokable(all.get(i), seen0, seen1)) {
                        outcome[i] = Outcome.NOT_CONTROLLABLE;
                    } else {
                        open.add(i);
                    }
                }
            }
            // Proofs from power-up first, in parallel: most faults left here cannot be detected at all.
            List<java.util.concurrent.Callable<Void>> jobs = new ArrayList<>();
            for (int i : open) {
                if (proof[i] == null) {
                    Fault f = all.get(i);
                    jobs.add(() -> {
                        proof[i] = search.search(f, sim.machine(), 0, sim.loaded(List.of(f), 0, 1), 0);
                        return null;
                    });
                }
            }
            sim.run(jobs);
            // Pairs of states may be too many to visit; the faulty machine alone is often few:
            // if none of its reachable states shows a known lamp, no step can tell it.
            List<java.util.concurrent.Callable<Void>> alone = new ArrayList<>();
            for (int i : open) {
                if (proof[i].end() == StateSearch.End.BUDGET && proof[i].blurred()) {
                    Fault f = all.get(i);
                    alone.add(() -> {
                        if (deep.lampsNeverKnown(f, sim.loaded(List.of(f), 0, 1), 0)) {
                            proof[i] = new StateSearch.Result(StateSearch.End.EXHAUSTED, List.of(), proof[i].provoked(), true,
                                    proof[i].visited());
                        }
                        return null;
                    });
                }
            }
            sim.run(alone);
            int next = -1;
            for (int i : open) {
                if (proof[i].end() == StateSearch.End.EXHAUSTED) {
                    outcome[i] = proof[i].blurred() ? Outcome.UNKNOWN_STATE
                        : proof[i].provoked() ? Outcome.REDUNDANT : Outcome.NOT_CONTROLLABLE;
                } else if (proof[i].end() == StateSearch.End.BUDGET || searched[i] || steps.size() >= effort.maxSteps()) {
                    outcome[i] = Outcome.ABORTED;
                } else if (next < 0) {
                    next = i;
                }
            }
            if (next < 0) {
                for (int i = 0; i < all.size(); i++) {
                    if (outcome[i] == null) {
                        outcome[i] = Outcome.ABORTED;
                    }
                }
                return new Plan(steps, sim.expected(steps), all, outcome, first, targets.size());
            }
            // Detectable from power-up: look for the cycles that show it from where the plan has got to.
            searched[next] = true;
            Fault f = all.get(next);
            LaneMachine g = sim.machine();
            LaneMachine b = sim.loaded(List.of(f), 0, 1);
            for (Step st : steps) {
                FaultSimulator.apply(g, st);
                FaultSimulator.apply(b, st);
            }
            StateSearch.Result here = search.search(f, g, 0, b, 0);
            if (here.end() == StateSearch.End.FOUND) {
                steps = new ArrayList<>(steps);
                steps.addAll(merge(here.cycles()));
            } else {
                outcome[next] = Outcome.ABORTED;
            }
        }
    }

    private static boolean provokable(Fault f, long[] seen0, long[] seen1) {
        Bridge b = f.bridge();
        if (b != null) {
            // seen apart, each at some time: more than the two ever being unlike at once, so sound
            return (seen0[b.slotA()] != 0L && seen1[b.slotB()] != 0L) || (seen1[b.slotA()] != 0L && seen0[b.slotB()] != 0L);
        }
        for (Force x : f.forces()) {
            if ((x.value() ? seen0[x.slot()] : seen1[x.slot()]) != 0L) {
                return true;
            }
        }
        return false;
    }

    private static boolean reaches(Fault f, boolean[] observable) {
        for (int slot : f.slots()) {
            if (observable[slot]) {
                return true;
            }
        }
        return false;
    }

    /** Runs of cycles with the same settings become one step: the search's path shows the fault at its last cycle. */
    static List<Step> merge(List<boolean[]> cycles) {
        List<Step> out = new ArrayList<>();
        int k = 0;
        while (k < cycles.size()) {
            int e = k + 1;
            while (e < cycles.size() && Arrays.equals(cycles.get(e), cycles.get(k))) {
                e++;
            }
            out.add(new Step(cycles.get(k), e - k));
            k = e;
        }
        return out;
    }

    /** Greedy steps for a machine with state: each the (setting, cycles) that shows the most faults. */
    private List<Step> greedy(List<Fault> targets) {
        List<Step> steps = new ArrayList<>();
        int batches = (targets.size() + LaneMachine.LANES - 1) / LaneMachine.LANES;
        LaneMachine[] state = new LaneMachine[batches];
        LaneMachine[] scratch = new LaneMachine[batches];
        long[] alive = new long[batches];
        for (int b = 0; b < batches; b++) {
            int n = Math.min(LaneMachine.LANES, targets.size() - b * LaneMachine.LANES);
            state[b] = sim.loaded(targets, b * LaneMachine.LANES, n);
            scratch[b] = sim.loaded(targets, b * LaneMachine.LANES, n);
            alive[b] = n == 64 ? -1L : (1L << n) - 1;
        }
        LaneMachine good = sim.machine();
        int cycles = effort.maxCycles();
        int ns = settings.size();
        while (steps.size() < effort.maxSteps() && anyAlive(alive)) {
            // The good machine under every setting at once, one setting per lane.
            byte[][][] goodAt = new byte[ns][cycles][];
            for (int s0 = 0; s0 < ns; s0 += LaneMachine.LANES) {
                LaneMachine g = sim.machine();
                g.copyFrom(good);
                int lanes = Math.min(LaneMachine.LANES, ns - s0);
                for (int i = 0; i < c.inputCount(); i++) {
                    long in = 0L;
                    for (int l = 0; l < lanes; l++) {
                        if (settings.get(s0 + l)[i]) {
                            in |= 1L << l;
                        }
                    }
                    g.setInput(i, in);
                }
                for (int k = 0; k < cycles; k++) {
                    g.clock(1);
                    for (int l = 0; l < lanes; l++) {
                        goodAt[s0 + l][k] = sim.lamps(g, l);
                    }
                }
            }
            List<java.util.concurrent.Callable<int[][]>> jobs = new ArrayList<>();
            for (int b = 0; b < batches; b++) {
                int bb = b;
                if (alive[b] == 0L) {
                    continue;
                }
                jobs.add(() -> {
                    int[][] score = new int[ns][cycles];
                    for (int s = 0; s < ns; s++) {
                        scratch[bb].copyFrom(state[bb]);
                        scratch[bb].setInputs(settings.get(s));
                        for (int k = 0; k < cycles; k++) {
                            scratch[bb].clock(1);
                            score[s][k] = Long.bitCount(sim.detected(scratch[bb], goodAt[s][k]) & alive[bb]);
                        }
                    }
                    return score;
                });
            }
            int[][] total = new int[ns][cycles];
            for (int[][] score : sim.run(jobs)) {
                for (int s = 0; s < ns; s++) {
                    for (int k = 0; k < cycles; k++) {
                        total[s][k] += score[s][k];
                    }
                }
            }
            int bestS = -1;
            int bestK = -1;
            int best = 0;
            for (int k = 0; k < cycles; k++) {
                for (int s = 0; s < ns; s++) {
                    if (total[s][k] > best) {
                        best = total[s][k];
                        bestS = s;
                        bestK = k;
                    }
                }
            }
            if (best == 0) {
                break;
            }
            Step step = new Step(settings.get(bestS), bestK + 1);
            steps.add(step);
            FaultSimulator.apply(good, step);
            byte[] expect = sim.lamps(good, 0);
            for (int b = 0; b < batches; b++) {
                FaultSimulator.apply(state[b], step);
                alive[b] &= ~sim.detected(state[b], expect);
            }
        }
        return steps;
    }

    private static boolean anyAlive(long[] alive) {
        for (long a : alive) {
            if (a != 0L) {
                return true;
            }
        }
        return false;
    }

    /**
     * A machine without state: which settings detect which faults, then the fewest settings
     * that together detect every detectable fault (exact search within the effort budget,
     * else the greedy cover), most-detecting first.
     */
    private List<Step> smallestCover(List<Fault> all) {
        int ns = settings.size();
        BitSet[] detects = new BitSet[ns];
        for (int s = 0; s < ns; s++) {
            int[] first = sim.firstDetection(all, List.of(new Step(settings.get(s), 1)));
            detects[s] = new BitSet();
            for (int i = 0; i < first.length; i++) {
                if (first[i] == 0) {
                    detects[s].set(i);
                }
            }
        }
        BitSet want = new BitSet();
        for (BitSet d : detects) {
            want.or(d);
        }
        List<Integer> greedy = new ArrayList<>();
        BitSet left = (BitSet) want.clone();
        while (!left.isEmpty()) {
            int best = -1;
            int most = 0;
            for (int s = 0; s < ns; s++) {
                BitSet t = (BitSet) detects[s].clone();
                t.and(left);
                if (t.cardinality() > most) {
                    most = t.cardinality();
                    best = s;
                }
            }
            greedy.add(best);
            left.andNot(detects[best]);
        }
        List<Integer> chosen = greedy;
        long[] work = {0};
        for (int size = greedy.size() - 1; size >= 1 && allSettings; size--) {
            int[] pick = new int[size];
            if (!cover(detects, want, new BitSet(), pick, 0, work)) {
                break;
            }
            List<Integer> found = new ArrayList<>();
            for (int p : pick) {
                found.add(p);
            }
            chosen = found;
        }
        chosen = new ArrayList<>(chosen);
        chosen.sort((a, b) -> detects[b].cardinality() - detects[a].cardinality());
        List<Step> steps = new ArrayList<>();
        for (int s : chosen) {
            steps.add(new Step(settings.get(s), 1));
        }
        return steps;
    }

    // Depth-first cover: branch on the lowest fault not yet covered, over the settings that detect it.
    private boolean cover(BitSet[] detects, BitSet want, BitSet got, int[] pick, int depth, long[] work) {
        BitSet left = (BitSet) want.clone();
        left.andNot(got);
        if (left.isEmpty()) {
            for (int d = depth; d < pick.length; d++) {
                pick[d] = pick[0];
            }
            return true;
        }
        if (depth == pick.length || ++work[0] > 2_000_000L) {
            return false;
        }
        int f = left.nextSetBit(0);
        for (int s = 0; s < detects.length; s++) {
            if (detects[s].get(f)) {
                BitSet next = (BitSet) got.clone();
                next.or(detects[s]);
                pick[depth] = s;
                if (cover(detects, want, next, pick, depth + 1, work)) {
                    return true;
                }
            }
        }
        return false;
    }

    static List<boolean[]> everySetting(int n) {
        List<boolean[]> out = new ArrayList<>(1 << n);
        for (int v = 0; v < 1 << n; v++) {
            boolean[] s = new boolean[n];
            for (int i = 0; i < n; i++) {
                s[i] = (v >> i & 1) != 0;
            }
            out.add(s);
        }
        return out;
    }

    static List<boolean[]> sample(int n, int count) {
        Random r = new Random(n * 7919L + count);
        List<boolean[]> out = new ArrayList<>();
        out.add(new boolean[n]);
        boolean[] ones = new boolean[n];
        Arrays.fill(ones, true);
        out.add(ones);
        while (out.size() < count) {
            boolean[] s = new boolean[n];
            for (int i = 0; i < n; i++) {
                s[i] = r.nextBoolean();
            }
            out.add(s);
        }
        return out;
    }
}
