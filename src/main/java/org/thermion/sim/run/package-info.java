/**
 * The one run loop: {@link org.thermion.sim.run.RunDriver} clocks a
 * {@link org.thermion.sim.run.Clocked} machine (a lane of the logic, or the ISA's meaning) with
 * stimulus, breakpoints, a cycle limit, fixed-point detection and a cooperative stop;
 * {@link org.thermion.sim.run.RunObserver}s take what each caller needs (output changes, the
 * watch table, unknown values, a value change dump, current metering, the UI, verify's snapshots).
 */
package org.thermion.sim.run;
