package org.thermion.circuit;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The parts library's stages as circuits, for rails named "bplus", "bias" and "relay" (the
 * library's assumption). Plate loads, lamp and coil come from the library's stage blocks; the
 * grid dividers (100 k from the driving plate, 47 k to bias) are our own design values, since the
 * library does not state them yet. The suppressor-grid NAND (pentode_nand2) is not modelled:
 * its suppressor is taken as tied to the cathode.
 */
public final class LibraryCircuits {
    /** Grid divider used by the library's logic stages (our own design values). */
    public static final GridNetwork DIVIDER = new GridNetwork(100e3, 47e3, "bias", 0);

    private LibraryCircuits() {
    }

    /** The library's stages by name. */
    public static Map<String, StageCircuit> of(TubeLibrary tubes) {
        Map<String, StageCircuit> m = new LinkedHashMap<>();
        TubeModel u7 = tubes.require("12AU7");
        ChildDiode al5 = (ChildDiode) tubes.require("6AL5");
        CathodeReturn ground = CathodeReturn.grounded();
        put(m, TubeStage.inverter("pentode_inverter", tubes.require("6AU6"), 1, new LoadResistor(22e3), "bplus",
                ground, DIVIDER, new ScreenSupply(0, "bplus")));
        put(m, new TubeStage("triode_nor2", u7, TubeStage.Arrangement.PARALLEL, 2, 1, new LoadResistor(15e3), "bplus",
                ground, DIVIDER, null, TubeStage.Output.PLATE));
        put(m, new TubeStage("cathode_follower", u7, TubeStage.Arrangement.PARALLEL, 1, 1, new DirectToRail(),
                "bplus", new CathodeReturn(10e3, "bias"), GridNetwork.direct(), null, TubeStage.Output.CATHODE));
        put(m, new FlipFlop("triode_flipflop", (KorenTriode) u7, 15e3, "bplus", DIVIDER, ground));
        put(m, new DiodeGate("diode_and", al5, DiodeGate.Kind.AND, 4, 47e3, "bplus"));
        put(m, new DiodeGate("diode_or", al5, DiodeGate.Kind.OR, 4, 100e3, "bias"));
        put(m, TubeStage.inverter("lamp_driver", u7, 2, new Lamp(48, 25e-3, Lamp.TYPICAL_COLD_RATIO), "bplus", ground,
                DIVIDER, null));
        // Library: "sensitive 48 V relay coil, 8 mA pull-in"; drop-out not stated (0).
        put(m, TubeStage.inverter("triode_relay", u7, 2, new RelayCoil(4700, 8e-3, 0), "bplus", ground, DIVIDER,
                null));
        // Library: 53 ohm plate resistor, 160 ohm coil from the 24 V relay rail; pick-up not stated.
        put(m, new ThyratronStage("thyratron_relay", (GasThyratron) tubes.require("2D21"), new LoadResistor(160),
                "relay", 53, DIVIDER, ground));
        return m;
    }

    private static void put(Map<String, StageCircuit> m, StageCircuit s) {
        m.put(s.name(), s);
    }
}
