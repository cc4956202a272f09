package org.thermion.elab;

import org.thermion.model.Relay;
import org.thermion.model.StageFunction;
import org.thermion.model.TubeKind;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import static org.thermion.elab.Slot.Range.above;
import static org.thermion.elab.Slot.Range.from;

/**
 * The properties one kind of block accepts: every key with its values' units, ranges,
 * defaults and sources. {@link PropBlock} reads every block against its table, so the
 * parser's diagnostics, the language reference ({@link PropertyReference}) and the
 * builders all see the same entries. Limits marked "plausibility" are not physics: they
 * sit far beyond any receiving-tube circuit and catch slips such as a missing unit prefix.
 */
final class PropertyTable {
    final String kind;
    final String heading;
    final List<Property> properties;

    private PropertyTable(String kind, String heading, Property... properties) {
        this.kind = kind;
        this.heading = heading;
        this.properties = List.of(properties);
    }

    private static final String PLAUSIBLE = "plausibility limit";
    /** A conducting stage's output resistance is its plate load over this ratio (common practice). */
    static final double RON_LOAD_RATIO = 10;
    /** ... or this many ohms for a stage without a load resistor. */
    static final double RON_WITHOUT_LOAD = 1000;

    static final PropertyTable RAIL = new PropertyTable("rail", "rail NAME { ... }",
            Property.of("voltage", "rail voltage, signed", q("rail voltage", Unit.VOLT, from(-10e3, 10e3)))
                    .required("voltage 48 V").source(PLAUSIBLE + " of 10 kV either way"),
            Property.of("source", "source resistance of the supply", q("source resistance", Unit.OHM, from(0, 1e6)))
                    .byDefault(0).source("an ideal supply unless given; " + PLAUSIBLE),
            Property.of("limit", "current the supply may deliver", q("current limit", Unit.AMPERE, above(0, 1e6)))
                    .byDefault("no limit").source(PLAUSIBLE + ": synthetic machines of 10^5 stages draw kiloamperes of heater current"));

