package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.lang.Span;
import org.thermion.model.Machine;
import org.thermion.model.StageFunction;
import org.thermion.model.StageType;
import org.thermion.model.TubeType;
import org.thermion.power.StageDraw;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every stage of the parts library reads cleanly against the tables, is known by its circuit
 * (not by typed-in currents), and draws most in the state its function's definition says it conducts.
 */
class LibraryStagesTest {
    /** Library stages whose circuit the solver cannot express, so they keep their declared draws (with the reason in the library). */
    private static final Set<String> DECLARED = Set.of("pentode_nand2");

    /** The rails the library's stages are designed for (library.machine's header). */
    private static final String RAILS = """
            rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
            rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
            rail relay { voltage 24 V; source 1 ohm; limit 500 mA }
            """;

    private static Parts library(Diagnostics diags) {
        SourceSet sources = new SourceSet();
        SourceLoader loader = new SourceLoader(sources, diags);
        Declarations decls = new Declarations();
        decls.add(loader.library(), true, diags);
        for (var f : loader.loadText(Path.of("rails.machine"), RAILS)) {
            decls.add(f, false, diags);
        }
        Parts parts = new Parts(decls, diags);
        for (String name : parts.stageNames()) {
            parts.stage(name, Span.none());
        }
        return parts;
    }

    @Test
    void everyLibraryStageReadsCleanly() {
        Diagnostics diags = new Diagnostics();
        Parts parts = library(diags);
        assertThat(diags.all()).isEmpty();
        assertThat(parts.stages).isNotEmpty();
    }

    @Test
    void everyLibraryStageWithACircuitIsSolvedAndDrawsMostWhereItsFunctionConducts() {
        Parts parts = library(new Diagnostics());
        for (StageType st : new ArrayList<>(parts.stages)) {
            Machine m = alone(st, parts.tubes.get(st.tube()));
            StageType in = m.stages().stream().filter(s -> s.name().equals(st.name())).findFirst().orElseThrow();
            StageDraw d = StageDraw.of(m);
            if (DECLARED.contains(st.name())) {
                // the exception keeps its typed-in figures, and says so
                assertThat(in.hasCircuit()).as(st.name()).isFalse();
                assertThat(d.origin(in)).as(st.name()).isEqualTo(StageDraw.Origin.DECLARED);
            } else {
                // a circuit and no typed-in currents: budget, power-up and timing take the solved figures
                assertThat(in.drawLow()).as(st.name() + " draw lines").isEmpty();
                assertThat(in.drawHigh()).as(st.name() + " draw lines").isEmpty();
                assertThat(in.drawAlways()).as(st.name() + " draw lines").isEmpty();
                assertThat(d.origin(in)).as(st.name()).isEqualTo(StageDraw.Origin.COMPUTED);
            }
            assertThat(d.unsolved()).as(st.name()).isEmpty();
            double low = 0, high = 0;
            for (int r = 0; r < m.rails().size(); r++) {
                low += d.amps(in, r, false);
                high += d.amps(in, r, true);
            }
            StageFunction.Conducts c = st.function().conducts();
            // the same within 1 uA: a stage that draws alike in both states (a flip-flop: one half always on)
            if (Math.abs(low - high) < 1e-6 && DECLARED.contains(st.name())) {
                // pentode_nand2: its worst high state (suppressor low) sends the whole cathode current to the screen
                assertThat(c).as(st.name()).isEqualTo(StageFunction.Conducts.OUTPUT_LOW);
            } else if (Math.abs(low - high) < 1e-6) {
                assertThat(c).as(st.name() + " draws alike in both states").isIn(StageFunction.Conducts.ALWAYS,
                        StageFunction.Conducts.OUTPUT_HIGH);
            } else {
                assertThat(c).as(st.name() + ": low " + low + " A, high " + high + " A")
                        .isEqualTo(low > high ? StageFunction.Conducts.OUTPUT_LOW : StageFunction.Conducts.OUTPUT_HIGH);
            }
        }
    }

    /** A machine of one instance of {@code st} on the library's rails, its tube's heater on a rail of its own. */
    private static Machine alone(StageType st, TubeType tube) {
        double heater = tube.heaters().get(0).volts();
        StringBuilder ins = new StringBuilder();
        List<String> names = new ArrayList<>();
        int inputs = Math.max(1, Math.min(2, st.fanIn()));
        for (int i = 0; i < inputs; i++) {
            names.add("a" + i);
        }
        ins.append(String.join(", ", names));
        boolean storage = st.function().role() == StageFunction.Role.STORAGE;
        String use = storage ? "latch y on phase 1 = a0" : "y = " + st.name() + "(" + ins + ")";
        String text = RAILS + """
                rail heat { voltage %s V; source 0.01 ohm; limit 10 A }
                heaters on heat { parallel %s at %s V }
                %s
                module top {
                  in %s
                  out y
                  %s
                }
                machine alone {
                  clock { phases 1; period 100 us }
                  top top
                  inputs %s
                  outputs y
                }
                """.formatted(heater, tube.name(), heater, storage ? "realize { latch " + st.name() + " }" : "", ins, use,
                String.join(" ", names));
        SourceSet sources = new SourceSet();
        Diagnostics diags = new Diagnostics();
        Machine m = new Elaborator(sources, diags).elaborateText(Path.of(st.name() + ".machine"), text);
        assertThat(diags.hasErrors()).as(st.name() + ": " + diags.all()).isFalse();
        return m;
    }
}
