package org.thermion.timing;

/** The 10-90 % transition time of an RC node. */
public final class RcDelay {
    /** ln 9, the 10-90 % rise of a single RC node in units of RC (Millman &amp; Taub, Pulse and Digital Circuits). */
    public static final double LN9 = Math.log(9);

    private RcDelay() {
    }

    /** 10-90 % transition time in seconds of {@code ohms} charging {@code farads}: ln 9 RC, about 2.2 RC. */
    public static double tenToNinety(double ohms, double farads) {
        return LN9 * ohms * farads;
    }
}
