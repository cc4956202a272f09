package org.thermion.faults;

import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads the lamps back. Every fault of the full list is simulated through the plan; faults
 * whose lamps agree at every step cannot be told apart by it and form one class (the class
 * that looks like the good machine is "no fault seen"). Given what the builder saw (a lamp
 * may be left blank), classes are ranked by the lamps they contradict, then by the lamps they
 * cannot predict (unknown where something was seen), a contradicted lamp weighing as two
 * unpredicted ones, then by the lamps they contradict, then by the lamps they predict that were left blank (before the step the builder
 * has got to): exact matches first, then the nearest,
 * so two faults at once or a fault outside the model still point somewhere. Equal scores
 * share a rank.
 */
public final class Diagnosis {
    /** A blank observation: the lamp was not looked at. */
    public static final byte BLANK = -1;

    private final FaultSimulator sim;
    private final FaultList faults;
    private final List<Step> steps;
    private final byte[] good;
    private final List<Suspect> classes;
    /** Each class's lamps, {@code [step * lamps + lamp]}, in the order of {@link #classes}. */
    private final List<byte[]> responses;

    /** One class of faults the plan cannot tell apart, with its score against an observation. */
    public record Suspect(int rank, int contradicted, int unpredicted, int unchecked, List<Fault> members,
                          boolean looksGood) {
        public Suspect {
            members = List.copyOf(members);
        }
    }

    public Diagnosis(FaultSimulator sim, FaultList faults, List<Step> steps) {
        this.sim = sim;
        this.faults = faults;
        this.steps = List.copyOf(steps);
        int lamps = sim.circuit().lamps().size();
        byte[][] e = sim.expected(steps);
        good = new byte[steps.size() * lamps];
        for (int s = 0; s < e.length; s++) {
            System.arraycopy(e[s], 0, good, s * lamps, lamps);
        }
        byte[][] resp = sim.responses(faults.all(), steps);
        Map<ByteBuffer, List<Fault>> byResponse = new HashMap<>();
        List<ByteBuffer> order = new ArrayList<>();
        ByteBuffer goodKey = ByteBuffer.wrap(good);
        byResponse.put(goodKey, new ArrayList<>());
        order.add(goodKey);
        for (Fault f : faults.all()) {
            ByteBuffer k = ByteBuffer.wrap(resp[f.id()]);
            List<Fault> members = byResponse.get(k);
            if (members == null) {
                members = new ArrayList<>();
                byResponse.put(k, members);
                order.add(k);
            }
            members.add(f);
        }
        List<Suspect> cls = new ArrayList<>();
        for (ByteBuffer k : order) {
            cls.add(new Suspect(0, 0, 0, 0, byResponse.get(k), k.equals(goodKey)));
        }
        this.classes = cls;
        this.responses = new ArrayList<>();
        for (ByteBuffer k : order) {
            responses.add(k.array());
        }
    }

    public List<Step> steps() {
        return steps;
    }

    /** Every class of faults the plan cannot tell apart (the good-looking class first), unscored. */
    public List<Suspect> classes() {
        return classes;
    }

    /** The class holding fault {@code id}. */
    public int classOf(int id) {
        for (int i = 0; i < classes.size(); i++) {
            for (Fault f : classes.get(i).members()) {
                if (f.id() == id) {
                    return i;
                }
            }
        }
        throw new IllegalArgumentException("no fault " + id);
    }

    /** What the plan predicts for fault {@code id}: {@code [step][lamp]}, unknowns left blank. */
    public byte[][] predicted(int id) {
        byte[] r = responses.get(classOf(id));
        int lamps = sim.circuit().lamps().size();
        byte[][] out = new byte[steps.size()][lamps];
        for (int s = 0; s < steps.size(); s++) {
            for (int i = 0; i < lamps; i++) {
                byte b = r[s * lamps + i];
                out[s][i] = b == FaultSimulator.UNKNOWN ? BLANK : b;
            }
        }
        return out;
    }

