package org.thermion.build;

import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Boards, our own grouping: each module instance directly under the top is a board with all the
 * modules below it; the top's own stages form a board of their own. Designators are numbered per
 * board and class; with more than one board they carry the board as an IEEE 315 assembly prefix
 * ({@code A2R14}: resistor 14 of board A2).
 */
public final class Boards {
    private final int[] boardOf;
    private final List<String> names = new ArrayList<>();
    private final Map<String, Integer> next = new HashMap<>();
    private final boolean prefixed;

    public Boards(Machine m) {
        List<ModuleInstance> mods = m.modules();
        boardOf = new int[mods.size()];
        Map<Integer, Integer> byTopChild = new HashMap<>();
        for (ModuleInstance mi : mods) {
            int top = mi.id();
            while (top >= 0 && mods.get(top).parent() > 0) {
                top = mods.get(top).parent();
            }
            int key = mi.parent() < 0 ? 0 : top;
            Integer b = byTopChild.get(key);
            if (b == null) {
                b = names.size();
                byTopChild.put(key, b);
                names.add(mi.parent() < 0 ? "top" : mods.get(key).path());
            }
            boardOf[mi.id()] = b;
        }
        prefixed = names.size() > 1;
    }

    /** The board of module instance {@code module}. */
    public int of(int module) {
        return boardOf[module];
    }

    /** Board names (the top-level instance path; "top" for the top's own stages), by board number. */
    public List<String> names() {
        return List.copyOf(names);
    }

    /** The assembly prefix of board {@code board} ("" with only one board). */
    public String prefix(int board) {
        return prefixed ? "A" + (board + 1) : "";
    }

    /** The next designator of class {@code cls} on board {@code board}. */
    public String next(int board, PartClass cls) {
        return prefix(board) + cls.letters() + nextNumber(board, cls.letters());
    }

    /** The next number for the letters on the board (a tube and its socket share one number: XV3 holds V3). */
    int nextNumber(int board, String letters) {
        return next.merge(board + ":" + letters, 1, Integer::sum);
    }
}
