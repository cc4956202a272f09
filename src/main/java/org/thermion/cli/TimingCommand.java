package org.thermion.cli;

import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Format;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.model.Machine;
import org.thermion.timing.InstanceDelay;
import org.thermion.timing.PathStep;
import org.thermion.timing.PhaseTiming;
import org.thermion.timing.StaticTiming;
import org.thermion.timing.TimingReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.FARADS;
import static org.thermion.cli.report.ReportUnit.FLAG;
import static org.thermion.cli.report.ReportUnit.HERTZ;
import static org.thermion.cli.report.ReportUnit.SECONDS;
import static org.thermion.cli.report.ReportUnit.TEXT;

/** {@code timing MACHINE}: stage delays, the worst path of every phase, slack and the highest safe clock. */
@Command(name = "timing", mixinStandardHelpOptions = true,
        description = {"Static timing: every stage's rise and fall delay (given, or ln 9 RC from its load and "
                + "the capacitance it drives), the worst path into each phase's latches, its slack, and the "
                + "highest safe clock rate.",
                "Exit 1 when a path does not settle in time at the clock period."})
final class TimingCommand implements Callable<Integer> {
    private static final Pattern TIME = Pattern.compile("\\s*([0-9]*\\.?[0-9]+(?:[eE][-+]?[0-9]+)?)\\s*(s|ms|us|ns)\\s*");

    @Parameters(paramLabel = "MACHINE", description = "The .machine file.")
    Path file;

    @Option(names = "--period", paramLabel = "T",
            description = "Clock period to test instead of the machine's own, with its unit (e.g. 50us, 0.2 ms).")
    String period;

    @Option(names = "--rom-access", paramLabel = "T",
            description = "Access time of the off-board ROM, from the PC loading to valid data (default: 0).")
    String romAccess;

    @Option(names = "--format", paramLabel = "FORMAT", description = "text, csv or json (default: ${DEFAULT-VALUE}).")
    Format format = Format.text;