    /** Classes ranked against {@code observed[step][lamp]} (0, 1 or {@link #BLANK}; missing steps are blank). */
    public List<Suspect> rank(byte[][] observed) {
        return rank(observed, steps.size());
    }

    /**
     * As {@link #rank(byte[][])} for a builder who has got to step {@code stepsReached} only:
     * lamps left blank after it are not held against any class.
     */
    public List<Suspect> rank(byte[][] observed, int stepsReached) {
        int lamps = sim.circuit().lamps().size();
        List<Suspect> scored = new ArrayList<>();
        for (int c = 0; c < classes.size(); c++) {
            byte[] r = responses.get(c);
            int bad = 0;
            int unknown = 0;
            int unchecked = 0;
            for (int s = 0; s < Math.min(observed.length, steps.size()); s++) {
                boolean looked = s < stepsReached;
                for (int i = 0; i < Math.min(lamps, observed[s].length); i++) {
                    byte o = observed[s][i];
                    byte p = r[s * lamps + i];
                    if (o == BLANK) {
                        unchecked += p == FaultSimulator.UNKNOWN || !looked ? 0 : 1;
                        continue;
                    }
                    if (p == FaultSimulator.UNKNOWN) {
                        unknown++;
                    } else if (p != o) {
                        bad++;
                    }
                }
            }
            Suspect k = classes.get(c);
            if (!k.members().isEmpty() || k.looksGood()) {
                scored.add(new Suspect(0, bad, unknown, unchecked, k.members(), k.looksGood()));
            }
        }
        // Nearest = least unlikely: a lamp left unpredictable matches half the time, a wrong one only
        // if a second fault or one outside the model is at work, so a wrong lamp weighs as two
        // unpredictable ones. A class that predicts nothing (a bridge whose drivers fight)
        // contradicts nothing, yet must not lead a near match on that alone.
        scored.sort(Comparator.comparingInt((Suspect s) -> 2 * s.contradicted() + s.unpredicted())
                .thenComparingInt(Suspect::contradicted).thenComparingInt(Suspect::unchecked));
        List<Suspect> out = new ArrayList<>(scored.size());
        int rank = 0;
        for (int i = 0; i < scored.size(); i++) {
            Suspect s = scored.get(i);
            Suspect p = i == 0 ? null : scored.get(i - 1);
            if (p == null || s.contradicted() != p.contradicted() || s.unpredicted() != p.unpredicted()
                    || s.unchecked() != p.unchecked()) {
                rank = i + 1;
            }
            out.add(new Suspect(rank, s.contradicted(), s.unpredicted(), s.unchecked(), s.members(), s.looksGood()));
        }
        return out;
    }

    /** How many steps lead up to the last one with a lamp seen: the steps the builder has got to. */
    public static int stepsReached(byte[][] observed) {
        int n = 0;
        for (int s = 0; s < observed.length; s++) {
            for (byte b : observed[s]) {
                if (b != BLANK) {
                    n = s + 1;
                    break;
                }
            }
        }
        return n;
    }

    /**
     * The step to add after the plan that best splits {@code suspects} (faults, plus the good
     * machine where a suspect looks good): the one whose largest group of faults showing the
     * same lamps is smallest; null when no step tells any of them apart.
     */
    public Step nextStep(List<Suspect> suspects, Effort effort) {
        List<Fault> pool = new ArrayList<>();
        for (Suspect s : suspects) {
            pool.addAll(s.members());
        }
        Choice c = bestSplit(sim, steps, pool, new long[pool.size()], effort);
        return c == null ? null : c.step;
    }

    /** A step to take next and the ranked classes it is meant to tell apart. */
    public record Proposal(Step step, List<Suspect> candidates) {
        public Proposal {
            candidates = List.copyOf(candidates);
        }
    }

