package org.thermion.elab;

import org.junit.jupiter.api.Test;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;
import org.thermion.model.Relay;
import org.thermion.testing.Golden;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** The language reference is rendered from the tables, lists every key, and the defaults it shows are the ones used. */
class PropertyReferenceTest {

    @Test
    void theReferenceListsEveryKeyOfEveryBlockKind() {
        String md = PropertyReference.markdown();
        for (PropertyTable t : PropertyTable.ALL) {
            assertThat(md).contains("\n## " + t.kind + "\n");
            String section = md.substring(md.indexOf("\n## " + t.kind + "\n"));
            int next = section.indexOf("\n## ", 4);
            section = next < 0 ? section : section.substring(0, next);
            for (String key : t.keys()) {
                assertThat(section).as(t.kind + " lists " + key).containsPattern("\\n\\| `" + key + "`( \\*)? \\|");
            }
        }
    }

    @Test
    void docsPropertiesMdIsTheRenderedReference() {
        Golden.assertMatches(Path.of("src/docs/properties.md"), PropertyReference.markdown());
    }

    @Test
    void everyBlockKindTheParserKnowsHasATable() {
        for (String kind : Declarations.KINDS) {
            assertThat(PropertyTable.ALL.stream().anyMatch(t -> t.kind.equals(kind))).as(kind).isTrue();
        }
    }

    @Test
    void aRelayWithoutThresholdsGetsTheDataSheetsWorstCase() {
        // REFERENCES.md: a 12 V relay picks up at 7.2 V at most and drops out at 1.2 V at least.
        Relay r = new Relay(100, 12, Double.NaN, Double.NaN, 0.01, Double.NaN);
        assertThat(r.pickupVolts()).isCloseTo(7.2, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(r.dropoutVolts()).isCloseTo(1.2, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(PropertyReference.markdown()).contains("60 % of rated").contains("10 % of rated");
    }

    @Test
    void absentPropertiesTakeTheTablesDefaults() {
        String text = """
                rail bplus { voltage 48 V }
                rail bias { voltage -24 V }
                rail heat { voltage 6.3 V }
                heaters on heat { parallel 6AU6 }
                stage inv : not { tube 6AU6; load 22 k from bplus }
                realize { not inv }
                module top { in a; out y; y = !a }
                machine m { top top; inputs a; outputs y }
                """;
        Machine m = elaborateClean(text);
        assertThat(m.clock().phases()).isEqualTo(2);
        assertThat(m.clock().periodSeconds()).isEqualTo(100e-6);
        var st = m.stages().get(0);
        assertThat(st.outputOhmsLow()).as("ron: load / 10").isEqualTo(2200.0);
        assertThat(st.fanIn()).as("a not takes one input").isEqualTo(1);
        assertThat(st.gain()).isEqualTo(1.0);
        assertThat(m.rails().get(0).sourceOhms()).isZero();
        assertThat(m.rails().get(0).limitAmps()).isInfinite();
    }

    @Test
    void drawConductingMeansTheStateInWhichTheFunctionsCircuitConducts() {
        String text = """
                rail bplus { voltage 48 V }
                rail bias { voltage -24 V }
                rail heat { voltage 6.3 V }
                heaters on heat { parallel 6AU6 6AL5 }
                stage inv : not { tube 6AU6; load 22 k from bplus; draw conducting bplus 2 mA }
                stage dor : or { tube 6AL5; sections 1 per input; fanin 2; load 100 k from bias; draw conducting bias 0.6 mA }
                realize { not inv; or dor }
                module top { in a, b; out y, z; y = !a; z = a | b }
                machine m { top top; inputs a b; outputs y z }
                """;
        Machine m = elaborateClean(text);
        for (var st : m.stages()) {
            // an inverter's tube pulls its plate low; a diode OR's pull-down carries current with the output high
            var drawn = st.name().equals("inv") ? st.drawLow() : st.drawHigh();
            assertThat(drawn).as(st.name()).hasSize(1);
            assertThat(st.drawAlways()).isEmpty();
        }
    }

    private static Machine elaborateClean(String text) {
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), d).elaborateText(Path.of("snippet.machine"), text);
        assertThat(d.all()).isEmpty();
        return m;
    }
}
