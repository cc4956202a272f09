package org.thermion.power.startup;

/**
 * One soft-start network through a run: its resistor, its relay (open, or closed since when), the
 * thyratron that triggers it (fired or not), and what its resistor has dissipated.
 */
final class SoftStartState {
    final StartupNetwork.Soft soft;
    final double ohms;
    /** Index of the resistor's energy, joules, in the state vector. */
    final int joules;
    /** The thyratron's heater, when a thyratron triggers the bypass. */
    final HeaterState thyratron;

    boolean bypassed;
    boolean fired;
    double fireTime = Double.NaN;
    /** When the relay will close (NaN: not yet known). */
    double bypassAt = Double.NaN;
    double bypassTime = Double.NaN;

    /** Resistor dissipation at the point last solved, watts. */
    double watts;
    double peakWatts;

    SoftStartState(StartupNetwork.Soft soft, double ohms, int joules, HeaterState thyratron) {
        this.soft = soft;
        this.ohms = ohms;
        this.joules = joules;
        this.thyratron = thyratron;
    }

    /** A resistor is in the rail and in circuit. */
    boolean inCircuit() {
        return !bypassed && ohms > 0;
    }

    /** Records the firing at {@code t} and schedules the relay (if its coil picks up and bypasses may close). */
    void fire(double t, boolean holdBypass) {
        fired = true;
        fireTime = t;
        if (soft.picksUp() && !holdBypass) {
            bypassAt = t + soft.operate();
        }
    }

    void close(double t) {
        bypassed = true;
        bypassTime = t;
    }

    void dissipate(double railAmps) {
        watts = bypassed ? 0 : railAmps * railAmps * ohms;
    }

    void observe() {
        peakWatts = Math.max(peakWatts, watts);
    }
}
