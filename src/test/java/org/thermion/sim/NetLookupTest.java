package org.thermion.sim;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Finding nets of the demo machine by the names the netlist gives them. */
class NetLookupTest {
    static final Machine DEMO = SimMachines.demo();
    final NetLookup lookup = new NetLookup(DEMO);

    @Test
    void singleNetsBusBitsAndWholeBuses() {
        assertThat(lookup.resolve("acc")).containsExactly(SimMachines.net(DEMO, "acc"));
        assertThat(lookup.resolve("line[3]")).containsExactly(SimMachines.net(DEMO, "line[3]"));
        String inner = VcdWriterTest.innerBusBit(DEMO);
        assertThat(lookup.resolve(inner)).containsExactly(SimMachines.net(DEMO, inner));
        assertThat(lookup.resolve("line")).hasSize(16).startsWith(SimMachines.net(DEMO, "line[0]"))
                .endsWith(SimMachines.net(DEMO, "line[15]"));
        // A bus sorts by bit index, not by name: line[10] comes after line[9].
        assertThat(lookup.resolve("line").get(10)).isEqualTo(SimMachines.net(DEMO, "line[10]"));
    }

    @Test
    void unknownNamesSuggestTheNearest() {
        assertThatThrownBy(() -> lookup.resolve("acc_nxt")).hasMessage("no net named 'acc_nxt'; did you mean 'acc_next'?");
        assertThatThrownBy(() -> lookup.resolve("osel.src"))
                .hasMessageContaining("a port takes the name of the net it is connected to: did you mean 'src'?");
        assertThatThrownBy(() -> lookup.resolve("zzzzzzzz")).hasMessage("no net named 'zzzzzzzz'");
    }

    @Test
    void temporariesAreRecognised() {
        assertThat(NetLookup.temporary("lu.$4")).isTrue();
        assertThat(NetLookup.temporary("$24")).isTrue();
        assertThat(NetLookup.temporary("lu.inv")).isFalse();
        assertThat(NetLookup.temporary("ir[8]_n")).isFalse();
    }
}
