package org.thermion.circuit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.thermion.elab.Elaborator;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;
import org.thermion.sim.SimMachines;

class RailLoadingTest {

    private static Machine machine(String text) {
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), d).elaborateText(Path.of("rails.machine"), text);
        assertThat(d.hasErrors()).as(d.all().toString()).isFalse();
        return m;
    }

    @Test
    void declaredDrawsLowerTheRailByOhmsLaw() {
        // Hand check (Ohm's law): four inverters typed at 2 mA low, 0.5 mA high on a 48 V rail of
        // 100 ohm. Heavy: 4 x 2 mA = 8 mA, 48 - 0.8 = 47.2 V; light: 4 x 0.5 mA = 2 mA, 47.8 V.
        Machine m = machine("""
                rail bplus { voltage 48 V; source 100 ohm }
                rail heat { voltage 6.3 V }
                tube TX1 { kind triode; sections 1; heater 6.3 V 300 mA }
                heaters on heat { parallel TX1 at 6.3 V }
                stage inv : not { tube TX1; draw low bplus 2 mA; draw high bplus 0.5 mA }
                realize { not inv }
                module top { in a, b, c, d
                  out w, x, y, z
                  w = !a
                  x = !b
                  y = !c
                  z = !d }
                machine r { top top; inputs a b c d; outputs w x y z }
                """);
        MachineCircuits mc = MachineCircuits.of(m);
        assertThat(mc.instances(m.stages().get(0))).isEqualTo(4);
        LoadedRails heavy = mc.loaded(Loading.HEAVY);
        LoadedRails light = mc.loaded(Loading.LIGHT);
        assertThat(heavy.problem()).isNull();
        assertThat(heavy.volts("bplus")).isCloseTo(47.2, within(1e-3));
        assertThat(light.volts("bplus")).isCloseTo(47.8, within(1e-3));
        // The heater rail has no source resistance: 4 heaters at 0.3 A leave it at 6.3 V.
        assertThat(heavy.rails().get("heat").amps()).isCloseTo(1.2, within(1e-9));
        assertThat(heavy.volts("heat")).isEqualTo(6.3);
    }

    @Test
    void computedLoadsAgreeWithTheRailTheyAreSolvedAt() {
        Machine m = machine(SimMachines.PRELUDE + """
                module top { in a, b
                  out y, z
                  y = !(a | b)
                  z = !a }
                machine r { top top; inputs a b; outputs y z }
                """);
        MachineCircuits mc = MachineCircuits.of(m);
        for (Loading l : Loading.values()) {
            LoadedRails r = mc.loaded(l);
            assertThat(r.problem()).isNull();
            for (RailState s : r.rails().values()) {
                // Agreement: the terminal volts are the declared volts less the source drop.
                assertThat(s.volts()).as(s.rail()).isCloseTo(s.nominalVolts() - s.sourceOhms() * s.amps(),
                        within(2 * RailLoading.TOLERANCE_VOLTS));
            }
        }
        // The bias rail sinks the grid dividers' current: it rises toward 0 V, more at heavy load.
        assertThat(mc.loaded(Loading.HEAVY).volts("bplus")).isLessThan(mc.loaded(Loading.LIGHT).volts("bplus"));
        assertThat(mc.loaded(Loading.HEAVY).volts("bplus")).isLessThan(48);
        assertThat(mc.currents(m.stages().get(0), Loading.HEAVY).computed()).isTrue();
    }

    @Test
    void aRailThatCannotSupplyItsLoadIsSaid() {
        Machine m = machine("""
                rail bplus { voltage 48 V; source 100 k }
                rail heat { voltage 6.3 V }
                tube TX1 { kind triode; sections 1; heater 6.3 V 300 mA }
                heaters on heat { parallel TX1 at 6.3 V }
                stage inv : not { tube TX1; draw low bplus 2 mA; draw high bplus 2 mA }
                realize { not inv }
                module top { in a
                  out w
                  w = !a }
                machine r { top top; inputs a; outputs w }
                """);
        LoadedRails r = MachineCircuits.of(m).loaded(Loading.HEAVY);
        assertThat(r.problem()).contains("bplus").contains("cannot supply");
    }
}
