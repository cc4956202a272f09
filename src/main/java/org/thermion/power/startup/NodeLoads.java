package org.thermion.power.startup;

/**
 * The loads at one node of a rail: heater string groups, plate and bias conductances tied to the
 * heater state that warms their cathodes, and those with no heater (always drawing).
 */
record NodeLoads(int[] groups, int[] plateState, double[] plateSiemens, double alwaysSiemens) {
    // Built once by StartupNetwork and only read after: a run copies what it changes (TransientCircuit).
}
