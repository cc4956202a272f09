package org.thermion.cli;

import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Format;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;

import org.thermion.bench.BenchRow;
import org.thermion.bench.BenchSuite;
import org.thermion.sim.compiled.Engine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static org.thermion.cli.report.ReportUnit.FLAG;
import static org.thermion.cli.report.ReportUnit.NUMBER;
import static org.thermion.cli.report.ReportUnit.SECONDS;
import static org.thermion.cli.report.ReportUnit.TEXT;

/** {@code bench}: speed and scale of elaboration and simulation, against their targets. */
@Command(name = "bench", mixinStandardHelpOptions = true, hidden = true, // a developer tool: DEVELOPERS.md documents it
        description = "Measure elaboration time, heap per stage instance and simulation speed of each engine"
                + " on the demo and on synthetic machines, beside the straight-line reference; each figure"
                + " is shown against its target. One run, with warm-up; takes a minute or two (--quick: seconds).")
final class BenchCommand extends CommandBase {
    @Option(names = "--sizes", split = ",", paramLabel = "N",
            description = "Synthetic machine sizes in stage instances (default: 1000,10000,100000).")
    List<Integer> sizes;

    @Option(names = "--engine", split = ",", paramLabel = "ENGINE",
            description = "Engines to measure: compiled, array (default: both).")
    List<String> engines;

    @Option(names = "--faults", description = "Only the bring-up rows: fault simulation and plan generation.")
    boolean faultsOnly;

    @Option(names = "--quick", description = "Short runs: sizes 1000,10000 unless given, 0.2 s per speed.")
    boolean quick;

    @Option(names = "--seconds", paramLabel = "S", description = "Seconds per speed measurement (default 1, --quick 0.2).")
    Double seconds;

    @Option(names = "--compile-max", paramLabel = "GATES",
            description = "Largest netlist, in gates, given the straight-line reference and the compiled engine"
                    + " (the reference's warm-up takes seconds per 10^5 gates; default 200000).")
    int compileMax = 200_000;

    @Option(names = "--machine", paramLabel = "FILE", description = "The machine measured as 'demo' (default: the bundled example).")
    Path demo;

    @Option(names = "--format", paramLabel = "FORMAT", description = "text, csv or json (default text).")
    Format format = Format.text;

    @Override
    public Integer call() {
        PrintWriter out = out();
        PrintWriter err = err();
        List<Integer> n = sizes != null ? sizes : quick ? List.of(1000, 10_000) : List.of(1000, 10_000, 100_000);
        for (int s : n) {
            if (s < 200 || s > 2_000_000) {
                throw new Failures.BadInput("error: --sizes takes stage counts from 200 to 2000000, not " + s);
            }
        }
        List<Engine> es = new ArrayList<>();
        try {
            for (String e : engines == null ? List.of("array", "compiled") : engines) {
                Engine en = Engine.parse(e);
                if (en == Engine.AUTO) {
                    throw new IllegalArgumentException("auto is a choice between engines, not one to measure: choose compiled or array");
                }
                es.add(en);
            }
        } catch (IllegalArgumentException e) {
            throw new Failures.BadInput("error: " + e.getMessage());
        }
        double secs = seconds != null ? seconds : quick ? 0.2 : 1.0;
        if (!(secs > 0 && secs <= 60)) {
            throw new Failures.BadInput("error: --seconds takes a time from 0 to 60 s");
        }
        Path machine = demo != null ? demo : DefaultRun.BundledExample.machine();
        if (!Files.isRegularFile(machine)) {
            throw new Failures.BadInput("error: no such machine file: " + machine);
        }
        BenchSuite suite = new BenchSuite(machine, n, es, quick, secs, compileMax, msg -> {
            err.println(msg);
            err.flush();
        });
        List<BenchRow> rows;
        if (faultsOnly) {
            rows = new ArrayList<>();
            org.thermion.bench.FaultBench.rows(rows, machine, DefaultRun.BundledExample.program("pump.asm"), quick, msg -> {
                err.println(msg);
                err.flush();
            });
        } else {
            rows = suite.run();
        }
        format.write(out, report(rows));
        return ExitCodes.OK;
    }

    /** The schema version of bench's JSON ({@code org/thermion/schema/bench.schema.json}). */
    static final int VERSION = 2;

    /** The measurements as a report: text shows each value with its unit, CSV and JSON the number and the unit apart. */
    static Report report(List<BenchRow> rows) {
        Report rep = new Report("bench", VERSION);
        rep.field("default_engine", Engine.DEFAULT.word());
        Table view = new Table("measurements", "measurements")
                .column("machine", "machine", TEXT)
                .column("measurement", "measurement", TEXT)
                .column("value", "value", TEXT)
                .column("target", "target", TEXT)
                .column("verdict", "verdict", TEXT);
        Table data = new Table("rows", "measurements")
                .column("machine", "machine", TEXT)
                .column("measure", "measure", TEXT)
                .column("value", "value", NUMBER, "in the row's unit")
                .column("unit", "unit", TEXT)
                .column("target", "target", TEXT)
                .column("met", "met", FLAG)
                .column("note", "note", TEXT);
        for (BenchRow r : rows) {
            view.row(r.machine(), r.measure(), value(r), r.target() == null ? "" : r.target(), r.note());
            data.row(r.machine(), r.measure(), Double.isNaN(r.value()) ? new Absent("n/a") : (Object) r.value(), r.unit(),
                    r.target() == null ? new Absent("none") : r.target(), r.met() == null ? new Absent("none") : r.met(), r.note());
        }
        rep.view(view).data(data);
        rep.text("gate evals: netlist gates evaluated per second, each over a 64-bit word; lane-evals count each of the "
                + "64 lanes. 1 lane: every lane runs the same inputs; 64 lanes: independent random inputs per lane.",
                "Default engine: auto, which takes the compiled engine for small machines and for long runs "
                        + "like these short of the largest netlists (see run --help).");
        return rep;
    }

    static String value(BenchRow r) {
        double v = r.value();
        if (Double.isNaN(v)) {
            return "n/a";
        }
        return switch (r.unit()) {
            case "s" -> Numbers.si(v, SECONDS);
            case "B" -> String.format(Locale.ROOT, "%.0f B", v);
            case "x" -> String.format(Locale.ROOT, "%.2f x", v);
            case "/s" -> String.format(Locale.ROOT, "%.3g /s", v);
            default -> v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.3g", v);
        };
    }
}
