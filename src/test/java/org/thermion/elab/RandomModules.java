package org.thermion.elab;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Generated descriptions for order tests: a top module of inputs, latches, nets and cell
 * instances (each cell an output stored in a latch) whose logic reads latches both plain and
 * inverted. Net k reads only earlier nets, so no order of the statements makes a loop.
 */
final class RandomModules {
    private RandomModules() {
    }

    static String machine(Random r) {
        int inputs = 2 + r.nextInt(4);
        int latches = 1 + r.nextInt(4);
        int cells = r.nextInt(3);
        int nets = 2 + r.nextInt(6);
        int outputs = 1 + r.nextInt(3);
        StringBuilder sb = new StringBuilder(ElaborationTest.PARTS);
        sb.append("""
                module cell {
                  in d, en
                  out q
                  latch q on phase 2 when en = d
                }
                module top {
                """);
        sb.append("  in a[").append(inputs).append("]\n");
        sb.append("  out y[").append(outputs).append("]\n");
        sb.append("  net n[").append(nets).append("]\n");
        if (cells > 0) {
            sb.append("  net m[").append(cells).append("]\n");
        }
        List<String> leaves = new ArrayList<>();
        for (int i = 0; i < inputs; i++) {
            leaves.add("a[" + i + "]");
        }
        for (int i = 0; i < latches; i++) {
            leaves.add("s" + i);
        }
        for (int i = 0; i < cells; i++) {
            leaves.add("m[" + i + "]");
        }
        for (int k = 0; k < nets; k++) {
            List<String> visible = new ArrayList<>(leaves);
            for (int j = 0; j < k; j++) {
                visible.add("n[" + j + "]");
            }
            sb.append("  n[").append(k).append("] = ").append(expr(r, visible, 2)).append('\n');
        }
        List<String> all = new ArrayList<>(leaves);
        for (int j = 0; j < nets; j++) {
            all.add("n[" + j + "]");
        }
        for (int i = 0; i < latches; i++) {
            sb.append("  latch s").append(i).append(" on phase ").append(1 + r.nextInt(2)).append(" = ")
                    .append(expr(r, all, 2)).append('\n');
        }
        for (int i = 0; i < cells; i++) {
            sb.append("  use cell as c").append(i).append(" (d: ").append(expr(r, all, 1)).append(", en: ")
                    .append(expr(r, all, 1)).append(", q: m[").append(i).append("])\n");
        }
        for (int i = 0; i < outputs; i++) {
            sb.append("  y[").append(i).append("] = ").append(expr(r, all, 2)).append('\n');
        }
        sb.append("}\nmachine t { clock { phases 2; period 1 ms }; top top; inputs a; outputs y }\n");
        return sb.toString();
    }

    private static String expr(Random r, List<String> leaves, int depth) {
        if (depth == 0 || r.nextInt(3) == 0) {
            String leaf = leaves.get(r.nextInt(leaves.size()));
            // Inverted reads are what the order used to change: make them common, and name the
            // inverter stage outright now and then, beside the operator that picks the same stage.
            int pick = r.nextInt(5);
            return pick < 2 ? "!" + leaf : pick == 2 ? "pentode_inverter(" + leaf + ")" : leaf;
        }
        if (r.nextInt(6) == 0) {
            return "pentode_nand2(" + expr(r, leaves, depth - 1) + ", " + expr(r, leaves, depth - 1) + ")";
        }
        String op = new String[]{"&", "|", "^", "==", "&"}[r.nextInt(5)];
        String e = "(" + expr(r, leaves, depth - 1) + " " + op + " " + expr(r, leaves, depth - 1) + ")";
        return r.nextInt(4) == 0 ? "!" + e : e;
    }
}
