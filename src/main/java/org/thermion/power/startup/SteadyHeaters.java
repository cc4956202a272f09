package org.thermion.power.startup;

import org.thermion.model.HeaterRating;
import org.thermion.model.Machine;
import org.thermion.model.TubeType;
import org.thermion.power.HeaterLaw;

import java.util.HashMap;
import java.util.Map;

/**
 * The power-up model's heaters in their steady state, as a {@link HeaterLaw} for the budget: a
 * heater carrying a current settles where the power it takes equals what it loses
 * ({@code I^2 R(T) = k (T^4 - Ta^4)}, {@link HeaterModel#radiated}), and its resistance is the wire's
 * at that temperature. Rated current gives the rated temperature and so the rated resistance;
 * below it the wire is cooler and its resistance lower. The budget's heater figures and the
 * power-up's end state therefore come from one model. Not thread-safe (models are cached).
 */
public final class SteadyHeaters implements HeaterLaw {
    private final Machine machine;
    private final ThermalAssumptions assumptions;
    private final Map<String, HeaterModel> models = new HashMap<>();

    public SteadyHeaters(Machine machine, ThermalAssumptions assumptions) {
        this.machine = machine;
        this.assumptions = assumptions;
    }

    /** With the power-up's standard assumptions. */
    public static SteadyHeaters of(Machine machine) {
        return new SteadyHeaters(machine, ThermalAssumptions.standard());
    }

    @Override
    public double ohms(int tube, HeaterRating rating, double amps) {
        HeaterModel h = model(tube, rating);
        return h.resistance(kelvin(h, amps));
    }

    /** The wire temperature at which {@code amps} heats the heater as fast as it loses heat (bisection). */
    static double kelvin(HeaterModel h, double amps) {
        double lo = h.ambientKelvin();
        double hi = 3 * h.hotKelvin();
        double i2 = amps * amps;
        for (int k = 0; k < 80 && hi - lo > 1e-10 * hi; k++) {
            double t = 0.5 * (lo + hi);
            if (i2 * h.resistance(t) > h.radiated(t)) {
                lo = t;
            } else {
                hi = t;
            }
        }
        return 0.5 * (lo + hi);
    }

    private HeaterModel model(int tube, HeaterRating rating) {
        TubeType t = machine.tubes().get(tube);
        return models.computeIfAbsent(t.name() + "|" + rating.volts() + "|" + rating.amps(),
                k -> HeaterModel.uncalibrated(t.name(), rating, assumptions, t.coldHotRatio(), assumptions.defaultWarmup(),
                        false));
    }
}
