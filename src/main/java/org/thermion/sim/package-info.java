/**
 * Cycle-level simulation of an elaborated machine: the 64-lane {@link org.thermion.sim.Simulator}
 * (two- and three-valued), stimulus files and value change dumps. Program runs, at the logic
 * level and the instruction-set level, go through the one run loop of {@code org.thermion.sim.run}.
 */
package org.thermion.sim;
