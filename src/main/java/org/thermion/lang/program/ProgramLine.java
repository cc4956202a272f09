package org.thermion.lang.program;

import org.thermion.lang.ast.Ident;

/**
 * One source line: its 1-based number and text, the label it defines (or null) and its
 * statement (or null for blank, comment-only, label-only and unreadable lines).
 */
public record ProgramLine(int number, String text, Ident label, Statement statement) {
}