    static final PropertyTable TUBE = new PropertyTable("tube", "tube NAME { ... }",
            Property.of("kind", "what a section is", name("kind", "tube kind", words(TubeKind.values())))
                    .byDefault("triode"),
            Property.of("sections", "sections in one envelope", whole("number of sections", 1, 4)).byDefault(1)
                    .source("receiving tubes hold at most four sections (common practice)"),
            Property.of("heater", "heater rating; one line per wiring, series or parallel pins",
                    q("heater voltage", Unit.VOLT, above(0, 200)), q("current", "heater current", Unit.AMPERE, above(0, 20)))
                    .required("heater 6.3 V 300 mA").many()
                    .source("the data sheet; " + PLAUSIBLE + "s 200 V and 20 A"),
            Property.of("warmup", "heater warm-up time", q("warm-up time", Unit.SECOND, from(0.1, 600)))
                    .byDefault("the heater model's standard warm-up").source(PLAUSIBLE + "s of 0.1 s (a directly heated "
                            + "filament warms in a fraction of a second, from memory; a millisecond typed for a second "
                            + "made power-up's thermal model stiff and slow) and 10 minutes"),
            Property.of("coldratio", "hot-to-cold heater resistance ratio", plain("hot-to-cold resistance ratio", from(1.5, 30)))
                    .byDefault("from the tungsten table (about 7)").source("tungsten between room temperature and 1400 K; "
                            + PLAUSIBLE + "; at 4/3 or less the standard warm-up test (4 x rated volts through 3 x the hot "
                            + "resistance, timed to 80 % of rated volts) is passed at switch-on, so no warm-up time fits"),
            Property.of("cgk", "grid-cathode capacitance per section", q("grid-cathode capacitance", Unit.FARAD, from(0, 1e-9)))
                    .byDefault(0).source(PLAUSIBLE + " of 1 nF"),
            Property.of("cgp", "grid-plate capacitance per section", q("grid-plate capacitance", Unit.FARAD, from(0, 1e-9)))
                    .byDefault(0).source(PLAUSIBLE + " of 1 nF"),
            Property.of("cpk", "plate-cathode capacitance per section", q("plate-cathode capacitance", Unit.FARAD, from(0, 1e-9)))
                    .byDefault(0).source(PLAUSIBLE + " of 1 nF"),
            Property.of("cin", "input capacitance per section", q("input capacitance", Unit.FARAD, from(0, 1e-9)))
                    .byDefault("cgk + cgp").source(PLAUSIBLE + " of 1 nF"),
            Property.of("cout", "output capacitance per section", q("output capacitance", Unit.FARAD, from(0, 1e-9)))
                    .byDefault("cpk + cgp").source(PLAUSIBLE + " of 1 nF"),
            Property.of("avgcurrent", "rated average cathode current", q("average cathode current", Unit.AMPERE, above(0, 100)))
                    .byDefault("none").source(PLAUSIBLE),
            Property.of("peakcurrent", "rated peak cathode current", q("peak cathode current", Unit.AMPERE, above(0, 100)))
                    .byDefault("none").source(PLAUSIBLE),
            Property.of("arcdrop", "tube drop while conducting (thyratrons)", q("tube drop", Unit.VOLT, above(0, 1e3)))
                    .byDefault("none").source(PLAUSIBLE),
            Property.of("model", "the law of the section's currents and its parameters: Koren's equations "
                            + "(triode: mu ex kg1 kp kvb; pentode: also kg2), the 3/2-power diode law through one point, "
                            + "or a thyratron's firing: a fixed critical grid voltage, or its control ratio (the critical grid "
                            + "at minus the anode voltage over the ratio); with where the figures come from",
                    new Slot.Choice("law", branches(
                            "koren", List.of(new Slot.AnyOrder(List.of(koren("mu", above(0, 1e3)), koren("ex", from(1, 2)),
                                    koren("kg1"), koren("kg2"), koren("kp"), koren("kvb"), sourceOption()))),
                            "diode", List.of(q("amps", "diode current", Unit.AMPERE, above(0, 100)), new Slot.Word("at"),
                                    q("volts", "diode voltage", Unit.VOLT, from(0.1, 1e3)), sourceOption()),
                            "gas", List.of(new Slot.Choice("firing", branches(
                                    "critical", List.of(q("critical", "critical grid voltage", Unit.VOLT, from(-200, 200))),
                                    "ratio", List.of(plain("ratio", "control ratio", above(1, 1e5)))), null),
                                    sourceOption())),
                            null))
                    .byDefault("none: the tube's stages must state their currents")
                    .source("Koren, Glass Audio 1996 (REFERENCES.md); Child-Langmuir 3/2-power law; " + PLAUSIBLE
                            + " of 10^9 on a Koren parameter, 1000 on mu (small tubes stay near 100) and 1 to 2 on ex "
                            + "(the 3/2-power law's exponent; Koren's sets 1.3 to 1.4)"),
            Property.of("point", "a published figure to fit the model to or check it by: plate or screen current, "
                            + "transconductance (mA per V) or amplification factor, at a plate voltage, a screen voltage "
                            + "(pentodes), and a fixed grid voltage or a cathode resistor; with its source",
                    new Slot.Choice("quantity", branches(
                            "plate", List.of(q("amps", "plate current", Unit.AMPERE, above(0, 100))),
                            "screen", List.of(q("amps", "screen current", Unit.AMPERE, above(0, 100))),
                            "gm", List.of(q("amps", "transconductance", Unit.AMPERE, above(0, 100)), new Slot.Word("per"),
                                    new Slot.Word("V")),
                            "mu", List.of(plain("factor", "amplification factor", above(0, 1e4)))), null),
                    new Slot.Word("at"), q("plate", "plate voltage", Unit.VOLT, above(0, 1e4)),
                    new Slot.Optional("screen", List.of(q("screenvolts", "screen voltage", Unit.VOLT, above(0, 1e4)))),
                    new Slot.Choice("bias", branches(
                            "grid", List.of(q("grid", "grid voltage", Unit.VOLT, from(-1e3, 1e3))),
                            "cathode", List.of(q("cathode", "cathode resistor", Unit.OHM, above(0, 1e7)))), null),
                    new Slot.Word("source"), text("pointsource", "where the figure comes from"))
                    .many().byDefault("none").source(PLAUSIBLE),
            Property.of("fit", "model parameters fitted to the point lines when the tube is loaded (Levenberg-Marquardt on "
                            + "the relative errors), and the fit's residual as the library states it",
                    new Slot.Names("params", "parameter names"),
                    new Slot.Optional("residual", List.of(plain("rms", "rms relative error in percent", from(0, 1e3)),
                            new Slot.Word("percent"))))
                    .byDefault("none: the model line's parameters are used as written").source(PLAUSIBLE),
            Property.of("gridcurrent", "grid current at a positive grid voltage, for the 3/2-power grid law",
                    q("amps", "grid current", Unit.AMPERE, above(0, 10)), new Slot.Word("at"),
                    q("volts", "grid voltage", Unit.VOLT, from(0.1, 100)))
                    .byDefault("0.5 mA at 1 V").source("matched to the 2 kOhm grid resistance of Koren's 1996 netlists"),
            Property.of("maxplate", "rated plate dissipation per section", q("plate dissipation", Unit.WATT, above(0, 1e4)))
                    .byDefault("unknown: not checked").source(PLAUSIBLE),
            Property.of("maxscreen", "rated screen dissipation (pentodes)", q("screen dissipation", Unit.WATT, above(0, 1e4)))
                    .byDefault("unknown: not checked").source(PLAUSIBLE),
            Property.of("basing", "the base and what each pin carries, as one source gives it; one line per source "
                            + "(several when sources disagree: the first is wired, the pins they differ on are flagged)",
                    name("base", "a base", List.of("miniature7", "noval", "octal")), new Slot.Text("pins", "the pins"),
                    new Slot.Word("from"), new Slot.Text("from", "the basing's source"))
                    .byDefault("none (the wire list needs it)").many()
                    .source("pins as `N electrode.section`, comma-separated; electrodes plate grid screen suppressor "
                            + "shield cathode, and heater tap ic nc without a section"),
            Property.of("source", "where the tube's figures come from", text("the source of the data")).byDefault("empty"));

