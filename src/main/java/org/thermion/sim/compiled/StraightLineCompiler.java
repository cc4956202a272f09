package org.thermion.sim.compiled;

import org.objectweb.asm.ClassWriter;
import org.objectweb.asm.MethodVisitor;
import org.objectweb.asm.Opcodes;
import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.Netlist;
import org.thermion.sim.Simulator;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

/**
 * Compiles a netlist's combinational logic to JVM bytecode in-process: one assignment per gate,
 * in the netlist's levelized order, over the value words {@code v} (bit i = lane i), so one call
 * settles all 64 lanes. The bytecode is written directly (ASM), which takes milliseconds where a
 * Java compiler takes seconds, and needs no JDK.
 *
 * <p>The statements are split into static methods small enough for the JIT (HotSpot will not
 * compile a method past 8000 bytes of bytecode), the methods into classes small enough for the
 * class-file constant pool (a net index past 32767 is a pool entry), and the calls into groups
 * so no caller grows past the limit either.
 */
public final class StraightLineCompiler {
    /** Bytecode per generated method, kept under HotSpot's 8000-byte compile limit. */
    static final int METHOD_BYTES = 6000;
    /** Gates per class, which bounds its constant pool (at most five pool entries per gate). */
    static final int CLASS_GATES = 6000;
    /** Calls per group method of the entry class (4 bytes each). */
    static final int GROUP_CALLS = 1500;

    private static final String PKG = "org/thermion/sim/compiled/gen/";
    private static final String SETTLE_DESC = "([J)V";
    private static final String SETTLE_TYPE = Simulator.Settle.class.getName().replace('.', '/');

    private StraightLineCompiler() {
    }

    /** The compiled settle of {@code netlist}: the generated object, called by the simulator with no adapter between. */
    public static Simulator.Settle compile(Netlist netlist) {
        return (Simulator.Settle) instance(netlist);
    }

    /** As {@link #compile}, seen as a {@code Consumer<long[]>} (for callers that time the raw call). */
    @SuppressWarnings("unchecked")
    public static Consumer<long[]> compileConsumer(Netlist netlist) {
        return (Consumer<long[]>) instance(netlist);
    }

    private static Object instance(Netlist netlist) {
        Generated g = generate(netlist);
        return load(g.classes(), g.entry());
    }

    private static Object load(Map<String, byte[]> classes, String entryName) {
        try {
            Class<?> entry = new Loader(StraightLineCompiler.class.getClassLoader(), classes).loadClass(entryName);
            return entry.getDeclaredConstructor().newInstance();
        } catch (ReflectiveOperationException | LinkageError e) {
            throw new IllegalStateException("cannot load the generated logic: " + e, e);
        }
    }

    /** Generated class files by binary name, and the entry class (a {@code Consumer<long[]>}). */
    record Generated(Map<String, byte[]> classes, String entry, int methods) {
    }

    /** Writes the class files for {@code netlist}. */
    static Generated generate(Netlist netlist) {
        Map<String, byte[]> classes = new HashMap<>();
        List<String[]> calls = new ArrayList<>();
        List<Gate> gates = netlist.gates();
        int at = 0;
        while (at < gates.size()) {
            String owner = PKG + "Part" + classes.size();
            ClassWriter cw = partClass(owner);
            int classEnd = Math.min(gates.size(), at + CLASS_GATES);
            while (at < classEnd) {
                String name = "m" + calls.size();
                MethodVisitor mv = cw.visitMethod(Opcodes.ACC_STATIC, name, SETTLE_DESC, null, null);
                mv.visitCode();
                int bytes = 0;
                while (at < classEnd && (bytes == 0 || bytes + cost(gates.get(at)) <= METHOD_BYTES)) {
                    bytes += statement(mv, gates.get(at));
                    at++;
                }
                mv.visitInsn(Opcodes.RETURN);
                mv.visitMaxs(0, 0);
                mv.visitEnd();
                calls.add(new String[]{owner, name});
            }
            cw.visitEnd();
            classes.put(owner.replace('/', '.'), cw.toByteArray());
        }
        String entry = PKG + "Settle";
        classes.put(entry.replace('/', '.'), entryClass(entry, calls));
        return new Generated(classes, entry.replace('/', '.'), calls.size());
    }

