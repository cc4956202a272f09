package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Gate;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Port;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A half-built pump station: the operand selector ({@code osel}) is marked not built. Its
 * stages leave the netlist, the nets it drove become switches, and the rest stays as it was.
 */
class NotBuiltTest {
    static final Path DEMO = Path.of("examples", "pumpstation", "pumpstation.machine");

    static Machine demo(String notBuilt, boolean asDescribed) throws IOException {
        String text = Files.readString(DEMO).replace("  outputs pump alarm sum ready\n",
                "  outputs pump alarm sum ready\n" + notBuilt);
        SourceSet s = new SourceSet();
        Diagnostics d = new Diagnostics();
        Elaborator e = new Elaborator(s, d);
        Machine m = (asDescribed ? e.asDescribed() : e).elaborateText(DEMO, text);
        StringWriter w = new StringWriter();
        new DiagnosticPrinter(s).print(d, new PrintWriter(w, true));
        assertThat(d.hasErrors()).as(w::toString).isFalse();
        return m;
    }

    @Test
    void anUnbuiltModuleLeavesTheLogicAndItsOutputsBecomeSwitches() throws IOException {
        Machine whole = demo("", false);
        Machine half = demo("  notbuilt osel\n", false);
        ModuleInstance osel = half.modules().stream().filter(mi -> mi.path().equals("osel")).findFirst().orElseThrow();
        assertThat(osel.built()).isFalse();
        assertThat(half.modules().stream().filter(mi -> !mi.path().equals("osel")).allMatch(ModuleInstance::built)).isTrue();
        for (Gate g : half.netlist().gates()) {
            assertThat(g.module()).as("no stage of osel is left").isNotEqualTo(osel.id());
        }
        int oselStages = (int) whole.netlist().gates().stream().filter(g -> g.module() == osel.id() && g.stage() >= 0).count();
        assertThat(oselStages).isPositive();
        assertThat(half.stageInstanceCount()).isEqualTo(whole.stageInstanceCount() - oselStages);
        // osel drives src and pos[4] of the controller, which reads all five: five switches after
        // the six inputs. Its group lines grp[0..3] are read only inside osel: no switch.
        assertThat(half.inputs()).hasSize(whole.inputs().size() + 5);
        assertThat(half.inputs().stream().map(Port::name).toList()).contains("src", "pos[0]", "pos[3]")
                .doesNotContain("grp[0]", "grp[2]", "osel.grp[2]");
    }

    @Test
    void theWholeDescriptionKeepsTheUnbuiltModuleButFlagsIt() throws IOException {
        Machine described = demo("  notbuilt osel\n", true);
        Machine whole = demo("", false);
        assertThat(described.stageInstanceCount()).isEqualTo(whole.stageInstanceCount());
        assertThat(described.inputs()).hasSize(whole.inputs().size());
        assertThat(described.modules().stream().filter(mi -> !mi.built()).map(ModuleInstance::path)).containsExactly("osel");
    }

    @Test
    void anUnbuiltModuleHeldAtALevelTiesItsOutputsInsteadOfAddingSwitches() throws IOException {
        Machine whole = demo("", false);
        for (int level = 0; level <= 1; level++) {
            Machine held = demo("  notbuilt osel held " + level + "\n", false);
            assertThat(held.inputs()).hasSize(whole.inputs().size());
            // The five nets osel drove for the built part now read the level on every lane.
            org.thermion.sim.Simulator sim = new org.thermion.sim.Simulator(held);
            sim.reset(new org.thermion.sim.InitMode.Zero());
            sim.settle();
            for (String net : java.util.List.of("src", "pos[0]", "pos[1]", "pos[2]", "pos[3]")) {
                int n = java.util.Arrays.asList(held.netlist().netNames()).indexOf(net);
                assertThat(n).as(net).isPositive();
                assertThat(sim.value(n)).as(net + " held " + level).isEqualTo(level == 1 ? -1L : 0L);
            }
            // Ties are wires, not stages: the tube count is the half-built one.
            assertThat(held.stageInstanceCount()).isEqualTo(demo("  notbuilt osel\n", false).stageInstanceCount());
        }
    }

    @Test
    void aDeclaredRadixNamesABusOfTheInputsOrOutputs() throws IOException {
        String text = Files.readString(Path.of("examples", "decoder-board", "decoder-board.machine"))
                .replace("  outputs lamp\n", "  outputs lamp\n  radix binary lamp\n  radix decimal code\n");
        SourceSet s = new SourceSet();
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(s, d).elaborateText(Path.of("board.machine"), text);
        assertThat(d.hasErrors()).isFalse();
        assertThat(m.radix("lamp")).isEqualTo(2);
        assertThat(m.radix("code")).isEqualTo(10);
        assertThat(m.radix("load")).isEqualTo(16);
        Diagnostics bad = new Diagnostics();
        new Elaborator(new SourceSet(), bad).elaborateText(Path.of("board.machine"), text.replace("radix decimal code", "radix decimal lamps"));
        assertThat(bad.all()).anySatisfy(x -> assertThat(x.message()).contains("no input or output bus 'lamps'"));
    }
}