    static final PropertyTable STAGE = new PropertyTable("stage", "stage NAME : FUNCTION { ... }",
            Property.of("tube", "tube type the stage is built from", name("tube", "a tube type", List.of()))
                    .required("tube 12AU7"),
            Property.of("sections", "tube sections one instance uses; `per input` for diode gates",
                    whole("sections used", 1, 8), new Slot.Optional("per", List.of(new Slot.Word("input"))))
                    .byDefault(1).source("two twin-triode envelopes at most (common practice)"),
            Property.of("fanin", "most inputs one instance takes", whole("fan-in", 1, 16))
                    .byDefault("the function's: 1 for not, buffer, latch, lamp, relay; 2 for the others")
                    .source("16 diode inputs at most (" + PLAUSIBLE + ")"),
            Property.of("load", "plate load and the rail it returns to: a resistor, a relay coil (resistance, "
                            + "pick-up and drop-out current) or a lamp (rated volts and amps), or `direct` (the plate on the rail); a diode "
                            + "gate's pull resistor",
                    new Slot.Choice("loadkind", branches(
                            "direct", List.of(),
                            "coil", List.of(q("value", "coil resistance", Unit.OHM, above(0, 1e6)), new Slot.Word("pickup"),
                                    q("pickup", "pick-up current", Unit.AMPERE, above(0, 10)),
                                    new Slot.Optional("dropout", List.of(q("dropoutamps", "drop-out current", Unit.AMPERE,
                                            from(0, 10))))),
                            "lamp", List.of(q("lampvolts", "lamp voltage", Unit.VOLT, above(0, 1e3)),
                                    q("lampamps", "lamp current", Unit.AMPERE, above(0, 100)))),
                            List.of(q("plate load", Unit.OHM, above(0, 100e6)))),
                    new Slot.Word("from"), name("rail", "a rail name", List.of()))
                    .byDefault("none").source(PLAUSIBLE + " of 100 M"),
            Property.of("circuit", "how the sections are joined: plates tied (parallel), stacked (series), "
                            + "cross-coupled halves (crossed), one diode per input (diodes), a thyratron and its load, "
                            + "or none (a stage known only by its draw lines)",
                    name("arrangement", "a circuit arrangement",
                            List.of("parallel", "series", "crossed", "diodes", "thyratron", "none")))
                    .byDefault("diodes for a diode tube, thyratron for a thyratron, crossed for latch, series for nand, "
                            + "else parallel"),
            Property.of("grid", "what each input's grid sees: `direct` from the driving output, or a divider from it "
                            + "(series resistor, then a resistor to a rail); a grid stopper in either case",
                    new Slot.Choice("gridkind", branches(
                            "direct", List.of(),
                            "divider", List.of(q("series", "grid series resistor", Unit.OHM, from(0, 100e6)),
                                    q("tobias", "grid resistor to the rail", Unit.OHM, above(0, 100e6)), new Slot.Word("to"),
                                    name("rail", "a rail name", List.of()))), null),
                    new Slot.Optional("stopper", List.of(q("stopperohms", "grid stopper", Unit.OHM, from(0, 10e6)))))
                    .byDefault("direct").source(PLAUSIBLE + " of 100 M"),
            Property.of("cathode", "the cathode's return: `ground`, a resistor to a rail, or a relay coil to a rail "
                            + "(resistance and pick-up current: a follower driving its coil)",
                    new Slot.Choice("cathodekind", branches("ground", List.of(),
                            "coil", List.of(q("value", "cathode coil resistance", Unit.OHM, above(0, 1e6)),
                                    new Slot.Word("pickup"), q("cathodepickup", "pick-up current", Unit.AMPERE, above(0, 10)),
                                    new Slot.Word("to"), name("rail", "a rail name", List.of()))),
                            List.of(q("cathode resistor", Unit.OHM, from(0, 100e6)), new Slot.Word("to"),
                                    name("rail", "a rail name", List.of()))))
                    .byDefault("ground").source(PLAUSIBLE + " of 100 M"),
            Property.of("screen", "a pentode's screen supply: dropping resistor (0 ohm for none) from a rail",
                    q("screen resistor", Unit.OHM, from(0, 100e6)), new Slot.Word("from"), name("rail", "a rail name", List.of()))
                    .byDefault("straight from the plate load's rail").source(PLAUSIBLE + " of 100 M"),
            Property.of("series", "resistor in series with a thyratron's load", q("series resistor", Unit.OHM, from(0, 1e6)))
                    .byDefault(0).source(PLAUSIBLE),
            Property.of("output", "where the output is taken", name("at", "plate or cathode", List.of("plate", "cathode")))
                    .byDefault("cathode for buffer, else plate"),
            Property.of("draw", "current drawn from a rail with the output low, high, always, or while the circuit "
                            + "conducts (" + conductingStates() + ")",
                    name("state", "output state", List.of("low", "high", "always", "conducting")), name("rail", "a rail name", List.of()),
                    q("amps", "current drawn", Unit.AMPERE, from(0, 100)))
                    .many().byDefault("nothing").source("worked out beside each library stage; " + PLAUSIBLE),
            Property.of("rise", "output rise time, when given rather than computed", q("rise time", Unit.SECOND, from(0, 10)))
                    .byDefault("ln 9 R C from the load").source("Millman & Taub (REFERENCES.md); " + PLAUSIBLE),
            Property.of("fall", "output fall time, when given rather than computed", q("fall time", Unit.SECOND, from(0, 10)))
                    .byDefault("ln 9 r_on C").source("Millman & Taub (REFERENCES.md); " + PLAUSIBLE),
            Property.of("delay", "rise and fall time together, or `auto` to compute both",
                    new Slot.Choice("mode", Map.of("auto", List.of()), List.of(q("delay", Unit.SECOND, from(0, 10)))))
                    .byDefault("auto").source(PLAUSIBLE),
            Property.of("setup", "time an input must be steady before the phase ends (latches)",
                    q("set-up time", Unit.SECOND, from(0, 10))).byDefault(0).source(PLAUSIBLE),
            Property.of("ron", "output resistance of the conducting tube", q("conducting output resistance", Unit.OHM, above(0, 100e6)))
                    .byDefault("load / " + Unit.number(RON_LOAD_RATIO) + ", or " + Unit.OHM.format(RON_WITHOUT_LOAD)
                            + " without a load").source("a conducting tube pulls about ten times harder than its plate "
                            + "load (common practice)"),
            Property.of("wiring", "wiring capacitance per connection", q("wiring capacitance", Unit.FARAD, from(0, 1e-6)))
                    .byDefault(0).source(PLAUSIBLE),
            Property.of("gain", "voltage gain, for the Miller capacitance of the next grid (a stage with a circuit has it computed; timing warns at a stated one over 25 % off)", plain("stage gain", from(-1e4, 1e4)))
                    .byDefault(1).source("Miller (REFERENCES.md); " + PLAUSIBLE),
            Property.of("note", "a line about the circuit", text("a note")).byDefault("empty"));

