package org.thermion.faults;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Random but valid machines for property tests: switches, a few latches on two clock
 * phases (some with a load enable), a web of nand/nor/and/or/xor/not logic over switches,
 * latch outputs and earlier nets, and a few outputs.
 */
public final class RandomMachines {
    private static final String SUPPLIES = """
            rail heat  { voltage 12.6 V; source 0.02 ohm; limit 40 A }
            rail bias  { voltage -24 V; source 10 ohm; limit 500 mA }
            rail bplus { voltage 48 V; source 4 ohm; limit 2 A }
            heaters on heat {
              series 2 of 6AL5 6AU6 across machine
              parallel 12AU7 at 12.6 V
            }
            realize {
              nand pentode_nand2
              nor triode_nor2
              not pentode_inverter
              or diode_or
              and diode_and
              latch triode_flipflop
              buffer cathode_follower
            }
            """;

    private RandomMachines() {
    }

    /** A machine text drawn from {@code seed}. */
    public static String text(long seed) {
        Random r = new Random(seed);
        int inputs = 2 + r.nextInt(4);
        int latches = r.nextInt(4);
        int nets = 4 + r.nextInt(14);
        int outputs = 1 + r.nextInt(3);
        List<String> pool = new ArrayList<>();
        StringBuilder b = new StringBuilder(SUPPLIES);
        b.append("module top {\n  in ");
        for (int i = 0; i < inputs; i++) {
            b.append(i == 0 ? "" : ", ").append("s").append(i);
            pool.add("s" + i);
        }
        b.append("\n  out ");
        for (int i = 0; i < outputs; i++) {
            b.append(i == 0 ? "" : ", ").append("o").append(i);
        }
        b.append("\n  net ");
        for (int i = 0; i < nets; i++) {
            b.append(i == 0 ? "" : ", ").append("w").append(i);
        }
        b.append("\n");
        for (int i = 0; i < latches; i++) {
            pool.add("q" + i);
        }
        for (int i = 0; i < latches; i++) {
            String data = "w" + r.nextInt(nets);
            int phase = 1 + r.nextInt(2);
            String when = r.nextBoolean() ? " when " + pool.get(r.nextInt(inputs + latches)) : "";
            b.append("  latch q").append(i).append(" on phase ").append(phase).append(when)
                    .append(" = ").append(data).append("\n");
        }
        for (int i = 0; i < nets; i++) {
            String a = pool.get(r.nextInt(pool.size()));
            String c = pool.get(r.nextInt(pool.size()));
            String e;
            switch (r.nextInt(7)) {
                case 0 -> e = "!(" + a + " & " + c + ")";
                case 1 -> e = "!(" + a + " | " + c + ")";
                case 2 -> e = a + " & " + c + " & " + pool.get(r.nextInt(pool.size()));
                case 3 -> e = a + " | " + c;
                case 4 -> e = a + " ^ " + c;
                case 5 -> e = "!" + a;
                default -> e = "(" + a + " & !" + c + ") | " + pool.get(r.nextInt(pool.size()));
            }
            b.append("  w").append(i).append(" = ").append(e).append("\n");
            pool.add("w" + i);
        }
        for (int i = 0; i < outputs; i++) {
            b.append("  o").append(i).append(" = ").append("w").append(nets - 1 - r.nextInt(Math.min(nets, 4)))
                    .append(" & ").append(pool.get(r.nextInt(pool.size()))).append("\n");
        }
        b.append("}\n\nmachine random").append(Math.abs(seed)).append(" {\n");
        b.append("  clock { phases 2; period 100 us }\n  top top\n  inputs");
        for (int i = 0; i < inputs; i++) {
            b.append(" s").append(i);
        }
        b.append("\n  outputs");
        for (int i = 0; i < outputs; i++) {
            b.append(" o").append(i);
        }
        b.append("\n}\n");
        return b.toString();
    }

    /** {@code n} random steps over {@code inputs} switches, 1 to 3 cycles each. */
    static List<Step> steps(long seed, int inputs, int n) {
        Random r = new Random(seed * 31 + 7);
        List<Step> out = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            boolean[] in = new boolean[inputs];
            for (int i = 0; i < inputs; i++) {
                in[i] = r.nextBoolean();
            }
            out.add(new Step(in, 1 + r.nextInt(3)));
        }
        return out;
    }
}
