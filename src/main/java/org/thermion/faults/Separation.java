package org.thermion.faults;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;

/**
 * Extends a plan until no class of faults it leaves holds more than a given number, or says why a
 * class stays. After the one-step extension ({@link Diagnosis#extend}) stalls, each large class's
 * faults are searched in pairs ({@link StateSearch#tellApart}, every reachable pair of states from
 * where the plan leaves the two machines): a run of cycles that tells two apart joins the plan;
 * when every pair is exhausted, no continuation of the plan can split the class at the lamps, and
 * the class is reported with the net whose lamp would split it along the plan's steps.
 */
public record Separation(List<Step> steps, List<Alike> alike, List<long[]> written) {
    /** Random programs tried on a group the plan's program cannot split. */
    public static final int PROGRAMS = 8;
    /** Words of a program the plan writes itself: these first ones random, every later one 0. */
    public static final int WRITTEN_WORDS = 16;
    /** Programs a plan writes itself at most, after the ones it was given. */
    public static final int WRITTEN_MOST = 2;
    /** Short random programs weighed for each one written. */
    static final int CANDIDATES = 16;

    /**
     * @param written programs the plan wrote itself (ROM words, the first {@link #WRITTEN_WORDS} random), fitted
     *                after the simulator's own: a restarting step with program k beyond those fits {@code written.get(k - n)}
     */
    public Separation {
        steps = List.copyOf(steps);
        alike = List.copyOf(alike);
        written = List.copyOf(written);
    }

    /** A plan's steps as they are, with no group reported. */
    public static Separation none(List<Step> steps) {
        return new Separation(steps, List.of(), List.of());
    }

    /**
     * A class of faults that still holds more than the limit: its distinct faults; {@code proven} when
     * no run of cycles after the plan tells any two apart (false: the search budget ran out); the net
     * (as a builder finds it, null when none) whose lamp would split it best along the plan's steps, and
     * the sizes of the parts it would split it into; {@code otherProgram}, on a machine with a ROM,
     * whether some of {@link #PROGRAMS} random programs run with random switch steps showed its faults
     * apart at the lamps (null without a ROM: the switches are all there is).
     */
    public record Alike(List<Fault> faults, boolean proven, String net, List<Integer> parts, Boolean otherProgram) {
        public Alike {
            faults = List.copyOf(faults);
            parts = List.copyOf(parts);
        }
    }

    /**
     * Extends {@code plan} so that as few classes as can hold more than {@code most} distinct faults.
     * When the program that runs leaves some too large, and the simulator has further programs,
     * the plan goes on with each in turn: switch off, fit it, switch on, and extend again.
     */
    public static Separation of(FaultSimulator sim, FaultList faults, List<Step> plan, int most, Effort effort) {
        List<Step> steps = new ArrayList<>(plan);
        FaultCircuit c = sim.circuit();
        int n = c.inputCount();
        boolean all = n <= 10;
        List<boolean[]> settings = all ? PlanGenerator.everySetting(n) : PlanGenerator.sample(n, effort.candidates());
        // Faults of a pair whose search ran out of budget, under any program: their group is not proven.
        Set<Integer> unproven = java.util.concurrent.ConcurrentHashMap.newKeySet();
        List<List<Fault>> large = List.of();
        List<long[]> written = new ArrayList<>();
        FaultSimulator now = sim;
        try {
            for (int program = 0; ; program++) {
                if (program > 0) {
                    if (large.isEmpty() || steps.size() >= effort.maxSteps()) {
                        break;
                    }
                    if (program >= now.programs()) {
                        // Given programs all run: write a short one that shows some group apart, if one does.
                        long[] w = written.size() < WRITTEN_MOST && c.romSlots.length > 0 ? write(c, large) : null;
                        if (w == null) {
                            break;
                        }
                        written.add(w);
                        FaultSimulator grown = sim.withPrograms(written);
                        if (now != sim) {
                            now.close();
                        }
                        now = grown;
                    }
                    steps.add(new Step(new boolean[n], 1, program));
                }
                StateSearch search = new StateSearch(now, settings, all, effort.searchStates());
                large = separate(now, faults, steps, most, effort, search, unproven);
            }
            List<Alike> out = new ArrayList<>();
            for (List<Fault> cls : large) {
                boolean proven = cls.stream().noneMatch(f -> unproven.contains(f.id()));
                out.add(split(now, cls, steps, proven));
            }
            return new Separation(steps, out, written);
        } finally {
            if (now != sim) {
                now.close();
            }
        }
    }

