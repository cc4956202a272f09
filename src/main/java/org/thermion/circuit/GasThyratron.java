package org.thermion.circuit;

/**
 * Gas thyratron: no plate current until fired; fired when the control grid rises above the
 * critical grid voltage while the anode is positive; once fired the grid loses control and the
 * tube holds a constant arc drop until the anode current is broken (textbook behaviour).
 *
 * @param arcDrop      anode-to-cathode volts while conducting
 * @param criticalGrid grid-to-cathode volts above which it fires
 * @param maxAvgAmps   rated average cathode current (NaN when unknown)
 */
public record GasThyratron(String name, double arcDrop, double criticalGrid, double maxAvgAmps, String source)
        implements TubeModel {
    /** Arc drop of a small xenon thyratron when its tube block gives none: 8 V (the 2D21's, REFERENCES.md). */
    public static final double TYPICAL_ARC_DROP = 8;

    public GasThyratron {
        Checks.positive("arcDrop", arcDrop);
        Checks.finite("criticalGrid", criticalGrid);
    }

    /** Whether the tube conducts: already fired, or its grid is above the critical voltage. */
    public boolean conducts(boolean fired, double vgk) {
        return fired || vgk > criticalGrid;
    }
}