    static final PropertyTable RELAY = new PropertyTable("relay", "relay { ... } inside a softstart",
            Property.of("coil", "coil resistance", q("coil resistance", Unit.OHM, above(0, 1e6)))
                    .byDefault(Relay.DEFAULT_COIL_OHMS).source(Relay.DEFAULTS_SOURCE),
            Property.of("rated", "rated coil voltage", q("rated coil voltage", Unit.VOLT, above(0, 1e3)))
                    .byDefault(Relay.DEFAULT_RATED_VOLTS).source(Relay.DEFAULTS_SOURCE),
            Property.of("pickup", "voltage at which the relay is sure to pick up", q("pick-up voltage", Unit.VOLT, above(0, 1e3)))
                    .byDefault(percentOfRated(Relay.PICKUP_FRACTION)).source(Relay.DEFAULTS_SOURCE),
            Property.of("dropout", "voltage below which the relay is sure to drop out", q("drop-out voltage", Unit.VOLT, from(0, 1e3)))
                    .byDefault(percentOfRated(Relay.DROPOUT_FRACTION)).source(Relay.DEFAULTS_SOURCE),
            Property.of("operate", "time from pick-up voltage to closed contacts", q("operate time", Unit.SECOND, from(0, 10)))
                    .byDefault(Relay.DEFAULT_OPERATE_SECONDS).source(Relay.DEFAULTS_SOURCE),
            Property.of("contacts", "current the contacts may make and carry", q("contact rating", Unit.AMPERE, above(0, 1e4)))
                    .byDefault("none").source(PLAUSIBLE));