    /**
     * The next step for a builder holding {@code ranked} (from {@link #rank}): the one that best splits
     * the classes sharing the first rank; when those cannot be split (one class alone, or faults no
     * step after the plan tells apart), the one that best splits the first {@code widest} classes, so a
     * near match (two faults at once) is still told from its neighbours. The step is null only when no
     * step after the plan tells any of those candidates apart.
     */
    public Proposal propose(List<Suspect> ranked, int widest, Effort effort) {
        if (ranked.isEmpty()) {
            return new Proposal(null, List.of());
        }
        List<Suspect> leading = ranked.stream().filter(s -> s.rank() == ranked.get(0).rank()).toList();
        Step step = nextStep(leading, effort);
        if (step != null) {
            return new Proposal(step, leading);
        }
        List<Suspect> wide = ranked.subList(0, Math.min(ranked.size(), Math.max(widest, leading.size())));
        step = wide.size() > leading.size() ? nextStep(wide, effort) : null;
        return step != null ? new Proposal(step, wide) : new Proposal(null, leading);
    }

    /**
     * What the lamps would show after the plan and one more step {@code next}: the candidate
     * faults (see {@link #named}, from {@code suspects}) and the good machine where a
     * suspect looks good, grouped by the lamps they show at that step, in order of first
     * appearance.
     */
    public List<Reading> readings(List<Suspect> suspects, Step next) {
        List<Step> longer = new ArrayList<>(steps);
        longer.add(next);
        int lamps = sim.circuit().lamps().size();
        List<Fault> pool = new ArrayList<>();
        boolean good = false;
        for (Suspect s : suspects) {
            good |= s.looksGood();
            pool.addAll(named(faults, s));
        }
        byte[][] resp = sim.responses(pool, longer);
        Map<ByteBuffer, Reading> groups = new java.util.LinkedHashMap<>();
        if (good) {
            byte[] g = sim.expected(longer)[steps.size()];
            groups.put(ByteBuffer.wrap(g), new Reading(g, new ArrayList<>(), true));
        }
        for (int i = 0; i < pool.size(); i++) {
            byte[] row = Arrays.copyOfRange(resp[i], steps.size() * lamps, (steps.size() + 1) * lamps);
            Reading r = groups.computeIfAbsent(ByteBuffer.wrap(row), k -> new Reading(row, new ArrayList<>(), false));
            r.faults().add(pool.get(i));
        }
        return List.copyOf(groups.values());
    }

    /** One way the lamps may look after a proposed step: the lamps, and who shows them. */
    public record Reading(byte[] lamps, List<Fault> faults, boolean looksGood) {
    }

    /**
     * A class's faults as a builder reads them: one per equivalence class (its representative),
     * every tube, heater, relay and lamp fault on its own even where it forces the same wires
     * as a stuck-at fault.
     */
    public static List<Fault> named(FaultList faults, Suspect s) {
        List<Fault> out = new ArrayList<>();
        for (Fault f : s.members()) {
            if (faults.classOf(f.id()) == f.id()) {
                out.add(f);
            }
        }
        return out;
    }

    /** A class's faults, one per distinct effect (equivalent faults and faults forcing the same wires once). */
    public static List<Fault> distinct(FaultList faults, Suspect s) {
        java.util.Set<String> effects = new java.util.HashSet<>();
        List<Fault> out = new ArrayList<>();
        for (Fault f : s.members()) {
            if (effects.add(faults.effect(f))) {
                out.add(f);
            }
        }
        return out;
    }

    /** A step to add and its score (sum of squared group sizes after it). */
    private record Choice(Step step, long score) {
    }

