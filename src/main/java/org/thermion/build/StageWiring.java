package org.thermion.build;

import org.thermion.circuit.CathodeReturn;
import org.thermion.circuit.DiodeGate;
import org.thermion.circuit.FlipFlop;
import org.thermion.circuit.GridNetwork;
import org.thermion.circuit.Lamp;
import org.thermion.circuit.LoadResistor;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.PlateLoad;
import org.thermion.circuit.RailSet;
import org.thermion.circuit.RelayCoil;
import org.thermion.circuit.ScreenSupply;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.ThyratronStage;
import org.thermion.circuit.TubeStage;
import org.thermion.model.Electrode;
import org.thermion.model.Gate;
import org.thermion.model.Latch;
import org.thermion.model.StageFunction;
import org.thermion.model.StageType;
import org.thermion.model.TubeKind;

import java.util.List;
import java.util.Optional;

/**
 * Wires one stage instance from its circuit ({@link MachineCircuits}): sections onto socket pins,
 * plate load, cathode return, screen supply, grid networks, as {@code CircuitBuilder} joins them.
 * A stage without a circuit (declared currents) is wired by its function: load resistor to its
 * rail, one grid per input (a pentode's second input on its suppressor), cathodes to ground.
 */
final class StageWiring {
    private final WiringBuilder w;
    private final MachineCircuits circuits;
    private final Dissipation heat;

    StageWiring(WiringBuilder w, MachineCircuits circuits, Dissipation heat) {
        this.w = w;
        this.circuits = circuits;
        this.heat = heat;
    }

    /**
     * A stage instance being wired: its key, type, sections (envelope, section), board, name for local
     * nodes, and the circuit its parts' dissipation comes from (null: the stage type's own).
     */
    private record Instance(int key, StageType type, List<int[]> sections, int board, String name, StageCircuit circuit) {
        Instance(int key, StageType type, List<int[]> sections, int board, String name) {
            this(key, type, sections, board, name, null);
        }
    }

    void gate(Gate g, List<int[]> sections, int qbarOf) {
        StageType st = w.m.stages().get(g.stage());
        Instance in = new Instance(StageKey.gate(g.id()), st, sections, w.boards.of(g.module()),
                w.m.netlist().netName(g.output()));
        w.module = g.module();
        w.place(in.name, sections);
        Optional<StageCircuit> c = circuits.circuit(st);
        int[] inputs = new int[g.arity()];
        for (int i = 0; i < inputs.length; i++) {
            inputs[i] = w.net(g.input(i));
        }
        function(in, c, inputs, w.net(g.output()));
        w.module = -1;
    }

    /** A stage with no flip-flop circuit, from the nodes of its inputs to the node of its output. */
    private void function(Instance in, Optional<StageCircuit> c, int[] inputs, int out) {
        if (c.isPresent() && c.get() instanceof TubeStage t) {
            tubeStage(in, t, inputs, out);
        } else if (c.isPresent() && c.get() instanceof DiodeGate d) {
            diodeGate(in, d.kind() == DiodeGate.Kind.AND, d.pullOhms(), d.pullRail(), "pull", inputs, out);
        } else if (c.isPresent() && c.get() instanceof ThyratronStage t) {
            thyratron(in, t, inputs.length > 0 ? inputs[0] : w.stageLocal(in.key, in.name, "in0"), out);
        } else {
            declared(in, inputs, out);
        }
    }

    /**
     * Stage instance {@code index} of a built block (program counter, ROM decoding, clock): its parts
     * and socket pins from its circuit like any stage's; its inputs and outputs are not nets of the
     * logic, so they end on a terminal board of the instance, to be joined as the block's own drawing
     * says. {@code key} is past every gate and latch key.
     */
    void built(String name, StageType st, List<int[]> sections, int module, int key) {
        Instance in = new Instance(key, st, sections, w.boards.of(module), name);
        w.module = module;
        w.place(name, sections);
        Optional<StageCircuit> c = circuits.circuit(st);
        List<String> pins = new java.util.ArrayList<>();
        List<Integer> nodes = new java.util.ArrayList<>();
        if (st.function() == StageFunction.LATCH) {
            int q = w.stageLocal(key, name, "plateA");
            int qb = w.stageLocal(key, name, "plateB");
            int data = w.local(name + "/data", Node.Kind.LOCAL);
            int load = w.local(name + "/load", Node.Kind.LOCAL);
            int clock = w.local(name + "/clock", Node.Kind.LOCAL);
            flipFlop(in, c, q, qb, data, load, clock);
            pins.addAll(List.of("Q", "not Q", "data", "load", "clock"));
            nodes.addAll(List.of(q, qb, data, load, clock));
        } else {
            int n = c.map(StageCircuit::inputs).orElse(st.fanIn());
            int[] inputs = new int[Math.max(n, 0)];
            for (int i = 0; i < inputs.length; i++) {
                inputs[i] = w.local(name + "/in" + i, Node.Kind.LOCAL);
                pins.add("in " + i);
                nodes.add(inputs[i]);
            }
            int out = w.local(name + "/out", Node.Kind.LOCAL);
            function(in, c, inputs, out);
            pins.add("out");
            nodes.add(out);
        }
        w.multiLead(PartClass.TERMINAL, "block terminals", in.board, "terminals of " + name, key,
                pins.toArray(new String[0]), nodes.stream().mapToInt(Integer::intValue).toArray());
        w.module = -1;
    }

