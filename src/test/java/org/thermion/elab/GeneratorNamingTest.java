package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.thermion.lang.Diagnostics;
import org.thermion.model.Gate;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Instances placed in nested generator loops are named by their indices in nesting order. */
class GeneratorNamingTest {

    private static Machine grid(String outer, String inner) {
        // Two rows of three cells: cell [r][k] passes a[3r + k] to y[3r + k].
        Diagnostics d = new Diagnostics();
        Machine m = ElaborationTest.elaborate("""
                module cell {
                  in d
                  out q
                  q = d
                }
                module top {
                  in a[6]
                  out y[6]
                  for OUTER in 0..1 {
                    for INNER in 0..2 {
                      use cell as c (d: a[3 * OUTER + INNER], q: y[3 * OUTER + INNER])
                    }
                  }
                }
                machine t { top top; inputs a; outputs y }
                """.replace("OUTER", outer).replace("INNER", inner), d);
        assertThat(d.hasErrors()).as(d.all().toString()).isFalse();
        return m;
    }

    private static List<String> paths(Machine m) {
        List<String> out = new ArrayList<>();
        for (ModuleInstance mi : m.modules()) {
            if (mi.parent() >= 0) {
                out.add(mi.path());
            }
        }
        return out;
    }

    @Test
    void rowComesBeforeColumnWhateverTheVariablesAreCalled() {
        // Both spellings: hash order of the loop variables would get one of them wrong.
        for (String[] vars : new String[][]{{"row", "col"}, {"col", "row"}, {"i", "j"}, {"j", "i"}}) {
            Machine m = grid(vars[0], vars[1]);
            assertThat(paths(m)).as(vars[0] + "/" + vars[1])
                    .containsExactly("c[0][0]", "c[0][1]", "c[0][2]", "c[1][0]", "c[1][1]", "c[1][2]");
        }
    }

    @Test
    void theInstanceNamedByItsIndicesIsTheOneThoseIndicesConnect() {
        Machine m = grid("row", "col");
        int y5 = m.output("y[5]").net();
        // y[5] = a[3*1 + 2]: the connection made by cell [1][2].
        Gate driver = m.netlist().gates().stream().filter(g -> g.output() == y5).findFirst().orElseThrow();
        assertThat(m.modules().get(driver.module()).path()).isEqualTo("c[1][2]");
    }
}