    // Scores every (setting, cycles) after {@code steps} by the sum of squares of the groups it leaves.
    private static Choice bestSplit(FaultSimulator sim, List<Step> steps, List<Fault> pool, long[] group, Effort effort) {
        if (pool.size() < 2) {
            return null;
        }
        List<boolean[]> settings = sim.circuit().inputCount() <= 10
                ? PlanGenerator.everySetting(sim.circuit().inputCount()) : List.of(new boolean[sim.circuit().inputCount()]);
        int cycles = effort.maxCycles();
        int ns = settings.size();
        long[][][] sig = new long[ns][cycles][pool.size()];
        sim.eachBatch(pool, (m, base, n) -> {
            for (Step s : steps) {
                FaultSimulator.apply(m, s);
            }
            LaneMachine scratch = sim.loaded(pool, base, n);
            for (int s = 0; s < ns; s++) {
                scratch.copyFrom(m);
                scratch.setInputs(settings.get(s));
                for (int k = 0; k < cycles; k++) {
                    scratch.clock(1);
                    for (int l = 0; l < n; l++) {
                        sig[s][k][base + l] = signature(sim.circuit(), scratch, l);
                    }
                }
            }
        });
        long before = squares(group);
        Choice best = null;
        for (int k = 0; k < cycles; k++) {
            for (int s = 0; s < ns; s++) {
                long[] keys = new long[pool.size()];
                for (int i = 0; i < keys.length; i++) {
                    keys[i] = sig[s][k][i] * 1_000_003L + group[i];
                }
                long score = squares(keys);
                if (score < before && (best == null || score < best.score)) {
                    best = new Choice(new Step(settings.get(s), k + 1), score);
                }
            }
        }
        return best;
    }

    private static long signature(FaultCircuit c, LaneMachine m, int lane) {
        long h = 1469598103934665603L;
        for (ObservedLamp lamp : c.lamps()) {
            h = (h ^ FaultSimulator.reading(m, lamp.slot(), lane)) * 1099511628211L;
        }
        return h;
    }

    static long squares(long[] keys) {
        long[] k = keys.clone();
        Arrays.sort(k);
        long sum = 0;
        int run = 0;
        for (int i = 0; i < k.length; i++) {
            run = i > 0 && k[i] == k[i - 1] ? run + 1 : 1;
            if (i == k.length - 1 || k[i + 1] != k[i]) {
                sum += (long) run * run;
            }
        }
        return sum;
    }

    /**
     * Extends the plan with distinguishing steps until no class of detected faults holds more
     * than {@code most} faults, no step splits the large classes further, or the effort budget
     * runs out. Returns the longer plan's steps.
     */
    public static List<Step> extend(FaultSimulator sim, FaultList faults, List<Step> plan, int most, Effort effort) {
        List<Step> steps = new ArrayList<>(plan);
        while (steps.size() < effort.maxSteps()) {
            // Every class afresh: a fault that looked good may show itself at the new step and join a large class.
            Diagnosis d = new Diagnosis(sim, faults, steps);
            List<Fault> pool = new ArrayList<>();
            List<Long> group = new ArrayList<>();
            for (int c = 0; c < d.classes.size(); c++) {
                Suspect s = d.classes.get(c);
                if (!s.looksGood() && size(faults, s) > most) {
                    for (Fault f : s.members()) {
                        pool.add(f);
                        group.add((long) c);
                    }
                }
            }
            if (pool.isEmpty()) {
                break;
            }
            Choice c = bestSplit(sim, steps, pool, group.stream().mapToLong(Long::longValue).toArray(), effort);
            if (c == null) {
                break;
            }
            steps.add(c.step);
        }
        return steps;
    }

    /** How many classes of detected faults hold more than {@code most} distinct faults. */
    public int classesAbove(int most) {
        int n = 0;
        for (Suspect s : classes) {
            n += !s.looksGood() && size(faults, s) > most ? 1 : 0;
        }
        return n;
    }

    /** Largest class of detected faults, counting faults that force the same wires once. */
    public int largestClass() {
        int most = 0;
        for (Suspect s : classes) {
            if (!s.looksGood()) {
                most = Math.max(most, size(faults, s));
            }
        }
        return most;
    }

    /** Distinct faults in a class: equivalent faults and faults forcing the same wires count once. */
    static int size(FaultList faults, Suspect s) {
        return distinct(faults, s).size();
    }
}
