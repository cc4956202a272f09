package org.thermion.build;

/** Small machine texts for the build tests (our own demo data). */
final class WireListTestData {
    private WireListTestData() {
    }

    /** A one-inverter machine whose inverter stage is built on {@code tube} (heaters in parallel at 6.3 V). */
    static String usesTube(String tube) {
        String kind = tube.equals("2D21") ? "relay" : "not";
        String stage = tube.equals("2D21")
                ? "stage probe : relay { tube 2D21; sections 1; load 53 ohm from bplus; draw high bplus 75 mA; rise 1 us; fall 35 us }"
                : "stage probe : not { tube " + tube + "; sections 1; load 22 k from bplus; draw low bplus 2 mA }";
        return """
                rail heat { voltage 6.3 V }
                rail bplus { voltage 48 V }
                rail bias { voltage -24 V }
                heaters on heat { parallel %s at 6.3 V }
                %s
                realize { %s }
                module top {
                  in a
                  out y
                  y = %s
                }
                machine probe { top top; inputs a; outputs y }
                """.formatted(tube, stage, kind.equals("relay") ? "not pentode_inverter" : "not probe",
                        kind.equals("relay") ? "probe(a)" : "!a");
    }
}
