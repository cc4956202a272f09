package org.thermion.build;

import org.thermion.power.startup.PreferredValues;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The parts to order, one row per orderable item with quantities summed: tubes with spares,
 * sockets per base, resistors at their E24 value (IEC 60063) and a wattage rating from their
 * computed dissipation and a derating, relays, lamps, diodes, switches, connectors.
 *
 * @param sparePercent spare tubes per type, percent of those used, rounded up, at least one
 *                     (default 10 %, common practice)
 * @param derating     the fraction of a resistor's rating it may dissipate in service
 *                     (default 0.5, common practice)
 */
public record PartsList(List<Row> rows, double sparePercent, double derating) {
    public static final double DEFAULT_SPARE_PERCENT = 10;
    public static final double DEFAULT_DERATING = 0.5;
    /** Commonly sold resistor ratings in watts (common practice). */
    static final double[] RATINGS = {0.125, 0.25, 0.5, 1, 2, 3, 5, 7, 10, 15, 20, 25, 50, 100, 150, 200, 250, 300};

    /**
     * One orderable item: what it is, its type (tube type, base, lamp or relay), its E24 value in
     * ohms (NaN where none), its rating in watts (NaN where none), the most any one dissipates,
     * how many the machine uses, the spares, and the quantity to order.
     */
    public record Row(String item, String type, double ohms, double ratedWatts, double maxWatts, int used, int spares) {
        public int order() {
            return used + spares;
        }
    }

    public PartsList {
        rows = List.copyOf(rows);
    }

    /** The parts list of a wiring, with {@code romDiodes} diodes for a diode-matrix ROM (0 for none). */
    public static PartsList of(Wiring w, long romDiodes, double sparePercent, double derating) {
        Map<String, Row> rows = new TreeMap<>();
        for (Part p : w.parts()) {
            String item = item(p.cls());
            if (p.cls() == PartClass.RESISTOR) {
                double e24 = PreferredValues.nearestE24(p.ohms());
                double need = Double.isNaN(p.watts()) ? 0 : p.watts() / derating;
                // a rating the description declares (a soft start's resistor, sized by `powerup`) is ordered as declared
                double rating = Double.isNaN(p.declaredWatts()) ? rating(need) : p.declaredWatts();
                String key = item + "|" + p.type() + "|" + String.format("%012.3f", e24) + "|" + rating;
                Row r = rows.get(key);
                double before = r == null ? Double.NaN : r.maxWatts();
                double max = Double.isNaN(p.watts()) ? before : Double.isNaN(before) ? p.watts() : Math.max(before, p.watts());
                rows.put(key, new Row(item, p.type(), e24, rating, max, (r == null ? 0 : r.used()) + 1, 0));
            } else {
                String key = item + "|" + p.type();
                Row r = rows.get(key);
                rows.put(key, new Row(item, p.type(), Double.NaN, Double.NaN, Double.NaN, (r == null ? 0 : r.used()) + 1, 0));
            }
        }
        if (romDiodes > 0) {
            rows.put("diode|ROM", new Row("diode", "small-signal diode, ROM matrix", Double.NaN, Double.NaN, Double.NaN,
                    (int) Math.min(Integer.MAX_VALUE, romDiodes), 0));
        }
        List<Row> out = new ArrayList<>();
        for (Row r : rows.values()) {
            int spares = r.item().equals("tube") ? (int) Math.max(1, Math.ceil(r.used() * sparePercent / 100 - 1e-9)) : 0;
            out.add(new Row(r.item(), r.type(), r.ohms(), r.ratedWatts(), r.maxWatts(), r.used(), spares));
        }
        return new PartsList(out, sparePercent, derating);
    }

    /** The smallest commonly sold rating at or above {@code watts}. */
    static double rating(double watts) {
        for (double r : RATINGS) {
            if (r >= watts - 1e-12) {
                return r;
            }
        }
        return Math.ceil(watts);
    }

    /** Tubes the list orders for use (spares apart). */
    public int tubesUsed() {
        return rows.stream().filter(r -> r.item().equals("tube")).mapToInt(Row::used).sum();
    }

    private static String item(PartClass c) {
        switch (c) {
            case TUBE:
                return "tube";
            case SOCKET:
                return "tube socket";
            case RESISTOR:
                return "resistor";
            case CAPACITOR:
                return "capacitor";
            case RELAY:
                return "relay";
            case LAMP:
                return "lamp";
            case DIODE:
                return "diode";
            case SWITCH:
                return "switch";
            case CONNECTOR:
                return "connector";
            default:
                return "terminal board";
        }
    }
}
