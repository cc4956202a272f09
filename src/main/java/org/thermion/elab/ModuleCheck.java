package org.thermion.elab;

/**
 * One module of a description that has no machine block (a file meant for {@code include}),
 * expanded on its own: its stage instances, latches and nets.
 */
public record ModuleCheck(String name, int stages, int latches, int nets) {
}
