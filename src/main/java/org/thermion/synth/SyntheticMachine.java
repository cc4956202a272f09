package org.thermion.synth;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Writes the text of a valid machine description of a chosen size, for benchmarks and
 * scale tests. The machine is built like a real one: a ROM-driven control part (an
 * instruction register loaded on phase 1 from the off-board ROM, an opcode decoder, a
 * jump line), and a datapath of identical 8-bit slices chained around a ring bus. Each
 * slice holds its input on phase 1, runs eight levels of bounded fan-in logic (NAND,
 * NOR, AND, OR, inverters, free flip-flop complements) and stores the result on phase 2.
 * Control lines reach the slices through a tree of cathode-follower buffers, eight
 * children per node, so no net drives more than a couple of dozen inputs. A few single
 * NAND trim cells make the stage count land exactly on the target.
 *
 * <p>The count is exact by construction; {@link #stageInstances()} states it so a test
 * can hold the elaborator to it.
 */
public final class SyntheticMachine {
    /** Slice stage instances: per bit 9 gates and 2 latches, 8 bits; one enable buffer. */
    static final int SLICE_STAGES = 8 * (9 + 2) + 1;
    /** Cathode followers per buffer node: 16 decode lines and 4 operand bits. */
    static final int CTL = 20;
    /** Children per buffer node. */
    static final int FANOUT = 8;
    /**
     * Top-module stage instances outside the datapath: instruction register 12, decoder
     * 16, accumulator 1, output latches 4, jump logic 3, lamp drivers 4, ring-head
     * exclusive-ors 8 x 3 (no xor stage: OR, NAND, AND each).
     */
    static final int TOP_STAGES = 12 + 16 + 1 + 4 + 3 + 4 + 8 * 3;

    private final int target;
    private final int slices;
    private final int trim;
    /** Root instances at the top, by buffer-tree level (0 = a bare slice). */
    private final int[] roots;

    private SyntheticMachine(int target, int slices, int trim, int[] roots) {
        this.target = target;
        this.slices = slices;
        this.trim = trim;
        this.roots = roots;
    }

    /** Plans a machine of about {@code stages} stage instances (at least {@value #TOP_STAGES} + one slice). */
    public static SyntheticMachine ofSize(int stages) {
        int min = TOP_STAGES + SLICE_STAGES;
        if (stages < min) {
            throw new IllegalArgumentException("a synthetic machine has at least " + min + " stage instances; asked for " + stages);
        }
        if (stages > 2_000_000) {
            throw new IllegalArgumentException("synthetic machines go up to 2,000,000 stage instances; asked for " + stages);
        }
        int k = Math.max(1, (stages - TOP_STAGES) / (SLICE_STAGES + 3));
        while (true) {
            int[] digits = digits(k);
            int total = TOP_STAGES + datapath(digits);
            int trim = stages - total;
            if (trim < 0) {
                k--;
                continue;
            }
            if (trim > SLICE_STAGES + CTL) {
                k++;
                continue;
            }
            return new SyntheticMachine(stages, k, trim, digits);
        }
    }

    private static int[] digits(int k) {
        List<Integer> d = new ArrayList<>();
        for (int v = k; v > 0; v /= FANOUT) {
            d.add(v % FANOUT);
        }
        return d.stream().mapToInt(Integer::intValue).toArray();
    }

    /** Stage instances of a buffer-tree node at {@code level} (level 0: one slice). */
    static int nodeStages(int level) {
        return level == 0 ? SLICE_STAGES : CTL + FANOUT * nodeStages(level - 1);
    }

    private static int datapath(int[] digits) {
        int n = 0;
        for (int level = 0; level < digits.length; level++) {
            n += digits[level] * nodeStages(level);
        }
        return n;
    }

    /** The size asked for. */
    public int target() {
        return target;
    }

    /** Datapath slices. */
    public int slices() {
        return slices;
    }

    /** Stage instances the elaborated machine has: exactly the target. */
    public int stageInstances() {
        return TOP_STAGES + datapath(roots) + trim;
    }

    /** The machine's name in its text. */
    public String name() {
        return "synth" + target;
    }

    /** The description text. */
    public String text() {
        StringBuilder b = new StringBuilder(8192);
        int n = stageInstances();
        line(b, "# Synthetic machine of %d stage instances: %d datapath slices, %d trim cells.", n, slices, trim);
        line(b, "# Written by Thermion's generator for benchmarks and scale tests.");
        line(b, "# Opcode in word bits 11..8, operand bits 3..0 steer the slices; phase 1 fetches, phase 2 stores.");
        line(b, "");
        supplies(b, n);
        decoder(b);
        slice(b);
        for (int level = 1; level < roots.length; level++) {
            node(b, level);
        }
        trimCell(b);
        top(b);
        line(b, "machine %s {", name());
        line(b, "  clock { phases 2; period 400 us }");
        line(b, "  top synth_top");
        line(b, "  rom { words 256; width 12; data word; offboard }");
        line(b, "  pc { width 8; phase 2; jump jump; target target; offboard }");
        line(b, "  inputs x0 x1 x2 x3 x4 x5");
        line(b, "  outputs y0 y1 y2 y3");
        line(b, "}");
        line(b, "");
        isa(b);
        return b.toString();
    }

    /**
     * The instruction set, as far as it can be stated over the one state bit the ISA sees (the
     * accumulator): the slice-steering opcodes change only datapath latches, which it does not
     * name; opcode 2 loads the accumulator from the datapath and is left out, having no meaning
     * in these terms. Enough for programs to assemble and for control flow to be checked.
     */
    private void isa(StringBuilder b) {
        line(b, "isa %s {", name());
        line(b, "  word 12");
        line(b, "  field opcode 11..8");
        line(b, "  field operand 7..0");
        line(b, "  field sel 3..0");
        line(b, "  opcode opcode");
        line(b, "  target operand");
        line(b, "  select sel");
        line(b, "  state acc = acc");
        line(b, "  op IDLE 0x0 { }");
        line(b, "  op SHIFT 0x1 { }");
        line(b, "  op SHOW 0x3 { }");
        line(b, "  op SHOWB 0x4 { }");
        for (int k = 5; k <= 12; k++) {
            line(b, "  op MIX%d 0x%X { }", k, k);
        }
        line(b, "  op JMP 0xD { pc <- operand }");
        line(b, "  op JMPA 0xE { if acc { pc <- operand } }");
        line(b, "  op JMPNA 0xF { if !acc { pc <- operand } }");
        line(b, "}");
    }

    /**
     * A program for this machine: an endless loop that shifts the ring and steers the slices.
     * (The assembler gives these opcodes no operand, their meanings naming no field; the slices'
     * operand inputs then read 0.)
     */
    public String program() {
        StringBuilder b = new StringBuilder();
        line(b, "; Endless loop for %s: shift the ring bus through the slices, steer them, show a result.", name());
        line(b, "loop:   SHIFT");
        line(b, "        MIX5");
        line(b, "        SHIFT");
        line(b, "        MIX9");
        line(b, "        SHOW");
        line(b, "        SHIFT");
        line(b, "        MIX12");
        line(b, "        SHOWB");
        line(b, "        JMPA  loop");
        line(b, "        JMP   loop");
        return b.toString();
    }

    private static void supplies(StringBuilder b, int n) {
        // Limits sized generously from the library's per-stage draws (at most 3.2 mA of B+ and
        // 3 mA of bias per stage, plus the lamps), so large machines are not refused for supply.
        // Heaters: about 0.18 A per stage instance when hot (measured on these machines: 17 kA
        // for 10^5); the supply allows four and a half times that for the cold-heater surge.
        double bplus = Math.max(0.8, n * 4.0e-3 + 0.2);
        double bias = Math.max(0.15, n * 3.5e-3);
        double hot = 0.18 * n + 1;
        double heat = 4.5 * hot;
        line(b, "rail bplus { voltage 48 V; source %s ohm; limit %s A }", num(4 * 0.8 / bplus), num(bplus));
        line(b, "rail bias  { voltage -24 V; source %s ohm; limit %s A }", num(10 * 0.15 / bias), num(bias));
        line(b, "rail heat  { voltage 12.6 V; source %s ohm; limit %s A }", num(0.02 * 40 / heat), num(heat));
        line(b, "rail relay { voltage 24 V; source 1 ohm; limit 500 mA }");
        line(b, "");
        line(b, "heaters on heat {");
        line(b, "  parallel 12AU7 at 12.6 V");
        line(b, "  series 2 of 6AL5 6AU6 across machine");
        line(b, "  series 1 of 2D21 drop 10.5 ohm   # (12.6 V - 6.3 V) / 0.6 A, 3.8 W");
        line(b, "}");
        line(b, "");
        line(b, "softstart heater_soft on heat {");
        // A tenth of the supply dropped at hot current; cold heaters (about a sixth of their hot
        // resistance) then draw some 3.7 x hot current, so the resistor peaks near 18 W per hot
        // ampere: rated at 25 W per ampere.
        line(b, "  resistor %s ohm rated %s W", num(0.1 * 12.6 / hot), num(25 * hot));
        line(b, "  relay { coil 160 ohm; rated 12 V; pickup 8 V; dropout 1.2 V; operate 10 ms }");
        line(b, "  bypass when thyratron_relay warm");
        line(b, "}");
        line(b, "");
        line(b, "realize {");
        line(b, "  not pentode_inverter");
        line(b, "  nand pentode_nand2");
        line(b, "  nor triode_nor2");
        line(b, "  and diode_and");
        line(b, "  or diode_or");
        line(b, "  buffer cathode_follower");
        line(b, "  latch triode_flipflop");
        line(b, "}");
        line(b, "");
    }

    private static void decoder(StringBuilder b) {
        line(b, "# One line per opcode: a four-input AND of instruction-register literals.");
        line(b, "module opcode_decoder {");
        line(b, "  in op[4]");
        line(b, "  out line[16]");
        line(b, "  for k in 0..15 {");
        line(b, "    line[k] = op == k");
        line(b, "  }");
        line(b, "}");
        line(b, "");
    }

    private static void slice(StringBuilder b) {
        line(b, "# One datapath slice: ctl[15..0] are decode lines, ctl[19..16] the operand bits.");
        line(b, "module slice {");
        line(b, "  in ctl[%d], din[8]", CTL);
        line(b, "  out dout[8]");
        line(b, "  latch hold[8] on phase 1 = din");
        line(b, "  net p[8], q[8], r[8], s[8], t[8], u[8], v[8]");
        line(b, "  for i in 0..7 {");
        line(b, "    p[i] = !(hold[i] & ctl[i %% 4 + 4])");
        line(b, "    q[i] = !(p[i] | hold[(i + 1) %% 8])");
        line(b, "    r[i] = p[i] & q[(i + 3) %% 8] & ctl[16 + i %% 4] & ctl[i %% 4]");
        line(b, "    s[i] = r[i] | !hold[(i + 2) %% 8] | q[i]");
        line(b, "    t[i] = !s[i]");
        line(b, "    u[i] = !(t[i] & s[(i + 5) %% 8])");
        line(b, "    v[i] = (u[i] & ctl[8 + i]) | (r[(i + 1) %% 8] & u[(i + 2) %% 8])");
        line(b, "  }");
        line(b, "  # The store enable goes to eight flip-flops: re-driven here, not by the node's follower.");
        line(b, "  net en = cathode_follower(ctl[1])");
        line(b, "  latch dout[8] on phase 2 when en = v");
        line(b, "}");
        line(b, "");
    }

    private static String nodeName(int level) {
        return level == 0 ? "slice" : "group" + level;
    }

    private static void node(StringBuilder b, int level) {
        line(b, "# Buffer node: cathode followers re-drive the control lines for %d children.", FANOUT);
        line(b, "module %s {", nodeName(level));
        line(b, "  in ctl[%d], din[8]", CTL);
        line(b, "  out dout[8]");
        line(b, "  net c[%d], r[%d]", CTL, 8 * (FANOUT + 1));
        line(b, "  for k in 0..%d {", CTL - 1);
        line(b, "    c[k] = cathode_follower(ctl[k])");
        line(b, "  }");
        line(b, "  r[7..0] = din");
        line(b, "  for j in 0..%d {", FANOUT - 1);
        line(b, "    use %s as part (ctl: c, din: r[8 * j + 7..8 * j], dout: r[8 * j + 15..8 * j + 8])", nodeName(level - 1));
        line(b, "  }");
        line(b, "  dout = r[%d..%d]", 8 * FANOUT + 7, 8 * FANOUT);
        line(b, "}");
        line(b, "");
    }

    private static void trimCell(StringBuilder b) {
        line(b, "module trim_cell {");
        line(b, "  in a, b");
        line(b, "  out y");
        line(b, "  y = !(a & b)");
        line(b, "}");
        line(b, "");
    }

    private void top(StringBuilder b) {
        int m = 0;
        for (int d : roots) {
            m += d;
        }
        int end = 8 * m;
        line(b, "module synth_top {");
        line(b, "  in word[12]");
        line(b, "  in x0, x1, x2, x3, x4, x5");
        line(b, "  out y0, y1, y2, y3");
        line(b, "  out jump, target[8]");
        line(b, "  latch ir[12] on phase 1 = word");
        line(b, "  net line[16], ctl[%d], ring[%d]", CTL, 8 * (m + 1));
        line(b, "  use opcode_decoder as dec (op: ir[11..8], line: line)");
        line(b, "  ctl[15..0] = line");
        line(b, "  ctl[19..16] = ir[3..0]");
        line(b, "  latch acc on phase 2 when line[2] = ring[%d]", end);
        line(b, "  latch y0 on phase 2 when line[3] = ring[%d]", end + 1);
        line(b, "  latch y1 on phase 2 when line[3] = ring[%d]", end + 2);
        line(b, "  latch y2 on phase 2 when line[4] = ring[%d]", end + 3);
        line(b, "  latch y3 on phase 2 when line[4] = acc");
        line(b, "  jump = line[13] | (line[14] & acc) | (line[15] & !acc)");
        line(b, "  target = ir[7..0]");
        line(b, "  net lamp[4]");
        for (int i = 0; i < 4; i++) {
            line(b, "  lamp[%d] = lamp_driver(y%d)", i, i);
        }
        // Trim cells in eight columns, each column a short chain of NANDs that starts at an input.
        String[] colEnd = new String[8];
        int[] colLen = new int[8];
        for (int c = 0; c < trim; c++) {
            colLen[c % 8]++;
        }
        int cell = 0;
        for (int i = 0; i < 8; i++) {
            String prev = "x" + (i % 6);
            if (colLen[i] > 0) {
                line(b, "  net tc%d[%d]", i, colLen[i]);
            }
            for (int j = 0; j < colLen[i]; j++) {
                String out = "tc" + i + "[" + j + "]";
                line(b, "  use trim_cell as trim%d (a: %s, b: line[%d], y: %s)", cell++, prev, (i + j) % 16, out);
                prev = out;
            }
            colEnd[i] = prev;
        }
        for (int i = 0; i < 8; i++) {
            line(b, "  ring[%d] = ring[%d] ^ %s", i, end + i, colEnd[i]);
        }
        int n = 0;
        for (int level = roots.length - 1; level >= 0; level--) {
            for (int d = 0; d < roots[level]; d++) {
                line(b, "  use %s as root%d (ctl: ctl, din: ring[%d..%d], dout: ring[%d..%d])", nodeName(level), n,
                        8 * n + 7, 8 * n, 8 * n + 15, 8 * n + 8);
                n++;
            }
        }
        line(b, "}");
        line(b, "");
    }

    private static String num(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(6)).stripTrailingZeros().toPlainString();
    }

    private static void line(StringBuilder b, String fmt, Object... args) {
        b.append(String.format(Locale.ROOT, fmt, args)).append('\n');
    }
}
