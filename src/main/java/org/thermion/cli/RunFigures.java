package org.thermion.cli;

import org.thermion.text.Nouns;
import org.thermion.cli.report.Numbers;
import org.thermion.plot.Figure;
import org.thermion.plot.Panel;
import org.thermion.plot.Series;
import org.thermion.sim.RunResult;

import java.util.ArrayList;
import java.util.List;

/**
 * A run's watched nets as a picture ({@code run --watch ... --svg FILE}): one panel per watched
 * name, its value at the end of each cycle held until the next; a bus or the program counter as
 * its number, a net as 0 or 1, an unknown value as a gap.
 */
final class RunFigures {
    private RunFigures() {
    }

    static Figure watched(String machine, RunResult r) {
        List<Panel> panels = new ArrayList<>();
        int n = r.watch().size();
        double[] cycles = new double[n];
        for (int i = 0; i < n; i++) {
            cycles[i] = r.watch().get(i).cycle();
        }
        for (int k = 0; k < r.watchNames().size(); k++) {
            double[] y = new double[n];
            boolean bus = false;
            for (int i = 0; i < n; i++) {
                String v = r.watch().get(i).values().get(k);
                bus |= v.startsWith("0x");
                y[i] = value(v);
            }
            String name = r.watchNames().get(k);
            panels.add(new Panel(name, "cycle (end of cycle, counted from 0)", bus ? "value (number)" : "level (0 or 1)",
                    List.of(new Series(name, cycles, y, true))));
        }
        return new Figure("watched nets of " + machine + " over " + Nouns.count(r.cycles(), "cycle"),
                panels, "unknown values are left as gaps");
    }

    /** A watched value as a number: 0 or 1 for a net, a bus in hexadecimal; NaN when any bit is unknown. */
    static double value(String v) {
        if (v.startsWith("0x")) {
            String digits = v.substring(2);
            return digits.indexOf('x') >= 0 || digits.isEmpty() ? Double.NaN : Long.parseLong(digits, 16);
        }
        return v.equals("1") ? 1 : v.equals("0") ? 0 : Double.NaN;
    }
}
