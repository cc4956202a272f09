package org.thermion.tui;

import org.thermion.asm.OperandRule;
import org.thermion.model.AddressedBit;
import org.thermion.model.Instruction;
import org.thermion.model.Isa;
import org.thermion.model.IsaField;
import org.thermion.model.Machine;

/**
 * The switch panel of a machine whose instruction word comes from switches (a bring-up panel,
 * no ROM or PC), drawn where a program's listing would be: each bit of the word as a switch
 * with its field and the key that flips it, the word as a number in hex, decimal and binary,
 * and what the ISA makes of it. {@code +} and {@code -} step the word as a number, {@code z}
 * turns every word switch off.
 */
final class WordPanel {
    static final String TITLE = "instruction word (switches)";

    private WordPanel() {
    }

    static void draw(Canvas c, Rect r, Session s) {
        c.box(r, TITLE);
        Rect in = Canvas.inside(r);
        Canvas cc = c.within(in);
        Machine m = s.machine();
        Isa isa = m.isa();
        int[] inputs = isa.wordInputs();
        int bits = inputs.length;
        long word = s.switchWord();
        int col = in.col() + 1;
        int label = 7;
        int row = in.row();
        // Most significant bit on the left, as a builder writes the word; two columns a bit.
        String[] rows = {"bit", "field", "key", "switch"};
        for (int k = 0; k < rows.length && row + k < in.bottom(); k++) {
            cc.text(col, row + k, rows[k], Palette.DIM);
        }
        String lastField = null;
        for (int i = bits - 1; i >= 0; i--) {
            int x = col + label + 2 * (bits - 1 - i) + gaps(isa, i, bits);
            if (x + 1 >= in.right()) {
                break;
            }
            cc.text(x, row, Integer.toString(i % 10), Palette.DIM);
            String field = fieldOf(isa, i);
            if (row + 1 < in.bottom() && field != null && !field.equals(lastField)) {
                cc.text(x, row + 1, Canvas.fit(field, Math.max(1, in.right() - x)), Palette.TEXT);
            }
            lastField = field;
            int index = inputs[i];
            String key = index < Keymap.INPUT_KEYS.length() ? String.valueOf(Keymap.INPUT_KEYS.charAt(index)) : " ";
            if (row + 2 < in.bottom()) {
                cc.text(x, row + 2, key, Palette.KEY);
            }
            boolean on = (word >>> i & 1L) != 0;
            if (row + 3 < in.bottom()) {
                cc.text(x, row + 3, String.valueOf(on ? Glyphs.SWITCH_ON : Glyphs.SWITCH_OFF), on ? Palette.LIT : Palette.UNLIT);
            }
        }
        if (row + 4 < in.bottom()) {
            int x = cc.text(col, row + 4, Canvas.pad("word", label), Palette.DIM);
            String binary = Long.toBinaryString(word);
            String number = "0x" + Hex.word(word, m) + " = " + word + " = 0b" + "0".repeat(bits - binary.length()) + binary;
            cc.text(x, row + 4, Canvas.fit(number, Math.max(1, in.right() - x)), Palette.LIT);
        }
        if (row + 5 < in.bottom()) {
            int x = cc.text(col, row + 5, Canvas.pad("means", label), Palette.DIM);
            cc.text(x, row + 5, Canvas.fit(meaning(isa, word), Math.max(1, in.right() - x)), Palette.TEXT);
        }
        if (row + 6 < in.bottom()) {
            int x = cc.text(col, row + 6, "+ -", Palette.KEY);
            x = cc.text(x + 1, row + 6, "next/previous word", Palette.DIM);
            x = cc.text(x + 2, row + 6, "z", Palette.KEY);
            cc.text(x + 1, row + 6, "all off", Palette.DIM);
        }
    }

    /** Acts on a word key: steps the word or clears it, or says there is no word to set. */
    static void handle(Command cmd, Session s, View v) {
        if (!s.switchFed()) {
            v.message = "this machine's word comes from its ROM, not from switches";
            return;
        }
        long mask = (1L << s.machine().isa().wordBits()) - 1;
        long w = s.switchWord();
        long next = cmd == Command.WORD_UP ? w + 1 : cmd == Command.WORD_DOWN ? w - 1 : 0;
        s.setSwitchWord(next & mask);
        v.message = "word switches set to 0x" + Hex.word(next & mask, s.machine());
    }

    /** The mnemonic and operand the word spells, or why it spells none. */
    static String meaning(Isa isa, long word) {
        long code = isa.opcode().extract(word);
        Instruction ins = isa.byOpcode(code);
        if (ins == null) {
            return "opcode " + code + ": no instruction (changes nothing)";
        }
        OperandRule rule = OperandRule.of(isa, ins);
        if (rule.kind() != OperandRule.Kind.BIT) {
            return ins.mnemonic();
        }
        long addr = isa.fields().get(rule.field()).extract(word);
        for (AddressedBit b : isa.bitMap()) {
            if (b.address() == addr) {
                return ins.mnemonic() + " " + addr + " (" + b.name() + ")";
            }
        }
        return ins.mnemonic() + " " + addr + " (no bit there: reads 0)";
    }

    /** The field a word bit belongs to: the opcode first, then the select field, then any other. */
    private static String fieldOf(Isa isa, int bit) {
        IsaField op = isa.opcode();
        if (bit >= op.lo() && bit <= op.hi()) {
            return op.name();
        }
        if (isa.selectField() >= 0) {
            IsaField sel = isa.fields().get(isa.selectField());
            if (bit >= sel.lo() && bit <= sel.hi()) {
                return sel.name();
            }
        }
        for (IsaField f : isa.fields()) {
            if (bit >= f.lo() && bit <= f.hi()) {
                return f.name();
            }
        }
        return null;
    }

    /** One column of space after each field boundary to the left of bit {@code i}, so fields stand apart. */
    private static int gaps(Isa isa, int i, int bits) {
        int g = 0;
        for (int b = bits - 1; b > i; b--) {
            String here = fieldOf(isa, b);
            String next = fieldOf(isa, b - 1);
            if (here == null ? next != null : !here.equals(next)) {
                g++;
            }
        }
        return g;
    }
}
