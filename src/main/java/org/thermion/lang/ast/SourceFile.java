package org.thermion.lang.ast;

import java.nio.file.Path;
import java.util.List;

/** One parsed .machine file: its declarations in order. */
public record SourceFile(Path path, List<Decl> decls) {
}