    /**
     * A soft start's thyratron, instance {@code key} in {@code sections} of module {@code module}:
     * wired as its relay stage {@code driver} (whose load is the bypass relay's coil), the grid
     * network's input on ground as `powerup` and `levels` solve it (the tube fires by warming, not
     * by its grid). {@code coil} wires the relay between the plate feed and the anode.
     */
    void bypassDriver(String name, StageType st, ThyratronStage driver, List<int[]> sections, int module, int key,
                      Between coil) {
        Instance in = new Instance(key, st, sections, w.boards.of(module), name, driver);
        w.module = module;
        w.place(name, sections);
        thyratron(in, driver, w.rail(circuits.rails().highest().name()), w.stageLocal(key, name, "plate"), coil);
        w.module = -1;
    }

    /** Wires a part between two nodes. */
    interface Between {
        void wire(int a, int b);
    }

    void latch(Latch l, List<int[]> sections, int qbar) {
        StageType st = w.m.stages().get(l.stage());
        Instance in = new Instance(StageKey.latch(w.m.netlist(), l.id()), st, sections, w.boards.of(l.module()),
                w.m.netlist().netName(l.output()));
        w.module = l.module();
        w.place(in.name, sections);
        Optional<StageCircuit> c = circuits.circuit(st);
        int q = w.net(l.output());
        int qb = qbar >= 0 ? w.net(qbar) : w.stageLocal(in.key, in.name, "plateB");
        int enable = l.enable() >= 0 ? w.net(l.enable()) : w.rail(RailSet.GROUND);
        int clock = w.local("clock phase " + l.phase(), org.thermion.build.Node.Kind.RAIL);
        flipFlop(in, c, q, qb, w.net(l.data()), enable, clock);
        w.module = -1;
    }

    /** A cross-coupled pair between plates {@code q} and {@code qb}, steered from {@code data}. */
    private void flipFlop(Instance in, Optional<StageCircuit> c, int q, int qb, int data, int enable, int clock) {
        StageType st = in.type;
        String rail;
        double load;
        GridNetwork cross;
        CathodeReturn cathode;
        if (c.isPresent() && c.get() instanceof FlipFlop f) {
            rail = f.plateRail();
            load = f.loadOhms();
            cross = f.cross();
            cathode = f.cathode();
        } else {
            rail = w.m.rails().get(Math.max(0, st.loadRail())).name();
            load = st.loadOhms() > 0 ? st.loadOhms() : 10e3;
            cross = GridNetwork.direct();
            cathode = CathodeReturn.grounded();
            w.problems.add("stage " + st.name() + " has no flip-flop circuit: " + in.name + " is wired with its declared load and direct cross-coupling");
        }
        int r = w.rail(rail);
        resistor(in, "load", load, r, q, "plate load A");
        resistor(in, "load", load, r, qb, "plate load B");
        int k = cathode(in, cathode);
        int ga = grid(in, cross, qb, "A");
        int gb = grid(in, cross, q, "B");
        section(in, 0, Electrode.PLATE, q);
        section(in, 0, Electrode.GRID, ga);
        section(in, 0, Electrode.CATHODE, k);
        section(in, 1, Electrode.PLATE, qb);
        section(in, 1, Electrode.GRID, gb);
        section(in, 1, Electrode.CATHODE, k);
        // The data input's load in the circuit is one grid network (FlipFlop.inputLoad): its divider
        // from the data net to the bias rail is wired here, part by part. The circuit has no gating
        // parts: the divider's tap, the load enable and the clock phase end on a terminal board with
        // both grids, for the builder's steering gate.
        int steer = grid(in, cross, data, "D", "steering");
        w.multiLead(PartClass.TERMINAL, "steering terminals", in.board, "steering of " + in.name, in.key,
                new String[] {"steering tap", "load", "clock", "grid A", "grid B"},
                new int[] {steer, enable, clock, ga, gb});
    }

