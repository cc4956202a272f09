package org.thermion.power.startup;

/** One distinct heater string of a run: its heaters in order and, at the point last solved, its conductance. */
final class StringState {
    final int rail;
    final int count;
    final double dropOhms;
    final HeaterState[] heaters;
    /** Amperes per volt across the string at the point last solved. */
    double siemens;

    StringState(int rail, int count, double dropOhms, HeaterState[] heaters) {
        this.rail = rail;
        this.count = count;
        this.dropOhms = dropOhms;
        this.heaters = heaters;
    }

    /** Sums the string's resistance from its heaters' present values. */
    void resist() {
        double r = dropOhms;
        for (HeaterState h : heaters) {
            r += h.elementOhms;
        }
        siemens = 1 / r;
    }

    /** Passes the string current on to its heaters for bus voltage {@code volts}. */
    void carry(double volts) {
        double amps = volts * siemens;
        for (HeaterState h : heaters) {
            h.carry(amps);
        }
    }
}
