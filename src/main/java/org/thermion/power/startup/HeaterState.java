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
    /** Index of the cathode sleeve's temperature, kelvin. */
    final int cathode;
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
    /** When the cathode crossed its emission threshold. */
    double emitTime = Double.NaN;

    HeaterState(HeaterModel model, int group, int position, double shuntOhms, int wire, int cathode, int joulesIn,
                int joulesRadiated) {
        this.model = model;
        this.group = group;
        this.position = position;
        this.shuntOhms = shuntOhms;
        this.wire = wire;
        this.cathode = cathode;
        this.joulesIn = joulesIn;
        this.joulesRadiated = joulesRadiated;
    }

    /** Sets resistance (with its shunt) from the wire temperature in {@code y}. */
    void resist(double[] y) {
        double k = y[wire];
        if (!(k > 0 && k < 1e5)) {
            throw new TransientFailure("heater of " + model.tube() + " (" + StartupNetwork.fmt(model.rating().volts())
                    + " V " + StartupNetwork.fmt(model.rating().amps()) + " A): its temperature left the model's range ("
                    + StartupNetwork.fmt(k) + " K): check the voltage of its rail and its dropping resistor");
        }
        double rh = model.resistance(k);
        ohms = rh;
        elementOhms = Double.isInfinite(shuntOhms) ? rh : rh * shuntOhms / (rh + shuntOhms);
    }

    /** Sets voltage and power from the string current. */
    void carry(double amps) {
        volts = amps * elementOhms;
        watts = volts * volts / ohms;
    }

    /** Fills this heater's derivatives: the wire heats the sleeve, the sleeve radiates. */
    void derivatives(double[] y, double[] d) {
        double across = model.toCathode(y[wire], y[cathode]);
        double rad = model.cathodeRadiated(y[cathode]);
        d[wire] = (watts - across) / model.heatCapacity();
        d[cathode] = (across - rad) / model.cathodeHeatCapacity();
        d[joulesIn] = watts;
        d[joulesRadiated] = rad;
    }

    /** Emission fraction of the cathode in {@code y} (0..1). */
    double emission(double[] y, Emission e) {
        return e.factor(model.cathodeFraction(y[cathode]));
    }

    /** Heat stored in wire and sleeve above ambient, joules. */
    double joulesStored(double[] y) {
        double a = model.ambientKelvin();
        return model.heatCapacity() * (y[wire] - a) + model.cathodeHeatCapacity() * (y[cathode] - a);
    }

    void observe(double t) {
        double ratio = volts / model.rating().volts();
        if (ratio > peakRatio) {
            peakRatio = ratio;
            peakRatioTime = t;
        }
    }
}