    private void tubeStage(Instance in, TubeStage t, int[] inputs, int out) {
        boolean cathodeOut = t.output() == TubeStage.Output.CATHODE;
        int rail = w.rail(t.plateRail());
        int plate = t.load().direct() ? rail : cathodeOut ? w.stageLocal(in.key, in.name, "plate") : out;
        if (!t.load().direct()) {
            load(in, t.load(), rail, plate);
        }
        int k = cathodeOut ? cathodeTo(in, t.cathode(), out) : cathode(in, t.cathode());
        int screen = t.screen() == null ? -1 : screen(in, t.screen());
        int spi = t.sectionsPerInput();
        boolean series = t.arrangement() == TubeStage.Arrangement.SERIES;
        int below = k;
        for (int i = 0; i < inputs.length; i++) {
            int g = grid(in, t.grid(), inputs[i], String.valueOf(i));
            int p = series && i < inputs.length - 1 ? w.stageLocal(in.key, in.name, "stack" + i) : plate;
            int kk = series ? below : k;
            for (int s = 0; s < spi; s++) {
                int sec = i * spi + s;
                section(in, sec, Electrode.PLATE, p);
                section(in, sec, Electrode.GRID, g);
                section(in, sec, Electrode.CATHODE, kk);
                if (screen >= 0) {
                    section(in, sec, Electrode.SCREEN, screen);
                    optional(in, sec, Electrode.SUPPRESSOR, kk);
                }
            }
            below = p;
        }
    }

    private void diodeGate(Instance in, boolean and, double pullOhms, String pullRail, String what, int[] inputs, int out) {
        resistor(in, what, pullOhms, out, w.rail(pullRail), and ? "pull-up" : "pull-down");
        for (int i = 0; i < inputs.length; i++) {
            int input = inputs[i];
            section(in, i, Electrode.PLATE, and ? out : input);
            section(in, i, Electrode.CATHODE, and ? input : out);
        }
    }

    private void thyratron(Instance in, ThyratronStage t, int input, int output) {
        thyratron(in, t, input, output, (top, anode) -> load(in, t.load(), top, anode));
    }

    /** A thyratron stage whose plate load {@code load} wires between the feed and the anode. */
    private void thyratron(Instance in, ThyratronStage t, int input, int output, Between load) {
        int rail = w.rail(t.plateRail());
        int top = rail;
        if (t.plateOhms() > 0) {
            top = w.stageLocal(in.key, in.name, "feed");
            resistor(in, "plate", t.plateOhms(), rail, top, "plate resistor");
        }
        int anode = output;
        load.wire(top, anode);
        int k = cathode(in, t.cathode());
        int g = grid(in, t.grid(), input, "0");
        section(in, 0, Electrode.PLATE, anode);
        section(in, 0, Electrode.GRID, g);
        section(in, 0, Electrode.CATHODE, k);
        optional(in, 0, Electrode.SCREEN, k);
    }

    /** A stage without a circuit, wired by its function from the declared load. */
    private void declared(Instance in, int[] inputs, int out) {
        StageType st = in.type;
        String rail = st.loadRail() >= 0 ? w.m.rails().get(st.loadRail()).name() : RailSet.GROUND;
        boolean diode = w.m.tubes().get(st.tube()).kind() == TubeKind.DIODE;
        if (diode) {
            diodeGate(in, st.function() == StageFunction.AND, st.loadOhms(), rail, "load", inputs, out);
            return;
        }
        if (st.loadOhms() > 0) {
            resistor(in, "load", st.loadOhms(), w.rail(rail), out, "plate load");
        }
        int ground = w.rail(RailSet.GROUND);
        int sections = in.sections.size();
        boolean pentode = w.m.tubes().get(st.tube()).kind() == TubeKind.PENTODE;
        for (int s = 0; s < sections; s++) {
            section(in, s, Electrode.PLATE, out);
            section(in, s, Electrode.CATHODE, ground);
            if (pentode) {
                section(in, s, Electrode.SCREEN, w.rail(rail));
            }
        }
        for (int i = 0; i < inputs.length; i++) {
            int input = inputs[i];
            if (i < sections) {
                section(in, i, Electrode.GRID, input);
            } else if (pentode && i == sections) {
                section(in, 0, Electrode.SUPPRESSOR, input);
            } else {
                w.problems.add("stage " + st.name() + " (" + in.name + "): input " + (i + 1) + " has no electrode to go to");
            }
        }
        if (pentode && inputs.length <= sections) {
            for (int s = 0; s < sections; s++) {
                optional(in, s, Electrode.SUPPRESSOR, ground);
            }
        }
    }

