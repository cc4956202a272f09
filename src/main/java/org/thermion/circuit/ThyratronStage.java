package org.thermion.circuit;

/**
 * A gas thyratron driving a load (a relay coil) from a rail, with an optional series plate
 * resistor. It fires when its grid (through the grid network, no grid current before firing)
 * rises above the critical voltage at its anode's voltage, and stays fired (stored true) until the plate supply is broken.
 */
public record ThyratronStage(String name, GasThyratron tube, PlateLoad load, String plateRail, double plateOhms,
                             GridNetwork grid, CathodeReturn cathode) implements StageCircuit {

    public ThyratronStage {
        Checks.nonNegative("plate ohms", plateOhms);
        if (load.direct()) {
            throw new IllegalArgumentException("stage " + name + ": a thyratron needs a plate load");
        }
    }

    public int inputs() {
        return 1;
    }

    public boolean logic(boolean[] in, boolean stored) {
        return stored || in[0];
    }

    public boolean inverting() {
        return false;
    }

    public int build(CircuitBuilder b, double[] inputVolts, boolean stored) {
        int rail = b.rail(plateRail);
        int top = rail;
        if (plateOhms > 0) {
            top = b.node("feed");
            b.resistor("plate", rail, top, plateOhms);
        }
        int anode = b.node("plate");
        load.attach(b, top, anode);
        int k = cathode.attach(b);
        int in = b.source("in0", inputVolts[0]);
        grid.attach(b, in, "0");
        double vgk = grid.openTapVolts(b, inputVolts[0]) - b.railVolts(cathode.rail());
        // unfired, no current flows: the anode stands at its rail, and the critical grid follows it
        double vak = b.railVolts(plateRail) - b.railVolts(cathode.rail());
        b.arc("tube", tube, tube.conducts(stored, vgk, vak), anode, k);
        return anode;
    }

    public Load inputLoad() {
        return new GridLoad(grid, GridCurrentLaw.NONE, cathode.rail());
    }
}