    static final PropertyTable SOFTSTART = new PropertyTable("softstart", "softstart NAME on RAIL { ... }",
            Property.of("resistor", "series resistor and its power rating",
                    q("soft-start resistor", Unit.OHM, above(0, 1e6)),
                    new Slot.Optional("rated", List.of(q("watts", "resistor rating", Unit.WATT, above(0, 1e9)))))
                    .required("resistor 2 ohm rated 50 W").source(PLAUSIBLE),
            Property.of("covers", "the loads behind the resistor (module instances, tube types); the rest is fed ahead of it",
                    new Slot.Names("loads", "module instances or tube types")).byDefault("the whole rail"),
            Property.of("relay", "the bypass relay's coil data").opens(RELAY)
                    .byDefault("a 12 V relay of 100 ohm, figures as in the relay block's defaults"),
            Property.of("bypass", "what closes the bypass relay: a delay, or a thyratron stage warming",
                    new Slot.Choice("trigger", orderedMap("after", List.of(q("bypass delay", Unit.SECOND, from(0, 3600))),
                            "when", List.of(name("stage", "a thyratron relay-driver stage", List.of()), new Slot.Word("warm"))),
                            null))
                    .required("bypass after 10 s").source(PLAUSIBLE + " of one hour"));

    static final PropertyTable CLOCK = new PropertyTable("clock", "clock { ... } inside the machine block",
            Property.of("phases", "clock phases per machine cycle", whole("number of phases", 1, 8)).byDefault(2)
                    .source(PLAUSIBLE),
            Property.of("period", "machine cycle period (phases share it equally)", q("clock period", Unit.SECOND, above(0, 3600)))
                    .byDefault(100e-6).source("demo value; " + PLAUSIBLE),
            Property.of("uses", "a stage the clock generator is built from: N instances of a stage per phase, or once",
                    whole("instances", 1, 1000000), name("stage", "a stage name", List.of()),
                    new Slot.Choice("scale", orderedMap("per", List.of(name("unit", "one of phase", List.of("phase"))),
                            "once", List.of()), null)).many().source(PLAUSIBLE),
            Property.of("offboard", "the clock generator is not made of tubes and is not counted; optionally why",
                    new Slot.Optional("because", List.of(text("what it is made of")))).byDefault("counted when `uses` lines state its stages, else left out"));

