package org.thermion.verify;

import org.thermion.model.AddressedBit;
import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.Machine;
import org.thermion.model.Meanings;
import org.thermion.model.Port;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Writes one lane of a batch (word, operands, state, inputs) as text for verify's messages. */
final class CaseText {
    private final Machine machine;
    private final Isa isa;
    private final int stateBits;
    private final int inputBits;

    CaseText(Machine machine) {
        this.machine = machine;
        this.isa = machine.isa();
        this.stateBits = isa.state().size();
        this.inputBits = machine.inputs().size();
    }

    String net(int n) {
        return machine.netlist().netName(n);
    }

    static boolean bit(long v, int lane) {
        return (v >>> lane & 1L) != 0;
    }

    static String b01(boolean v) {
        return v ? "1" : "0";
    }

    String operandText(Instruction ins, long word) {
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

    String stateText(Batch b, int lane) {
        StringBuilder sb = new StringBuilder();
        for (int s = 0; s < stateBits; s++) {
            sb.append(s == 0 ? "" : " ").append(isa.state().get(s).name()).append('=').append(b01(b.state(s, lane)));
        }
        return sb.toString();
    }

    String inputText(Batch b, int lane) {
        StringBuilder sb = new StringBuilder();
        List<Port> in = machine.inputs();
        for (int i = 0; i < inputBits; i++) {
            sb.append(i == 0 ? "" : " ").append(in.get(i).name()).append('=').append(b01(b.input(i, lane)));
        }
        return sb.toString();
    }

    String afterText(long[] state, int lane) {
        StringBuilder sb = new StringBuilder();
        for (int s = 0; s < stateBits; s++) {
            sb.append(s == 0 ? "" : " ").append(isa.state().get(s).name()).append('=').append(b01(bit(state[s], lane)));
        }
        return sb.toString();
    }

    String caseText(Batch b, int lane) {
        return String.format(Locale.ROOT, "word 0x%X, %s, %s", b.word(lane), stateText(b, lane), inputText(b, lane));
    }
}