    /** The entry class, a {@code Settle} and a {@code Consumer<long[]>}: {@code settle} calls each group method, each group its parts in order. */
    private static byte[] entryClass(String entry, List<String[]> calls) {
        ClassWriter cw = new ClassWriter(ClassWriter.COMPUTE_MAXS);
        cw.visit(Opcodes.V17, Opcodes.ACC_PUBLIC | Opcodes.ACC_FINAL | Opcodes.ACC_SUPER, entry,
                "Ljava/lang/Object;Ljava/util/function/Consumer<[J>;", "java/lang/Object",
                new String[]{"java/util/function/Consumer", SETTLE_TYPE});
        constructor(cw);
        int groups = (calls.size() + GROUP_CALLS - 1) / GROUP_CALLS;
        for (int g = 0; g < groups; g++) {
            MethodVisitor mv = cw.visitMethod(Opcodes.ACC_STATIC, "g" + g, SETTLE_DESC, null, null);
            mv.visitCode();
            for (int i = g * GROUP_CALLS, e = Math.min(calls.size(), i + GROUP_CALLS); i < e; i++) {
                mv.visitVarInsn(Opcodes.ALOAD, 0);
                mv.visitMethodInsn(Opcodes.INVOKESTATIC, calls.get(i)[0], calls.get(i)[1], SETTLE_DESC, false);
            }
            mv.visitInsn(Opcodes.RETURN);
            mv.visitMaxs(0, 0);
            mv.visitEnd();
        }
        MethodVisitor settle = cw.visitMethod(Opcodes.ACC_PUBLIC, "settle", SETTLE_DESC, null, null);
        settle.visitCode();
        for (int g = 0; g < groups; g++) {
            settle.visitVarInsn(Opcodes.ALOAD, 1);
            settle.visitMethodInsn(Opcodes.INVOKESTATIC, entry, "g" + g, SETTLE_DESC, false);
        }
        settle.visitInsn(Opcodes.RETURN);
        settle.visitMaxs(0, 0);
        settle.visitEnd();
        MethodVisitor acc = cw.visitMethod(Opcodes.ACC_PUBLIC, "accept", "(Ljava/lang/Object;)V", null, null);
        acc.visitCode();
        acc.visitVarInsn(Opcodes.ALOAD, 0);
        acc.visitVarInsn(Opcodes.ALOAD, 1);
        acc.visitTypeInsn(Opcodes.CHECKCAST, "[J");
        acc.visitMethodInsn(Opcodes.INVOKEVIRTUAL, entry, "settle", SETTLE_DESC, false);
        acc.visitInsn(Opcodes.RETURN);
        acc.visitMaxs(0, 0);
        acc.visitEnd();
        cw.visitEnd();
        return cw.toByteArray();
    }

    /** Latches per generated load method (at most 55 bytes each). */
    static final int METHOD_LATCHES = 100;
    /** Latches per generated load class (at most three pool entries each). */
    static final int CLASS_LATCHES = 6000;
    private static final String LOAD_DESC = "([J)J";
    private static final String LOAD_TYPE = Simulator.LatchLoad.class.getName().replace('.', '/');

    /**
     * Two-valued latch loads per clock phase (index p loads phase p + 1) as straight-line bytecode:
     * each latch {@code q = en ? d : q}, committed at once, the changed lanes ORed together. Right
     * only where no latch of the phase reads another's output, which the simulator checks.
     */
    public static Simulator.LatchLoad[] latchLoads(Machine machine) {
        int phases = Math.max(1, machine.clock().phases());
        Simulator.LatchLoad[] loads = new Simulator.LatchLoad[phases];
        for (int p = 0; p < phases; p++) {
            List<Latch> ls = new ArrayList<>();
            for (Latch l : machine.netlist().latches()) {
                if (l.phase() == p + 1) {
                    ls.add(l);
                }
            }
            loads[p] = (Simulator.LatchLoad) load(loadClasses(ls, "Load"), PKG.replace('/', '.') + "Load");
        }
        return loads;
    }

