package org.thermion.faults;

import org.thermion.model.Envelope;
import org.thermion.model.Gate;
import org.thermion.model.HeaterString;
import org.thermion.model.Latch;
import org.thermion.model.Machine;

import java.util.ArrayList;
import java.util.List;

/**
 * Where a fault lives, in the builder's words: the module instance, the stage, the net and
 * the tube envelope (designator and type), and one line that says it all.
 */
public record FaultPlace(String module, String stage, String net, String envelope, String text) {

    /** Names fault {@code f} of circuit {@code c}. */
    public static FaultPlace of(FaultCircuit c, Fault f) {
        Machine m = c.machine();
        switch (f.kind()) {
            case STUCK_AT_0:
            case STUCK_AT_1:
                return wire(c, c.sites().get(f.subject()), f.kind().words);
            case DEAD_ENVELOPE: {
                Envelope e = m.envelopes().get(f.subject());
                String env = envelope(m, f.subject());
                return new FaultPlace(module(m, e.module()), "", "", env, env + " in " + module(m, e.module())
                        + ": " + f.kind().words);
            }
            case OPEN_HEATER: {
                HeaterString hs = m.heaterStrings().get(f.subject());
                List<String> tubes = new ArrayList<>();
                for (int e : hs.envelopes()) {
                    tubes.add(envelope(m, e));
                }
                String all = String.join(", ", tubes);
                return new FaultPlace(module(m, hs.module()), "", "", all,
                        f.kind().words + " in the string " + all);
            }
            case RELAY_OPEN: {
                Gate g = m.netlist().gates().get(f.subject());
                FaultPlace w = wire(c, c.sites().get(g.output()), f.kind().words);
                return new FaultPlace(w.module, w.stage, w.net, w.envelope, w.text);
            }
            case BRIDGE: {
                Bridge b = f.bridge();
                String a = shown(m.netlist().netName(b.slotA()));
                String other = shown(m.netlist().netName(b.slotB()));
                int module = b.envelope() >= 0 && b.envelope() < m.envelopes().size()
                        ? m.envelopes().get(b.envelope()).module() : -1;
                String env = b.tube() + " (" + b.type() + ")";
                return new FaultPlace(module(m, module), "", a + " / " + other, env, f.kind().words + " on socket "
                        + b.socket() + " pins " + Math.min(b.pinA(), b.pinB()) + "-" + Math.max(b.pinA(), b.pinB())
                        + ": " + name(a) + " and " + name(other) + ", " + b.behaviour(a, other));
            }
            default: {
                ObservedLamp lamp = c.lamps().get(f.subject());
                return new FaultPlace("", "", m.netlist().netName(lamp.net()), "", "lamp " + lamp.name() + ": "
                        + f.kind().words);
            }
        }
    }

    private static FaultPlace wire(FaultCircuit c, Site s, String what) {
        Machine m = c.machine();
        String net = shown(m.netlist().netName(s.net()));
        int gate = -1;
        int latch = -1;
        String role;
        switch (s.place()) {
            case INPUT: role = "switch " + m.inputs().get(s.index()).name(); break;
            case ROM: role = "program-memory line " + s.index(); break;
            case GATE_OUT: gate = s.index(); role = "output"; break;
            case LATCH_OUT: latch = s.index(); role = "output"; break;
            case GATE_IN: gate = s.index(); role = "input " + (s.pin() + 1); break;
            case LATCH_DATA: latch = s.index(); role = "data input"; break;
            case LATCH_ENABLE: latch = s.index(); role = "load input"; break;
            case PC_JUMP: role = "program counter jump input"; break;
            case PC_TARGET: role = "program counter target bit " + s.pin(); break;
            case LAMP: role = "lamp " + c.lamps().get(s.index()).name(); break;
            default: role = "constant"; break;
        }
        String module = module(m, m.netlist().netModule()[s.net()]);
        String stage = "";
        String env = "";
        if (gate >= 0) {
            Gate g = m.netlist().gates().get(gate);
            module = module(m, g.module());
            stage = (g.stage() >= 0 ? m.stages().get(g.stage()).name() : "flip-flop complement")
                    + arrow(m.netlist().netName(g.output()));
            env = envelope(m, m.gateEnvelope()[g.id()]);
        } else if (latch >= 0) {
            Latch l = m.netlist().latches().get(latch);
            module = module(m, l.module());
            stage = (l.stage() >= 0 ? m.stages().get(l.stage()).name() : "latch") + arrow(m.netlist().netName(l.output()));
            env = envelope(m, m.latchEnvelope()[l.id()]);
        }
        StringBuilder t = new StringBuilder();
        t.append(net.equals(UNNAMED) ? "an unnamed net" : "net " + net).append(' ').append(what).append(" at ").append(role);
        if (!stage.isEmpty()) {
            t.append(" of ").append(stage);
        }
        if (!module.isEmpty()) {
            t.append(" in ").append(module);
        }
        if (!env.isEmpty()) {
            t.append(", tube ").append(env);
        }
        return new FaultPlace(module, stage, net, env, t.toString());
    }

    /** How a net the elaborator made for a sub-expression (no name in the source) is shown. */
    static final String UNNAMED = "(unnamed)";

    /** Stem {@code slot}'s net as a builder finds it: its name, or for a net with none the stage driving it. */
    static String netLabel(FaultCircuit c, int slot) {
        FaultPlace p = wire(c, c.sites().get(slot), "");
        if (!p.net.equals(UNNAMED)) {
            return p.net;
        }
        return "the unnamed output of " + (p.stage.isEmpty() ? "a stage" : p.stage)
                + (p.module.isEmpty() ? "" : " in " + p.module) + (p.envelope.isEmpty() ? "" : ", tube " + p.envelope);
    }

    /** A net's name as a builder is shown it: a generated net ("lu.$18") as {@link #UNNAMED}. */
    static String shownName(String net) {
        return shown(net);
    }

    // A generated net ("lu.$18") means nothing to a builder: say it has no name.
    private static String shown(String net) {
        int dot = net.lastIndexOf('.');
        return net.startsWith("$", dot + 1) ? UNNAMED : net;
    }

    private static String name(String net) {
        return net.equals(UNNAMED) ? "an unnamed net" : "net " + net;
    }

    private static String arrow(String net) {
        String n = shown(net);
        return n.equals(UNNAMED) ? "" : " -> " + n;
    }

    private static String module(Machine m, int id) {
        if (id < 0 || id >= m.modules().size()) {
            return "";
        }
        String path = m.modules().get(id).path();
        return path.isEmpty() ? "top " + m.modules().get(id).type() : path;
    }

    private static String envelope(Machine m, int env) {
        if (env < 0) {
            return "";
        }
        Envelope e = m.envelopes().get(env);
        return e.designator() + " (" + m.tubes().get(e.tube()).name() + ")";
    }
}
