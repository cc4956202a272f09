package org.thermion.verify;

import org.thermion.model.AddressedBit;
import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Meanings;
import org.thermion.model.Netlist;
import org.thermion.model.Port;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

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
     */
    public record Options(int allTargetBits, long sampleCases, long seed, String decodeName, boolean stopAtFirst,
                          Machine reference, int maxNets, Progress progress, long exhaustiveLimit) {
        public static Options defaults() {
            return new Options(4, 1L << 22, 1, "line", false, null, 8, null, EXHAUSTIVE_LIMIT);
        }

        public Options withReference(Machine ref, boolean stop) {
            return new Options(allTargetBits, sampleCases, seed, decodeName, stop, ref, maxNets, progress, exhaustiveLimit);
        }

        public Options withProgress(Progress p) {
            return new Options(allTargetBits, sampleCases, seed, decodeName, stopAtFirst, reference, maxNets, p,
                    exhaustiveLimit);
        }

        public Options withSampling(long limit, long samples, long newSeed) {
            return new Options(allTargetBits, samples, newSeed, decodeName, stopAtFirst, reference, maxNets, progress, limit);
        }

        public Options withDecode(String name, int targetBits) {
            return new Options(targetBits, sampleCases, seed, name, stopAtFirst, reference, maxNets, progress,
                    exhaustiveLimit);
        }
    }

    private final Machine machine;
    private final Isa isa;
    private final Options opt;
    private final BatchRun logic;
    private final IsaLanes lanes;
    private final int stateBits;
    private final int inputBits;
    private final int pcMask;
    private final List<OperandPlan> plans = new ArrayList<>();
    private final int[] lineNets;
    private final String[] lineNames;
    private NetTrace netTrace;

    public Verifier(Machine machine, Options options) {
        this.machine = machine;
        this.isa = machine.isa();
        if (isa == null) {
            throw new IllegalArgumentException("machine '" + machine.name() + "' has no isa block to verify against");
        }
        if (machine.rom() == null || machine.pc() == null) {
            throw new IllegalArgumentException("machine '" + machine.name() + "' needs a rom and a pc to run instructions");
        }
        this.opt = options;
        this.logic = new BatchRun(machine);
        this.lanes = new IsaLanes(isa);
        this.stateBits = isa.state().size();
        this.inputBits = machine.inputs().size();
        this.pcMask = (1 << machine.pc().width()) - 1;
        for (Instruction ins : isa.instructions()) {
            plans.add(OperandPlan.of(isa, ins, options.allTargetBits()));
        }
        List<Integer> nets = decodeNets(machine.netlist(), options.decodeName());
        lineNets = nets.stream().mapToInt(Integer::intValue).toArray();
        lineNames = new String[lineNets.length];
        for (int i = 0; i < lineNets.length; i++) {
            lineNames[i] = machine.netlist().netName(lineNets[i]);
        }
    }

    /** Nets named {@code name[k]}, the bus with the shortest module prefix, ordered by k. */
    static List<Integer> decodeNets(Netlist nl, String name) {
        Pattern p = Pattern.compile("^((?:.*\\.)?)" + Pattern.quote(name) + "\\[(\\d+)\\]$");
        Map<String, TreeMap<Integer, Integer>> byPrefix = new LinkedHashMap<>();
        for (int n = 0; n < nl.netCount(); n++) {
            Matcher m = p.matcher(nl.netName(n));
            if (m.matches()) {
                byPrefix.computeIfAbsent(m.group(1), k -> new TreeMap<>()).put(Integer.parseInt(m.group(2)), n);
            }
        }
        String best = null;
        for (String prefix : byPrefix.keySet()) {
            if (best == null || prefix.length() < best.length()) {
                best = prefix;
            }
        }
        return best == null ? List.of() : new ArrayList<>(byPrefix.get(best).values());
    }

    private long casesOf(int k) {
        return (long) plans.get(k).words().length << (stateBits + inputBits);
    }

    /** Runs the check. */
    public VerifyReport run() {
        boolean exhaustive = stateBits + inputBits <= 40;
        long total = 0;
        if (exhaustive) {
            for (int k = 0; k < plans.size(); k++) {
                total += casesOf(k);
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
        Map<Long, Group> groups = new LinkedHashMap<>();
        DecodeState[] decode = new DecodeState[plans.size()];
        long done = 0;
        outer:
        for (int k = 0; k < plans.size(); k++) {
            decode[k] = new DecodeState();
            long count = exhaustive ? casesOf(k) : perInstruction;
            for (long c0 = 0; c0 < count; c0 += 64) {
                Batch b = exhaustive ? exhaustiveBatch(k, c0, count) : sampleBatch(k, c0);
                BatchRun.Result r = logic.run(b, false);
                compare(k, b, c0, r, groups);
                checkDecode(decode[k], b, plans.get(k).instruction().body().isEmpty());
                done += Long.bitCount(b.valid);
                if (opt.progress() != null) {
                    opt.progress().update(done, total);
                }
                if (opt.stopAtFirst() && (!groups.isEmpty() || decode[k].problem != null)) {
                    break outer;
                }
            }
        }
        List<DecodeVerdict> lines = decodeLines(decode);
        List<Counterexample> ces = new ArrayList<>();
        for (Group g : groups.values()) {
            ces.add(diagnose(g));
        }
        List<String> planText = new ArrayList<>();
        for (OperandPlan p : plans) {
            planText.add(p.instruction().mnemonic() + ": " + p.description() + " (" + p.words().length
                    + (p.words().length == 1 ? " word)" : " words)"));
        }
        return new VerifyReport(machine.name(), done, exhaustive, opt.seed(), List.copyOf(planText), opt.decodeName(),
                lines, List.copyOf(ces), notes());
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
        if (lineNets.length == 0) {
            notes.add("no decode lines named '" + opt.decodeName() + "[k]' found; name them with --decode NAME");
        }
        return List.copyOf(notes);
    }

    // ---- cases ------------------------------------------------------------------------

    private Batch exhaustiveBatch(int k, long c0, long count) {
        Batch b = new Batch(k, isa.wordBits(), stateBits, inputBits);
        OperandPlan plan = plans.get(k);
        SplittableRandom rnd = random(k, c0);
        int low = stateBits + inputBits;
        if (low >= 6 && count - c0 >= 64) {
            // A whole batch inside one operand pattern: lane i is case c0 + i, so the six low
            // case bits follow the lane number and the others are the same in every lane.
            long word = plan.words()[(int) (c0 >>> low)];
            for (int bit = 0; bit < b.wordBits.length; bit++) {
                b.wordBits[bit] = (plan.freeMask() >>> bit & 1L) != 0 ? rnd.nextLong() : (word >>> bit & 1L) != 0 ? -1L : 0L;
            }
            for (int j = 0; j < low; j++) {
                long v = j < 6 ? LANE_BITS[j] : (c0 >>> j & 1L) != 0 ? -1L : 0L;
                if (j < stateBits) {
                    b.state[j] = v;
                } else {
                    b.inputs[j - stateBits] = v;
                }
            }
            b.valid = -1L;
            return b;
        }
        for (int lane = 0; lane < 64; lane++) {
            long c = c0 + lane;
            if (c >= count) {
                c = c0;
            } else {
                b.valid |= 1L << lane;
            }
            long rest = low == 0 ? 0 : c & ((1L << low) - 1);
            int pattern = (int) (c >>> low);
            b.setWord(lane, plan.words()[pattern] | (rnd.nextLong() & plan.freeMask()));
            for (int s = 0; s < stateBits; s++) {
                b.state[s] |= (rest >>> s & 1L) << lane;
            }
            for (int i = 0; i < inputBits; i++) {
                b.inputs[i] |= (rest >>> (stateBits + i) & 1L) << lane;
            }
        }
        return b;
    }

    /** Lane words whose lane i carries bit j of i. */
    private static final long[] LANE_BITS = {
        0xAAAAAAAAAAAAAAAAL, 0xCCCCCCCCCCCCCCCCL, 0xF0F0F0F0F0F0F0F0L,
        0xFF00FF00FF00FF00L, 0xFFFF0000FFFF0000L, 0xFFFFFFFF00000000L};

    private SplittableRandom random(int k, long c0) {
        return new SplittableRandom(opt.seed() ^ (k * 0x9E3779B97F4A7C15L) ^ (c0 * 0xBF58476D1CE4E5B9L));
    }

    private Batch sampleBatch(int k, long c0) {
        Batch b = new Batch(k, isa.wordBits(), stateBits, inputBits);
        OperandPlan plan = plans.get(k);
        SplittableRandom rnd = random(k, c0);
        for (int lane = 0; lane < 64; lane++) {
            b.setWord(lane, plan.words()[rnd.nextInt(plan.words().length)] | (rnd.nextLong() & plan.freeMask()));
        }
        for (int s = 0; s < stateBits; s++) {
            b.state[s] = rnd.nextLong();
        }
        for (int i = 0; i < inputBits; i++) {
            b.inputs[i] = rnd.nextLong();
        }
        b.valid = -1L;
        return b;
    }

    // ---- comparison ---------------------------------------------------------------------

    /** Mismatches of one item of one instruction: how many cases, and the first. */
    private static final class Group {
        final int instruction;
        final int item;
        long cases;
        Batch batch;
        int lane;

        Group(int instruction, int item) {
            this.instruction = instruction;
            this.item = item;
        }
    }

    private IsaLanes.Expected expected(Batch b) {
        return lanes.evaluate(plans.get(b.instruction).instruction(), b.wordBits, b.state, b.inputs);
    }

    private int expectedPc(IsaLanes.Expected e, int lane) {
        return (e.jump() >>> lane & 1L) != 0 ? e.jumpTarget()[lane] & pcMask : 1 & pcMask;
    }

    /** Lanes where item (a state bit index, or stateBits for the PC) is wrong. */
    private long wrong(Batch b, IsaLanes.Expected e, BatchRun.Result r, int item) {
        if (item < stateBits) {
            return (r.state[item] ^ e.state()[item]) & b.valid;
        }
        long bad = 0;
        for (int lane = 0; lane < 64; lane++) {
            if ((b.valid >>> lane & 1L) != 0 && r.pc[lane] != expectedPc(e, lane)) {
                bad |= 1L << lane;
            }
        }
        return bad;
    }

    private void compare(int k, Batch b, long c0, BatchRun.Result r, Map<Long, Group> groups) {
        IsaLanes.Expected e = expected(b);
        for (int item = 0; item <= stateBits; item++) {
            long bad = wrong(b, e, r, item);
            if (bad != 0) {
                long key = (long) k * (stateBits + 1) + item;
                Group g = groups.get(key);
                if (g == null) {
                    g = new Group(k, item);
                    g.batch = b;
                    g.lane = Long.numberOfTrailingZeros(bad);
                    groups.put(key, g);
                }
                g.cases += Long.bitCount(bad);
            }
        }
    }

    // ---- decode lines ---------------------------------------------------------------------

    private static final class DecodeState {
        int line = -1;
        /** An instruction that does nothing showed no line (so far). */
        boolean idle;
        String problem;
    }

    /** {@code idle}: the instruction does nothing, so it may also have no line at all. */
    private void checkDecode(DecodeState d, Batch b, boolean idle) {
        if (lineNets.length == 0 || d.problem != null) {
            return;
        }
        long seen1 = 0;
        long seen2 = 0;
        for (int net : lineNets) {
            long v = logic.value(net);
            seen2 |= seen1 & v;
            seen1 |= v;
        }
        long none = ~seen1 & b.valid;
        long many = seen2 & b.valid;
        if (idle && none == b.valid) {
            d.idle = true;
            return;
        }
        if (none != 0) {
            d.problem = "no line active (" + caseText(b, Long.numberOfTrailingZeros(none)) + ")";
            return;
        }
        if (many != 0) {
            int lane = Long.numberOfTrailingZeros(many);
            List<String> act = new ArrayList<>();
            for (int i = 0; i < lineNets.length; i++) {
                if ((logic.value(lineNets[i]) >>> lane & 1L) != 0) {
                    act.add(lineNames[i]);
                }
            }
            d.problem = String.join(" and ", act) + " active together (" + caseText(b, lane) + ")";
            return;
        }
        for (int i = 0; i < lineNets.length; i++) {
            long v = logic.value(lineNets[i]) & b.valid;
            if (v == 0) {
                continue;
            }
            if (v != b.valid || (d.line >= 0 && d.line != i) || d.idle) {
                int other = d.line >= 0 && d.line != i ? d.line : -1;
                d.problem = "the active line depends on the case: " + lineNames[i]
                        + (other >= 0 ? " or " + lineNames[other] : " in some cases only");
                return;
            }
            d.line = i;
        }
    }

    private List<DecodeVerdict> decodeLines(DecodeState[] decode) {
        List<DecodeVerdict> out = new ArrayList<>();
        if (lineNets.length == 0) {
            return out;
        }
        for (int k = 0; k < plans.size(); k++) {
            Instruction ins = plans.get(k).instruction();
            DecodeState d = decode[k];
            if (d == null) {
                out.add(new DecodeVerdict(ins.mnemonic(), ins.opcode(), null, "not run"));
                continue;
            }
            String problem = d.problem;
            if (problem == null && d.line >= 0) {
                for (int j = 0; j < plans.size(); j++) {
                    if (j != k && decode[j] != null && decode[j].problem == null && decode[j].line == d.line) {
                        problem = lineNames[d.line] + " is also the line of " + plans.get(j).instruction().mnemonic();
                    }
                }
            }
            if (problem == null && d.line < 0) {
                out.add(new DecodeVerdict(ins.mnemonic(), ins.opcode(), "(none: does nothing)", null));
                continue;
            }
            out.add(new DecodeVerdict(ins.mnemonic(), ins.opcode(), problem == null ? lineNames[d.line] : null, problem));
        }
        return List.copyOf(out);
    }

    // ---- diagnosis ------------------------------------------------------------------------

    private Counterexample diagnose(Group g) {
        Batch b = g.batch;
        int lane = g.lane;
        OperandPlan plan = plans.get(g.instruction);
        Instruction ins = plan.instruction();
        BatchRun.Result r = logic.run(b, true);
        IsaLanes.Expected e = expected(b);
        String item = g.item < stateBits ? isa.state().get(g.item).name() : "pc";
        String kind;
        String explanation;
        int[] pins;
        int phase;
        if (g.item < stateBits) {
            Latch l = machine.netlist().latches().get(logic.stateLatch(g.item));
            phase = l.phase();
            long[] at = r.atPhase[phase];
            boolean en = l.enable() < 0 || bit(at[l.enable()], lane);
            boolean d = bit(at[l.data()], lane);
            boolean q = b.state(g.item, lane);
            boolean x = bit(e.state()[g.item], lane);
            boolean w = bit(e.written()[g.item], lane);
            String enName = l.enable() < 0 ? "(always)" : net(l.enable());
            if (en && !w) {
                kind = "unexpected write";
                explanation = "latch " + item + " loaded (enable " + enName + " = 1) although " + ins.mnemonic()
                        + " does not write " + item + "; data " + net(l.data()) + " = " + b01(d);
                pins = new int[]{l.enable()};
            } else if (!en && x != q) {
                kind = "missed write";
                explanation = "latch " + item + " did not load (enable " + enName + " = 0); " + ins.mnemonic()
                        + " writes " + item + " = " + b01(x);
                pins = new int[]{l.enable()};
            } else {
                kind = "wrong value";
                explanation = "latch " + item + " loaded data " + net(l.data()) + " = " + b01(d) + ", expected "
                        + b01(x) + " (enable " + enName + " = " + b01(en) + ")";
                pins = new int[]{l.data()};
            }
        } else {
            phase = machine.pc().phase();
            long[] at = r.atPhase[phase];
            int jn = machine.pc().jumpNet();
            boolean j = jn >= 0 && bit(at[jn], lane);
            boolean jx = bit(e.jump(), lane);
            if (j != jx) {
                kind = "jump";
                explanation = "jump net " + (jn >= 0 ? net(jn) : "(none)") + " = " + b01(j) + "; " + ins.mnemonic()
                        + (jx ? " jumps here" : " does not jump here");
                pins = new int[]{jn};
            } else {
                kind = "target";
                int[] t = machine.pc().targetNets();
                List<Integer> badBits = new ArrayList<>();
                int want = e.jumpTarget()[lane];
                for (int i = 0; i < t.length; i++) {
                    if (bit(at[t[i]], lane) != ((want >>> i & 1) != 0)) {
                        badBits.add(t[i]);
                    }
                }
                explanation = String.format(Locale.ROOT, "jump target 0x%X, expected 0x%X", r.pc[lane], want & pcMask);
                pins = badBits.stream().mapToInt(Integer::intValue).toArray();
            }
        }
        String compared;
        List<NetDiff> nets;
        if (opt.reference() != null) {
            BatchRun ref = new BatchRun(opt.reference());
            BatchRun.Result rr = ref.run(b, true);
            compared = "the unmutated logic, same case";
            nets = nets().firstDifferences(r, rr, lane, lane, opt.reference().netlist().netCount(), null, 0);
        } else {
            Neighbour nb = passingNeighbour(b, lane, g.item);
            if (nb == null) {
                compared = "no passing case of " + ins.mnemonic() + " one bit away";
                nets = List.of();
            } else {
                compared = "the passing case with " + nb.change;
                boolean[] cone = nets().cone(pins);
                nets = nets().firstDifferences(nb.result, nb.result, 0, nb.lane, machine.netlist().netCount(), cone, phase);
            }
        }
        return new Counterexample(ins.mnemonic(), ins.opcode(), b.word(lane), operandText(ins, b.word(lane)), item, kind,
                explanation, stateText(b, lane), inputText(b, lane), afterText(e.state(), lane),
                afterText(r.state, lane), expectedPc(e, lane), r.pc[lane], g.cases, compared, nets,
                nets().trace(pins, r.atPhase[phase], lane));
    }

    // Made on the first counterexample: most runs find none.
    private NetTrace nets() {
        if (netTrace == null) {
            netTrace = new NetTrace(machine, opt.maxNets());
        }
        return netTrace;
    }

    private record Neighbour(BatchRun.Result result, int lane, String change) {
    }

    /**
     * Runs the failing case in lane 0 beside its one-bit neighbours (each state bit, input and
     * non-opcode word bit flipped) and returns the first neighbour that gets the item right.
     */
    private Neighbour passingNeighbour(Batch failing, int lane, int item) {
        Batch nb = new Batch(failing.instruction, isa.wordBits(), stateBits, inputBits);
        List<String> change = new ArrayList<>();
        nb.copyLane(failing, lane, 0);
        change.add("");
        long opMask = isa.opcode().place(-1L);
        int next = 1;
        for (int s = 0; s < stateBits && next < 64; s++, next++) {
            nb.copyLane(failing, lane, next);
            nb.state[s] ^= 1L << next;
            change.add(isa.state().get(s).name() + " = " + b01(nb.state(s, next)));
        }
        for (int i = 0; i < inputBits && next < 64; i++, next++) {
            nb.copyLane(failing, lane, next);
            nb.inputs[i] ^= 1L << next;
            change.add(machine.inputs().get(i).name() + " = " + b01(nb.input(i, next)));
        }
        for (int bit = 0; bit < isa.wordBits() && next < 64; bit++) {
            if ((opMask >>> bit & 1L) != 0) {
                continue;
            }
            nb.copyLane(failing, lane, next);
            nb.wordBits[bit] ^= 1L << next;
            change.add(String.format(Locale.ROOT, "word 0x%X", nb.word(next)));
            next++;
        }
        BatchRun.Result r = logic.run(nb, true);
        IsaLanes.Expected e = expected(nb);
        long bad = wrong(nb, e, r, item);
        long good = nb.valid & ~bad & ~1L;
        if (good == 0) {
            return null;
        }
        // Prefer a neighbour where the item really changes (a write of a new value, a jump),
        // so the comparison shows logic at work rather than a latch keeping its value.
        long changes;
        if (item < stateBits) {
            changes = e.state()[item] ^ nb.state[item];
        } else {
            changes = e.jump();
        }
        int p = Long.numberOfTrailingZeros((good & changes) != 0 ? good & changes : good);
        return new Neighbour(r, p, change.get(p));
    }

    // ---- text -----------------------------------------------------------------------------

    private String net(int n) {
        return machine.netlist().netName(n);
    }

    private static boolean bit(long v, int lane) {
        return (v >>> lane & 1L) != 0;
    }

    private static String b01(boolean v) {
        return v ? "1" : "0";
    }

    private String operandText(Instruction ins, long word) {
        List<String> parts = new ArrayList<>();
        if (isa.selectField() >= 0 && Meanings.usesSelected(ins.body())) {
            long a = isa.fields().get(isa.selectField()).extract(word);
            String name = "unmapped";
            for (AddressedBit ab : isa.bitMap()) {
                if (ab.address() == a) {
                    name = ab.name();
                }
            }
            parts.add(isa.fields().get(isa.selectField()).name() + " " + a + " (" + name + ")");
        }
        for (int f : Meanings.jumpFields(ins.body())) {
            parts.add(String.format(Locale.ROOT, "%s 0x%X", isa.fields().get(f).name(), isa.fields().get(f).extract(word)));
        }
        return parts.isEmpty() ? "-" : String.join(", ", parts);
    }

    private String stateText(Batch b, int lane) {
        StringBuilder sb = new StringBuilder();
        for (int s = 0; s < stateBits; s++) {
            sb.append(s == 0 ? "" : " ").append(isa.state().get(s).name()).append('=').append(b01(b.state(s, lane)));
        }
        return sb.toString();
    }

    private String inputText(Batch b, int lane) {
        StringBuilder sb = new StringBuilder();
        List<Port> in = machine.inputs();
        for (int i = 0; i < inputBits; i++) {
            sb.append(i == 0 ? "" : " ").append(in.get(i).name()).append('=').append(b01(b.input(i, lane)));
        }
        return sb.toString();
    }

    private String afterText(long[] state, int lane) {
        StringBuilder sb = new StringBuilder();
        for (int s = 0; s < stateBits; s++) {
            sb.append(s == 0 ? "" : " ").append(isa.state().get(s).name()).append('=').append(b01(bit(state[s], lane)));
        }
        return sb.toString();
    }

    private String caseText(Batch b, int lane) {
        return String.format(Locale.ROOT, "word 0x%X, %s, %s", b.word(lane), stateText(b, lane), inputText(b, lane));
    }
}
