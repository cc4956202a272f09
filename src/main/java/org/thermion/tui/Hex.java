package org.thermion.tui;

import org.thermion.model.Machine;

/** Hex numbers as wide as the machine's address and word, so columns line up. */
final class Hex {
    private Hex() {
    }

    static int digits(int bits) {
        return Math.max(1, (bits + 3) / 4);
    }

    static String address(int address, Machine m) {
        return pad(Integer.toHexString(address), digits(m.pc() == null ? 1 : m.pc().width()));
    }

    static String word(long word, Machine m) {
        return pad(Long.toHexString(word), digits(m.rom() != null ? m.rom().width() : m.isa() != null ? m.isa().wordBits() : 1));
    }

    private static String pad(String s, int n) {
        StringBuilder b = new StringBuilder();
        for (int i = s.length(); i < n; i++) {
            b.append('0');
        }
        return b.append(s.toUpperCase()).toString();
    }
}