    private static Map<String, byte[]> loadClasses(List<Latch> latches, String name) {
        Map<String, byte[]> classes = new HashMap<>();
        List<String[]> calls = new ArrayList<>();
        int at = 0;
        while (at < latches.size()) {
            String owner = PKG + name + "Part" + classes.size();
            ClassWriter cw = partClass(owner);
            int classEnd = Math.min(latches.size(), at + CLASS_LATCHES);
            while (at < classEnd) {
                String m = "l" + calls.size();
                MethodVisitor mv = cw.visitMethod(Opcodes.ACC_STATIC, m, LOAD_DESC, null, null);
                mv.visitCode();
                mv.visitInsn(Opcodes.LCONST_0);
                mv.visitVarInsn(Opcodes.LSTORE, 1);
                for (int end = Math.min(classEnd, at + METHOD_LATCHES); at < end; at++) {
                    latch(mv, latches.get(at));
                }
                mv.visitVarInsn(Opcodes.LLOAD, 1);
                mv.visitInsn(Opcodes.LRETURN);
                mv.visitMaxs(0, 0);
                mv.visitEnd();
                calls.add(new String[]{owner, m});
            }
            cw.visitEnd();
            classes.put(owner.replace('/', '.'), cw.toByteArray());
        }
        String entry = PKG + name;
        ClassWriter cw = new ClassWriter(ClassWriter.COMPUTE_MAXS);
        cw.visit(Opcodes.V17, Opcodes.ACC_PUBLIC | Opcodes.ACC_FINAL | Opcodes.ACC_SUPER, entry, null,
                "java/lang/Object", new String[]{LOAD_TYPE});
        constructor(cw);
        MethodVisitor mv = cw.visitMethod(Opcodes.ACC_PUBLIC, "load", LOAD_DESC, null, null);
        mv.visitCode();
        mv.visitInsn(Opcodes.LCONST_0);
        for (String[] c : calls) {
            mv.visitVarInsn(Opcodes.ALOAD, 1);
            mv.visitMethodInsn(Opcodes.INVOKESTATIC, c[0], c[1], LOAD_DESC, false);
            mv.visitInsn(Opcodes.LOR);
        }
        mv.visitInsn(Opcodes.LRETURN);
        mv.visitMaxs(0, 0);
        mv.visitEnd();
        cw.visitEnd();
        classes.put(entry.replace('/', '.'), cw.toByteArray());
        return classes;
    }

    // Locals: 0 v, 1 changed, 3 old, 5 enable, 7 new value.
    private static void latch(MethodVisitor mv, Latch l) {
        load(mv, l.output());
        mv.visitVarInsn(Opcodes.LSTORE, 3);
        if (l.enable() < 0) {
            load(mv, l.data());
        } else {
            load(mv, l.enable());
            mv.visitVarInsn(Opcodes.LSTORE, 5);
            load(mv, l.data());
            mv.visitVarInsn(Opcodes.LLOAD, 5);
            mv.visitInsn(Opcodes.LAND);
            mv.visitVarInsn(Opcodes.LLOAD, 3);
            mv.visitVarInsn(Opcodes.LLOAD, 5);
            complement(mv);
            mv.visitInsn(Opcodes.LAND);
            mv.visitInsn(Opcodes.LOR);
        }
        mv.visitVarInsn(Opcodes.LSTORE, 7);
        mv.visitVarInsn(Opcodes.LLOAD, 1);
        mv.visitVarInsn(Opcodes.LLOAD, 3);
        mv.visitVarInsn(Opcodes.LLOAD, 7);
        mv.visitInsn(Opcodes.LXOR);
        mv.visitInsn(Opcodes.LOR);
        mv.visitVarInsn(Opcodes.LSTORE, 1);
        address(mv, l.output());
        mv.visitVarInsn(Opcodes.LLOAD, 7);
        mv.visitInsn(Opcodes.LASTORE);
    }

    // A package-private class of static methods only.
    private static ClassWriter partClass(String owner) {
        ClassWriter cw = new ClassWriter(ClassWriter.COMPUTE_MAXS);
        cw.visit(Opcodes.V17, Opcodes.ACC_FINAL | Opcodes.ACC_SUPER, owner, null, "java/lang/Object", null);
        return cw;
    }

