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
    /**
     * Proven: no sequence of steps shows a known wrong lamp, but the fault leaves some lamp
     * unknown where the good machine's is known (it keeps the machine from leaving its unknown
     * power-up state, or a solder bridge joins two drivers that fight to a level between the
     * thresholds; a builder may see it, depending on how the flip-flops came up or where the level sits).
     */
    UNKNOWN_STATE("undetectable: lamps stay unknown"),
    /** The effort budget ran out before it was detected or proven undetectable. */
    ABORTED("aborted: effort budget ran out");

    public final String words;

    Outcome(String words) {
        this.words = words;
    }

    public boolean proven() {
        return this == REDUNDANT || this == NOT_OBSERVABLE || this == NOT_CONTROLLABLE || this == UNKNOWN_STATE;
    }
}
