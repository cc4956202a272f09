package org.thermion.cli;

import org.thermion.cli.report.CsvWriter;
import org.thermion.cli.report.Numbers;
import org.thermion.power.startup.PowerUpResult;
import org.thermion.power.startup.RailTransient;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The power-up time series that {@code powerup --csv FILE} writes. */
final class PowerUpSeries {
    private PowerUpSeries() {
    }

    /**
     * The time series for {@code --csv FILE} (RFC 4180, CRLF): {@code time_seconds}, each rail's current
     * ({@code RAIL_amps}) and load voltage signed as the rail ({@code RAIL_volts}), then each heater row's
     * temperature ({@code heater_N_kelvin}, N the row of the heaters table, from 1).
     */
    static String of(PowerUpResult r) {
        StringBuilder b = new StringBuilder();
        List<String> head = new ArrayList<>();
        head.add("time_seconds");
        for (RailTransient rt : r.rails()) {
            head.add(identifier(rt.name()) + "_amps");
        }
        for (RailTransient rt : r.rails()) {
            head.add(identifier(rt.name()) + "_volts");
        }
        for (int i = 0; i < r.heaters().size(); i++) {
            head.add("heater_" + (i + 1) + "_kelvin");
        }
        row(b, head);
        double[] t = r.t();
        for (int i = 0; i < t.length; i++) {
            List<String> cells = new ArrayList<>();
            cells.add(Numbers.plain(t[i]));
            for (RailTransient rt : r.rails()) {
                cells.add(Numbers.plain(rt.amps()[i]));
            }
            for (RailTransient rt : r.rails()) {
                cells.add(Numbers.plain(Math.copySign(rt.busVolts()[i], rt.volts())));
            }
            for (double[] k : r.heaterKelvin()) {
                cells.add(Numbers.plain(k[i]));
            }
            row(b, cells);
        }
        return b.toString();
    }

    /** A rail name as a lower-case identifier for a CSV header. */
    static String identifier(String name) {
        String s = name.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "_").replaceAll("^_+|_+$", "");
        return s.isEmpty() || !Character.isLetter(s.charAt(0)) ? "rail_" + s : s;
    }

    private static void row(StringBuilder b, List<String> cells) {
        b.append(CsvWriter.row(cells.toArray(String[]::new))).append("\r\n");
    }

}
