package org.thermion.verify;

import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;

import java.util.ArrayList;
import java.util.List;

/**
 * Fault seeding: applies single faults to copies of the logic and runs the full check on
 * each, stopping at the first mismatch. A fault on a net that reaches no state bit, PC input or
 * decode line cannot show and is reported equivalent without a run. A mutant the check does not catch is equivalent when
 * the check was exhaustive (no case of the plan shows a difference); it is reported as not
 * caught when the check only sampled.
 */
public final class MutationRun {
    /** Reports progress: mutants done out of the total. */
    public interface Progress {
        void update(int done, int total);
    }

    private final Machine machine;
    private final Verifier.Options options;

    /** {@code base} is the check of the unmutated machine (its mode decides what "not caught" means). */
    public MutationRun(Machine machine, Verifier.Options options, VerifyReport base) {
        this.machine = machine;
        this.options = options;
    }

    public MutationReport run(int count, long seed, Progress progress) {
        Mutator mut = new Mutator(machine);
        List<SeededFault> faults = mut.choose(count, seed);
        boolean[] observed = observedCone();
        List<MutantOutcome> outcomes = new ArrayList<>();
        int done = 0;
        for (SeededFault f : faults) {
            String what = mut.describe(f);
            if (!observed[mut.site(f)]) {
                // Nothing the check observes can see this net: no case can differ, no run needed.
                outcomes.add(new MutantOutcome(what, MutantOutcome.Status.UNUSED,
                        machine.netlist().netName(mut.site(f)) + " reaches no state bit, pc or decode line"));
                if (progress != null) {
                    progress.update(++done, faults.size());
                }
                continue;
            }
            Machine m = mut.apply(f);
            VerifyReport r = new Verifier(m, options.withReference(machine, true).withProgress(null)).run();
            if (!r.counterexamples().isEmpty()) {
                Counterexample c = r.counterexamples().get(0);
                String first = c.nets().isEmpty() ? "" : "; first differing net " + c.nets().get(0).name();
                outcomes.add(new MutantOutcome(what, MutantOutcome.Status.CAUGHT,
                        String.format(java.util.Locale.ROOT, "%s word 0x%X: %s %s%s", c.mnemonic(), c.word(), c.item(),
                                c.kind(), first)));
            } else if (!r.decodeOk()) {
                DecodeVerdict d = r.decode().stream().filter(x -> !x.ok()).findFirst().orElseThrow();
                outcomes.add(new MutantOutcome(what, MutantOutcome.Status.CAUGHT,
                        "decode lines: " + d.mnemonic() + ": " + d.problem().replaceFirst(" \\(word .*$", "")));
            } else if (!r.exhaustive()) {
                outcomes.add(new MutantOutcome(what, MutantOutcome.Status.NOT_CAUGHT, r.cases() + " sampled cases"));
            } else {
                outcomes.add(new MutantOutcome(what, MutantOutcome.Status.EQUIVALENT, r.cases() + " cases, none differs"));
            }
            if (progress != null) {
                progress.update(++done, faults.size());
            }
        }
        return new MutationReport(seed, List.copyOf(outcomes));
    }

    /** Nets from which some state latch, the PC or a decode line can be reached. */
    private boolean[] observedCone() {
        Netlist nl = machine.netlist();
        boolean[] seen = new boolean[nl.netCount()];
        int[] driver = new int[nl.netCount()];
        java.util.Arrays.fill(driver, -1);
        for (Gate g : nl.gates()) {
            driver[g.output()] = g.id();
        }
        int[] latchOf = new int[nl.netCount()];
        java.util.Arrays.fill(latchOf, -1);
        for (Latch l : nl.latches()) {
            latchOf[l.output()] = l.id();
        }
        java.util.ArrayDeque<Integer> todo = new java.util.ArrayDeque<>();
        machine.isa().state().forEach(s -> todo.add(s.net()));
        todo.add(machine.pc().jumpNet());
        for (int t : machine.pc().targetNets()) {
            todo.add(t);
        }
        DecodeCheck.decodeNets(nl, options.decodeName()).forEach(todo::add);
        while (!todo.isEmpty()) {
            int n = todo.pop();
            if (n < 0 || seen[n]) {
                continue;
            }
            seen[n] = true;
            if (driver[n] >= 0) {
                for (int i : nl.gates().get(driver[n]).inputs()) {
                    todo.add(i);
                }
            } else if (latchOf[n] >= 0) {
                Latch l = nl.latches().get(latchOf[n]);
                todo.add(l.data());
                if (l.enable() >= 0) {
                    todo.add(l.enable());
                }
            }
        }
        return seen;
    }
}
