package org.thermion.tui;

import org.thermion.faults.Diagnosis;
import org.thermion.faults.Effort;
import org.thermion.faults.FaultCircuit;
import org.thermion.faults.FaultList;
import org.thermion.faults.SocketPins;
import org.thermion.faults.FaultPlace;
import org.thermion.faults.FaultSimulator;
import org.thermion.faults.PlanGenerator;
import org.thermion.faults.Step;
import org.thermion.model.Machine;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The bench mode's model: the bring-up plan of the machine, the lamps the builder says they
 * see at each step (typed in as they go), and the groups of faults that explain them, best
 * first, re-ranked after every step recorded. Once every step is recorded and more than one
 * group leads, the step that best tells them apart. No terminal: tests drive it directly.
 */
final class BenchSession {
    private final Machine machine;
    private final FaultCircuit circuit;
    private final FaultList faults;
    private final FaultSimulator sim;
    private final List<Step> steps;
    private final byte[][] expected;
    private final Diagnosis diagnosis;
    private final byte[][] seen;
    private final boolean[] recorded;
    private final byte[] entry;
    private int step;
    private int lamp;
    private List<Diagnosis.Suspect> ranked;
    private Step next;
    /** The classes {@link #next} is meant to tell apart: the leaders, or the nearest ones when they cannot be split. */
    private int nextSplits;
    private boolean nextAsked;

    /** Makes the plan for {@code machine} running {@code rom} (null: no ROM); takes seconds on a large machine. */
    BenchSession(Machine machine, long[] rom) {
        this.machine = machine;
        this.circuit = FaultCircuit.of(machine);
        if (circuit.lamps().isEmpty()) {
            throw new IllegalArgumentException("machine " + machine.name() + " has no lamps: declare outputs in its "
                    + "machine block, or drive a lamp with a lamp or relay stage");
        }
        this.faults = FaultList.of(circuit, SocketPins.of(machine));
        this.sim = new FaultSimulator(circuit, rom, 2);
        this.steps = new PlanGenerator(sim, faults, Effort.DEFAULT).generate().steps();
        this.expected = sim.expected(steps);
        this.diagnosis = new Diagnosis(sim, faults, steps);
        this.seen = new byte[steps.size()][circuit.lamps().size()];
        for (byte[] row : seen) {
            Arrays.fill(row, Diagnosis.BLANK);
        }
        this.recorded = new boolean[steps.size()];
        this.entry = new byte[circuit.lamps().size()];
        this.ranked = diagnosis.rank(seen, 0);
        loadEntry();
    }

    int stepCount() {
        return steps.size();
    }

    /** The step on the bench, from 0. */
    int step() {
        return step;
    }

    int lampCount() {
        return circuit.lamps().size();
    }

    String lampName(int i) {
        return circuit.lamps().get(i).name();
    }

    /** The lamp under the cursor. */
    int lamp() {
        return lamp;
    }

    /** What the working machine shows at the current step: 0, 1 or {@link FaultSimulator#UNKNOWN}. */
    byte expected(int lampIndex) {
        return expected[step][lampIndex];
    }

    /** What the builder says they see at the current step: 0, 1 or {@link Diagnosis#BLANK} (not looked). */
    byte entry(int lampIndex) {
        return entry[lampIndex];
    }

    boolean recorded(int s) {
        return recorded[s];
    }

    int recordedCount() {
        int n = 0;
        for (boolean r : recorded) {
            n += r ? 1 : 0;
        }
        return n;
    }

    /** The switches set on at the current step, by name. */
    List<String> switchesOn() {
        return switchesOn(steps.get(step));
    }

    int cycles() {
        return steps.get(step).cycles();
    }

    void moveLamp(int by) {
        lamp = Math.max(0, Math.min(lampCount() - 1, lamp + by));
    }

    /** Lit becomes dark, dark or not looked becomes lit. */
    void toggleLamp() {
        entry[lamp] = entry[lamp] == 1 ? (byte) 0 : (byte) 1;
    }

    /** The lamp under the cursor was not looked at. */
    void skipLamp() {
        entry[lamp] = Diagnosis.BLANK;
    }

    /** Every lamp as the working machine shows it (unknown ones not looked at). */
    void asExpected() {
        for (int i = 0; i < entry.length; i++) {
            entry[i] = expected[step][i] == FaultSimulator.UNKNOWN ? Diagnosis.BLANK : expected[step][i];
        }
    }

    /** Keeps the lamps typed in for this step, re-ranks the suspects and goes to the next step. */
    void record() {
        seen[step] = entry.clone();
        recorded[step] = true;
        ranked = diagnosis.rank(seen, Diagnosis.stepsReached(seen));
        next = null;
        nextAsked = false;
        goTo(step + 1);
    }

    /** Shows another step (its recorded lamps, else what the working machine shows). */
    void goTo(int s) {
        step = Math.max(0, Math.min(steps.size() - 1, s));
        loadEntry();
    }

    private void loadEntry() {
        if (recorded[step]) {
            System.arraycopy(seen[step], 0, entry, 0, entry.length);
        } else {
            asExpected();
        }
    }

    /** The groups of faults, best first, against every step recorded so far. */
    List<Diagnosis.Suspect> ranked() {
        return ranked;
    }

    /** A group's faults in the builder's words. */
    List<String> words(Diagnosis.Suspect s) {
        List<String> out = new ArrayList<>();
        if (s.looksGood()) {
            out.add("no fault: a working machine");
        }
        for (var f : Diagnosis.named(faults, s)) {
            out.add(FaultPlace.of(circuit, f).text());
        }
        return out;
    }

    /** True when every step is recorded. */
    boolean done() {
        return recordedCount() == steps.size();
    }

    /** How many faults (the working machine counting as one) share the first rank. */
    int leadingCount() {
        int n = 0;
        for (Diagnosis.Suspect s : ranked) {
            if (s.rank() == ranked.get(0).rank()) {
                n += Diagnosis.named(faults, s).size() + (s.looksGood() ? 1 : 0);
            }
        }
        return n;
    }

    /**
     * The step after the plan that best splits the leading groups, or, when they cannot be split,
     * the nearest {@link #WIDEST} (as {@code diagnose} proposes: two faults at once still point
     * somewhere); null when no step tells any of them apart.
     */
    Step nextStep() {
        if (!nextAsked) {
            nextAsked = true;
            Diagnosis.Proposal p = ranked.isEmpty() ? null : diagnosis.propose(ranked, WIDEST, Effort.DEFAULT);
            next = p == null ? null : p.step();
            nextSplits = p == null ? 0 : p.candidates().size();
        }
        return next;
    }

    /** True when {@link #nextStep} reaches past the leaders to the classes nearest them. */
    boolean nextWidened() {
        nextStep();
        return next != null && nextSplits > ranked.stream().filter(s -> s.rank() == ranked.get(0).rank()).count();
    }

    /** How many classes the proposed step is meant to tell apart. */
    int nextSplits() {
        nextStep();
        return nextSplits;
    }

    /** Classes a proposal may reach when the leaders cannot be split: diagnose's default --top. */
    static final int WIDEST = 8;

    /** The switches a step sets on, by name. */
    List<String> switchesOn(Step s) {
        boolean[] in = s.inputs();
        List<String> on = new ArrayList<>();
        for (int i = 0; i < in.length; i++) {
            if (in[i]) {
                on.add(machine.inputs().get(i).name());
            }
        }
        return on;
    }
}
