package org.thermion.lang.program;

import java.nio.file.Path;
import java.util.List;

/** A parsed program: every line of the file, in order, including blank ones. */
public record ProgramSource(Path file, List<ProgramLine> lines) {
}
