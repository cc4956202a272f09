package org.thermion.model;

/**
 * The published law a tube section's currents follow, with its parameters as declared on a
 * tube block's {@code model} line: Koren's triode and pentode equations, the 3/2-power diode law
 * through one point, or a gas thyratron's firing voltage (its arc drop is the tube's {@code arcdrop}).
 */
public sealed interface TubeLaw {

    /** Koren's 1996 parameters; {@code kg2} is NaN for a triode. */
    record Koren(double mu, double ex, double kg1, double kg2, double kp, double kvb) implements TubeLaw {
    }

    /** A diode whose 3/2-power law passes through ({@code volts}, {@code amps}). */
    record Diode(double amps, double volts) implements TubeLaw {
    }

    /**
     * A gas thyratron firing when its grid rises above its critical grid voltage: {@code criticalGrid} volts
     * whatever the anode voltage, or (when that is NaN) minus the anode voltage over {@code controlRatio}.
     */
    record Gas(double criticalGrid, double controlRatio) implements TubeLaw {
    }
}
