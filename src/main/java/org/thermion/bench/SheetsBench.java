package org.thermion.bench;

import java.util.List;

import org.thermion.build.BuildDocuments;
import org.thermion.build.ChartStates;
import org.thermion.build.Designations;
import org.thermion.build.PartsList;
import org.thermion.build.PinVoltages;
import org.thermion.build.WireChecks;
import org.thermion.model.Machine;
import org.thermion.spice.MachineDeck;

/**
 * Every build document of {@code sheets} for one machine, from the elaborated machine: the wiring
 * (stage circuits, packing, designators, heater strings), the wire checks, the parts list, the
 * voltage chart at rest and the whole machine's SPICE deck, each run with fresh caches after one
 * warm-up run. Target: under 5 s on the 10^4-stage machine (issue 19).
 */
final class SheetsBench {
    /** The most all documents may take on the 10^4-stage synthetic machine (seconds). */
    static final double TARGET_SECONDS = 5.0;

    private SheetsBench() {
    }

    static void rows(List<BenchRow> rows, String who, Machine m, boolean quick, boolean held) {
        int[] size = new int[1];
        double best = BenchSuite.best(() -> documents(m, size), quick ? 1 : 3);
        String what = "sheets: all build documents";
        BenchRow row = held ? BenchRow.target(who, what, best, "s", TARGET_SECONDS, true, "5 s")
                : BenchRow.info(who, what, best, "s");
        int cores = Runtime.getRuntime().availableProcessors();
        double load = java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
        if (held && load > cores) {
            row = row.withNote(String.format(java.util.Locale.ROOT, "load average %.1f on %d cores while measured",
                    load, cores));
        }
        rows.add(row);
        rows.add(BenchRow.info(who, "sheets: socket pins charted", size[0], ""));
    }

    private static void documents(Machine m, int[] pins) {
        BuildDocuments docs = BuildDocuments.of(m, Designations.NONE);
        WireChecks.run(m, docs.wiring());
        PartsList.of(docs.wiring(), 0, 10, 0.5);
        new PinVoltages(docs).at(ChartStates.atRest(m, null));
        new MachineDeck(m, docs.circuits()).write(null).deck().text();
        pins[0] = docs.wiring().sockets().stream().mapToInt(s -> s.pins()).sum();
    }
}
