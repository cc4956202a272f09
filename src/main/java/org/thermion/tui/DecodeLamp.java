package org.thermion.tui;

import org.thermion.model.Instruction;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Netlist;

import java.util.ArrayList;
import java.util.List;

/**
 * One decode line of the top module: the net {@code NAME[k]} whose index k is the opcode of
 * an ISA instruction, labelled with that instruction's mnemonic.
 */
public record DecodeLamp(String mnemonic, long opcode, int net) {

    /** The decode net name used when none is given. */
    public static final String DEFAULT_NAME = "line";

    /**
     * Finds the decode lines named {@code name[k]} in the top module, in opcode order.
     * Instructions without such a net are left out: the machine may decode them elsewhere.
     */
    public static List<DecodeLamp> find(Machine m, String name) {
        int top = topModule(m);
        Netlist n = m.netlist();
        List<DecodeLamp> lines = new ArrayList<>();
        List<Instruction> byCode = new ArrayList<>(m.isa().instructions());
        byCode.sort((a, b) -> Long.compare(a.opcode(), b.opcode()));
        for (Instruction ins : byCode) {
            String wanted = name + "[" + ins.opcode() + "]";
            for (int net = 0; net < n.netCount(); net++) {
                if (n.netModule(net) == top && wanted.equals(n.netName(net))) {
                    lines.add(new DecodeLamp(ins.mnemonic(), ins.opcode(), net));
                    break;
                }
            }
        }
        return List.copyOf(lines);
    }

    static int topModule(Machine m) {
        for (ModuleInstance mi : m.modules()) {
            if (mi.parent() < 0) {
                return mi.id();
            }
        }
        return 0;
    }
}