    /**
     * A short program ({@link #WRITTEN_WORDS} random words, then 0) that, run from power-up with random
     * switch steps, shows the faults of most of the {@code large} groups apart; null when none of
     * {@link #CANDIDATES} shows any group apart. The same groups always get the same program.
     */
    static long[] write(FaultCircuit c, List<List<Fault>> large) {
        List<Fault> pool = new ArrayList<>();
        for (List<Fault> g : large) {
            pool.addAll(g);
        }
        java.util.Random r = new java.util.Random(pool.get(0).id() * 1_000_003L + pool.size());
        int words = Math.min(1 << Math.min(c.pcWidth, 12), WRITTEN_WORDS);
        long mask = c.romSlots.length >= 64 ? -1L : (1L << c.romSlots.length) - 1;
        long[] best = null;
        int bestSplit = 0;
        for (int k = 0; k < CANDIDATES; k++) {
            long[] rom = new long[words];
            for (int w = 0; w < words; w++) {
                rom[w] = r.nextLong() & mask;
            }
            List<Step> steps = Step.random(r, c.inputCount(), 24, 4);
            byte[][] resp;
            try (FaultSimulator one = new FaultSimulator(c, rom, 1)) {
                resp = one.responses(pool, steps);
            }
            int split = 0;
            for (int g = 0, at = 0; g < large.size(); at += large.get(g).size(), g++) {
                for (int i = at + 1; i < at + large.get(g).size(); i++) {
                    if (!Arrays.equals(resp[i], resp[at])) {
                        split++;
                        break;
                    }
                }
            }
            if (split > bestSplit) {
                best = rom;
                bestSplit = split;
            }
        }
        return best;
    }

    /** Extends {@code steps} in place while the program that runs splits classes; returns the classes left too large. */
    private static List<List<Fault>> separate(FaultSimulator sim, FaultList faults, List<Step> steps, int most,
                                              Effort effort, StateSearch search, Set<Integer> unproven) {
        List<Step> longer = Diagnosis.extend(sim, faults, steps, most, effort);
        steps.addAll(longer.subList(steps.size(), longer.size()));
        // A pair with no telling run of cycles stays so after more steps of the same program (their
        // states only move within the pairs reachable from where the search started): never searched twice.
        Set<Long> settled = java.util.concurrent.ConcurrentHashMap.newKeySet();
        while (true) {
            Diagnosis d = new Diagnosis(sim, faults, steps);
            List<List<Fault>> large = new ArrayList<>();
            for (Diagnosis.Suspect s : d.classes()) {
                if (!s.looksGood() && Diagnosis.size(faults, s) > most) {
                    large.add(Diagnosis.distinct(faults, s));
                }
            }
            List<List<boolean[]>> found = new ArrayList<>();
            List<Callable<Void>> jobs = new ArrayList<>();
            List<Step> now = List.copyOf(steps);
            for (int k = 0; k < large.size(); k++) {
                List<Fault> cls = large.get(k);
                found.add(null);
                int at = k;
                jobs.add(() -> {
                    Fault a = cls.get(0);
                    // The group's machines after the steps, 64 to a batch: each simulated once, not once a pair.
                    LaneMachine[] batch = new LaneMachine[(cls.size() + LaneMachine.LANES - 1) / LaneMachine.LANES];
                    for (int i = 1; i < cls.size(); i++) {
                        Fault b = cls.get(i);
                        long key = (long) a.id() << 32 | b.id();
                        if (settled.contains(key)) {
                            continue;
                        }
                        LaneMachine withA = after(sim, cls, 0, batch, now);
                        LaneMachine withB = after(sim, cls, i, batch, now);
                        StateSearch.Result r = search.tellApart(a, withA, 0, b, withB, i % LaneMachine.LANES);
                        if (r.end() == StateSearch.End.FOUND) {
                            found.set(at, r.cycles());
                            return null;
                        }
                        if (r.end() == StateSearch.End.BUDGET) {
                            unproven.add(a.id());
                            unproven.add(b.id());
                        }
                        settled.add(key);
                    }
                    return null;
                });
            }
            sim.run(jobs);
            boolean grew = false;
            for (List<boolean[]> path : found) {
                if (path != null && steps.size() < effort.maxSteps()) {
                    steps.addAll(PlanGenerator.merge(path));
                    grew = true;
                }
            }
            if (!grew) {
                return large;
            }
        }
    }

