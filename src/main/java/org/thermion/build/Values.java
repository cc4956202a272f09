package org.thermion.build;

import java.util.Locale;

/** Values written into part types for people and orders: {@code 22k}, {@code 4k7} style avoided, plain SI. */
final class Values {
    private Values() {
    }

    /** {@code 22 kohm}, {@code 1.9 kohm}, {@code 470 ohm}, {@code 1 Mohm}. */
    static String ohms(double ohms) {
        if (ohms >= 1e6) {
            return plain(ohms / 1e6) + " Mohm";
        }
        if (ohms >= 1e3) {
            return plain(ohms / 1e3) + " kohm";
        }
        return plain(ohms) + " ohm";
    }

    /**
     * A relay as ordered: by its coil's rated voltage and resistance where the rating is known
     * ({@code relay 12 V, coil 160 ohm}), else by resistance and the pick-up voltage it must
     * operate at ({@code relay 5 kohm, pick-up 25 V}).
     */
    static String relay(double coilOhms, double ratedVolts, double pickupVolts) {
        if (!Double.isNaN(ratedVolts)) {
            return "relay " + plain(ratedVolts) + " V, coil " + ohms(coilOhms);
        }
        return "relay " + ohms(coilOhms) + (Double.isNaN(pickupVolts) ? "" : ", pick-up " + plain(pickupVolts) + " V");
    }

    /** A number with at most three significant figures and no trailing zeros. */
    static String plain(double v) {
        String s = String.format(Locale.ROOT, "%.3g", v);
        if (s.contains("e") || s.contains("E")) {
            return s;
        }
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }
}
