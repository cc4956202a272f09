package org.thermion.faults;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Solder bridges on a hand-made machine (bridges.machine: switches x, y; plates px = not x,
 * py = not y; followers fx = x, fy = y; a lamp on each), each with the lamps it must give.
 */
class BridgeTest {
    private static final Machine M = Bench.load(Path.of("src", "test", "resources", "org", "thermion", "faults",
            "bridges.machine"));
    private static final byte X = FaultSimulator.UNKNOWN;

    private static int net(String name) {
        return Arrays.asList(M.netlist().netNames()).indexOf(name);
    }

    /** A noval socket with net {@code a} on pin 1 and {@code b} on pin 2, nothing else wired to logic. */
    private static SocketPins socket(String a, String b) {
        int[] nets = new int[9];
        Arrays.fill(nets, -1);
        nets[0] = net(a);
        nets[1] = net(b);
        return new SocketPins("XV1", "V1", "test", "noval", 0, nets);
    }

    /** The lamps px, py, fx, fy for switches (x, y) with the bridge between {@code a} and {@code b}. */
    private static byte[] lamps(String a, String b, boolean x, boolean y) {
        FaultCircuit c = FaultCircuit.of(M);
        FaultList list = FaultList.of(c, List.of(socket(a, b)));
        Fault bridge = list.all().get(list.all().size() - 1);
        assertThat(bridge.kind()).isEqualTo(FaultKind.BRIDGE);
        List<Step> steps = List.of(new Step(new boolean[] {x, y}, 1));
        byte[] ref = new OneFaultSimulator(c, null).run(bridge, steps);
        try (FaultSimulator fast = new FaultSimulator(c, null, 1)) {
            assertThat(fast.responses(List.of(bridge), steps)[0]).isEqualTo(ref);
        }
        return ref;
    }

    private static Bridge only(String a, String b) {
        FaultList list = FaultList.of(FaultCircuit.of(M), List.of(socket(a, b)));
        assertThat(list.bridges()).hasSize(1);
        return list.bridges().get(0);
    }

    @Test
    void twoPlatesShortedGiveLowWinsAWiredAnd() {
        // px = 1 (load pulls up), py = 0 (tube conducts): the conducting tube wins, both read 0.
        assertThat(only("px", "py").behaviour("px", "py")).isEqualTo("low wins (wired AND)");
        assertThat(lamps("px", "py", false, true)).containsExactly(0, 0, 0, 1);
        assertThat(lamps("px", "py", false, false)).containsExactly(1, 1, 0, 0);
    }

    @Test
    void twoFollowersShortedGiveHighWinsAWiredOr() {
        // fx = 1 (tube conducts, sourcing), fy = 0 (cathode resistor): both read 1.
        assertThat(only("fx", "fy").behaviour("fx", "fy")).isEqualTo("high wins (wired OR)");
        assertThat(lamps("fx", "fy", true, false)).containsExactly(0, 1, 1, 1);
        assertThat(lamps("fx", "fy", false, false)).containsExactly(1, 1, 0, 0);
    }

    @Test
    void aPlateShortedToAFollowerIsAFightWheneverTheyDiffer() {
        // px = not x and fx = x always differ: two tubes conducting against each other (x = 1), or
        // a load resistor against a cathode resistor (x = 0); neither level is a logic level.
        assertThat(lamps("px", "fx", true, false)).containsExactly(X, 1, X, 0);
        assertThat(lamps("px", "fx", false, false)).containsExactly(X, 1, X, 0);
    }

    @Test
    void aSwitchShortedToAPlateWinsBothWays() {
        // The switch ties y's wire to a rail: px follows y, y itself is unchanged (py = not y).
        assertThat(only("px", "y").behaviour("y", "px")).isEqualTo("y wins");
        assertThat(lamps("px", "y", true, true)).containsExactly(1, 0, 1, 1);
        assertThat(lamps("px", "y", false, false)).containsExactly(0, 1, 0, 0);
    }

    @Test
    void neighboursWrapRoundOnlyOnTheOctalBase() {
        assertThat(SocketPins.neighbours("octal", 8)).hasSize(8).anyMatch(p -> p[0] == 8 && p[1] == 1);
        assertThat(SocketPins.neighbours("noval", 9)).hasSize(8).noneMatch(p -> p[0] == 9 && p[1] == 1);
        assertThat(SocketPins.neighbours("miniature7", 7)).hasSize(6).noneMatch(p -> p[0] == 7 && p[1] == 1);
    }

    @Test
    void theDecoderBoardsTwelveBridgesAreDiodeAndOutputsShortedToFlipFlopPlatesLowWins() {
        // Each 6AL5 has cathode 1 (pin 1, a flip-flop plate) beside plate 2 (pin 2, a diode AND's
        // output); pins 7 (plate 1) and 1 do not touch across the miniature base's gap.
        Machine m = Bench.load(Path.of("examples", "decoder-board", "decoder-board.machine"));
        FaultList list = FaultList.of(FaultCircuit.of(m), SocketPins.of(m));
        assertThat(list.bridges()).hasSize(12).allMatch(b -> b.behaviour("a", "b").equals("low wins (wired AND)"));
        assertThat(list.bridgeCollapsedCount()).isEqualTo(12);
        List<String> places = new ArrayList<>();
        for (Fault f : list.all()) {
            if (f.kind() == FaultKind.BRIDGE) {
                places.add(FaultPlace.of(list.circuit(), f).text());
            }
        }
        assertThat(places).contains("solder bridge on socket A1XV1 pins 1-2: net line[0] and net held[0]_n, low wins (wired AND)");
    }

    @Test
    void theSameTwoNetsBridgedOnTwoSocketsAreOneClass() {
        FaultList list = FaultList.of(FaultCircuit.of(M), List.of(socket("px", "py"), socket("py", "px")));
        assertThat(list.bridges()).hasSize(2);
        assertThat(list.bridgeCollapsedCount()).isEqualTo(1);
        assertThat(list.collapsed().stream().filter(f -> f.kind() == FaultKind.BRIDGE)).hasSize(1);
    }
}
