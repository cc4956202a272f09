package org.thermion.faults;

import org.thermion.model.Gate;
import org.thermion.model.GateFn;
import org.thermion.model.Latch;
import org.thermion.model.Machine;
import org.thermion.model.StageFunction;

/**
 * What two nets joined by a solder bridge carry, from how each net is driven. A stage holds the
 * level it conducts in through a tube section or a diode (firm: a few kilohms) and the other level
 * through a resistor (weak: a plate load, a pull-up or pull-down of a hundred kilohms and more); a
 * switch ties its net to a rail (stiff). Where two drivers disagree the stronger one wins; two of
 * equal strength fight and the level is unknown. So two plate outputs (inverter, NAND, NOR, a
 * flip-flop's plates, a diode AND's output) give low wins, a wired AND; two cathode followers or
 * diode OR outputs give high wins, a wired OR; a plate against a cathode follower is a fight; a
 * switch always wins. A diode gate passes its conducting level on from its inputs, no firmer than
 * they hold it: a diode OR fed by plates is weak both ways, so a plate shorted to it wins when low
 * and fights it (a divider of two resistors, level not computed: unknown) when high. Which level a stage conducts in is its function's {@link StageFunction#conducts()}
 * (the same fact the budget's {@code draw conducting} rests on).
 */
final class BridgeRule {
    static final int WEAK = 0;
    static final int FIRM = 1;
    static final int STIFF = 2;

    private final FaultCircuit c;

    BridgeRule(FaultCircuit c) {
        this.c = c;
    }

    /** The bridge between stems {@code netA} and {@code netB} at the given pins of {@code s}. */
    Bridge bridge(int netA, int netB, SocketPins s, int pinA, int pinB) {
        if (netA > netB) {
            return bridge(netB, netA, s, pinB, pinA);
        }
        return new Bridge(netA, netB, wins(strength(netA, false), strength(netB, true), (byte) 0),
                wins(strength(netA, true), strength(netB, false), (byte) 1), s.socket(), s.tubeRef(), s.type(),
                s.envelope(), pinA, pinB);
    }

    // A holds its value (a) with strength sa, B the other with sb.
    private static byte wins(int sa, int sb, byte a) {
        if (sa == sb) {
            return FaultSimulator.UNKNOWN;
        }
        return sa > sb ? a : (byte) (1 - a);
    }

    /** How firmly {@code net}'s driver holds it at {@code high} (or low). */
    int strength(int net, boolean high) {
        Site s = c.sites().get(net);
        Machine m = c.machine();
        switch (s.place()) {
            case INPUT:
                return STIFF;
            case ROM:
                // a diode-matrix data line: the selected row drives it high through a diode
                return high ? FIRM : WEAK;
            case LATCH_OUT: {
                Latch l = m.netlist().latches().get(s.index());
                return l.stage() >= 0 ? byConduction(m.stages().get(l.stage()).function(), high) : FIRM;
            }
            case GATE_OUT: {
                Gate g = m.netlist().gates().get(s.index());
                if (g.stage() >= 0) {
                    StageFunction fn = m.stages().get(g.stage()).function();
                    int own = byConduction(fn, high);
                    if (own == FIRM && (fn == StageFunction.AND || fn == StageFunction.OR)) {
                        // a diode passes on its input's level no firmer than that input holds it
                        int weakest = FIRM;
                        for (int in : g.inputs()) {
                            weakest = Math.min(weakest, strength(in, high));
                        }
                        return weakest;
                    }
                    return own;
                }
                if (g.fn() == GateFn.BUF && g.arity() == 1) {
                    return strength(g.input(0), high); // a wire to another net
                }
                if (g.fn() == GateFn.NOT && g.arity() == 1) {
                    return high ? WEAK : FIRM; // a flip-flop's second plate
                }
                return FIRM;
            }
            default:
                return FIRM;
        }
    }

    private static int byConduction(StageFunction fn, boolean high) {
        switch (fn.conducts()) {
            case OUTPUT_LOW:
            case ALWAYS:
                // plates (and a flip-flop's conducting side) pull low through the tube
                return high ? WEAK : FIRM;
            case OUTPUT_HIGH:
                return high ? FIRM : WEAK;
            default:
                return FIRM;
        }
    }
}
