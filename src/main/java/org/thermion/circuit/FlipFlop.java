package org.thermion.circuit;

/**
 * A cross-coupled pair of triode halves: each half's plate load to the rail, each grid fed by a
 * divider from the other half's plate to the bias rail, cathodes on one return. The stored state
 * says which half conducts; the output (Q) is the first half's plate, high when stored is true.
 * The steering input is not part of the DC circuit; as a load it is taken as one grid network.
 */
public record FlipFlop(String name, KorenTriode tube, double loadOhms, String plateRail, GridNetwork cross,
                       CathodeReturn cathode) implements StageCircuit {

    public FlipFlop {
        Checks.positive("flip-flop load ohms", loadOhms);
        if (cross.seriesOhms() == 0) {
            throw new IllegalArgumentException("stage " + name + ": cross-coupling needs a series resistor");
        }
    }

    public int inputs() {
        return 0;
    }

    public boolean logic(boolean[] in, boolean stored) {
        return stored;
    }

    public boolean inverting() {
        return true;
    }

    public int build(CircuitBuilder b, double[] inputVolts, boolean stored) {
        int[] n = halves(b, -1);
        int qa = n[0];
        int qb = n[1];
        int ga = n[2];
        int gb = n[3];
        int rail = n[4];
        double high = b.fixedVolts(rail);
        b.guess(qa, stored ? high : 0.1 * high);
        b.guess(qb, stored ? 0.1 * high : high);
        // start the grids apart too: from a symmetric start Newton finds the balanced (unstable) point
        double cut = Double.isFinite(cross.toBiasOhms()) ? 0.5 * b.fixedVolts(b.rail(cross.biasRail())) : -0.5 * high;
        b.guess(ga, stored ? cut : 0);
        b.guess(gb, stored ? 0 : cut);
        return qa;
    }

    /**
     * Both halves on their loads and the one cathode return, half B's grid network fed from
     * plate A and half A's from {@code steering} (plate B when -1: the closed loop). Returns the
     * nodes plate A, plate B, grid A, grid B and the plate rail.
     */
    int[] halves(CircuitBuilder b, int steering) {
        int rail = b.rail(plateRail);
        int k = cathode.attach(b);
        int qa = b.node("plateA");
        int qb = b.node("plateB");
        b.resistor("load", rail, qa, loadOhms);
        b.resistor("load", rail, qb, loadOhms);
        int ga = cross.attach(b, steering >= 0 ? steering : qb, "A");
        int gb = cross.attach(b, qa, "B");
        b.triode("tubeA", tube, 1, qa, ga, k);
        b.triode("tubeB", tube, 1, qb, gb, k);
        return new int[] {qa, qb, ga, gb, rail};
    }

    public Load inputLoad() {
        return new GridLoad(cross, tube.grid(), cathode.rail());
    }
}
