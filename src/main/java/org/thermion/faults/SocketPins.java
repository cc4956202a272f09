package org.thermion.faults;

import org.thermion.build.BuildDocuments;
import org.thermion.build.Node;
import org.thermion.build.Wiring;
import org.thermion.model.Machine;

import java.util.ArrayList;
import java.util.List;

/**
 * One tube socket as the build documents wire it, reduced to what a solder bridge needs: its
 * designators, tube type, base, the envelope it holds, and per pin (index = pin - 1) the logic net
 * wired there, or -1 where the pin carries no logic net (a grid behind its divider, a cathode, a
 * rail, a heater, a spare pin).
 */
public record SocketPins(String socket, String tubeRef, String type, String base, int envelope, int[] nets) {
    public SocketPins {
        nets = nets.clone();
    }

    /**
     * The machine's sockets as the build documents wire them: a pin carries a logic net only when
     * it is wired straight to one (a plate, a diode's electrode, a grid fed without a divider).
     */
    public static List<SocketPins> of(Machine m) {
        Wiring w = BuildDocuments.of(m).wiring();
        List<SocketPins> out = new ArrayList<>();
        for (Wiring.Socket s : w.sockets()) {
            int[] nets = new int[s.pins()];
            for (int p = 1; p <= s.pins(); p++) {
                int node = s.node(p);
                Node n = node < 0 ? null : w.nodes().get(node);
                nets[p - 1] = n != null && n.kind() == Node.Kind.NET ? n.net() : -1;
            }
            out.add(new SocketPins(s.ref(), s.tubeRef(), s.tube(), s.base(), s.envelope(), nets));
        }
        return out;
    }

    public int net(int pin) {
        return nets[pin - 1];
    }

    public int pins() {
        return nets.length;
    }

    /**
     * Pairs of neighbouring pins {@code {p, q}} around the base. Pins are numbered round the circle,
     * so p and p + 1 are neighbours. The last and the first are neighbours only on a base whose pins
     * are evenly spaced all round: the octal base (8 pins at 45 degrees, the key on the spigot). The
     * 7-pin miniature and the 9-pin noval bases leave one pin position empty between their last and
     * first pins (8 and 10 positions on the circle), the wide gap that orients the tube, so a drop of
     * solder joins those two far less readily than real neighbours (from memory: the button-base
     * drawings of the 7- and 9-pin families).
     */
    public static List<int[]> neighbours(String base, int pins) {
        List<int[]> out = new ArrayList<>();
        for (int p = 1; p < pins; p++) {
            out.add(new int[] {p, p + 1});
        }
        if (wrapsRound(base) && pins > 2) {
            out.add(new int[] {pins, 1});
        }
        return out;
    }

    /** True for a base whose last and first pins are neighbours (no gap in the circle). */
    public static boolean wrapsRound(String base) {
        return "octal".equals(base);
    }
}