    // The machine carrying cls[i] (on lane i % 64) after the steps, made when first asked for.
    private static LaneMachine after(FaultSimulator sim, List<Fault> cls, int i, LaneMachine[] batch, List<Step> steps) {
        int k = i / LaneMachine.LANES;
        if (batch[k] == null) {
            int from = k * LaneMachine.LANES;
            LaneMachine m = sim.loaded(cls, from, Math.min(LaneMachine.LANES, cls.size() - from));
            for (Step s : steps) {
                FaultSimulator.apply(m, s);
            }
            batch[k] = m;
        }
        return batch[k];
    }

    // The net whose readings after each step part the class best (fewest pairs left together);
    // a net with a name (one a builder finds on the drawing) before any the elaborator made.
    private static Alike split(FaultSimulator sim, List<Fault> cls, List<Step> steps, boolean proven) {
        List<Fault> few = cls.subList(0, Math.min(cls.size(), LaneMachine.LANES));
        FaultCircuit c = sim.circuit();
        LaneMachine m = sim.loaded(few, 0, few.size());
        long[][] h = new long[c.slotCount][few.size()];
        for (Step s : steps) {
            FaultSimulator.apply(m, s);
            for (Site site : c.sites()) {
                if (site.line() && site.place().stem()) {
                    long[] hs = h[site.slot()];
                    for (int l = 0; l < hs.length; l++) {
                        hs[l] = (hs[l] ^ FaultSimulator.reading(m, site.slot(), l)) * 1099511628211L + 7;
                    }
                }
            }
        }
        String[] names = c.machine().netlist().netNames();
        int best = -1;
        long bestScore = (long) few.size() * few.size();
        boolean bestNamed = false;
        for (Site site : c.sites()) {
            if (!site.line() || !site.place().stem()) {
                continue;
            }
            long score = Diagnosis.squares(h[site.slot()]);
            boolean named = !FaultPlace.UNNAMED.equals(FaultPlace.shownName(names[site.net()]));
            boolean splits = score < (long) few.size() * few.size();
            if (splits && (named && !bestNamed || named == bestNamed && score < bestScore)) {
                best = site.slot();
                bestScore = score;
                bestNamed = named;
            }
        }
        Boolean other = c.romSlots.length == 0 ? null : otherProgramSplits(c, few);
        if (best < 0) {
            return new Alike(cls, proven, null, List.of(), other);
        }
        long[] k = h[best].clone();
        Arrays.sort(k);
        List<Integer> parts = new ArrayList<>();
        for (int i = 0, run = 1; i < k.length; i++, run++) {
            if (i == k.length - 1 || k[i + 1] != k[i]) {
                parts.add(run);
                run = 0;
            }
        }
        parts.sort(java.util.Comparator.reverseOrder());
        return new Alike(cls, proven, FaultPlace.netLabel(c, best), parts, other);
    }

    // Random words in the ROM, random switch steps: does some run show the faults apart at a lamp?
    private static boolean otherProgramSplits(FaultCircuit c, List<Fault> few) {
        java.util.Random r = new java.util.Random(few.get(0).id() * 31L + few.size());
        int words = 1 << Math.min(c.pcWidth, 12);
        long mask = c.romSlots.length >= 64 ? -1L : (1L << c.romSlots.length) - 1;
        for (int k = 0; k < PROGRAMS; k++) {
            long[] rom = new long[words];
            for (int w = 0; w < words; w++) {
                rom[w] = r.nextLong() & mask;
            }
            List<Step> steps = Step.random(r, c.inputCount(), 24, 4);
            try (FaultSimulator other = new FaultSimulator(c, rom, 1)) {
                byte[][] resp = other.responses(few, steps);
                for (byte[] row : resp) {
                    if (!Arrays.equals(row, resp[0])) {
                        return true;
                    }
                }
            }
        }
        return false;
    }
}
