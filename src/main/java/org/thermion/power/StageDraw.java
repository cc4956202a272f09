package org.thermion.power;

import org.thermion.model.RailDraw;
import org.thermion.model.StageType;

import java.util.List;

/**
 * What one stage instance draws from a rail: its stage's {@code always} draw plus its
 * {@code low} or {@code high} draw for the instance's present output value. Amperes,
 * magnitudes (a negative rail's draw is a positive number).
 */
public final class StageDraw {
    private StageDraw() {
    }

    /** Amps an instance of {@code st} draws from {@code rail} with its output high or low. */
    public static double amps(StageType st, int rail, boolean outputHigh) {
        return sum(st.drawAlways(), rail) + sum(outputHigh ? st.drawHigh() : st.drawLow(), rail);
    }

    /** The smaller of the two output states' draws on {@code rail}. */
    public static double minAmps(StageType st, int rail) {
        return Math.min(amps(st, rail, false), amps(st, rail, true));
    }

    /** The larger of the two output states' draws on {@code rail}. */
    public static double maxAmps(StageType st, int rail) {
        return Math.max(amps(st, rail, false), amps(st, rail, true));
    }

    /** True when the stage declares any draw on {@code rail}. */
    public static boolean drawsOn(StageType st, int rail) {
        return declares(st.drawAlways(), rail) || declares(st.drawLow(), rail) || declares(st.drawHigh(), rail);
    }

    private static double sum(List<RailDraw> draws, int rail) {
        double a = 0;
        for (RailDraw d : draws) {
            if (d.rail() == rail) {
                a += Math.abs(d.amps());
            }
        }
        return a;
    }

    private static boolean declares(List<RailDraw> draws, int rail) {
        for (RailDraw d : draws) {
            if (d.rail() == rail) {
                return true;
            }
        }
        return false;
    }
}