    static final PropertyTable ROM = new PropertyTable("rom", "rom { ... } inside the machine block",
            Property.of("words", "ROM size in words", whole("ROM size in words", 1, 1 << 20)).byDefault(256)
                    .source("a 2^20-word limit keeps images in memory"),
            Property.of("width", "ROM word width in bits", whole("ROM word width", 1, 63))
                    .byDefault("the data port's width").source("one 64-bit word per lane (the simulator's limit)"),
            Property.of("data", "the top module's input port the ROM drives",
                    name("port", "the top module's input port for ROM data", List.of())),
            Property.of("uses", "a stage the ROM's decoding and drivers are built from: N instances of a stage per word or bit or address or line, or once",
                    whole("instances", 1, 1000000), name("stage", "a stage name", List.of()),
                    new Slot.Choice("scale", orderedMap("per", List.of(name("unit", "one of word, bit, address, line", List.of("word", "bit", "address", "line"))),
                            "once", List.of()), null)).many().source(PLAUSIBLE),
            Property.of("offboard", "the ROM is not made of tubes and is not counted; optionally why",
                    new Slot.Optional("because", List.of(text("what it is made of")))).byDefault("counted when `uses` lines state its stages, else left out"));

    static final PropertyTable PC = new PropertyTable("pc", "pc { ... } inside the machine block",
            Property.of("width", "program counter width in bits", whole("program counter width", 1, 20))
                    .byDefault("the jump target's width").source("a 2^20-word ROM at most"),
            Property.of("phase", "the clock phase the program counter loads on",
                    whole("the phase the program counter loads on", 1, 8)).byDefault("the last phase"),
            Property.of("jump", "the top module's output that makes the PC load its target",
                    name("port", "the top module's jump output", List.of())),
            Property.of("target", "the top module's output bus the PC loads",
                    name("port", "the top module's jump-target output", List.of())),
            Property.of("uses", "a stage the program counter is built from: N instances of a stage per bit, or once",
                    whole("instances", 1, 1000000), name("stage", "a stage name", List.of()),
                    new Slot.Choice("scale", orderedMap("per", List.of(name("unit", "one of bit", List.of("bit"))),
                            "once", List.of()), null)).many().source(PLAUSIBLE),
            Property.of("offboard", "the program counter is not made of tubes and is not counted; optionally why",
                    new Slot.Optional("because", List.of(text("what it is made of")))).byDefault("counted when `uses` lines state its stages, else left out"));

    static final PropertyTable MACHINE = new PropertyTable("machine", "machine NAME { ... }",
            Property.of("clock", "the clock").opens(CLOCK),
            Property.of("top", "the top module", name("module", "the top module's name", List.of())),
            Property.of("rom", "the program ROM").opens(ROM),
            Property.of("pc", "the program counter").opens(PC),
            Property.of("inputs", "top-module inputs driven from outside (switches, sensors)",
                    new Slot.Names("ports", "input ports")).many(),
            Property.of("outputs", "top-module outputs shown and logged", new Slot.Names("ports", "output ports")).many(),
            Property.of("notbuilt", "module instances not built yet: the outputs they would drive become switches (machine"
                    + " inputs named as the nets), or with `held 0` / `held 1` stay at that level (tied on the bench)",
                    new Slot.Names("instances", "instance names"),
                    new Slot.Optional("held", List.of(whole("the level an unbuilt module's outputs are held at", 0, 1))))
                    .many(),
            Property.of("radix", "how the screen writes these input or output buses: hex, decimal, octal or binary",
                    name("radix", "radix", List.of("hex", "decimal", "octal", "binary")),
                    new Slot.Names("buses", "bus names")).many().byDefault("hex"));

