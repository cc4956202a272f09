package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Gate;
import org.thermion.model.GateFn;
import org.thermion.model.Machine;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** How expressions become stages: fan-in trees, free complements, shared gates. */
class ElaborationTest {
    static final String PARTS = """
            rail bplus { voltage 48 V }
            rail bias { voltage -24 V }
            rail heat { voltage 12.6 V }
            heaters on heat {
              parallel 12AU7 at 12.6 V
              series 2 of 6AL5 6AU6 across machine
            }
            realize { not pentode_inverter; nand pentode_nand2; and diode_and; or diode_or; latch triode_flipflop }
            """;

    static Machine elaborate(String body, Diagnostics d) {
        return new Elaborator(new SourceSet(), d).elaborateText(Path.of("test.machine"), PARTS + body);
    }

    static long count(Machine m, GateFn fn) {
        return m.netlist().gates().stream().filter(g -> g.stage() >= 0 && g.fn() == fn).count();
    }

    @Test
    void wideAndSplitsIntoATreeWithinTheStagesFanIn() {
        Diagnostics d = new Diagnostics();
        Machine m = elaborate("""
                module top {
                  in a[9]
                  out y
                  y = a[0] & a[1] & a[2] & a[3] & a[4] & a[5] & a[6] & a[7] & a[8]
                }
                machine t { top top; inputs a; outputs y }
                """, d);
        assertThat(d.hasErrors()).isFalse();
        // diode_and has fan-in 4: nine inputs -> three groups of three, joined by one more AND.
        assertThat(count(m, GateFn.AND)).isEqualTo(4);
        for (Gate g : m.netlist().gates()) {
            assertThat(g.inputs().length).isLessThanOrEqualTo(4);
        }
    }

    @Test
    void complementOfAFlipFlopCostsNoTube() {
        Diagnostics d = new Diagnostics();
        Machine m = elaborate("""
                module top {
                  in a, b
                  out y
                  latch q on phase 1 = a
                  y = !q & b
                }
                machine t { clock { phases 1; period 1 ms }; top top; inputs a b; outputs y }
                """, d);
        assertThat(d.hasErrors()).isFalse();
        assertThat(count(m, GateFn.NOT)).isZero();
        assertThat(m.netlist().gates().stream().filter(g -> g.stage() < 0 && g.fn() == GateFn.NOT)).hasSize(1);
    }

    @Test
    void notOverAndBecomesOneNandAndIdenticalGatesAreShared() {
        Diagnostics d = new Diagnostics();
        Machine m = elaborate("""
                module top {
                  in a, b
                  out y, z
                  y = !(a & b)
                  z = !(b & a) | a
                }
                machine t { top top; inputs a b; outputs y z }
                """, d);
        assertThat(d.hasErrors()).isFalse();
        assertThat(count(m, GateFn.NAND)).isEqualTo(1);
        assertThat(count(m, GateFn.NOT)).isZero();
    }

    @Test
    void generatorsAndIncludesExpandWithHierarchicalNames() {
        Diagnostics d = new Diagnostics();
        Machine m = elaborate("""
                module cell {
                  in x
                  out s
                  s = !x
                }
                module top {
                  in a[3]
                  out y[3]
                  for k in 0..2 {
                    use cell as c (x: a[k], s: y[k])
                  }
                }
                machine t { top top; inputs a; outputs y }
                """, d);
        assertThat(d.hasErrors()).isFalse();
        assertThat(m.modules()).extracting(mi -> mi.path()).containsExactly("", "c[0]", "c[1]", "c[2]");
        assertThat(count(m, GateFn.NOT)).isEqualTo(3);
    }

    @Test
    void latchesTakeTheirPhaseAndEnable() {
        Diagnostics d = new Diagnostics();
        Machine m = elaborate("""
                module top {
                  in a, en
                  out y
                  latch y on phase 2 when en = a
                }
                machine t { clock { phases 2; period 10 us }; top top; inputs a en; outputs y }
                """, d);
        assertThat(d.hasErrors()).isFalse();
        assertThat(m.netlist().latches()).singleElement()
                .satisfies(l -> {
                    assertThat(l.phase()).isEqualTo(2);
                    assertThat(l.enable()).isEqualTo(m.input("en").net());
                    assertThat(l.data()).isEqualTo(m.input("a").net());
                });
        assertThat(m.clock().phaseSeconds()).isCloseTo(5e-6, org.assertj.core.data.Offset.offset(1e-15));
    }
}
