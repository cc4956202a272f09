package org.thermion.model;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Model records keep their own copies: changing what was passed in, or what came out, changes nothing. */
class RecordCopiesTest {

    @Test
    void gateInputsAreCopiedInAndOut() {
        int[] in = {2, 3};
        Gate g = new Gate(0, GateFn.NAND, in, 4, -1, 0);
        in[0] = 9;
        g.inputs()[1] = 9;
        assertThat(g.inputs()).containsExactly(2, 3);
        assertThat(g.input(0)).isEqualTo(2);
        assertThat(g.arity()).isEqualTo(2);
    }

    @Test
    void netlistArraysAndListsAreCopies() {
        String[] names = {"0", "1", "a"};
        int[] module = {0, 0, 0};
        List<Gate> gates = new ArrayList<>();
        Netlist nl = new Netlist(names, module, gates, List.of());
        names[2] = "b";
        module[2] = 5;
        gates.add(new Gate(0, GateFn.NOT, new int[] {2}, 2, -1, 0));
        nl.netNames()[2] = "c";
        assertThat(nl.netName(2)).isEqualTo("a");
        assertThat(nl.netModule(2)).isZero();
        assertThat(nl.gates()).isEmpty();
        assertThatThrownBy(() -> nl.latches().add(null)).isInstanceOf(UnsupportedOperationException.class);
    }

    @Test
    void heaterStringListsAreImmutable() {
        List<Integer> env = new ArrayList<>(List.of(0, 1));
        HeaterString hs = new HeaterString(0, env, List.of(new HeaterRating(6.3, 0.3), new HeaterRating(6.3, 0.3)), 0,
                false, 0, 0);
        env.add(2);
        assertThat(hs.envelopes()).containsExactly(0, 1);
        assertThatThrownBy(() -> hs.ratings().clear()).isInstanceOf(UnsupportedOperationException.class);
    }

    @Test
    void romAndCounterNetsAreCopies() {
        int[] data = {5, 6};
        Rom rom = new Rom(16, 2, data, false);
        data[0] = 0;
        rom.dataNets()[1] = 0;
        assertThat(rom.dataNets()).containsExactly(5, 6);
        ProgramCounter pc = new ProgramCounter(2, 0, 3, data, false);
        data[1] = 1;
        assertThat(pc.targetNets()).containsExactly(0, 6);
    }
}
