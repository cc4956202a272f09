package org.thermion.sim.compiled;

import org.thermion.model.Gate;
import org.thermion.model.Netlist;

import java.util.ArrayList;
import java.util.List;

/**
 * Writes a netlist's combinational logic as Java source: one assignment per gate, in the
 * netlist's levelized order, over the value words {@code v} (bit i = lane i), so one call
 * settles all 64 lanes. The statements are split into methods small enough for the JIT
 * (HotSpot will not compile a method past 8000 bytes of bytecode) and the methods into
 * classes small enough for the class-file constant pool.
 */
public final class StraightLineSource {
    /** Estimated bytecode per method, kept well under HotSpot's 8000-byte limit. */
    static final int METHOD_BYTES = 6000;
    /** Gates per class, which bounds its constant pool (one entry per large net index). */
    static final int CLASS_GATES = 8000;

    /** One generated compilation unit. */
    public record Unit(String className, String source) {
    }

    private final String pkg;
    private final List<Unit> units = new ArrayList<>();
    private final String entryClass;
    private int methods;

    /** Writes the source for {@code netlist} in package {@code pkg}; the entry class is {@code pkg.Settle}. */
    public StraightLineSource(Netlist netlist, String pkg) {
        this.pkg = pkg;
        this.entryClass = pkg + ".Settle";
        List<Gate> gates = netlist.gates();
        List<String> calls = new ArrayList<>();
        StringBuilder cls = null;
        StringBuilder method = null;
        String clsName = null;
        int classGates = 0;
        int bytes = 0;
        for (Gate g : gates) {
            if (cls == null || classGates >= CLASS_GATES) {
                if (cls != null) {
                    endMethod(cls, method);
                    endClass(cls, clsName);
                }
                clsName = "Part" + units.size();
                cls = beginClass(clsName);
                method = null;
                classGates = 0;
            }
            int cost = cost(g);
            if (method == null || bytes + cost > METHOD_BYTES) {
                if (method != null) {
                    endMethod(cls, method);
                }
                String m = "m" + methods++;
                method = new StringBuilder();
                method.append("    static void ").append(m).append("(final long[] v) {\n");
                calls.add(clsName + "." + m);
                bytes = 0;
            }
            statement(method, g);
            bytes += cost;
            classGates++;
        }
        if (cls != null) {
            endMethod(cls, method);
            endClass(cls, clsName);
        }
        StringBuilder entry = new StringBuilder();
        entry.append("package ").append(pkg).append(";\n\n");
        entry.append("/** Settles the logic: generated, one call per part in levelized order. */\n");
        entry.append("public final class Settle implements java.util.function.Consumer<long[]> {\n");
        entry.append("    @Override\n    public void accept(final long[] v) {\n");
        for (String c : calls) {
            entry.append("        ").append(c).append("(v);\n");
        }
        entry.append("    }\n}\n");
        units.add(new Unit(entryClass, entry.toString()));
    }

    /** Every compilation unit, parts first and the entry class last. */
    public List<Unit> units() {
        return units;
    }

    /** Binary name of the class that implements {@code Consumer<long[]>}. */
    public String entryClass() {
        return entryClass;
    }

    /** Generated methods. */
    public int methods() {
        return methods;
    }

    private StringBuilder beginClass(String name) {
        StringBuilder b = new StringBuilder();
        b.append("package ").append(pkg).append(";\n\n");
        b.append("final class ").append(name).append(" {\n");
        return b;
    }

    private static void endMethod(StringBuilder cls, StringBuilder method) {
        if (method != null) {
            cls.append(method).append("    }\n");
        }
    }

    private void endClass(StringBuilder cls, String name) {
        cls.append("}\n");
        units.add(new Unit(pkg + "." + name, cls.toString()));
    }

    /**
     * Bytecode estimate of one statement: per operand aload, a 3-byte index push and laload;
     * the store the same plus lastore; an operator byte per operand; 4 bytes for a complement.
     */
    static int cost(Gate g) {
        return 6 + 6 * Math.max(1, g.inputs().length) + 4;
    }

    /** One gate as an assignment, with the same meaning as the array engine's opcodes. */
    static void statement(StringBuilder b, Gate g) {
        int[] in = g.inputs();
        b.append("        v[").append(g.output()).append("] = ");
        switch (g.fn()) {
            case BUF -> operand(b, in, 0, "0L");
            case NOT -> b.append('~').append(in.length == 0 ? "0L" : "v[" + in[0] + "]");
            case AND -> list(b, in, " & ", "-1L", false);
            case OR -> list(b, in, " | ", "0L", false);
            case NAND -> list(b, in, " & ", "-1L", true);
            case NOR -> list(b, in, " | ", "0L", true);
            case XOR -> list(b, in, " ^ ", "0L", false);
        }
        b.append(";\n");
    }

    private static void operand(StringBuilder b, int[] in, int i, String none) {
        b.append(in.length > i ? "v[" + in[i] + "]" : none);
    }

    private static void list(StringBuilder b, int[] in, String op, String empty, boolean invert) {
        if (invert) {
            b.append("~(");
        }
        if (in.length == 0) {
            b.append(empty);
        }
        for (int i = 0; i < in.length; i++) {
            if (i > 0) {
                b.append(op);
            }
            b.append("v[").append(in[i]).append(']');
        }
        if (invert) {
            b.append(')');
        }
    }

    /** Total length of the source, in characters. */
    public long length() {
        long n = 0;
        for (Unit u : units) {
            n += u.source().length();
        }
        return n;
    }
}
