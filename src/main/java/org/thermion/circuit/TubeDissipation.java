package org.thermion.circuit;

/**
 * What one tube part dissipates at an operating point, per section, beside its ratings
 * (NaN when the rating is unknown), and its grid current (all sections).
 */
public record TubeDissipation(String label, String tube, int sections, double plateWatts, double screenWatts,
                              double plateRating, double screenRating, double gridAmps) {

    /** True when a known rating is exceeded. */
    public boolean overRating() {
        return plateWatts > plateRating || screenWatts > screenRating;
    }
}
