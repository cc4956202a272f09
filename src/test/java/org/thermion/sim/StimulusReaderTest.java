package org.thermion.sim;

import org.thermion.testing.Golden;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** Stimulus files: what a good one means, and how a bad one is reported. */
class StimulusReaderTest {
    static final Machine DEMO = SimMachines.demo();

    private static Stimulus parse(String text, Diagnostics d, SourceSet s) {
        return new StimulusReader(DEMO, s, d).parse(Path.of("stim.csv"), text);
    }

    @Test
    void rowsHoldTheirValuesFromTheirCycleOnAndEmptyFieldsKeepThePreviousValue() {
        Diagnostics d = new Diagnostics();
        Stimulus st = parse("cycle,low_sw,\"high_sw\"\r\n0,1,0\r\n5,,1\r\n\r\n9,0,\"0\"\r\n", d, new SourceSet());
        assertThat(d.hasErrors()).isFalse();
        assertThat(st.rows()).hasSize(3);
        assertThat(st.lastCycle()).isEqualTo(9);
        boolean[] in = new boolean[DEMO.inputs().size()];
        Stimulus.Cursor c = st.cursor();
        assertThat(c.advance(0, in)).isTrue();
        assertThat(in[0]).isTrue();
        assertThat(in[1]).isFalse();
        assertThat(c.advance(4, in)).isFalse();
        assertThat(c.advance(5, in)).isTrue();
        assertThat(in[0]).as("kept from cycle 0").isTrue();
        assertThat(in[1]).isTrue();
        assertThat(c.pending()).isTrue();
        c.advance(100, in);
        assertThat(in[0]).isFalse();
        assertThat(in[1]).isFalse();
        assertThat(c.pending()).isFalse();
    }

    @Test
    void aBusIsOneColumnHoldingANumberInDecimalHexOrBinary() {
        Machine m = SimMachines.fromText("""
                module top {
                  in code[4], go
                  out lamp
                  latch lamp on phase 1 = go & code[3]
                }
                machine m { clock { phases 2; period 1 ms }; top top; inputs code go; outputs lamp }
                """);
        Diagnostics d = new Diagnostics();
        Stimulus st = new StimulusReader(m, new SourceSet(), d).parse(Path.of("s.csv"),
                "cycle,phase,code,go\n0,,9,1\n2,2,0xA,\n4,1,0b0110,0\n");
        assertThat(d.hasErrors()).isFalse();
        boolean[] in = new boolean[m.inputs().size()];
        int[] code = st.columns().get(0).bits();
        assertThat(code).hasSize(4);
        Stimulus.Cursor c = st.cursor();
        c.advance(0, in);
        assertThat(bits(in, code)).isEqualTo(9);
        assertThat(c.advance(2, 1, in)).as("phase 2's row waits").isFalse();
        assertThat(c.advance(2, 2, in)).isTrue();
        assertThat(bits(in, code)).isEqualTo(10);
        c.advance(4, in);
        assertThat(bits(in, code)).isEqualTo(6);
        assertThat(in[m.inputs().size() - 1]).isFalse();
    }

    private static int bits(boolean[] in, int[] bus) {
        int v = 0;
        for (int i = 0; i < bus.length; i++) {
            v |= in[bus[i]] ? 1 << i : 0;
        }
        return v;
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            bus-bad-number   | cycle,code\\n0,0x1g\\n
            bus-too-wide     | cycle,code\\n0,16\\n
            bad-phase        | cycle,phase,code\\n0,3,1\\n
            phase-order      | cycle,phase,code\\n1,2,1\\n1,1,2\\n
            bus-and-bit      | cycle,code,code[1]\\n0,1,1\\n
            """)
    void badBusOrPhaseIsReportedWithPlaceAndExpectation(String name, String escaped) throws IOException {
        Machine m = SimMachines.fromText("""
                module top {
                  in code[4]
                  out lamp
                  latch lamp on phase 1 = code[3]
                }
                machine m { clock { phases 2; period 1 ms }; top top; inputs code; outputs lamp }
                """);
        Diagnostics d = new Diagnostics();
        SourceSet s = new SourceSet();
        Stimulus st = new StimulusReader(m, s, d).parse(Path.of("stim.csv"), escaped.replace("\\n", "\n"));
        assertThat(st).isNull();
        StringWriter w = new StringWriter();
        new DiagnosticPrinter(s).print(d, new PrintWriter(w));
        Golden.assertMatches(Path.of("src", "test", "resources", "org", "thermion", "sim", "stimulus", name + ".txt"),
                w.toString());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            no-cycle-column  | step,low_sw\\n0,1\\n
            unknown-input    | cycle,low_sww\\n0,1\\n
            duplicate-input  | cycle,manual,strobe,manual\\n0,1,0,1\\n
            bad-value        | cycle,low_sw,high_sw\\n0,1,0\\n3,1,2\\n
            bad-cycle        | cycle,low_sw\\n0,1\\nx3,0\\n
            cycle-order      | cycle,low_sw\\n0,1\\n7,0\\n7,1\\n
            too-few-fields   | cycle,low_sw,high_sw\\n0,1\\n
            too-many-fields  | cycle,low_sw\\n0,1,1\\n
            open-quote       | cycle,low_sw\\n0,"1\\n
            after-quote      | cycle,low_sw\\n0,"1"x\\n
            quote-inside     | cycle,low_sw\\n0,1"\\n
            empty            | \\n
            """)
    void badStimulusIsReportedWithPlaceAndExpectation(String name, String escaped) throws IOException {
        String text = escaped.replace("\\n", "\n");
        Diagnostics d = new Diagnostics();
        SourceSet s = new SourceSet();
        Stimulus st = parse(text, d, s);
        assertThat(st).isNull();
        StringWriter w = new StringWriter();
        new DiagnosticPrinter(s).print(d, new PrintWriter(w));
        Golden.assertMatches(Path.of("src", "test", "resources", "org", "thermion", "sim", "stimulus", name + ".txt"),
                w.toString());
    }
}
