package org.thermion.verify;

import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.Machine;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Checks a machine's logic against its ISA, one instruction (one machine cycle) at a time.
 *
 * <p>For every instruction: every operand pattern of its {@link OperandPlan}, every
 * combination of the ISA's state bits and every combination of the machine inputs, 64 cases
 * per simulator run. Each case starts from the state (all other latches 0, PC 0), runs one
 * cycle with the word on the ROM data nets, and compares every state bit and the PC with the
 * ISA's meaning; state bits the instruction does not write must keep their value, which also
 * catches writes to outputs or scratch bits it should not touch. When the space exceeds
 * {@link #EXHAUSTIVE_LIMIT} cases it checks a seeded random sample instead.
 *
 * <p>Decode lines - nets named {@code NAME[k]} (default {@code line}), the top-most such bus -
 * are read at the last phase's settle: each instruction must have exactly one line active in
 * all its cases, and no two instructions may share one. An instruction whose meaning is empty
 * (it does nothing) may instead have no line active in all its cases.
 *
 * <p>Where the ISA declares an {@code inhibit} latch (a decoder held off to skip an instruction),
 * {@code pc <- pc + 2} may be done by the logic as the next address with the inhibit set; a second
 * round runs every case with the inhibit set and expects no state change, the PC counting on by
 * one, the inhibit cleared, and never two decode lines at once. A machine whose word comes from
 * switches gets each case's word on those inputs; it has no PC to compare.
 *
 * <p>Each wrong item (a state bit or the PC) of an instruction is reported once, with the
 * number of cases it goes wrong in and one counterexample. The counterexample says what the
 * latch was given (data and enable nets) and lists the first nets, in levelized order, that
 * differ from a comparison run: the unmutated logic when a reference machine is given
 * (fault seeding), otherwise the nearest passing case - the same instruction with one
 * state bit, input or free word bit changed - restricted to the cone of logic feeding the
 * latch pin at fault, at the settle of the phase that loads it. A trace then lists the gates
 * feeding that pin, nearest first, with the values they saw in the failing case.
 */
public final class Verifier {
    /** Beyond this many cases the check samples. */
    public static final long EXHAUSTIVE_LIMIT = 1L << 28;

    /** Reports progress: cases done out of the total. */
    public interface Progress {
        void update(long done, long total);
    }

    /**
     * @param allTargetBits jump target bits enumerated in full up to this many, else patterns
     * @param sampleCases   cases to check when sampling
     * @param seed          seeds free word bits and samples
     * @param decodeName    the decode-line bus name
     * @param stopAtFirst   stop at the first mismatch (fault seeding)
     * @param reference     the unmutated machine to compare nets with, or null
     * @param maxNets       nets listed per counterexample
     * @param exhaustiveLimit beyond this many cases the check samples
     * @param threads       instructions checked at once (each thread its own simulator); the report is the same for any count
     */
    public record Options(int allTargetBits, long sampleCases, long seed, String decodeName, boolean stopAtFirst,
                          Machine reference, int maxNets, Progress progress, long exhaustiveLimit, int threads) {
        public static Options defaults() {
            return new Options(4, 1L << 22, 1, "line", false, null, 8, null, EXHAUSTIVE_LIMIT, 1);
        }

        public Options withThreads(int n) {
            return new Options(allTargetBits, sampleCases, seed, decodeName, stopAtFirst, reference, maxNets, progress,
                    exhaustiveLimit, Math.max(1, n));
        }

        public Options withReference(Machine ref, boolean stop) {
            return new Options(allTargetBits, sampleCases, seed, decodeName, stop, ref, maxNets, progress, exhaustiveLimit, threads);
        }

        public Options withProgress(Progress p) {
            return new Options(allTargetBits, sampleCases, seed, decodeName, stopAtFirst, reference, maxNets, p,
                    exhaustiveLimit, threads);
        }

        public Options withSampling(long limit, long samples, long newSeed) {
            return new Options(allTargetBits, samples, newSeed, decodeName, stopAtFirst, reference, maxNets, progress, limit, threads);
        }

        public Options withDecode(String name, int targetBits) {
            return new Options(targetBits, sampleCases, seed, name, stopAtFirst, reference, maxNets, progress,
                    exhaustiveLimit, threads);
        }
    }

    private final Machine machine;
    private final Isa isa;
    private final Options opt;
    private final BatchRun logic;
    private final List<OperandPlan> plans = new ArrayList<>();
    private final CaseBatches cases;
    private final ItemComparison items;
    private final DecodeCheck decodeCheck;
    private final CounterexampleBuilder counterexamples;
    private final int freeInputs;

    public Verifier(Machine machine, Options options) {
        this.machine = machine;
        this.isa = machine.isa();
        if (isa == null) {
            throw new IllegalArgumentException("machine '" + machine.name() + "' has no isa block to verify against");
        }
        if (!isa.wordFromSwitches() && (machine.rom() == null || machine.pc() == null)) {
            throw new IllegalArgumentException("machine '" + machine.name() + "' needs a rom and a pc to run instructions,"
                    + " or an instruction word from switches (`word N bits from PORT` in its isa)");
        }
        this.opt = options;
        this.logic = new BatchRun(machine);
        int pcMask = pcMask();
        for (Instruction ins : isa.instructions()) {
            plans.add(OperandPlan.of(isa, ins, options.allTargetBits()));
        }
        CaseText text = new CaseText(machine);
        this.cases = new CaseBatches(isa, plans, machine.inputs().size(), pcMask, options.seed());
        this.freeInputs = CaseBatches.freeInputs(isa, machine.inputs().size()).length;
        this.items = new ItemComparison(isa, plans, pcMask);
        this.decodeCheck = new DecodeCheck(machine.netlist(), options.decodeName(), logic, text, plans);
        this.counterexamples = new CounterexampleBuilder(machine, options, logic, items, text, pcMask);
    }

    /** Runs the check. */
    public VerifyReport run() {
        boolean exhaustive = isa.state().size() + freeInputs <= 40;
        int rounds = isa.inhibitNet() >= 0 ? 2 : 1;
        long total = 0;
        if (exhaustive) {
            for (int k = 0; k < plans.size(); k++) {
                total += cases.casesOf(k);
                if (total > opt.exhaustiveLimit()) {
                    exhaustive = false;
                    break;
                }
            }
        }
        long perInstruction = 0;
        if (!exhaustive) {
            perInstruction = Math.max(64, (opt.sampleCases() / Math.max(1, plans.size()) + 63) / 64 * 64);
            total = perInstruction * plans.size();
        }
        total *= rounds;
        int units = plans.size() * rounds;
        Unit[] results = new Unit[units];
        Progress progress = opt.progress() == null ? null : new SharedProgress(opt.progress(), total);
        boolean exh = exhaustive;
        long per = perInstruction;
        if (opt.threads() <= 1 || opt.stopAtFirst() || units == 1) {
            // In order, on this thread's simulator; a fault-seeding run stops at the first instruction that shows it.
            for (int k = 0; k < units; k++) {
                results[k] = unit(k, exh, per, logic, items, decodeCheck, progress);
                if (opt.stopAtFirst() && results[k].failed()) {
                    break;
                }
            }
        } else {
            inParallel(results, exh, per, progress);
        }
        Map<Long, ItemComparison.Group> groups = new LinkedHashMap<>();
        DecodeCheck.State[] decode = new DecodeCheck.State[plans.size()];
        DecodeCheck.State[] skipped = new DecodeCheck.State[plans.size()];
        long done = 0;
        // Merged in instruction order: the report is the same for any number of threads.
        for (int k = 0; k < units; k++) {
            if (results[k] == null) {
                break;
            }
            (k >= plans.size() ? skipped : decode)[k % plans.size()] = results[k].decode;
            groups.putAll(results[k].groups);
            done += results[k].done;
        }
        List<DecodeVerdict> lines = new ArrayList<>(decodeCheck.verdicts(decode));
        lines.addAll(decodeCheck.inhibitedVerdicts(skipped));
        List<Counterexample> ces = new ArrayList<>();
        for (ItemComparison.Group g : groups.values()) {
            ces.add(counterexamples.build(g, plans.get(g.instruction)));
        }
        List<String> planText = new ArrayList<>();
        for (OperandPlan p : plans) {
            planText.add(p.instruction().mnemonic() + ": " + p.description() + " (" + p.words().length
                    + (p.words().length == 1 ? " word)" : " words)"));
        }
        return new VerifyReport(machine.name(), done, exhaustive, opt.seed(), List.copyOf(planText), opt.decodeName(),
                lines, List.copyOf(ces), notes());
    }

    /** What one instruction (or its skipped round) showed. */
    private static final class Unit {
        final Map<Long, ItemComparison.Group> groups = new LinkedHashMap<>();
        final DecodeCheck.State decode = new DecodeCheck.State();
        long done;

        boolean failed() {
            return !groups.isEmpty() || decode.problem != null;
        }
    }

    /**
     * Unit {@code k}: every batch of instruction {@code k % plans} (the second round runs every
     * case again with the decoder inhibited: the skipped instruction), on the given simulator.
     */
    private Unit unit(int k, boolean exhaustive, long perInstruction, BatchRun run, ItemComparison compare,
                      DecodeCheck decodeLines, Progress progress) {
        boolean inhibited = k >= plans.size();
        int ik = k % plans.size();
        Unit u = new Unit();
        long count = exhaustive ? cases.casesOf(ik) : perInstruction;
        for (long c0 = 0; c0 < count; c0 += 64) {
            Batch b = exhaustive ? cases.exhaustive(ik, c0, count) : cases.sample(ik, c0);
            b.inhibited = inhibited;
            BatchRun.Result r = run.run(b, false);
            compare.compare(ik, b, r, u.groups);
            if (inhibited) {
                decodeLines.checkInhibited(u.decode, b);
            } else {
                decodeLines.check(u.decode, b, plans.get(ik).instruction().body().isEmpty());
            }
            int n = Long.bitCount(b.valid);
            u.done += n;
            if (progress != null) {
                progress.update(n, 0);
            }
            if (opt.stopAtFirst() && u.failed()) {
                break;
            }
        }
        return u;
    }

    // Each thread takes the next unit and runs it on its own simulator.
    private void inParallel(Unit[] results, boolean exhaustive, long perInstruction, Progress progress) {
        int threads = Math.min(opt.threads(), results.length);
        java.util.concurrent.atomic.AtomicInteger next = new java.util.concurrent.atomic.AtomicInteger();
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "verify");
            t.setDaemon(true);
            return t;
        });
        try {
            List<java.util.concurrent.Future<?>> running = new ArrayList<>();
            for (int t = 0; t < threads; t++) {
                running.add(pool.submit(() -> {
                    BatchRun run = new BatchRun(machine);
                    ItemComparison compare = new ItemComparison(isa, plans, pcMask());
                    DecodeCheck decodeLines = new DecodeCheck(machine.netlist(), opt.decodeName(), run,
                            new CaseText(machine), plans);
                    for (int k = next.getAndIncrement(); k < results.length; k = next.getAndIncrement()) {
                        results[k] = unit(k, exhaustive, perInstruction, run, compare, decodeLines, progress);
                    }
                }));
            }
            for (java.util.concurrent.Future<?> f : running) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("verify was interrupted", e);
        } catch (java.util.concurrent.ExecutionException e) {
            throw e.getCause() instanceof RuntimeException re ? re : new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    private int pcMask() {
        return machine.pc() == null ? 0 : (1 << machine.pc().width()) - 1;
    }

    /** Adds up the cases done on every thread and hands the sum to the caller's progress, one thread at a time. */
    private static final class SharedProgress implements Progress {
        private final Progress to;
        private final long total;
        private long done;

        SharedProgress(Progress to, long total) {
            this.to = to;
            this.total = total;
        }

        @Override
        public synchronized void update(long cases, long ignored) {
            done += cases;
            to.update(done, total);
        }
    }

    private List<String> notes() {
        List<String> notes = new ArrayList<>();
        int opWidth = isa.opcode().width();
        if (opWidth <= 16) {
            List<String> free = new ArrayList<>();
            for (long code = 0; code < 1L << opWidth; code++) {
                if (isa.byOpcode(code) == null) {
                    free.add(String.format(Locale.ROOT, "0x%X", code));
                }
            }
            if (!free.isEmpty()) {
                notes.add("opcodes without an instruction, not checked: " + String.join(" ", free));
            }
        }
        List<String> unbuilt = machine.modules().stream().filter(mi -> !mi.built()).map(mi -> mi.path()).toList();
        if (!unbuilt.isEmpty()) {
            notes.add("modules not built yet (" + String.join(", ", unbuilt) + ") were checked from their description:"
                    + " the built part does what the ISA says when their switches are set as they would drive them");
        }
        if (isa.inhibitNet() >= 0) {
            notes.add("skips: every case also ran as the instruction skipped (decoder inhibited by "
                    + machine.netlist().netName(isa.inhibitNet()) + "): no state may change, the pc counts on, the"
                    + " inhibit clears, and at most one decode line may be active");
        }
        if (isa.wordFromSwitches()) {
            notes.add("the instruction word comes from the switches " + machine.inputs().get(isa.wordInputs()[0]).name()
                    + ".." + machine.inputs().get(isa.wordInputs()[isa.wordInputs().length - 1]).name()
                    + ": every word of the plan was set on them");
        }
        if (!decodeCheck.hasLines()) {
            notes.add("no decode lines named '" + opt.decodeName() + "[k]' found; name them with --decode NAME");
        }
        return List.copyOf(notes);
    }
}
