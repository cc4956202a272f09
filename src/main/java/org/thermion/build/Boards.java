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
    private final Designations designations;
    private final java.util.Set<String> given = new java.util.HashSet<>();

    public Boards(Machine m) {
        this(m, Designations.NONE);
    }

    /** Boards whose designators come first from {@code d} (numbers it gives out are not given again). */
    Boards(Machine m, Designations d) {
        this.designations = d;
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
        for (String ref : d.refs()) {
            java.util.regex.Matcher r = Designations.parse(ref);
            int board = r.group(1) == null ? 0 : Integer.parseInt(r.group(1)) - 1;
            reserve(board, r.group(2), Integer.parseInt(r.group(3)));
        }
    }

    /**
     * The designator of the part that does {@code role}: the one the designations file gives it when
     * that is of this class and board and not given already, else the next free one.
     */
    String designate(int board, PartClass cls, String role) {
        String ref = fromFile(board, cls, designations.byRole().get(role));
        return ref != null ? ref : next(board, cls);
    }

    /** {@code ref} (from the file) when it is of this class and board and not given yet; then it is given. Else null. */
    String fromFile(int board, PartClass cls, String ref) {
        if (ref == null) {
            return null;
        }
        java.util.regex.Matcher r = Designations.parse(ref);
        boolean fits = r.group(2).equals(cls.letters()) && (r.group(1) == null ? prefix(board).isEmpty()
                : prefix(board).equals("A" + r.group(1)));
        return fits && given.add(ref) ? ref : null;
    }

    /**
     * For a tube whose stages changed ({@code role} "tube TYPE for a, b"): the file's tube of the
     * same type on this board sharing the most stages with it, not given yet; null when none shares one.
     */
    String closestTube(int board, String role) {
        int cut = role.indexOf(" for ");
        String type = role.substring(0, cut + 5);
        java.util.Set<String> mine = new java.util.HashSet<>(List.of(role.substring(cut + 5).split(", ")));
        String best = null;
        int most = 0;
        for (Map.Entry<String, String> e : designations.byRole().entrySet()) {
            if (e.getKey().startsWith(type) && !given.contains(e.getValue())) {
                int common = 0;
                for (String name : e.getKey().substring(type.length()).replaceAll(" \\([0-9]+\\)$", "").split(", ")) {
                    common += mine.contains(name) ? 1 : 0;
                }
                if (common > most) {
                    most = common;
                    best = e.getValue();
                }
            }
        }
        return fromFile(board, PartClass.TUBE, best);
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

    private final java.util.Set<String> reserved = new java.util.HashSet<>();

    /** Keeps {@code number} of the letters on the board for a part the description named. */
    void reserve(int board, String letters, int number) {
        reserved.add(board + ":" + letters + number);
    }

    /** The next number for the letters on the board, past reserved ones (a tube and its socket share one: XV3 holds V3). */
    int nextNumber(int board, String letters) {
        int n;
        do {
            n = next.merge(board + ":" + letters, 1, Integer::sum);
        } while (reserved.contains(board + ":" + letters + n));
        return n;
    }
}
