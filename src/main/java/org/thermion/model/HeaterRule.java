package org.thermion.model;

import java.util.List;

/**
 * How heaters of some tube types are wired on a rail: in parallel (each heater across
 * the rail at {@code volts}), or in series strings of {@code count}, formed per module
 * or across the whole machine. {@code dropOhms} is a declared dropping resistor per string
 * (0 for none), {@code restDropOhms} the one for a last, shorter string (0: same as the others);
 * {@code shunt} says the builder fits shunts where currents are mixed.
 */
public record HeaterRule(int rail, boolean series, List<Integer> tubes, int count, boolean perModule,
                         double volts, double dropOhms, boolean shunt, double restDropOhms) {
    public HeaterRule {
        tubes = List.copyOf(tubes);
    }
}
