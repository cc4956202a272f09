package org.thermion.elab;

/** Thrown when the elaborating thread is interrupted; {@link Elaborator} reports it and returns null. */
final class ElaborationInterrupted extends RuntimeException {
    ElaborationInterrupted() {
        super(null, null, false, false);
    }
}
