package org.thermion.timing;

/**
 * The delay of one stage instance. {@code rise} is the output's rise time, {@code fall} its fall
 * time, both in seconds; {@code farads} the capacitance its output drives, {@code fanOut} the
 * stage inputs on it. {@code riseGiven}/{@code fallGiven} say the stage declared the delay itself.
 * {@code riseOhms}/{@code fallOhms} are the output resistances the delays were worked out with
 * (NaN for a declared delay), {@code basis} says where they came from ("computed" from the
 * stage's operating points, "declared" from its load and ron, "free" for a free cell), and
 * {@code corner} the tolerance corner they are at. {@code note} explains a missing value.
 */
public record StageDelay(double rise, double fall, double farads, int fanOut, boolean riseGiven,
                         boolean fallGiven, String note, double riseOhms, double fallOhms, String basis,
                         String corner) {

    /** A delay without resistances (declared or free), at nominal values. */
    public StageDelay(double rise, double fall, double farads, int fanOut, boolean riseGiven, boolean fallGiven,
                      String note) {
        this(rise, fall, farads, fanOut, riseGiven, fallGiven, note, Double.NaN, Double.NaN, "declared", "nominal");
    }

    /** The slower edge. */
    public double worst() {
        return Math.max(rise, fall);
    }

    /** True when the resistances come from the stage's operating points. */
    public boolean computed() {
        return "computed".equals(basis);
    }
}
