package org.thermion.cli;

import org.thermion.tui.Reloader;
import org.thermion.tui.Session;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Reads the UI's machine, program and stimulus the way {@code ui} first read them, for the
 * first session and for every reload after a save; errors come back as the printed lines.
 */
final class UiReload implements Reloader {
    private final Path machine;
    private final Path program;
    private final Path inputs;
    private final String init;
    private final String decodeName;
    private Set<Path> files = Set.of();

    UiReload(Path machine, Path program, Path inputs, String init, String decodeName) {
        this.machine = machine;
        this.program = program;
        this.inputs = inputs;
        this.init = init;
        this.decodeName = decodeName;
    }

    /** The first session, its errors printed to {@code err}; null on bad input. */
    Session first(PrintWriter err) {
        MachineLoader loader = new MachineLoader();
        Session s = UiCommand.open(machine, program, inputs, init, decodeName, err, loader);
        files = filesRead(loader);
        return s;
    }

    @Override
    public Set<Path> files() {
        return files;
    }

    @Override
    public Result load() {
        StringWriter text = new StringWriter();
        PrintWriter err = new PrintWriter(text);
        MachineLoader loader = new MachineLoader();
        Session s;
        try {
            s = UiCommand.open(machine, program, inputs, init, decodeName, err, loader);
        } catch (RuntimeException e) {
            // A reload must never take the screen down: an internal fault is shown like an error.
            err.println("internal error while reading the files again: " + e);
            s = null;
        }
        err.flush();
        files = filesRead(loader);
        if (s == null) {
            List<String> lines = text.toString().lines().toList();
            return new Failed(lines.isEmpty() ? List.of("the files could not be read") : lines, files);
        }
        return new Loaded(s, files);
    }

    // Every file the loader read (includes too), and the named ones even when reading stopped early.
    private Set<Path> filesRead(MachineLoader loader) {
        Set<Path> f = new LinkedHashSet<>();
        f.add(machine);
        if (program != null) {
            f.add(program);
        }
        if (inputs != null) {
            f.add(inputs);
        }
        f.addAll(loader.sources().files());
        return f;
    }
}
