package org.thermion.power.startup;

import org.thermion.model.Machine;

/**
 * Solves a machine's power-up transient: heaters warming from room temperature, each rail's
 * circuit (source, soft-start resistor, current limit, heater strings, plate loads coming alive)
 * and the bypass relays closing on their triggers. See {@link StartupNetwork} and
 * {@link HeaterModel} for the models and their assumptions. A bypass closes one relay operate
 * time after its trigger: after the fixed delay, or after the thyratron's heater reaches its warm
 * fraction of operating temperature (and only if the coil reaches its pick-up voltage).
 */
public final class PowerUpSolver {
    private PowerUpSolver() {
    }

    /** One solve. */
    public static PowerUpResult solve(Machine m, PowerUpOptions o) {
        return StartupNetwork.of(m, o.assumptions(), o.drawMode()).solve(o);
    }
}
