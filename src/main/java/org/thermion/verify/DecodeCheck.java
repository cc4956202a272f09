package org.thermion.verify;

import org.thermion.model.Instruction;
import org.thermion.model.Netlist;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Checks the decode lines: one line per instruction in all its cases, no line shared by two. */
final class DecodeCheck {
    /** What one instruction's batches showed of its decode line so far. */
    static final class State {
        int line = -1;
        /** An instruction that does nothing showed no line (so far). */
        boolean idle;
        String problem;
    }

    private final BatchRun logic;
    private final CaseText text;
    private final List<OperandPlan> plans;
    private final int[] lineNets;
    private final String[] lineNames;

    DecodeCheck(Netlist nl, String decodeName, BatchRun logic, CaseText text, List<OperandPlan> plans) {
        this.logic = logic;
        this.text = text;
        this.plans = plans;
        List<Integer> nets = decodeNets(nl, decodeName);
        lineNets = nets.stream().mapToInt(Integer::intValue).toArray();
        lineNames = new String[lineNets.length];
        for (int i = 0; i < lineNets.length; i++) {
            lineNames[i] = nl.netName(lineNets[i]);
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

    boolean hasLines() {
        return lineNets.length > 0;
    }

    /** Reads the lines of the batch just run. {@code idle}: the instruction does nothing, so it may also have no line at all. */
    void check(State d, Batch b, boolean idle) {
        if (lineNets.length == 0 || d.problem != null) {
            return;
        }
        long seen1 = anyLine();
        long none = ~seen1 & b.valid;
        long many = twoLines() & b.valid;
        if (idle && none == b.valid) {
            d.idle = true;
            return;
        }
        if (none != 0) {
            d.problem = "no line active (" + text.caseText(b, Long.numberOfTrailingZeros(none)) + ")";
            return;
        }
        if (many != 0) {
            int lane = Long.numberOfTrailingZeros(many);
            d.problem = String.join(" and ", activeLines(lane)) + " active together (" + text.caseText(b, lane) + ")";
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

    /**
     * Reads the lines of an inhibited batch (a skipped instruction): no line, or one, is fine -
     * the decoder is held off on purpose - but two lines at once are still wrong.
     */
    void checkInhibited(State d, Batch b) {
        if (lineNets.length == 0 || d.problem != null) {
            return;
        }
        long many = twoLines() & b.valid;
        if (many != 0) {
            int lane = Long.numberOfTrailingZeros(many);
            d.problem = String.join(" and ", activeLines(lane)) + " active together while the decoder is inhibited ("
                    + text.caseText(b, lane) + ")";
        }
    }

    /** Lanes with at least one line active. */
    private long anyLine() {
        long seen = 0;
        for (int net : lineNets) {
            seen |= logic.value(net);
        }
        return seen;
    }

    /** Lanes with two or more lines active. */
    private long twoLines() {
        long seen1 = 0;
        long seen2 = 0;
        for (int net : lineNets) {
            long v = logic.value(net);
            seen2 |= seen1 & v;
            seen1 |= v;
        }
        return seen2;
    }

    private List<String> activeLines(int lane) {
        List<String> act = new ArrayList<>();
        for (int i = 0; i < lineNets.length; i++) {
            if ((logic.value(lineNets[i]) >>> lane & 1L) != 0) {
                act.add(lineNames[i]);
            }
        }
        return act;
    }

    /** Verdicts for the inhibited cycles that went wrong (two lines at once), after the instructions' own. */
    List<DecodeVerdict> inhibitedVerdicts(State[] inhibited) {
        List<DecodeVerdict> out = new ArrayList<>();
        for (int k = 0; k < plans.size() && inhibited != null; k++) {
            if (inhibited[k] != null && inhibited[k].problem != null) {
                Instruction ins = plans.get(k).instruction();
                out.add(new DecodeVerdict(ins.mnemonic() + " while skipped", ins.opcode(), null, inhibited[k].problem));
            }
        }
        return out;
    }

    /** One verdict per instruction from the states gathered (null: not run). */
    List<DecodeVerdict> verdicts(State[] decode) {
        List<DecodeVerdict> out = new ArrayList<>();
        if (lineNets.length == 0) {
            return out;
        }
        for (int k = 0; k < plans.size(); k++) {
            Instruction ins = plans.get(k).instruction();
            State d = decode[k];
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
}