    private static void constructor(ClassWriter cw) {
        MethodVisitor init = cw.visitMethod(Opcodes.ACC_PUBLIC, "<init>", "()V", null, null);
        init.visitCode();
        init.visitVarInsn(Opcodes.ALOAD, 0);
        init.visitMethodInsn(Opcodes.INVOKESPECIAL, "java/lang/Object", "<init>", "()V", false);
        init.visitInsn(Opcodes.RETURN);
        init.visitMaxs(0, 0);
        init.visitEnd();
    }

    /** Upper bound of one statement's bytecode: 5 bytes a load or store address, an operator per operand, 4 for a complement. */
    static int cost(Gate g) {
        return 5 + 6 * Math.max(1, g.arity()) + 1 + 4;
    }

    /**
     * Emits {@code v[out] = f(v[in]...)} with the same meaning as the array engine's opcodes;
     * returns the bytes written.
     */
    static int statement(MethodVisitor mv, Gate g) {
        int[] in = g.inputs();
        int bytes = address(mv, g.output());
        switch (g.fn()) {
            case BUF -> bytes += in.length == 0 ? constant(mv, 0L) : load(mv, in[0]);
            case NOT -> bytes += in.length == 0 ? constant(mv, -1L) : load(mv, in[0]) + complement(mv);
            case AND -> bytes += fold(mv, in, Opcodes.LAND, -1L, false);
            case OR -> bytes += fold(mv, in, Opcodes.LOR, 0L, false);
            case NAND -> bytes += fold(mv, in, Opcodes.LAND, -1L, true);
            case NOR -> bytes += fold(mv, in, Opcodes.LOR, 0L, true);
            case XOR -> bytes += fold(mv, in, Opcodes.LXOR, 0L, false);
        }
        mv.visitInsn(Opcodes.LASTORE);
        return bytes + 1;
    }

    private static int fold(MethodVisitor mv, int[] in, int op, long empty, boolean invert) {
        if (in.length == 0) {
            return constant(mv, invert ? ~empty : empty);
        }
        int bytes = load(mv, in[0]);
        for (int i = 1; i < in.length; i++) {
            bytes += load(mv, in[i]);
            mv.visitInsn(op);
            bytes++;
        }
        return invert ? bytes + complement(mv) : bytes;
    }

    private static int complement(MethodVisitor mv) {
        mv.visitLdcInsn(-1L);
        mv.visitInsn(Opcodes.LXOR);
        return 4;
    }

    private static int constant(MethodVisitor mv, long c) {
        if (c == 0L) {
            mv.visitInsn(Opcodes.LCONST_0);
            return 1;
        }
        mv.visitLdcInsn(c);
        return 3;
    }

    private static int load(MethodVisitor mv, int net) {
        int bytes = address(mv, net);
        mv.visitInsn(Opcodes.LALOAD);
        return bytes + 1;
    }

    /** Pushes {@code v} and an index. */
    private static int address(MethodVisitor mv, int index) {
        mv.visitVarInsn(Opcodes.ALOAD, 0);
        if (index <= 5) {
            mv.visitInsn(Opcodes.ICONST_0 + index);
            return 2;
        }
        if (index <= Byte.MAX_VALUE) {
            mv.visitIntInsn(Opcodes.BIPUSH, index);
            return 3;
        }
        if (index <= Short.MAX_VALUE) {
            mv.visitIntInsn(Opcodes.SIPUSH, index);
            return 4;
        }
        mv.visitLdcInsn(index);
        return 4;
    }

    /** Defines the generated classes; everything else comes from the parent. */
    private static final class Loader extends ClassLoader {
        private final Map<String, byte[]> classes;

        Loader(ClassLoader parent, Map<String, byte[]> classes) {
            super(parent);
            this.classes = classes;
        }

        @Override
        protected Class<?> findClass(String name) throws ClassNotFoundException {
            byte[] b = classes.get(name);
            if (b == null) {
                throw new ClassNotFoundException(name);
            }
            return defineClass(name, b, 0, b.length);
        }
    }
}
