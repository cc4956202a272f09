package org.thermion.circuit;

/**
 * Gas thyratron: no plate current until fired; fired when the control grid rises above the
 * critical grid voltage while the anode is positive; once fired the grid loses control and the
 * tube holds a constant arc drop until the anode current is broken (textbook behaviour).
 * The critical grid is either fixed or follows the anode by the tube's control ratio (anode volts
 * over the magnitude of the critical grid volts, the figure small thyratrons' sheets give):
 * Eg,crit = −Ea / ratio, so a 48 V anode needs the grid far nearer the cathode than a 400 V one.
 *
 * @param arcDrop      anode-to-cathode volts while conducting
 * @param criticalGrid grid-to-cathode volts above which it fires, whatever the anode (NaN when the ratio gives it)
 * @param controlRatio the control ratio (NaN when the critical grid is fixed)
 * @param maxAvgAmps   rated average cathode current (NaN when unknown)
 */
public record GasThyratron(String name, double arcDrop, double criticalGrid, double controlRatio, double maxAvgAmps,
                           String source) implements TubeModel {
    /** Arc drop of a small xenon thyratron when its tube block gives none: 8 V (the 2D21's, REFERENCES.md). */
    public static final double TYPICAL_ARC_DROP = 8;

    public GasThyratron {
        Checks.positive("arcDrop", arcDrop);
        if (Double.isNaN(controlRatio)) {
            Checks.finite("criticalGrid", criticalGrid);
        } else {
            Checks.positive("controlRatio", controlRatio);
        }
    }

    /** The grid-to-cathode volts above which it fires with {@code anodeVolts} on its anode (to the cathode). */
    public double criticalGrid(double anodeVolts) {
        return Double.isNaN(controlRatio) ? criticalGrid : -Math.max(anodeVolts, 0) / controlRatio;
    }

    /** Whether the tube conducts: already fired, or its grid above the critical voltage at this anode voltage. */
    public boolean conducts(boolean fired, double vgk, double anodeVolts) {
        return fired || vgk > criticalGrid(anodeVolts);
    }
}
