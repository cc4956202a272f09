package org.thermion.tui;

import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.model.StageType;
import org.thermion.power.CurrentMeter;
import org.thermion.power.DrawingInstance;
import org.thermion.power.DrawingInstances;
import org.thermion.power.StageDraw;

import java.util.ArrayList;
import java.util.List;

/**
 * Power per module (tubes, heater current, plate-supply current now and peak) and per rail
 * (now, peak, limit), from the current meter the session feeds every phase.
 */
final class PowerPanel {
    private static final int MODULE = 13;
    private static final int RAIL_COLUMNS = 17;

    private PowerPanel() {
    }

    /** Rows with border for the module table alone, without the rail totals. */
    static int leastHeight(Session s) {
        return 1 + s.modules().size() + 1 + 2;
    }

    static int height(Session s) {
        // header, modules, total; blank; header, rails; when the peaks came; border
        return 1 + s.modules().size() + 1 + 1 + 1 + s.machine().rails().size() + 1 + 2;
    }

    /**
     * Rails some stage instance draws from (plate, bias, relay coils, the soft-start thyratron), in the machine's
     * order but with the highest positive voltage (B+) first. Asked of the meter's stage figures, computed
     * from the circuits or declared: a library stage no longer declares its draws.
     */
    static List<Integer> plateRails(Machine m, StageDraw draw) {
        boolean[] drawn = new boolean[m.rails().size()];
        for (DrawingInstance d : DrawingInstances.of(m)) {
            StageType st = m.stages().get(d.stage());
            for (int rail = 0; rail < drawn.length; rail++) {
                drawn[rail] |= draw.drawsOn(st, rail);
            }
        }
        List<Integer> r = new ArrayList<>();
        int bplus = -1;
        for (int i = 0; i < drawn.length; i++) {
            if (drawn[i] && (bplus < 0 || m.rails().get(i).volts() > m.rails().get(bplus).volts())) {
                bplus = i;
            }
        }
        if (bplus >= 0) {
            r.add(bplus);
        }
        for (int i = 0; i < drawn.length; i++) {
            if (drawn[i] && i != bplus) {
                r.add(i);
            }
        }
        return r;
    }

    static void draw(Canvas c, Rect r, Session s) {
        Machine m = s.machine();
        CurrentMeter meter = s.meter();
        Rect in = Canvas.inside(r);
        // The rail totals come whole or not at all; the line of peak times may go.
        boolean showRails = in.height() >= height(s) - 2 - 1;
        c.box(r, showRails ? "power" : "power \u00B7 rail totals need more rows");
        Canvas cc = c.within(in);
        List<Integer> rails = plateRails(m, meter.draw());
        int fixed = 1 + MODULE + 6 + 9;
        int shown = Math.max(1, Math.min(rails.size(), (in.width() - fixed) / RAIL_COLUMNS));
        int col = in.col() + 1;
        int row = in.row();
        StringBuilder head = new StringBuilder(Canvas.pad("module", MODULE)).append(Canvas.padLeft("tubes", 6))
                .append(Canvas.padLeft("heater A", 9));
        for (int k = 0; k < shown && k < rails.size(); k++) {
            head.append(Canvas.padLeft(m.rails().get(rails.get(k)).name() + " mA", 10)).append(Canvas.padLeft("peak", 7));
        }
        cc.text(col, row++, head.toString(), Palette.DIM);
        int tubes = 0;
        double heater = 0;
        for (ModuleLoad ml : s.modules()) {
            tubes += ml.tubes();
            heater += ml.heaterAmps();
            StringBuilder b = new StringBuilder(Canvas.pad(ml.name(), MODULE)).append(Canvas.padLeft(Integer.toString(ml.tubes()), 6))
                    .append(Canvas.padLeft(String.format("%.2f", ml.heaterAmps()), 9));
            for (int k = 0; k < shown && k < rails.size(); k++) {
                int rail = rails.get(k);
                b.append(Canvas.padLeft(mA(meter.nowModule(ml.module(), rail)), 10))
                        .append(Canvas.padLeft(mA(meter.peakModule(ml.module(), rail)), 7));
            }
            cc.text(col, row++, b.toString(), Palette.TEXT);
        }
        StringBuilder t = new StringBuilder(Canvas.pad("all modules", MODULE)).append(Canvas.padLeft(Integer.toString(tubes), 6))
                .append(Canvas.padLeft(String.format("%.2f", heater), 9));
        for (int k = 0; k < shown && k < rails.size(); k++) {
            int rail = rails.get(k);
            t.append(Canvas.padLeft(mA(meter.nowRail(rail)), 10)).append(Canvas.padLeft(mA(meter.peakRail(rail)), 7));
        }
        cc.text(col, row++, t.toString(), Palette.HEADING);
        if (!showRails) {
            return;
        }
        row++;
        // Narrow panels leave out the voltage and the heater share; "now" and "peak" include heaters.
        boolean full = in.width() >= 70;
        cc.text(col, row++, Canvas.pad("rail", full ? MODULE : 10) + (full ? Canvas.padLeft("volts", 6) + Canvas.padLeft("heaters", 10) : "")
                + Canvas.padLeft("now", 10) + Canvas.padLeft("peak", 10) + Canvas.padLeft("limit", full ? 9 : 10)
                + Canvas.padLeft(full ? "peak use" : "use", full ? 10 : 7), Palette.DIM);
        for (int i = 0; i < m.rails().size(); i++) {
            Rail rail = m.rails().get(i);
            double heat = s.heaters().railAmps(i);
            double peak = heat + meter.peakRail(i);
            double share = rail.limitAmps() > 0 ? peak / rail.limitAmps() : Double.NaN;
            String line = Canvas.pad(rail.name(), full ? MODULE : 10)
                    + (full ? Canvas.padLeft(String.format("%+.1f", rail.volts()), 6) + Canvas.padLeft(heat > 0 ? amps(heat) : "-", 10) : "")
                    + Canvas.padLeft(amps(heat + meter.nowRail(i)), 10) + Canvas.padLeft(amps(peak), 10)
                    + Canvas.padLeft(rail.limitAmps() > 0 ? amps(rail.limitAmps()) : "-", full ? 9 : 10)
                    + Canvas.padLeft(Double.isNaN(share) ? "-" : String.format("%.0f %%", share * 100), full ? 10 : 7);
            cc.text(col, row++, line, share > 1 ? Palette.STOPPED : Palette.TEXT);
        }
        if (row >= in.bottom()) {
            return;
        }
        StringBuilder when = new StringBuilder("peaks at cycle.phase:");
        for (int rail : rails) {
            if (meter.samples() > 0) {
                when.append("  ").append(m.rails().get(rail).name()).append(' ')
                        .append(meter.peakCycle(rail)).append('.').append(meter.peakPhase(rail));
            }
        }
        cc.text(col, row, Canvas.fit(when.toString(), in.width() - 2), Palette.DIM);
    }

    /** Amperes with the unit a reader expects for the size: mA below one ampere. */
    static String amps(double a) {
        if (Double.isNaN(a)) {
            return "-";
        }
        return Math.abs(a) < 1 ? String.format("%.1f mA", a * 1000) : String.format("%.2f A", a);
    }

    static String mA(double amps) {
        return String.format("%.1f", amps * 1000);
    }
}
