package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.thermion.lang.Diagnostic;
import org.thermion.lang.Diagnostics;
import org.thermion.model.GateFn;
import org.thermion.model.Machine;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The steps that were rewritten to run in linear time keep their meaning: lint of inputs
 * passed down the hierarchy, duplicate operands of wide gates, gate sharing, and loop reports.
 */
class LinearStepsTest {
    static final String MACHINE = """
            machine m {
              clock { phases 2; period 100 us }
              top top
              inputs a b c
            }
            """;

    static Machine elaborate(String modules, Diagnostics d) {
        return ElaborationTest.elaborate(modules + MACHINE, d);
    }

    @Test
    void inputPassedToAChildThatReadsItCountsAsUsedOneThatDoesNotIsReportedOnce() {
        Diagnostics d = new Diagnostics();
        Machine m = elaborate("""
                module leaf {
                  in x, unused
                  out y
                  y = !x
                }
                module mid {
                  in p, q
                  out r, s
                  use leaf as l1 (x: p, unused: q, y: r)
                  use leaf as l2 (x: q, unused: p, y: s)
                }
                module top {
                  in a, b, c
                  out o1, o2
                  net k
                  k = !(b & c)
                  net r1, r2
                  use mid as m1 (p: a, q: k, r: r1, s: r2)
                  latch o1 on phase 1 = r1
                  latch o2 on phase 1 = r2
                }
                """, d);
        assertThat(m).isNotNull();
        // mid reads both inputs through its children; leaf's `unused` is reported once for the type.
        assertThat(d.warnings()).extracting(Diagnostic::message).filteredOn(w -> w.contains("tied to nothing"))
                .containsExactly("input 'unused' of module 'leaf' is tied to nothing inside it");
    }

    @Test
    void duplicateOperandsOfAWideOrAreJoinedOnce() {
        Diagnostics d = new Diagnostics();
        Machine m = elaborate("""
                module top {
                  in a, b, c
                  out o
                  latch o on phase 1 = a | b | a | c | b | a
                }
                """, d);
        assertThat(m).isNotNull();
        // Three distinct operands fit one diode OR (fan-in 4).
        assertThat(ElaborationTest.count(m, GateFn.OR)).isEqualTo(1);
        assertThat(m.netlist().gates().stream().filter(g -> g.fn() == GateFn.OR).findFirst().orElseThrow().inputs()).hasSize(3);
    }

    @Test
    void identicalGatesOfOneModuleAreSharedButNotAcrossModules() {
        Diagnostics d = new Diagnostics();
        Machine m = elaborate("""
                module half {
                  in x, y
                  out z
                  z = !(x & y) | !(y & x)
                }
                module top {
                  in a, b, c
                  out o1, o2
                  net n1, n2
                  use half as h1 (x: a, y: b, z: n1)
                  use half as h2 (x: a, y: b, z: n2)
                  latch o1 on phase 1 = n1 & c
                  latch o2 on phase 1 = n2 & c
                }
                """, d);
        assertThat(m).isNotNull();
        // Per instance one NAND (x & y and y & x are one gate); none shared between h1 and h2.
        assertThat(ElaborationTest.count(m, GateFn.NAND)).isEqualTo(2);
    }

    @Test
    void aLoopFeedingManyGatesIsReportedOnce() {
        Diagnostics d = new Diagnostics();
        StringBuilder tail = new StringBuilder();
        for (int i = 1; i < 200; i++) {
            tail.append("  t[").append(i).append("] = !(t[").append(i - 1).append("] & a)\n");
        }
        Machine m = elaborate("""
                module top {
                  in a, b, c
                  out o
                  net p, q, t[200]
                  p = !(q & a)
                  q = !(p & b)
                  t[0] = !(q & c)
                """ + tail + """
                  latch o on phase 1 = t[199]
                }
                """, d);
        assertThat(m).isNull();
        assertThat(d.all()).filteredOn(Diagnostic::isError).extracting(Diagnostic::message)
                .containsExactly("combinational loop: q -> p -> q");
    }
}
