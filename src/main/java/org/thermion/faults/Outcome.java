package org.thermion.faults;

/** What became of a fault under a test plan. */
public enum Outcome {
    /** Some step of the plan shows it at a lamp. */
    DETECTED("detected"),
    /** Proven: no sequence of steps detects it, although it can be provoked (the logic it sits in is redundant). */
    REDUNDANT("undetectable: redundant logic"),
    /** Proven: no path leads from it to any lamp. */
    NOT_OBSERVABLE("undetectable: not observable at any lamp"),
    /** Proven: no sequence of switch settings drives its wire to the other value. */
    NOT_CONTROLLABLE("undetectable: not controllable from the switches"),
    /** The effort budget ran out before it was detected or proven undetectable. */
    ABORTED("aborted: effort budget ran out");

    public final String words;

    Outcome(String words) {
        this.words = words;
    }

    public boolean proven() {
        return this == REDUNDANT || this == NOT_OBSERVABLE || this == NOT_CONTROLLABLE;
    }
}
