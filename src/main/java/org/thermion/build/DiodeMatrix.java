package org.thermion.build;

import org.thermion.model.Rom;

import java.util.ArrayList;
import java.util.List;

/**
 * The ROM as a diode matrix: one word line per address, one bit line per data bit, and a diode
 * wherever the assembled word has a 1 (anode on the word line, cathode on the bit line: the
 * selected word line is driven high and each bit line is held low by its resistor, common
 * practice for a diode matrix). Each crossing has a designator of its own,
 * {@code CR(address * width + bit + 1)} on the matrix board, so a diode keeps its number whatever
 * the program: a program change is diodes added and removed at fixed places.
 */
public record DiodeMatrix(int words, int width, long[] program, List<Diode> diodes) {
    /** One diode: its designator, the address of its word line and the bit of its bit line. */
    public record Diode(String ref, int address, int bit) {
    }

    /** A difference between two programs: diodes to fit ({@code add}) and to take out. */
    public record Change(boolean add, Diode diode) {
    }

    public DiodeMatrix {
        program = program.clone();
        diodes = List.copyOf(diodes);
    }

    /** The matrix of {@code rom} holding {@code program} (words past its end are 0, bits past the width ignored). */
    public static DiodeMatrix of(Rom rom, long[] program) {
        if (program.length > rom.words()) {
            throw new IllegalArgumentException("the program has " + program.length + " words, the ROM " + rom.words());
        }
        long[] words = new long[rom.words()];
        System.arraycopy(program, 0, words, 0, program.length);
        List<Diode> diodes = new ArrayList<>();
        for (int a = 0; a < words.length; a++) {
            for (int b = 0; b < rom.width(); b++) {
                if ((words[a] >>> b & 1L) != 0) {
                    diodes.add(diode(rom.width(), a, b));
                }
            }
        }
        return new DiodeMatrix(rom.words(), rom.width(), words, diodes);
    }

    private static Diode diode(int width, int address, int bit) {
        return new Diode("CR" + ((long) address * width + bit + 1), address, bit);
    }

    /** True when the crossing of word line {@code address} and bit line {@code bit} has a diode. */
    public boolean has(int address, int bit) {
        return (program[address] >>> bit & 1L) != 0;
    }

    /** The word at {@code address} as the matrix holds it. */
    public long word(int address) {
        return program[address];
    }

    /** The diodes to take out of {@code was} (first) and to fit, to make it hold this matrix's program. */
    public List<Change> changesFrom(DiodeMatrix was) {
        if (was.words != words || was.width != width) {
            throw new IllegalArgumentException("matrices of different sizes: " + was.words + " x " + was.width
                    + " and " + words + " x " + width);
        }
        List<Change> out = new ArrayList<>();
        for (Diode d : was.diodes) {
            if (!has(d.address(), d.bit())) {
                out.add(new Change(false, d));
            }
        }
        for (Diode d : diodes) {
            if (!was.has(d.address(), d.bit())) {
                out.add(new Change(true, d));
            }
        }
        return out;
    }
}
