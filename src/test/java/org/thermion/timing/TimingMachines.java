package org.thermion.timing;

import org.thermion.elab.Elaborator;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

/** Small machines for timing tests, with test-only tube and stage values chosen for easy hand sums. */
final class TimingMachines {
    private TimingMachines() {
    }

    /** Rails, heaters and a test triode (Cgk 2 pF, Cgp 1 pF, Cpk 0.5 pF, no cout) and pentode (cin 5 pF, cout 4 pF). */
    static final String PARTS = """
            rail bplus { voltage 48 V; source 1 ohm; limit 1 A }
            rail bias  { voltage -24 V; source 1 ohm; limit 1 A }
            rail heat  { voltage 12.6 V; source 0.02 ohm; limit 10 A }
            tube TQ1 { kind triode; sections 2; heater 12.6 V 150 mA; cgk 2 pF; cgp 1 pF; cpk 0.5 pF; source "test values" }
            tube PQ1 { kind pentode; sections 1; heater 12.6 V 150 mA; cin 5 pF; cout 4 pF; source "test values" }
            heaters on heat { parallel TQ1 PQ1 at 12.6 V }
            """;

    static Machine elaborate(String text) {
        SourceSet sources = new SourceSet();
        Diagnostics diags = new Diagnostics();
        Machine m = new Elaborator(sources, diags).elaborateText(Path.of("test.machine"), text);
        if (diags.hasErrors()) {
            StringWriter sw = new StringWriter();
            new DiagnosticPrinter(sources).print(diags, new PrintWriter(sw, true));
            throw new AssertionError("machine does not elaborate:\n" + sw);
        }
        return m;
    }
}
