package org.thermion.power.startup;

/**
 * One distinct heater trajectory through a run (identical strings share it): its model, where
 * its states sit in the integrator's vector, what the circuit gives it at the point last solved,
 * and what the run has seen of it so far.
 */
final class HeaterState {
    final HeaterModel model;
    final int group;
    final int position;
    /** Shunt across the heater, ohms (infinite: none). */
    final double shuntOhms;
    /** Index of the wire temperature, kelvin, in the state vector. */
    final int wire;
    /** Indices of the electrical energy in and the energy radiated, joules. */
    final int joulesIn;
    final int joulesRadiated;

    // At the point last solved.
    double ohms;
    double elementOhms;
    double volts;
    double watts;

    // Seen so far.
    double peakRatio;
    double peakRatioTime;
    double warmTime = Double.NaN;

    HeaterState(HeaterModel model, int group, int position, double shuntOhms, int wire, int joulesIn,
                int joulesRadiated) {
        this.model = model;
        this.group = group;
        this.position = position;
        this.shuntOhms = shuntOhms;
        this.wire = wire;
        this.joulesIn = joulesIn;
        this.joulesRadiated = joulesRadiated;
    }

    /** Sets resistance (with its shunt) from the wire temperature in {@code y}. */
    void resist(double[] y) {
        double rh = model.resistance(y[wire]);
        ohms = rh;
        elementOhms = Double.isInfinite(shuntOhms) ? rh : rh * shuntOhms / (rh + shuntOhms);
    }

    /** Sets voltage and power from the string current. */
    void carry(double amps) {
        volts = amps * elementOhms;
        watts = volts * volts / ohms;
    }

    /** Fills this heater's derivatives. */
    void derivatives(double[] y, double[] d) {
        double rad = model.radiated(y[wire]);
        d[wire] = (watts - rad) / model.heatCapacity();
        d[joulesIn] = watts;
        d[joulesRadiated] = rad;
    }

    void observe(double t) {
        double ratio = volts / model.rating().volts();
        if (ratio > peakRatio) {
            peakRatio = ratio;
            peakRatioTime = t;
        }
    }
}
