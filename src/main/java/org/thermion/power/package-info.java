/**
 * The power budget of an elaborated machine: tubes counted per module and type
 * ({@link org.thermion.power.TubeCount}), the voltage every heater gets in its string with
 * dropping resistors and shunts ({@link org.thermion.power.HeaterAnalysis}), plate and bias
 * current per module and rail, statically at every stage instance's lowest and highest draw
 * and dynamically from a simulation ({@link org.thermion.power.CurrentMeter}, fed by the run
 * driver), approximate plate dissipation
 * ({@link org.thermion.power.PlateDissipation}), and the supply check of each rail's peak
 * against its limit ({@link org.thermion.power.Budget}). Figures are planning estimates
 * from declared ratings and draws; the package knows no text layout.
 */
package org.thermion.power;
