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
public record Separation(List<Step> steps, List<Alike> alike) {
    /** Random programs tried on a group the plan's program cannot split. */
    public static final int PROGRAMS = 8;

    public Separation {
        steps = List.copyOf(steps);
        alike = List.copyOf(alike);
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

    /** Extends {@code plan} so that as few classes as can be hold more than {@code most} distinct faults. */
    public static Separation of(FaultSimulator sim, FaultList faults, List<Step> plan, int most, Effort effort) {
        List<Step> steps = new ArrayList<>(Diagnosis.extend(sim, faults, plan, most, effort));
        int n = sim.circuit().inputCount();
        boolean all = n <= 10;
        List<boolean[]> settings = all ? PlanGenerator.everySetting(n) : PlanGenerator.sample(n, effort.candidates());
        StateSearch search = new StateSearch(sim, settings, all, effort.searchStates());
        // A pair with no telling run of cycles stays so after more steps (their states only move
        // within the pairs reachable from where the search started): never searched twice.
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
            boolean[] budget = new boolean[large.size()];
            List<Callable<Void>> jobs = new ArrayList<>();
            List<Step> now = List.copyOf(steps);
            for (int k = 0; k < large.size(); k++) {
                List<Fault> cls = large.get(k);
                found.add(null);
                int at = k;
                jobs.add(() -> {
                    Fault a = cls.get(0);
                    for (Fault b : cls.subList(1, cls.size())) {
                        long key = (long) a.id() << 32 | b.id();
                        if (settled.contains(key)) {
                            continue;
                        }
                        StateSearch.Result r = search.tellApart(a, after(sim, a, now), b, after(sim, b, now));
                        if (r.end() == StateSearch.End.FOUND) {
                            found.set(at, r.cycles());
                            return null;
                        }
                        budget[at] |= r.end() == StateSearch.End.BUDGET;
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
                List<Alike> out = new ArrayList<>();
                for (int k = 0; k < large.size(); k++) {
                    out.add(split(sim, large.get(k), steps, !budget[k]));
                }
                return new Separation(steps, out);
            }
        }
    }

    private static LaneMachine after(FaultSimulator sim, Fault f, List<Step> steps) {
        LaneMachine m = sim.loaded(List.of(f), 0, 1);
        for (Step s : steps) {
            FaultSimulator.apply(m, s);
        }
        return m;
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
