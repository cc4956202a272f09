package org.thermion.sim.compiled;

import org.thermion.model.Netlist;
import org.thermion.sim.Simulator;

import javax.tools.Diagnostic;
import javax.tools.DiagnosticCollector;
import javax.tools.FileObject;
import javax.tools.ForwardingJavaFileManager;
import javax.tools.JavaCompiler;
import javax.tools.JavaFileManager;
import javax.tools.JavaFileObject;
import javax.tools.SimpleJavaFileObject;
import javax.tools.StandardJavaFileManager;
import javax.tools.ToolProvider;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;

/**
 * Compiles a netlist's logic to JVM bytecode in-process: {@link StraightLineSource} writes
 * it as Java, the JDK's compiler ({@code javax.tools}) turns that into classes held in
 * memory, and a private class loader defines them. Needs a JDK; on a bare runtime
 * {@link #available()} is false and callers fall back on the array engine.
 */
public final class StraightLineCompiler {
    private StraightLineCompiler() {
    }

    /** True when this runtime has a Java compiler. */
    public static boolean available() {
        return ToolProvider.getSystemJavaCompiler() != null;
    }

    /** Why the compiled engine cannot run here, or null when it can. */
    public static String unavailableReason() {
        return available() ? null : "this Java runtime has no compiler (javax.tools); run on a JDK for the compiled engine";
    }

    /** The compiled settle of {@code netlist}; IllegalStateException without a compiler or on a compile failure. */
    public static Simulator.Settle compile(Netlist netlist) {
        Consumer<long[]> c = compileConsumer(netlist);
        return c::accept;
    }

    /** As {@link #compile}, the generated object itself (for callers that time the raw call). */
    @SuppressWarnings("unchecked")
    public static Consumer<long[]> compileConsumer(Netlist netlist) {
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        if (javac == null) {
            throw new IllegalStateException(unavailableReason());
        }
        StraightLineSource src = new StraightLineSource(netlist, "org.thermion.sim.compiled.gen");
        List<JavaFileObject> units = new ArrayList<>();
        for (StraightLineSource.Unit u : src.units()) {
            units.add(new SourceUnit(u.className(), u.source()));
        }
        DiagnosticCollector<JavaFileObject> diags = new DiagnosticCollector<>();
        StandardJavaFileManager std = javac.getStandardFileManager(diags, Locale.ROOT, StandardCharsets.UTF_8);
        Map<String, byte[]> classes = new HashMap<>();
        try (MemoryFiles files = new MemoryFiles(std, classes)) {
            List<String> options = List.of("-g:none", "-proc:none", "-nowarn", "--release", "17");
            Boolean ok = javac.getTask(null, files, diags, options, null, units).call();
            if (!Boolean.TRUE.equals(ok)) {
                StringBuilder why = new StringBuilder("the generated logic did not compile");
                for (Diagnostic<? extends JavaFileObject> d : diags.getDiagnostics()) {
                    if (d.getKind() == Diagnostic.Kind.ERROR) {
                        why.append("; ").append(d.getMessage(Locale.ROOT));
                        break;
                    }
                }
                throw new IllegalStateException(why.toString());
            }
        } catch (IOException e) {
            throw new IllegalStateException("compiler file manager: " + e.getMessage(), e);
        }
        try {
            Class<?> entry = new Loader(StraightLineCompiler.class.getClassLoader(), classes).loadClass(src.entryClass());
            return (Consumer<long[]>) entry.getDeclaredConstructor().newInstance();
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot load the generated logic: " + e, e);
        }
    }

    /** A source unit held in memory. */
    private static final class SourceUnit extends SimpleJavaFileObject {
        private final String text;

        SourceUnit(String className, String text) {
            super(URI.create("string:///" + className.replace('.', '/') + Kind.SOURCE.extension), Kind.SOURCE);
            this.text = text;
        }

        @Override
        public CharSequence getCharContent(boolean ignoreEncodingErrors) {
            return text;
        }
    }

    /** A class file written to memory. */
    private static final class ClassUnit extends SimpleJavaFileObject {
        private final String name;
        private final Map<String, byte[]> sink;

        ClassUnit(String name, Map<String, byte[]> sink) {
            super(URI.create("mem:///" + name.replace('.', '/') + Kind.CLASS.extension), Kind.CLASS);
            this.name = name;
            this.sink = sink;
        }

        @Override
        public OutputStream openOutputStream() {
            return new ByteArrayOutputStream() {
                @Override
                public void close() throws IOException {
                    super.close();
                    sink.put(name, toByteArray());
                }
            };
        }
    }

    /** Sends class output to memory; reads everything else through the standard manager. */
    private static final class MemoryFiles extends ForwardingJavaFileManager<JavaFileManager> {
        private final Map<String, byte[]> sink;

        MemoryFiles(JavaFileManager std, Map<String, byte[]> sink) {
            super(std);
            this.sink = sink;
        }

        @Override
        public JavaFileObject getJavaFileForOutput(Location location, String className, JavaFileObject.Kind kind,
                                                   FileObject sibling) {
            return new ClassUnit(className, sink);
        }
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
