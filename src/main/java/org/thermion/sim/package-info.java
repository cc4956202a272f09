/**
 * Cycle-level simulation of an elaborated machine: the 64-lane {@link org.thermion.sim.Simulator}
 * (two- and three-valued), stimulus files, the output-change log, value change dumps, and
 * program runs at the logic level ({@link org.thermion.sim.LogicRun}) and the instruction-set
 * level ({@link org.thermion.sim.IsaRun}, over the reference interpreter).
 */
package org.thermion.sim;
