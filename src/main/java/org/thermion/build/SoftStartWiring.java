package org.thermion.build;

import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.ThyratronStage;
import org.thermion.model.BypassTrigger;
import org.thermion.model.Envelope;
import org.thermion.model.Machine;
import org.thermion.model.Relay;
import org.thermion.model.SoftStart;

import java.util.List;
import java.util.Optional;

/**
 * Wires each soft start: its power resistor in the rail between the supply and the node behind it
 * (what it covers hangs there), the bypass relay's contacts across the resistor, and the relay's
 * coil as the description drives it: in the plate of the thyratron stage the bypass names (plate
 * resistor, grid network, cathode and shield grid on their rails), or on a terminal board for the
 * delay timer of a {@code bypass after} line, which the description does not draw.
 */
final class SoftStartWiring {
    private final WiringBuilder w;
    private final StageWiring stages;
    private final MachineCircuits circuits;

    SoftStartWiring(WiringBuilder w, StageWiring stages, MachineCircuits circuits) {
        this.w = w;
        this.stages = stages;
        this.circuits = circuits;
    }

    /** Wires soft start {@code index} of the machine. */
    void wire(int index) {
        Machine m = w.m;
        SoftStart s = m.softStarts().get(index);
        int key = StageKey.softStart(m, index);
        int supply = w.supply(m.rails().get(s.rail()).name());
        int behind = w.behind(s);
        String name = "soft start " + s.name();
        Optional<ThyratronStage> driver = circuits.softStartDriver(s);
        BypassTrigger.ThyratronWarm tw = s.trigger() instanceof BypassTrigger.ThyratronWarm t ? t : null;
        int module = tw == null ? -1 : m.envelopes().get(tw.envelope()).module();
        int board = module < 0 ? 0 : w.boards.of(module);
        // the resistor's rating is the description's (powerup sizes it for the surge); after the bypass it carries nothing
        w.twoLead(PartClass.RESISTOR, s.resistorOhms(), "power resistor", board, name, Double.NaN, s.ratedWatts(), key,
                supply, behind);
        Relay r = s.relay();
        String type = Values.relay(r.coilOhms(), r.ratedVolts(), r.pickupVolts());
        String role = "bypass of " + name;
        String[] pins = {"1", "2", "C", "NO"};
        if (tw != null && driver.isPresent()) {
            stages.bypassDriver(name, m.stages().get(tw.stage()), driver.get(), sections(m, tw.envelope()), module, key,
                    (feed, anode) -> w.multiLead(PartClass.RELAY, r.coilOhms(), type, board, role, key, pins,
                            new int[] {feed, anode, supply, behind}));
            return;
        }
        if (tw != null) {
            w.problems.add(name + ": stage " + m.stages().get(tw.stage()).name()
                    + " has no thyratron circuit; its tube and relay coil are not wired");
        }
        int a = w.local(name + "/coil 1", Node.Kind.LOCAL);
        int b = w.local(name + "/coil 2", Node.Kind.LOCAL);
        w.multiLead(PartClass.RELAY, r.coilOhms(), type, board, role, key, pins, new int[] {a, b, supply, behind});
        w.multiLead(PartClass.TERMINAL, "timer terminals", board, "bypass timer of " + name, key,
                new String[] {"coil 1", "coil 2"}, new int[] {a, b});
    }

    /** The sections of the thyratron's envelope, in order. */
    private static List<int[]> sections(Machine m, int envelope) {
        Envelope e = m.envelopes().get(envelope);
        return e.slots().stream().map(sl -> new int[] {envelope, sl.section()}).toList();
    }

    /** The soft start on rail {@code rail} that covers module instance {@code module}, or null. */
    static SoftStart covering(Machine m, String rail, int module) {
        for (SoftStart s : m.softStarts()) {
            if (m.rails().get(s.rail()).name().equals(rail) && s.cover().coversModule(module)) {
                return s;
            }
        }
        return null;
    }
}
