package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.model.ModuleInstance;
import org.thermion.model.StageType;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Puts every stage instance into an envelope, in an order that does not depend on the order of
 * the statements that made them. Stages the description names in an {@code envelope} line go
 * first into that envelope. The rest go by sharing group (the module, or the board or machine
 * where a {@code share} line allows), tube type, sections (widest first), then gates before
 * latches in creation order. The packer fills each group's open envelope of a type in turn:
 * widest first, a group's sections of one type fill all but its last envelope, the fewest there are.
 */
final class StagePlacement {
    final int[] gateEnvelope;
    final int[] latchEnvelope;

    private StagePlacement(int[] gateEnvelope, int[] latchEnvelope) {
        this.gateEnvelope = gateEnvelope;
        this.latchEnvelope = latchEnvelope;
    }

    /** One stage instance waiting for its envelope. */
    private record Item(int module, int group, int tube, int sections, boolean latch, int index) {
    }

    static StagePlacement place(NetBuilder nb, Parts parts, Packer packer, List<ModuleInstance> modules, Diagnostics diags) {
        int[] board = boards(modules);
        List<Item> items = new ArrayList<>();
        Map<Integer, Item> byOutput = new HashMap<>();
        for (int i = 0; i < nb.gates.size(); i++) {
            NetBuilder.GateB g = nb.gates.get(i);
            if (g.stage >= 0) {
                StageType st = parts.stages.get(g.stage);
                Item it = new Item(g.module, group(packer, st.tube(), g.module, board), st.tube(), st.sectionsFor(g.in.length), false, i);
                items.add(it);
                byOutput.put(g.out, it);
            }
        }
        for (int i = 0; i < nb.latches.size(); i++) {
            NetBuilder.LatchB l = nb.latches.get(i);
            if (l.stage() >= 0) {
                StageType st = parts.stages.get(l.stage());
                Item it = new Item(l.module(), group(packer, st.tube(), l.module(), board), st.tube(), st.sectionsFor(1), true, i);
                items.add(it);
                byOutput.put(l.out(), it);
            }
        }
        int[] gateEnvelope = new int[nb.gates.size()];
        int[] latchEnvelope = new int[nb.latches.size()];
        java.util.Arrays.fill(gateEnvelope, -1);
        java.util.Arrays.fill(latchEnvelope, -1);
        java.util.Set<Item> done = new java.util.HashSet<>();
        new NamedEnvelopes(nb, parts, packer, diags).place(byOutput, done, gateEnvelope, latchEnvelope);
        items.removeIf(done::contains);
        items.sort(Comparator.comparingInt(Item::group).thenComparingInt(Item::tube)
                .thenComparing(Comparator.comparingInt(Item::sections).reversed())
                .thenComparing(Item::latch).thenComparingInt(Item::index));
        for (Item it : items) {
            int env = packer.place(it.tube(), it.module(), it.group(), it.sections(), it.latch(), it.index());
            (it.latch() ? latchEnvelope : gateEnvelope)[it.index()] = env;
        }
        return new StagePlacement(gateEnvelope, latchEnvelope);
    }

    /** The sharing group of a stage of {@code tube} in {@code module}: the module, its board (as -2 - board) or the machine. */
    private static int group(Packer packer, int tube, int module, int[] board) {
        String scope = packer.share.getOrDefault(tube, "module");
        if (scope.equals("machine")) {
            return Integer.MIN_VALUE;
        }
        return scope.equals("board") ? -2 - board[module] : module;
    }

    /** Each module's board: the instance directly under the top it sits in (the top's own: the top). */
    static int[] boards(List<ModuleInstance> modules) {
        int[] out = new int[modules.size()];
        for (ModuleInstance mi : modules) {
            int b = mi.id();
            while (b >= 0 && modules.get(b).parent() > 0) {
                b = modules.get(b).parent();
            }
            out[mi.id()] = Math.max(b, 0);
        }
        return out;
    }

    /** The stages of {@code envelope NAME "OUT, ..."} lines, checked and put into their named envelopes. */
    private static final class NamedEnvelopes {
        private final NetBuilder nb;
        private final Parts parts;
        private final Packer packer;
        private final Diagnostics diags;

        NamedEnvelopes(NetBuilder nb, Parts parts, Packer packer, Diagnostics diags) {
            this.nb = nb;
            this.parts = parts;
            this.packer = packer;
            this.diags = diags;
        }

        void place(Map<Integer, Item> byOutput, java.util.Set<Item> done, int[] gateEnvelope, int[] latchEnvelope) {
            if (packer.named.isEmpty()) {
                return;
            }
            Map<String, Integer> netByName = new HashMap<>();
            for (int n = 0; n < nb.names.size(); n++) {
                netByName.putIfAbsent(nb.names.get(n), n);
            }
            for (Packer.Named named : packer.named) {
                List<Item> chosen = new ArrayList<>();
                int offset = 0;
                boolean ok = true;
                for (String raw : named.outputs().split(",", -1)) {
                    String name = raw.strip();
                    int lead = raw.length() - raw.stripLeading().length();
                    Span at = BasingReader.shift(named.span(), offset + lead, name.length());
                    offset += raw.length() + 1;
                    Integer net = netByName.get(name);
                    Item it = net == null ? null : byOutput.get(net);
                    if (net == null) {
                        diags.error(at, "no net named '" + name + "'", "name a stage by its output net, a latch by its Q");
                        ok = false;
                    } else if (it == null) {
                        diags.error(at, "net '" + name + "' is not the output of a stage", "name a net a stage drives");
                        ok = false;
                    } else if (done.contains(it) || chosen.contains(it)) {
                        diags.error(at, "the stage driving '" + name + "' is already placed in a named envelope",
                                "put each stage in one envelope line");
                        ok = false;
                    } else if (!chosen.isEmpty() && chosen.get(0).tube() != it.tube()) {
                        diags.error(at, "the stage driving '" + name + "' is built on " + parts.tubes.get(it.tube()).name()
                                + ", the others here on " + parts.tubes.get(chosen.get(0).tube()).name(),
                                "one envelope holds one tube type");
                        ok = false;
                    } else {
                        chosen.add(it);
                    }
                }
                if (!ok || chosen.isEmpty()) {
                    continue;
                }
                int tube = chosen.get(0).tube();
                int need = chosen.stream().mapToInt(Item::sections).sum();
                int have = parts.tubes.get(tube).sections();
                if (need > have) {
                    diags.error(named.span(), "these stages need " + need + " sections; a " + parts.tubes.get(tube).name()
                            + " has " + have, "split them over two envelope lines");
                    continue;
                }
                int env = packer.pinned(named.name(), tube, chosen.get(0).module());
                for (Item it : chosen) {
                    packer.into(env, it.sections(), it.latch(), it.index());
                    (it.latch() ? latchEnvelope : gateEnvelope)[it.index()] = env;
                    done.add(it);
                }
            }
        }
    }
}
