package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.lang.Span;
import org.thermion.model.StageFunction;
import org.thermion.model.StageType;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** Every stage of the parts library reads cleanly against the tables and agrees with its function's definition. */
class LibraryStagesTest {

    @Test
    void eachLibraryStageDrawsMostInTheStateItsFunctionConducts() {
        SourceSet sources = new SourceSet();
        Diagnostics diags = new Diagnostics();
        SourceLoader loader = new SourceLoader(sources, diags);
        Declarations decls = new Declarations();
        decls.add(loader.library(), true, diags);
        // The rails the library's stages are designed for (library.machine's header).
        for (var f : loader.loadText(Path.of("rails.machine"),
                "rail bplus { voltage 48 V }\nrail bias { voltage -12 V }\nrail relay { voltage 24 V }\n")) {
            decls.add(f, false, diags);
        }
        Parts parts = new Parts(decls, diags);
        for (String name : parts.stageNames()) {
            parts.stage(name, Span.none());
        }
        assertThat(diags.all()).isEmpty();
        assertThat(parts.stages).hasSize(decls.stages.size());
        for (StageType st : parts.stages) {
            double low = 0, high = 0;
            for (int r = 0; r < parts.rails.size(); r++) {
                low += declared(st.drawAlways(), r) + declared(st.drawLow(), r);
                high += declared(st.drawAlways(), r) + declared(st.drawHigh(), r);
            }
            StageFunction.Conducts c = st.function().conducts();
            if (low == high) {
                assertThat(c).as(st.name() + " draws alike in both states").isIn(StageFunction.Conducts.ALWAYS,
                        StageFunction.Conducts.OUTPUT_HIGH);
            } else {
                assertThat(c).as(st.name() + ": low " + low + " A, high " + high + " A")
                        .isEqualTo(low > high ? StageFunction.Conducts.OUTPUT_LOW : StageFunction.Conducts.OUTPUT_HIGH);
            }
        }
    }

    /** The stage's declared draw lines on one rail (the figures these tests read are the typed-in ones). */
    private static double declared(java.util.List<org.thermion.model.RailDraw> draws, int rail) {
        return draws.stream().filter(d -> d.rail() == rail).mapToDouble(d -> Math.abs(d.amps())).sum();
    }
}
