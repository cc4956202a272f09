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
    /** Index of the resistor's lagged power, watts: the continuous rating the run asks of it ({@link ResistorRating}). */
    final int heat;
    /** The resistor's thermal time constant, seconds. */
    final double tau;
    /** The thyratron's heater, when a thyratron triggers the bypass. */
    final HeaterState thyratron;
    /** The loads behind a partial soft start's resistor (null: it is in series with the whole rail); set once, when built. */
    LoadNode node;

    boolean bypassed;
    boolean fired;
    double fireTime = Double.NaN;
    /** When the relay will close (NaN: not yet known). */
    double bypassAt = Double.NaN;
    double bypassTime = Double.NaN;

    /** Resistor dissipation at the point last solved, watts. */
    double watts;
    double peakWatts;

    // The relay coil of a thyratron trigger: at the point last solved, then what the run saw.
    double coilVolts;
    double plateVolts;
    double busVolts;
    double atFireVolts = Double.NaN;
    double maxCoil;
    double maxCoilTime = Double.NaN;
    double busAtMax;
    double plateAtMax;
    double firstClose = Double.NaN;
    int openings;
    double firstOpening = Double.NaN;

    SoftStartState(StartupNetwork.Soft soft, double ohms, int joules, int heat, double tau, HeaterState thyratron) {
        this.soft = soft;
        this.ohms = ohms;
        this.joules = joules;
        this.heat = heat;
        this.tau = tau;
        this.thyratron = thyratron;
    }

    /** A resistor is in the rail and in circuit. */
    boolean inCircuit() {
        return !bypassed && ohms > 0;
    }

    /** Records the firing at {@code t}; the relay closes once its coil reaches pick-up ({@link #pickUp}). */
    void fire(double t) {
        fired = true;
        fireTime = t;
    }

    /** The coil voltage over pick-up (positive: picks up), continuous while the circuit's topology holds. */
    double overPickup() {
        return coilVolts - soft.check().relay().pickupVolts();
    }

    /** The coil voltage over drop-out (negative: the closed contacts open). */
    double overDropout() {
        return coilVolts - soft.check().relay().dropoutVolts();
    }

    /** The coil reached pick-up at {@code t}: the contacts close one operate time later. */
    void pickUp(double t) {
        if (Double.isNaN(bypassAt)) {
            bypassAt = t + soft.operate();
        }
    }

    void close(double t) {
        bypassed = true;
        bypassTime = t;
        if (Double.isNaN(firstClose)) {
            firstClose = t;
        }
    }

    /** The coil fell below drop-out at {@code t}: the contacts open and the resistor is back in circuit. */
    void drop(double t) {
        bypassed = false;
        bypassAt = Double.NaN;
        openings++;
        if (Double.isNaN(firstOpening)) {
            firstOpening = t;
        }
    }

    /** Records the coil's voltage at {@code t}. */
    void observeCoil(double t) {
        if (fired && Double.isNaN(atFireVolts)) {
            atFireVolts = coilVolts;
        }
        if (fired && (Double.isNaN(maxCoilTime) || coilVolts > maxCoil)) {
            maxCoil = coilVolts;
            maxCoilTime = t;
            busAtMax = busVolts;
            plateAtMax = plateVolts;
        }
    }

    /** What the coil saw (null without a thyratron trigger). */
    CoilTransient coil() {
        if (soft.check() == null) {
            return null;
        }
        return new CoilTransient(soft.check().relay().pickupVolts(), soft.check().relay().dropoutVolts(), atFireVolts,
                maxCoil, maxCoilTime, Math.abs(soft.check().railVolts()), busAtMax, soft.branchVolts(), plateAtMax,
                firstClose, openings, firstOpening);
    }

    /** Current through the resistor or the closed contacts at the point last solved, amperes. */
    double amps;
    /** Highest current through the closed contacts so far (NaN: never closed). */
    double peakClosed = Double.NaN;

    void dissipate(double amps) {
        this.amps = amps;
        watts = bypassed ? 0 : amps * amps * ohms;
    }

    /** Peak of the lagged power so far, watts. */
    double neededWatts;

    void derivatives(double[] y, double[] d) {
        d[joules] = watts;
        d[heat] = (watts - y[heat]) / tau;
    }

    void observe(double[] y) {
        if (bypassed && ohms > 0 && (Double.isNaN(peakClosed) || amps > peakClosed)) {
            peakClosed = amps;
        }
        peakWatts = Math.max(peakWatts, watts);
        neededWatts = Math.max(neededWatts, y[heat]);
    }
}
