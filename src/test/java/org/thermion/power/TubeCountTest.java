package org.thermion.power;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;

/** Sections per envelope from the parts library: 12AU7 twin triode (2), 6AU6 pentode (1). */
class TubeCountTest {
    @Test
    void aLoneCathodeFollowerLeavesHalfATwinTriodeSpare() {
        Machine m = PowerMachines.of("""
                rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
                rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
                rail heat  { voltage 12.6 V; source 0.01 ohm; limit 10 A }
                heaters on heat {
                  parallel 12AU7 at 12.6 V
                  series 2 of 6AU6 across machine
                }
                realize {
                  not pentode_inverter
                }
                module top {
                  in a
                  out y, z
                  net n
                  n = !a
                  z = !n
                  y = cathode_follower(n)
                }
                machine count {
                  clock { phases 2; period 100 us }
                  top top
                  inputs a
                  outputs y z
                }
                """);
        TubeCount c = new TubeCount(m);
        assertThat(c.total()).isEqualTo(3);
        assertThat(c.byType()).hasSize(2);
        TubeCount.Row twin = c.byType().stream().filter(r -> m.tubes().get(r.tube()).name().equals("12AU7"))
                .findFirst().orElseThrow();
        assertThat(twin.envelopes()).isEqualTo(1);
        assertThat(twin.sectionsUsed()).isEqualTo(1);
        assertThat(twin.sectionsSpare()).isEqualTo(1);
        TubeCount.Row top = c.module(0);
        assertThat(top.envelopes()).isEqualTo(3);
        assertThat(top.sectionsUsed()).isEqualTo(3);
        assertThat(top.sectionsSpare()).isEqualTo(1);
        assertThat(c.sectionsSpare()).isEqualTo(1);
    }

    @Test
    void theDemoCountMatchesItsModules() throws Exception {
        Machine m = PowerMachines.file(java.nio.file.Path.of("examples/pumpstation/pumpstation.machine"));
        TubeCount c = new TubeCount(m);
        assertThat(c.total()).isEqualTo(m.envelopes().size());
        assertThat(c.byModule().stream().mapToInt(TubeCount.Row::envelopes).sum()).isEqualTo(c.total());
        // every envelope's sections are either used or spare
        int sections = m.envelopes().stream().mapToInt(e -> m.tubes().get(e.tube()).sections()).sum();
        assertThat(c.sectionsUsed() + c.sectionsSpare()).isEqualTo(sections);
    }
}
