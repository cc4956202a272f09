package org.thermion.elab;

/** Thrown to stop an expansion that would grow past the instance limit. */
final class TooLarge extends RuntimeException {
    TooLarge() {
        super(null, null, false, false);
    }
}
