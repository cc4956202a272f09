package org.thermion.cli;

import org.thermion.plot.Figure;
import org.thermion.plot.Marker;
import org.thermion.plot.Panel;
import org.thermion.plot.Series;
import org.thermion.power.startup.PowerUpResult;
import org.thermion.power.startup.RailTransient;
import org.thermion.power.startup.ResistorSweep;
import org.thermion.power.startup.SoftStartSizing;

import java.util.ArrayList;
import java.util.List;

/**
 * The power-up pictures ({@code powerup --svg FILE}): the rails' currents and load voltages
 * against time, the resistor sweep, the two-way sizing table. The same values as the CSV of
 * the same run; every axis titled with its unit.
 */
final class PowerUpFigures {
    private PowerUpFigures() {
    }

    /** One panel per loaded rail (current, with its peaks marked), then the rails' load voltages. */
    static Figure curves(PowerUpResult r) {
        List<Panel> panels = new ArrayList<>();
        List<Series> volts = new ArrayList<>();
        double emit = r.allEmitSeconds();
        for (RailTransient rt : r.rails()) {
            if (!rt.hasLoad()) {
                continue;
            }
            List<Marker> marks = new ArrayList<>();
            if (rt.switchOnPeak() > 0 && !Double.isNaN(rt.switchOnTime())) {
                marks.add(new Marker("switch-on peak", rt.switchOnTime(), rt.switchOnPeak()));
            }
            if (!Double.isNaN(rt.bypassPeak()) && !Double.isNaN(rt.bypassPeakTime())) {
                marks.add(new Marker("bypass peak", rt.bypassPeakTime(), rt.bypassPeak()));
            }
            if (!Double.isNaN(emit) && emit <= rt.t()[rt.t().length - 1]) {
                marks.add(new Marker("all tubes conduct", emit, at(rt.t(), rt.amps(), emit)));
            }
            panels.add(new Panel("rail " + rt.name() + " (" + PowerUpArgs.fmt(rt.volts()) + " V)", "time (s)",
                    "current (A)", List.of(Series.line(rt.name() + " current", rt.t(), rt.amps())), marks));
            double[] v = rt.busVolts().clone();
            for (int i = 0; i < v.length; i++) {
                v[i] = Math.copySign(v[i], rt.volts());
            }
            volts.add(Series.line(rt.name() + " load voltage", rt.t(), v));
        }
        if (!volts.isEmpty()) {
            panels.add(new Panel("load voltages (signed as declared)", "time (s)", "voltage (V)", volts));
        }
        return new Figure("switch-on of " + r.machine(), panels, PowerUpReport.CAUTION);
    }

    /** The resistor sweep: both peaks against the resistor, the recommendation marked. */
    static Figure sweep(ResistorSweep.Result s) {
        int n = s.rows().size();
        double[] ohms = new double[n], on = new double[n], by = new double[n];
        for (int i = 0; i < n; i++) {
            ResistorSweep.Row row = s.rows().get(i);
            ohms[i] = row.ohms();
            on[i] = row.switchOnPeak();
            by[i] = row.bypassPeak();
        }
        List<Marker> marks = new ArrayList<>();
        ResistorSweep.Row best = s.recommended();
        if (best != null) {
            marks.add(new Marker("recommended", best.ohms(), best.worstPeak()));
        }
        Panel p = new Panel("soft start " + s.softStart() + " on rail " + s.rail(), "resistor (ohm)", "peak current (A)",
                List.of(Series.line("switch-on peak", ohms, on), Series.line("bypass peak", ohms, by)), marks);
        return new Figure("soft-start resistor sweep", List.of(p), PowerUpReport.CAUTION);
    }

    /** The sizing table: the larger peak against the resistor, one curve per bypass time, the balance point marked. */
    static Figure sizing(SoftStartSizing.Table t) {
        List<Series> curves = new ArrayList<>();
        for (int j = 0; j < t.seconds().length; j++) {
            double[] y = new double[t.ohms().length];
            for (int i = 0; i < y.length; i++) {
                y[i] = t.cells()[i][j].worstPeak();
            }
            curves.add(Series.line("bypass at " + PowerUpArgs.fmt(t.seconds()[j]) + " s", t.ohms(), y));
        }
        List<Marker> marks = new ArrayList<>();
        if (t.best() != null) {
            marks.add(new Marker("balance point", t.ohms()[t.bestOhm()], t.best().worstPeak()));
        }
        Panel p = new Panel("sizing a soft start for rail " + t.rail(), "resistor (ohm)", "larger peak current (A)",
                curves, marks);
        return new Figure("soft-start sizing", List.of(p), PowerUpReport.CAUTION);
    }

    /** Linear interpolation of {@code y(x)} at {@code at}. */
    private static double at(double[] x, double[] y, double at) {
        for (int i = 1; i < x.length; i++) {
            if (x[i] >= at) {
                double f = x[i] == x[i - 1] ? 0 : (at - x[i - 1]) / (x[i] - x[i - 1]);
                return y[i - 1] + f * (y[i] - y[i - 1]);
            }
        }
        return y[y.length - 1];
    }
}