    private void load(Instance in, PlateLoad load, int rail, int plate) {
        if (load instanceof LoadResistor r) {
            resistor(in, "load", r.ohms(), rail, plate, "plate load");
        } else if (load instanceof RelayCoil c) {
            w.twoLead(PartClass.RELAY, c.ohms(), Values.relay(c.ohms(), Double.NaN, c.pickupAmps() * c.ohms()), in.board, "relay in the plate of " + in.name,
                    Double.NaN, in.key, rail, plate);
        } else if (load instanceof Lamp l) {
            w.twoLead(PartClass.LAMP, l.hotOhms(), "lamp " + volts(l.ratedVolts()) + " V " + milli(l.ratedAmps()) + " mA",
                    in.board, "lamp in the plate of " + in.name, l.ratedVolts() * l.ratedAmps(), in.key, rail, plate);
        }
    }

    private int cathode(Instance in, CathodeReturn c) {
        if (c.ohms() == 0) {
            return w.rail(c.rail());
        }
        return cathodeTo(in, c, w.stageLocal(in.key, in.name, "cathode"));
    }

    private int cathodeTo(Instance in, CathodeReturn c, int k) {
        if (c.ohms() == 0) {
            w.problems.add(in.name + ": a cathode output without a cathode resistor");
            return k;
        }
        if (c.coil() != null) {
            // a follower driving its relay: the cathode return is the coil, a relay on the parts list
            w.twoLead(PartClass.RELAY, c.ohms(), Values.relay(c.ohms(), Double.NaN, c.coil().pickupAmps() * c.ohms()), in.board, "relay in the cathode of "
                    + in.name, Double.NaN, in.key, k, w.rail(c.rail()));
        } else {
            resistor(in, "cathode", c.ohms(), k, w.rail(c.rail()), "cathode resistor");
        }
        return k;
    }

    private int screen(Instance in, ScreenSupply s) {
        if (s.ohms() == 0) {
            return w.rail(s.rail());
        }
        int node = w.stageLocal(in.key, in.name, "screen");
        resistor(in, "screen", s.ohms(), w.rail(s.rail()), node, "screen resistor");
        return node;
    }

    /** The grid network from {@code input}; returns the node the grid pin goes to. */
    private int grid(Instance in, GridNetwork g, int input, String tag) {
        return grid(in, g, input, tag, "grid");
    }

    /** As {@link #grid(Instance, GridNetwork, int, String)}, its parts' roles starting with {@code what}. */
    private int grid(Instance in, GridNetwork g, int input, String tag, String what) {
        int tap = input;
        if (g.seriesOhms() > 0) {
            tap = w.stageLocal(in.key, in.name, "tap" + tag);
            resistor(in, "grid.series", g.seriesOhms(), input, tap, what + " series " + tag);
        }
        if (Double.isFinite(g.toBiasOhms()) && g.toBiasOhms() > 0) {
            resistor(in, "grid.tobias", g.toBiasOhms(), tap, w.rail(g.biasRail()), what + " to bias " + tag);
        }
        if (g.stopperOhms() > 0) {
            int pin = w.stageLocal(in.key, in.name, what + tag);
            resistor(in, "grid.stopper", g.stopperOhms(), tap, pin, what + " stopper " + tag);
            return pin;
        }
        return tap;
    }

    private void resistor(Instance in, String label, double ohms, int a, int b, String role) {
        double watts = in.circuit == null ? heat.watts(in.type, label, ohms) : heat.watts(in.name, in.circuit, label, ohms);
        w.twoLead(PartClass.RESISTOR, ohms, "resistor", in.board, role + " of " + in.name, watts, in.key, a, b);
    }

    /** Section {@code i} of the instance's sections (0-based) gets electrode {@code e} on {@code node}. */
    private void section(Instance in, int i, Electrode e, int node) {
        if (i >= in.sections.size()) {
            w.problems.add(in.name + ": stage " + in.type.name() + " needs section " + (i + 1) + " but has " + in.sections.size());
            return;
        }
        int[] es = in.sections.get(i);
        w.pin(es[0], es[1], e, node);
    }

    /** As {@link #section}, only where the tube has that electrode on a pin. */
    private void optional(Instance in, int i, Electrode e, int node) {
        if (i < in.sections.size() && w.has(in.sections.get(i)[0], in.sections.get(i)[1], e)) {
            section(in, i, e, node);
        }
    }

    static String ohmsText(double ohms) {
        return Values.ohms(ohms);
    }

    private static String volts(double v) {
        return Values.plain(v);
    }

    private static String milli(double a) {
        return Values.plain(a * 1e3);
    }
}
