package org.thermion.cli;

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
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

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
        switch (format) {
            case text -> text(r, out);
            case csv -> csv(r, out);
            case json -> json(r, out);
        }
        out.flush();
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

    private void text(TimingReport r, PrintWriter out) {
        out.printf(Locale.ROOT, "timing %s: %d phases, period %s, phase width %s%n", r.machine(), r.phases(),
                Units.time(r.periodSeconds()), Units.time(r.phaseSeconds()));
        out.println("  a change launched at the end of one phase (latch outputs after their delay; inputs at the end");
        out.println("  of the last phase; ROM data when the PC loads) must reach each latch set-up before the end of");
        out.println("  its loading phase: the next phase, or a whole cycle later for a latch of the same phase");
        out.println();
        Table t = new Table("phase", "launched", "span", "worst endpoint", "arrival", "budget", "slack", "result");
        for (PhaseTiming p : r.perPhase()) {
            if (!p.hasPath()) {
                t.row(Integer.toString(p.phase()), "-", "-", "(no paths)", "-", "-", "-", "ok");
                continue;
            }
            t.row(Integer.toString(p.phase()), "end of " + p.launchPhase(), Integer.toString(p.span()), p.endpoint(),
                    Units.time(p.arrival()), Units.time(p.budget()), Units.time(p.slack()),
                    p.passes() ? "ok" : "FAILS");
        }
        t.print(out, "  ");
        for (PhaseTiming p : r.perPhase()) {
            if (p.hasPath()) {
                out.println();
                out.printf(Locale.ROOT, "worst path into phase %d (launched at the end of phase %d, %d phase width%s, set-up %s):%n",
                        p.phase(), p.launchPhase(), p.span(), p.span() == 1 ? "" : "s", Units.time(p.setup()));
                path(p, out);
            }
        }
        out.println();
        if (r.critical() == null) {
            out.println("no path constrains the clock");
        } else {
            PhaseTiming c = r.critical();
            out.printf(Locale.ROOT, "critical path: into %s on phase %d, %s + set-up %s over %d phase width%s%n",
                    c.endpoint(), c.phase(), Units.time(c.arrival()), Units.time(c.setup()), c.span(),
                    c.span() == 1 ? "" : "s");
            out.printf(Locale.ROOT, "shortest safe period %s: highest safe clock rate %s%n",
                    Units.time(r.minPeriodSeconds()), Units.scaled(r.maxClockHertz(), "Hz"));
        }
        out.printf(Locale.ROOT, "at %s: %s%n", Units.time(r.periodSeconds()),
                r.passes() ? "every path settles in time" : "a path does not settle in time");
        if (stages) {
            out.println();
            out.println("stage delays (declared, or ln 9 RC: through the load toward its rail, through the conducting tube the other way):");
            Table s = new Table("kind", "stage", "module", "output", "drives", "fan-out", "rise", "fall", "source");
            for (InstanceDelay d : r.instances()) {
                s.row(d.kind(), d.stage(), d.module(), d.netName(), Units.farads(d.delay().farads()),
                        Integer.toString(d.delay().fanOut()), Units.time(d.delay().rise()), Units.time(d.delay().fall()),
                        source(d) );
            }
            s.print(out, "  ");
        }
    }

    private static String source(InstanceDelay d) {
        String s = d.delay().riseGiven() && d.delay().fallGiven() ? "given"
                : d.delay().riseGiven() || d.delay().fallGiven() ? "given/computed" : "computed";
        return d.delay().note().isEmpty() ? s : s + "; " + d.delay().note();
    }

    private static void path(PhaseTiming p, PrintWriter out) {
        Table t = new Table("step", "driver", "stage", "edge", "delay", "arrival", "net", "module");
        int i = 0;
        for (PathStep s : p.path()) {
            t.row(Integer.toString(i++), s.kind(), s.stage(), s.edge() == 'r' ? "rise" : "fall", Units.time(s.delay()),
                    Units.time(s.arrival()), s.netName(), s.module());
        }
        t.print(out, "  ");
    }

    private void csv(TimingReport r, PrintWriter out) {
        if (stages) {
            out.println(ReportCsv.row("kind", "index", "stage", "module", "output", "driven_F", "fan_out", "rise_s",
                    "fall_s", "rise_given", "fall_given"));
            for (InstanceDelay d : r.instances()) {
                out.println(ReportCsv.row(d.kind(), Integer.toString(d.index()), d.stage(), d.module(), d.netName(),
                        ReportCsv.number(d.delay().farads()), Integer.toString(d.delay().fanOut()),
                        ReportCsv.number(d.delay().rise()), ReportCsv.number(d.delay().fall()),
                        Boolean.toString(d.delay().riseGiven()), Boolean.toString(d.delay().fallGiven())));
            }
            return;
        }
        out.println(ReportCsv.row("phase", "launch_phase", "span", "endpoint", "budget_s", "slack_s", "step", "driver",
                "stage", "edge", "delay_s", "arrival_s", "net", "module"));
        for (PhaseTiming p : r.perPhase()) {
            int i = 0;
            for (PathStep s : p.path()) {
                out.println(ReportCsv.row(Integer.toString(p.phase()), Integer.toString(p.launchPhase()),
                        Integer.toString(p.span()), p.endpoint(), ReportCsv.number(p.budget()),
                        ReportCsv.number(p.slack()), Integer.toString(i++), s.kind(), s.stage(),
                        s.edge() == 'r' ? "rise" : "fall", ReportCsv.number(s.delay()), ReportCsv.number(s.arrival()),
                        s.netName(), s.module()));
            }
        }
    }

    private void json(TimingReport r, PrintWriter out) {
        ReportJson j = new ReportJson().begin();
        j.field("machine", r.machine()).field("phases", r.phases()).field("period_s", r.periodSeconds())
                .field("phase_s", r.phaseSeconds()).field("passes", r.passes())
                .field("min_period_s", r.minPeriodSeconds()).field("max_clock_hz", r.maxClockHertz());
        j.beginArray("per_phase");
        for (PhaseTiming p : r.perPhase()) {
            phase(j.begin(), p).end();
        }
        j.endArray();
        if (r.critical() != null) {
            phase(j.beginObject("critical"), r.critical()).end();
        }
        j.beginArray("stages");
        for (InstanceDelay d : r.instances()) {
            j.begin().field("kind", d.kind()).field("index", d.index()).field("stage", d.stage())
                    .field("module", d.module()).field("output", d.netName()).field("driven_F", d.delay().farads())
                    .field("fan_out", d.delay().fanOut()).field("rise_s", d.delay().rise())
                    .field("fall_s", d.delay().fall()).field("rise_given", d.delay().riseGiven())
                    .field("fall_given", d.delay().fallGiven()).end();
        }
        j.endArray().end();
        out.println(j);
    }

    private static ReportJson phase(ReportJson j, PhaseTiming p) {
        j.field("phase", p.phase()).field("has_path", p.hasPath()).field("launch_phase", p.launchPhase())
                .field("span", p.span()).field("endpoint", p.endpoint()).field("setup_s", p.setup())
                .field("budget_s", p.budget()).field("arrival_s", p.arrival()).field("slack_s", p.slack())
                .field("passes", p.passes());
        j.beginArray("path");
        for (PathStep s : p.path()) {
            j.begin().field("driver", s.kind()).field("stage", s.stage()).field("edge", s.edge() == 'r' ? "rise" : "fall")
                    .field("delay_s", s.delay()).field("arrival_s", s.arrival()).field("net", s.netName())
                    .field("module", s.module()).end();
        }
        return j.endArray();
    }
}
