package org.thermion.circuit;

/**
 * A stage of triode or pentode sections with a common plate load: an inverter (one input),
 * a NOR (sections in parallel, plates tied), a NAND (sections stacked in series), a cathode
 * follower (output at the cathode), or a lamp or relay driver (several sections in parallel on
 * one input, the lamp or coil as plate load). Every input has the same grid network.
 *
 * @param sectionsPerInput sections driven together by each input (2 for a twin triode's
 *                         sections in parallel)
 * @param screen           the screen supply of a pentode; null for a triode
 */
public record TubeStage(String name, TubeModel tube, Arrangement arrangement, int inputs, int sectionsPerInput,
                        PlateLoad load, String plateRail, CathodeReturn cathode, GridNetwork grid,
                        ScreenSupply screen, Output output) implements StageCircuit {

    /** How the sections of several inputs are joined. */
    public enum Arrangement { PARALLEL, SERIES }

    /** Where the output is taken. */
    public enum Output { PLATE, CATHODE }

    public TubeStage {
        if (!(tube instanceof KorenTriode) && !(tube instanceof KorenPentode)) {
            throw new IllegalArgumentException("stage " + name + ": a tube stage needs a triode or pentode model, not "
                    + tube.name());
        }
        if (tube instanceof KorenPentode && screen == null) {
            throw new IllegalArgumentException("stage " + name + ": a pentode needs a screen supply");
        }
        if (inputs < 1 || sectionsPerInput < 1) {
            throw new IllegalArgumentException("stage " + name + ": at least one input and one section");
        }
        if (output == Output.CATHODE && cathode.ohms() == 0) {
            throw new IllegalArgumentException("stage " + name + ": a cathode output needs a cathode resistor");
        }
    }

    /** A one-input stage with the output at the plate. */
    public static TubeStage inverter(String name, TubeModel tube, int sections, PlateLoad load, String rail,
                                     CathodeReturn cathode, GridNetwork grid, ScreenSupply screen) {
        return new TubeStage(name, tube, Arrangement.PARALLEL, 1, sections, load, rail, cathode, grid, screen,
                Output.PLATE);
    }

    public boolean logic(boolean[] in, boolean stored) {
        boolean conducts = arrangement == Arrangement.PARALLEL ? StageCircuit.any(in) : StageCircuit.all(in);
        return output == Output.PLATE ? !conducts : conducts;
    }

    public boolean inverting() {
        return output == Output.PLATE;
    }

    public int build(CircuitBuilder b, double[] inputVolts, boolean stored) {
        int rail = b.rail(plateRail);
        int plate = rail;
        if (!load.direct()) {
            plate = b.node("plate");
            load.attach(b, rail, plate);
        }
        int k = cathode.attach(b);
        int screenNode = screen == null ? -1 : screen.attach(b);
        int below = k;
        for (int i = 0; i < inputs; i++) {
            int g = grid.attach(b, b.source("in" + i, inputVolts[i]), String.valueOf(i));
            boolean series = arrangement == Arrangement.SERIES;
            int p = series && i < inputs - 1 ? b.node("stack" + i) : plate;
            int kk = series ? below : k;
            if (tube instanceof KorenTriode t) {
                b.triode("tube" + i, t, sectionsPerInput, p, g, kk);
            } else {
                b.pentode("tube" + i, (KorenPentode) tube, sectionsPerInput, p, g, screenNode, kk);
            }
            below = p;
        }
        return output == Output.PLATE ? plate : k;
    }

    public Load inputLoad() {
        if (output == Output.CATHODE) {
            // a follower's cathode rides a volt or two below its grid, not at its return rail:
            // the grid draws no current and the input sees its grid network alone
            return new GridLoad(grid, GridCurrentLaw.NONE, cathode.rail());
        }
        GridCurrentLaw law = tube instanceof KorenTriode t ? t.grid() : ((KorenPentode) tube).grid();
        return new GridLoad(grid, law, cathode.rail());
    }
}
