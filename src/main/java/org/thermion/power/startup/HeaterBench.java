package org.thermion.power.startup;

import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.nonstiff.DormandPrince54Integrator;

/**
 * One heater (wire and cathode sleeve) on a bench supply: its equilibrium and its warm-up, integrated with an adaptive
 * Dormand-Prince integrator and located with event detection. Used to calibrate heat capacity
 * and by tests as an independent check of the thermal model.
 */
public final class HeaterBench {
    private static final double HOTTEST = 4000;

    private HeaterBench() {
    }

    /** A fresh solver per use: Hipparchus solvers count their evaluations, so they are not shared. */
    private static BracketingNthOrderBrentSolver brent() {
        return new BracketingNthOrderBrentSolver(1e-12, 1e-9, 1e-12, 5);
    }

    /**
     * Result of a run: end time, wire and cathode temperature, electrical energy in and energy
     * radiated (joules), and whether the target was reached.
     */
    public record Run(double seconds, double kelvin, double cathodeKelvin, double joulesIn, double joulesRadiated,
                      boolean reached) {
    }

    /** Equilibrium temperature under {@code drive} (electrical power in = radiated). */
    public static double equilibrium(HeaterModel h, HeaterDrive drive) {
        return brent().solve(10_000, t -> {
            double i = drive.amps(h.resistance(t));
            return i * i * h.resistance(t) - h.radiated(t);
        }, h.ambientKelvin(), HOTTEST);
    }

    /** Heater temperature at which the warm-up test's heater voltage reaches 80 % of rated. */
    public static double eightyPercentKelvin(HeaterModel h) {
        HeaterDrive d = HeaterDrive.warmupTest(h.rating());
        double target = 0.8 * h.rating().volts();
        return brent().solve(10_000, t -> d.amps(h.resistance(t)) * h.resistance(t) - target, h.ambientKelvin(), HOTTEST);
    }

    /** The standard warm-up time: seconds until the heater voltage reaches 80 % of rated in the test circuit. */
    public static double warmupTime(HeaterModel h) {
        Run r = runUntil(h, HeaterDrive.warmupTest(h.rating()), eightyPercentKelvin(h), 1e4);
        return r.reached() ? r.seconds() : Double.NaN;
    }

    /** Seconds until the temperature rise reaches {@code fraction} of its final value under {@code drive}. */
    public static double timeToFractionOfRise(HeaterModel h, HeaterDrive drive, double fraction) {
        double tf = equilibrium(h, drive);
        double target = h.ambientKelvin() + fraction * (tf - h.ambientKelvin());
        Run r = runUntil(h, drive, target, 1e4);
        return r.reached() ? r.seconds() : Double.NaN;
    }

    /** Runs from ambient for {@code seconds}. */
    public static Run run(HeaterModel h, HeaterDrive drive, double seconds) {
        return runUntil(h, drive, Double.POSITIVE_INFINITY, seconds);
    }

    /** Runs from ambient until the wire temperature reaches {@code targetKelvin} or {@code maxSeconds} pass. */
    public static Run runUntil(HeaterModel h, HeaterDrive drive, double targetKelvin, double maxSeconds) {
        return runUntil(h, drive, 0, targetKelvin, maxSeconds);
    }

    /** Seconds until the cathode reaches {@code kelvin} under {@code drive} (NaN: not within 1000 s). */
    public static double cathodeTime(HeaterModel h, HeaterDrive drive, double kelvin) {
        Run r = runUntil(h, drive, 1, kelvin, 1e3);
        return r.reached() ? r.seconds() : Double.NaN;
    }

    /** Runs until state {@code body} (0 wire, 1 cathode) reaches {@code targetKelvin}. */
    private static Run runUntil(HeaterModel h, HeaterDrive drive, int body, double targetKelvin, double maxSeconds) {
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 4;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                double r = h.resistance(y[0]);
                double i = drive.amps(r);
                double pin = i * i * r;
                double across = h.toCathode(y[0], y[1]);
                double prad = h.cathodeRadiated(y[1]);
                return new double[] {(pin - across) / h.heatCapacity(), (across - prad) / h.cathodeHeatCapacity(), pin, prad};
            }
        };
        DormandPrince54Integrator dp = new DormandPrince54Integrator(1e-9, Math.max(1e-3, maxSeconds / 50),
                new double[] {1e-6, 1e-6, 1e-9, 1e-9}, new double[] {1e-9, 1e-9, 1e-9, 1e-9});
        dp.setMaxEvaluations(2_000_000);
        Threshold hit = null;
        if (Double.isFinite(targetKelvin)) {
            hit = new Threshold(s -> s.getPrimaryState()[body] - targetKelvin, Action.STOP, true);
            dp.addEventDetector(hit);
        }
        double amb = h.ambientKelvin();
        ODEStateAndDerivative end = dp.integrate(ode, new ODEState(0, new double[] {amb, amb, 0, 0}), maxSeconds);
        double[] y = end.getPrimaryState();
        return new Run(end.getTime(), y[0], y[1], y[2], y[3], hit != null && !Double.isNaN(hit.firstTime()));
    }
}
