package org.thermion.fuzz;

import java.util.List;
import java.util.Map;

/**
 * One fuzz input: the files to lay out in a fresh folder (name to bytes) and the command line,
 * in which {@link #DIR} stands for that folder. Built from {@code seed} alone, so a case that
 * fails can be replayed from the seed printed with the failure.
 */
record FuzzCase(long seed, String shape, Map<String, byte[]> files, List<String> args) {
    /** Stands for the case's folder in {@link #args}. */
    static final String DIR = "@DIR@";

    @Override
    public String toString() {
        return "case " + seed + " (" + shape + "): thermion " + String.join(" ", args.stream().map(FuzzCase::shown).toList());
    }

    private static String shown(String a) {
        StringBuilder b = new StringBuilder();
        for (char c : a.toCharArray()) {
            b.append(c < 0x20 ? String.format("\\u%04x", (int) c) : String.valueOf(c));
        }
        return a.isEmpty() || a.contains(" ") ? "'" + b + "'" : b.toString();
    }
}