    @Option(names = "--stages", description = "Also list every stage instance's rise and fall delay.")
    boolean stages;

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        double t = Double.NaN;
        if (period != null) {
            t = parseTime(period);
            if (Double.isNaN(t)) {
                err.println("error: --period '" + period + "' is not a time; write a positive number with s, ms, us or ns (e.g. 50us)");
                return ExitCodes.BAD_INPUT;
            }
        }
        double access = 0;
        if (romAccess != null) {
            access = parseTime(romAccess);
            if (Double.isNaN(access)) {
                err.println("error: --rom-access '" + romAccess + "' is not a time; write a positive number with s, ms, us or ns (e.g. 2us)");
                return ExitCodes.BAD_INPUT;
            }
        }
        Machine m = new MachineLoader().load(file, err, false);
        if (m == null) {
            return ExitCodes.BAD_INPUT;
        }
        TimingReport r = new StaticTiming(m, access).analyse(Double.isNaN(t) ? m.clock().periodSeconds() : t);
        format.write(out, report(r));
        return r.passes() ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }

    /** Seconds from text such as {@code 50us}; NaN when it is not a positive time. */
    static double parseTime(String text) {
        Matcher mt = TIME.matcher(text);
        if (!mt.matches()) {
            return Double.NaN;
        }
        double v = Double.parseDouble(mt.group(1));
        double f = switch (mt.group(2)) {
            case "ms" -> 1e-3;
            case "us" -> 1e-6;
            case "ns" -> 1e-9;
            default -> 1;
        };
        return v > 0 ? v * f : Double.NaN;
    }

    /** The schema version of timing's JSON ({@code org/thermion/schema/timing.schema.json}). */
    static final int VERSION = 2;
    private static final Absent NO_PATH = new Absent("no paths");

    /** The timing analysis as one report; the stage table only with {@code --stages}. */
    Report report(TimingReport r) {
        Report rep = new Report("timing", VERSION);
        rep.field("machine", r.machine());
        rep.field("phases", r.phases());
        rep.field("period", SECONDS, r.periodSeconds());
        rep.field("phase_width", SECONDS, r.phaseSeconds());
        rep.field("passes", r.passes());
        PhaseTiming c = r.critical();
        Absent unconstrained = new Absent("no path constrains the clock");
        rep.field("min_period", SECONDS, c == null ? unconstrained : r.minPeriodSeconds());
        rep.field("max_clock", HERTZ, c == null ? unconstrained : r.maxClockHertz());
        if (c == null) {
            rep.field("critical", unconstrained);
        } else {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("phase", c.phase());
            m.put("endpoint", c.endpoint());
            m.put(SECONDS.name("arrival"), c.arrival());
            m.put(SECONDS.name("setup"), c.setup());
            m.put("span", c.span());
            rep.field("critical", m);
        }
        rep.text(String.format(Locale.ROOT, "timing %s: %d phases, period %s, phase width %s", r.machine(), r.phases(),
                        Numbers.si(r.periodSeconds(), SECONDS), Numbers.si(r.phaseSeconds(), SECONDS)),
                "  a change launched at the end of one phase (latch outputs after their delay; inputs at the end of the "
                        + "last phase; ROM data when the PC loads) must reach each latch set-up before the end of its "
                        + "loading phase: the next phase, or a whole cycle later for a latch of the same phase", "");
        Table t = new Table("phases", "worst path into each phase")
                .column("phase", "phase", COUNT)
                .column("launch_phase", "launched", COUNT, "the phase at whose end the path starts")
                .column("span", "span", COUNT, "phase widths the path may take")
                .column("endpoint", "worst endpoint", TEXT)
                .column("setup", "set-up", SECONDS)
                .column("arrival", "arrival", SECONDS, "when the change reaches the endpoint")
                .column("budget", "budget", SECONDS, "span less set-up")
                .column("slack", "slack", SECONDS, "budget less arrival")
                .column("result", "result", TEXT);
        Table paths = new Table("paths", "worst paths, step by step (phase = the endpoint's phase)")
                .column("phase", "phase", COUNT)
                .column("step", "step", COUNT)
                .column("driver", "driver", TEXT)
                .column("stage", "stage", TEXT)
                .column("edge", "edge", TEXT)
                .column("delay", "delay", SECONDS)
                .column("arrival", "arrival", SECONDS)
                .column("net", "net", TEXT)
                .column("module", "module", TEXT);
        for (PhaseTiming p : r.perPhase()) {
            if (!p.hasPath()) {
                t.row(p.phase(), Absent.NONE, Absent.NONE, NO_PATH, Absent.NONE, Absent.NONE, Absent.NONE, Absent.NONE, "ok");
                continue;
            }
            t.row(p.phase(), p.launchPhase(), p.span(), p.endpoint(), p.setup(), p.arrival(), p.budget(), p.slack(),
                    p.passes() ? "ok" : "FAILS");
            int i = 0;
            for (PathStep st : p.path()) {
                paths.row(p.phase(), i++, st.kind(), st.stage(), st.edge() == 'r' ? "rise" : "fall", st.delay(),
                        st.arrival(), st.netName(), st.module());
            }
        }
        rep.table(t).table(paths);
        if (c == null) {
            rep.text("no path constrains the clock");
        } else {
            rep.text(String.format(Locale.ROOT, "critical path: into %s on phase %d, %s + set-up %s over %d phase width%s",
                            c.endpoint(), c.phase(), Numbers.si(c.arrival(), SECONDS), Numbers.si(c.setup(), SECONDS), c.span(),
                            c.span() == 1 ? "" : "s"),
                    String.format(Locale.ROOT, "shortest safe period %s: highest safe clock rate %s",
                            Numbers.si(r.minPeriodSeconds(), SECONDS), Numbers.si(r.maxClockHertz(), HERTZ)));
        }
        rep.text(String.format(Locale.ROOT, "at %s: %s", Numbers.si(r.periodSeconds(), SECONDS),
                r.passes() ? "every path settles in time" : "a path does not settle in time"));
        if (stages) {
            rep.text("");
            Table st = new Table("stages", "stage delays (declared, or ln 9 RC: through the load toward its rail, through "
                    + "the conducting tube the other way)")
                    .column("kind", "kind", TEXT)
                    .column("index", "index", COUNT)
                    .column("stage", "stage", TEXT)
                    .column("module", "module", TEXT)
                    .column("output", "output", TEXT)
                    .column("driven", "drives", FARADS, "the capacitance the output drives")
                    .column("fan_out", "fan-out", COUNT)
                    .column("rise", "rise", SECONDS)
                    .column("fall", "fall", SECONDS)
                    .column("rise_given", "rise given", FLAG, "declared rather than computed")
                    .column("fall_given", "fall given", FLAG)
                    .column("note", "note", TEXT);
            for (InstanceDelay d : r.instances()) {
                st.row(d.kind(), d.index(), d.stage(), d.module(), d.netName(), d.delay().farads(), d.delay().fanOut(),
                        d.delay().rise(), d.delay().fall(), d.delay().riseGiven(), d.delay().fallGiven(),
                        d.delay().note().isEmpty() ? Absent.NONE : d.delay().note());
            }
            rep.table(st);
        }
        return rep;
    }
}
