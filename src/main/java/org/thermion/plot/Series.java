package org.thermion.plot;

/**
 * One curve: its legend name and its points. A NaN y leaves a gap (an unknown value); a
 * {@code steps} curve holds each value until the next x (logic levels, a counter's value).
 */
public record Series(String name, double[] x, double[] y, boolean steps) {
    public Series {
        if (x.length != y.length) {
            throw new IllegalArgumentException(name + ": " + x.length + " x values for " + y.length + " y values");
        }
        x = x.clone();
        y = y.clone();
    }

    /** A curve joining its points by straight lines. */
    public static Series line(String name, double[] x, double[] y) {
        return new Series(name, x, y, false);
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    int size() {
        return x.length;
    }

    double xAt(int i) {
        return x[i];
    }

    double yAt(int i) {
        return y[i];
    }
}
