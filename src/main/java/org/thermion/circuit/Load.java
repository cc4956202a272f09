package org.thermion.circuit;

/** What a receiving stage's input puts on the net that drives it. */
public sealed interface Load permits GridLoad, DiodeLoad {

    /** Adds the load on node {@code out}; {@code tag} keeps each load's nodes apart. */
    void attach(CircuitBuilder b, int out, String tag);
}