    private static final Slot.AnyOrder HEATER_OPTIONS = new Slot.AnyOrder(List.of(
            new Slot.Optional("at", List.of(q("volts", "heater wiring voltage", Unit.VOLT, above(0, 200)))),
            new Slot.Optional("per", List.of(new Slot.Word("module"))),
            new Slot.Optional("across", List.of(new Slot.Word("machine"))),
            new Slot.Optional("drop", List.of(q("drop", "dropping resistor", Unit.OHM, from(0, 1e6)))),
            new Slot.Optional("rest", List.of(new Slot.Word("drop"),
                    q("restdrop", "dropping resistor for the last string", Unit.OHM, above(0, 1e6)))),
            new Slot.Optional("shunt", List.of())));

    static final PropertyTable HEATERS = new PropertyTable("heaters", "heaters on RAIL { ... }",
            Property.of("parallel", "these tube types' heaters straight across the rail; options: at V, per module, "
                    + "across machine, drop R, rest drop R, shunt", new Slot.Names("tubes", "tube types"), HEATER_OPTIONS)
                    .many(),
            Property.of("series", "strings of N heaters of these tube types; the same options",
                    whole("heaters per string", 1, 64), new Slot.Word("of"), new Slot.Names("tubes", "tube types"), HEATER_OPTIONS)
                    .many().source("64 heaters of 6.3 V make a 400 V string (" + PLAUSIBLE + ")"));

    static final PropertyTable REALIZE = new PropertyTable("realize", "realize { ... }", realizeEntries());

    static final PropertyTable MARGINS = new PropertyTable("margins", "margins { ... }",
            Property.of("rails", "each rail's tolerance either way, for worst-case margins",
                    plain("rail tolerance in percent", from(0, 50)), new Slot.Word("percent"))
                    .byDefault(100 * org.thermion.model.MarginRules.DEFAULT.rail())
                    .source("common practice: a supply held within 5 %; " + PLAUSIBLE + " of 50 %"),
            Property.of("resistors", "each resistor's tolerance either way",
                    plain("resistor tolerance in percent", from(0, 50)), new Slot.Word("percent"))
                    .byDefault(100 * org.thermion.model.MarginRules.DEFAULT.resistor())
                    .source("common practice: 5 % (E24) resistors; " + PLAUSIBLE + " of 50 %"),
            Property.of("endoflife", "a worn tube's emission as a share of a new tube's current",
                    plain("end-of-life emission in percent", above(0, 100)), new Slot.Word("percent"))
                    .byDefault(100 * org.thermion.model.MarginRules.DEFAULT.endOfLife())
                    .source("common practice: tube testers mark a tube worn at 60-70 % of a new tube's plate current "
                            + "or transconductance (REFERENCES.md, End of life)"),
            Property.of("minimum", "noise margin below which check warns",
                    q("minimum noise margin", Unit.VOLT, from(0, 1000)))
                    .byDefault(org.thermion.model.MarginRules.DEFAULT.minMargin())
                    .source("our own design value: room for hum and crosstalk on open wiring"));

    static final PropertyTable PACKING = new PropertyTable("packing", "packing { ... }",
            Property.of("share", "`share per board TUBE ...`: sections of these tube types may share an envelope across modules of one board "
                            + "(each instance under the top with everything below it) or of the whole machine",
                    new Slot.Word("per"), name("scope", "sharing scope", List.of("module", "board", "machine")),
                    new Slot.Names("tubes", "tube types"))
                    .byDefault("per module").many(),
            Property.of("envelope", "these stages (named by their output nets, a latch by its Q) share one envelope, "
                            + "which keeps the given designator: a builder's already wired tube",
                    name("name", "an envelope designator", List.of()), new Slot.Text("stages", "the stages' output nets"))
                    .byDefault("none").many());

    /** Every table, in the order the reference lists them. */
    static final List<PropertyTable> ALL = List.of(RAIL, TUBE, STAGE, HEATERS, SOFTSTART, RELAY, REALIZE, PACKING, MACHINE,
            CLOCK, ROM, PC, MARGINS);

    Property get(String key) {
        for (Property p : properties) {
            if (p.key().equals(key)) {
                return p;
            }
        }
        return null;
    }

