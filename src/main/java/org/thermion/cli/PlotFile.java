package org.thermion.cli;

import org.thermion.lang.SourceSet;
import org.thermion.lang.SourceText;
import org.thermion.plot.Figure;
import org.thermion.plot.SvgWriter;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

/** Writes a picture ({@code --svg FILE}) through {@link OutputFiles}: never over an input or a file of another kind. */
final class PlotFile {
    private PlotFile() {
    }

    /** Writes {@code f} as SVG to {@code target}; returns 0, or the exit code after printing why not. */
    static int write(Path target, Figure f, boolean replace, List<Path> inputs, SourceSet sources, PrintWriter err) {
        OutputFiles.Refusal no = OutputFiles.check(target, OutputFiles.Kind.SVG, replace, inputs, sources);
        if (no == null) {
            try {
                OutputFiles.write(target, SvgWriter.write(f), StandardCharsets.UTF_8);
            } catch (IOException e) {
                no = new OutputFiles.Refusal("cannot write " + target + ": " + SourceText.reason(target, e), null);
            }
        }
        return no == null ? 0 : no.print(err);
    }
}
