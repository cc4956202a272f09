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
        // osel drives src, grp[4] and pos[4] of the controller; the built part reads src, pos[0..3]
        // and grp[2..3] (the write strobes): seven switches after the six inputs. grp[0] and grp[1]
        // were read only inside osel, so they need no switch.
        assertThat(half.inputs()).hasSize(whole.inputs().size() + 7);
        assertThat(half.inputs().stream().map(Port::name).toList()).contains("src", "grp[2]", "grp[3]", "pos[0]", "pos[3]")
                .doesNotContain("grp[0]", "grp[1]");
    }

    @Test
    void theWholeDescriptionKeepsTheUnbuiltModuleButFlagsIt() throws IOException {
        Machine described = demo("  notbuilt osel\n", true);
        Machine whole = demo("", false);
        assertThat(described.stageInstanceCount()).isEqualTo(whole.stageInstanceCount());
        assertThat(described.inputs()).hasSize(whole.inputs().size());
        assertThat(described.modules().stream().filter(mi -> !mi.built()).map(ModuleInstance::path)).containsExactly("osel");
    }
}