    /** A minimal declaration for a hint: {@code rail x { voltage 48 V }}, its required lines filled in. */
    String skeleton(String name) {
        List<String> required = properties.stream().filter(Property::isRequired).map(Property::example).toList();
        String head = heading.replace("NAME", name);
        return head.replace("{ ... }", required.isEmpty() ? "{ ... }" : "{ " + String.join("; ", required) + " }");
    }

    List<String> keys() {
        return properties.stream().map(Property::key).toList();
    }

    private static Property[] realizeEntries() {
        List<Property> out = new ArrayList<>();
        for (String w : StageFunction.realizableWords()) {
            out.add(Property.of(w, "the stage that realizes " + w + (w.equals("latch") ? " lines" : " in expressions"),
                    name("stage", "a stage name", List.of())).byDefault("none: an error where one is needed"));
        }
        return out.toArray(new Property[0]);
    }

    /** "low for not, nand; high for or, ...", from each function's definition. */
    private static String conductingStates() {
        StringBuilder b = new StringBuilder();
        for (StageFunction.Conducts c : StageFunction.Conducts.values()) {
            List<String> fns = Arrays.stream(StageFunction.values()).filter(f -> f.conducts() == c).map(StageFunction::word)
                    .toList();
            if (!fns.isEmpty() && c != StageFunction.Conducts.DEPENDS) {
                String state = c == StageFunction.Conducts.OUTPUT_LOW ? "low" : c == StageFunction.Conducts.OUTPUT_HIGH
                        ? "high" : "always";
                b.append(b.length() > 0 ? "; " : "").append(state).append(" for ").append(String.join(", ", fns));
            }
        }
        return b.toString();
    }

    private static Slot.Optional koren(String param) {
        return koren(param, above(0, 1e9));
    }

    private static Slot.Optional koren(String param, Slot.Range range) {
        return new Slot.Optional(param, List.of(plain("k_" + param, "Koren parameter " + param, range)));
    }

    private static Slot.Optional sourceOption() {
        return new Slot.Optional("source", List.of(text("modelsource", "where the parameters come from")));
    }

    /** Choice branches in the order written (the reference lists them so). */
    private static Map<String, List<Slot>> branches(Object... wordSlots) {
        Map<String, List<Slot>> m = new LinkedHashMap<>();
        for (int i = 0; i < wordSlots.length; i += 2) {
            @SuppressWarnings("unchecked")
            List<Slot> slots = (List<Slot>) wordSlots[i + 1];
            m.put((String) wordSlots[i], slots);
        }
        return java.util.Collections.unmodifiableMap(m);
    }

    private static Slot.Plain plain(String id, String what, Slot.Range range) {
        return new Slot.Plain(id, what, range);
    }

    private static Slot.Text text(String id, String what) {
        return new Slot.Text(id, what);
    }

    private static String percentOfRated(double fraction) {
        return Math.round(fraction * 100) + " % of rated";
    }

    private static Slot.Quantity q(String what, Unit unit, Slot.Range range) {
        return new Slot.Quantity("value", what, unit, range);
    }

    private static Slot.Quantity q(String id, String what, Unit unit, Slot.Range range) {
        return new Slot.Quantity(id, what, unit, range);
    }

    private static Slot.Plain plain(String what, Slot.Range range) {
        return new Slot.Plain("value", what, range);
    }

    private static Slot.Whole whole(String what, long min, long max) {
        return new Slot.Whole("value", what, min, max);
    }

    private static Slot.Name name(String id, String what, List<String> choices) {
        return new Slot.Name(id, what, choices);
    }

    private static Slot.Text text(String what) {
        return new Slot.Text("value", what);
    }

    private static List<String> words(Enum<?>[] values) {
        return Arrays.stream(values).map(v -> v.name().toLowerCase(Locale.ROOT)).toList();
    }

    private static Map<String, List<Slot>> orderedMap(String k1, List<Slot> v1, String k2, List<Slot> v2) {
        Map<String, List<Slot>> m = new LinkedHashMap<>();
        m.put(k1, v1);
        m.put(k2, v2);
        return java.util.Collections.unmodifiableMap(m);
    }
}
