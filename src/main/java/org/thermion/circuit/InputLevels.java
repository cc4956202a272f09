package org.thermion.circuit;

/** The voltages that stand for logic 0 and 1 at a stage's inputs (its drivers' levels). */
public record InputLevels(double low, double high) {
    public InputLevels {
        Checks.finite("low level", low);
        Checks.finite("high level", high);
    }

    double[] volts(boolean[] in) {
        double[] v = new double[in.length];
        for (int i = 0; i < in.length; i++) {
            v[i] = in[i] ? high : low;
        }
        return v;
    }
}
