package org.thermion.cli;

import org.thermion.text.Nouns;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.circuit.MachineCircuits;
import org.thermion.circuit.Tolerances;
import org.thermion.model.Machine;
import org.thermion.timing.DelayCalculator;
import org.thermion.timing.StageDrive;
import org.thermion.levels.RailsUnderLoad;
import org.thermion.model.NetLabels;
import org.thermion.timing.PathAdvice;
import org.thermion.timing.RaceChecks;
import org.thermion.timing.InstanceDelay;
import org.thermion.timing.PathStep;
import org.thermion.timing.PhaseTiming;
import org.thermion.timing.StaticTiming;
import org.thermion.timing.TimingReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.FARADS;
import static org.thermion.cli.report.ReportUnit.FLAG;
import static org.thermion.cli.report.ReportUnit.HERTZ;
import static org.thermion.cli.report.ReportUnit.OHMS;
import static org.thermion.cli.report.ReportUnit.SECONDS;
import static org.thermion.cli.report.ReportUnit.TEXT;

/** {@code timing MACHINE}: stage delays, the worst path of every phase, slack and the highest safe clock. */
@Command(name = "timing", mixinStandardHelpOptions = true,
        description = {"Static timing: every stage's rise and fall delay (given, or ln 9 RC from its load and "
                + "the capacitance it drives), the worst path into each phase's latches, its slack, and the "
                + "highest safe clock rate.",
                "Exit 1 when a path does not settle in time at the clock period."})
final class TimingCommand extends ReportCommand {
    private static final Pattern TIME = Pattern.compile("\\s*([0-9]*\\.?[0-9]+(?:[eE][-+]?[0-9]+)?)\\s*(s|ms|us|ns)\\s*");

    @Parameters(paramLabel = "MACHINE", description = "The .machine file.")
    Path file;

    @Option(names = "--period", paramLabel = "T",
            description = "Clock period to test instead of the machine's own, with its unit (e.g. 50us, 0.2 ms).")
    String period;

    @Option(names = "--rom-access", paramLabel = "T",
            description = "Access time of the off-board ROM, from the PC loading to valid data (default: 0).")
    String romAccess;

    @Option(names = "--stages", description = "Also list every stage instance's rise and fall delay.")
    boolean stages;

    @Override
    public Integer call() {
        PrintWriter out = out();
        PrintWriter err = err();
        double t = Double.NaN;
        if (period != null) {
            t = parseTime(period);
            if (Double.isNaN(t)) {
                return badInput("--period '" + period + "' is not a time; write a positive number with s, ms, us or ns (e.g. 50us)");
            }
            if (t > MAX_SECONDS) {
                return badInput("--period '" + period + "' is out of range: at most 3600 s, as in the clock block");
            }
        }
        double access = Double.NaN;
        if (romAccess != null) {
            access = parseTime(romAccess);
            if (Double.isNaN(access)) {
                return badInput("--rom-access '" + romAccess + "' is not a time; write a positive number with s, ms, us or ns (e.g. 2us)");
            }
            if (access > MAX_SECONDS) {
                return badInput("--rom-access '" + romAccess + "' is out of range: at most 3600 s, as a clock period");
            }
        }
        Machine m = new MachineLoader().load(file, err, false);
        if (m == null) {
            return ExitCodes.BAD_INPUT;
        }
        Analysis a = analyse(m, Double.isNaN(t) ? m.clock().periodSeconds() : t, access);
        format.write(out, report(a));
        return a.passes() ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }

    /**
     * Timing at nominal values and at the slow corner, the remedies for failing or tight paths,
     * the short-path checks and the warnings (a ROM access time not given, declared figures far
     * from the computed ones).
     */
    record Analysis(Machine machine, TimingReport nominal, TimingReport slow, List<PathAdvice.Remedy> advice,
                    List<RaceChecks.Check> checks, DelayCalculator calc, double romAccess, List<String> warnings) {
        boolean passes() {
            return nominal.passes() && slow.passes() && checks.stream().allMatch(RaceChecks.Check::passes);
        }
    }

    /** {@code access}: the ROM access time, NaN when not given (taken as 0, with a warning). */
    static Analysis analyse(Machine m, double period, double access) {
        MachineCircuits circuits = MachineCircuits.of(m);
        // the operating points stand where check's levels do: at the rails under the heaviest static load
        RailsUnderLoad rails = RailsUnderLoad.of(m, circuits, Tolerances.DEFAULT.rail());
        StageDrive drive = new StageDrive(rails.solver(), Math.max(0, rails.solver().rails().highest().volts()));
        DelayCalculator nominal = new DelayCalculator(m, circuits, drive, null);
        DelayCalculator slow = new DelayCalculator(m, circuits, drive, Tolerances.DEFAULT.withLightRise(rails.lightRise()));
        List<String> warnings = new ArrayList<>();
        double rom = Double.isNaN(access) ? 0 : access;
        if (Double.isNaN(access) && m.rom() != null && m.pc() != null) {
            warnings.add("no ROM access time given: the ROM's data are taken as valid the moment the program "
                    + "counter loads; give the ROM's access time with --rom-access (e.g. --rom-access 2us)");
        }
        TimingReport rn = new StaticTiming(m, rom, nominal).analyse(period);
        TimingReport rs = new StaticTiming(m, rom, slow).analyse(period);
        List<RaceChecks.Check> checks = new ArrayList<>();
        double width = period / Math.max(1, m.clock().phases());
        for (RaceChecks.Check c : new RaceChecks(m, nominal, rom).checks(width)) {
            if (!c.kind().equals("pulse width")) {
                checks.add(c);
            }
        }
        checks.addAll(RaceChecks.overlaps(rs));
        for (RaceChecks.Check c : new RaceChecks(m, slow, rom).checks(width)) {
            if (c.kind().equals("pulse width")) {
                checks.add(c);
            }
        }
        List<PathAdvice.Remedy> advice = new PathAdvice(m, slow).advise(rs);
        return new Analysis(m, rn, rs, advice, checks, nominal, Double.isNaN(access) ? Double.NaN : access, warnings);
    }

    /** Seconds from text such as {@code 50us}; NaN when it is not a positive time. */
    /** The longest period or access time taken: the clock block's own limit (1e400s reads as infinite). */
    static final double MAX_SECONDS = 3600;

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
    static final int VERSION = 3;
    private static final Absent NO_PATH = new Absent("no paths");

    /** The timing analysis as one report; the stage table only with {@code --stages}. */
    Report report(Analysis a) {
        TimingReport r = a.nominal();
        TimingReport slow = a.slow();
        NetLabels labels = new NetLabels(a.machine().netlist());
        Report rep = new Report("timing", VERSION);
        rep.field("machine", r.machine());
        rep.field("phases", r.phases());
        rep.field("period", SECONDS, r.periodSeconds());
        rep.field("phase_width", SECONDS, r.phaseSeconds());
        rep.field("passes", a.passes());
        rep.field("rom_access", SECONDS, Double.isNaN(a.romAccess())
                ? new Absent(a.machine().rom() == null ? "no ROM" : "not given (taken as 0)") : a.romAccess());
        PhaseTiming c = r.critical();
        Absent unconstrained = new Absent("no path constrains the clock");
        rep.field("min_period", SECONDS, c == null ? unconstrained : r.minPeriodSeconds());
        rep.field("max_clock", HERTZ, c == null ? unconstrained : r.maxClockHertz());
        rep.field("min_period_slow", SECONDS, slow.critical() == null ? unconstrained : slow.minPeriodSeconds());
        rep.field("max_clock_slow", HERTZ, slow.critical() == null ? unconstrained : slow.maxClockHertz());
        rep.field("slow_corner", "each stage's rails, resistors and tube emission at the tolerance ends that slow it ("
                + "rails and resistors " + percent(Tolerances.DEFAULT.resistor()) + ", emission down to "
                + Math.round(Tolerances.DEFAULT.endOfLife() * 100) + " %), from the rails under the heaviest static load");
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
        rep.text(String.format(Locale.ROOT, "timing %s: %s, period %s, phase width %s", r.machine(), Nouns.count(r.phases(), "phase"),
                        Numbers.si(r.periodSeconds(), SECONDS), Numbers.si(r.phaseSeconds(), SECONDS)),
                "  a change launched at the end of one phase (latch outputs after their delay; inputs at the end of the "
                        + "last phase; ROM data when the PC loads) must reach each latch set-up before the end of its "
                        + "loading phase: the next phase, or a whole cycle later for a latch of the same phase",
                "  delays: ln 9 R C, R computed from each stage's operating points where it has a circuit (else its "
                        + "declared load and ron); slow corner: " + rep.fields().get("slow_corner"));
        for (String w : a.warnings()) {
            rep.text("  warning: " + w);
        }
        rep.text("");
        Table t = new Table("phases", "worst path into each phase, nominal and at the slow corner")
                .column("phase", "phase", COUNT)
                .column("launch_phase", "launched", COUNT, "the phase at whose end the path starts")
                .column("span", "span", COUNT, "phase widths the path may take")
                .column("endpoint", "worst endpoint", TEXT)
                .column("setup", "set-up", SECONDS)
                .column("arrival", "arrival", SECONDS, "when the change reaches the endpoint")
                .column("budget", "budget", SECONDS, "span less set-up")
                .column("slack", "slack", SECONDS, "budget less arrival")
                .column("result", "result", TEXT)
                .column("slow_arrival", "slow arrival", SECONDS, "arrival of the worst path at the slow corner")
                .column("slow_slack", "slow slack", SECONDS)
                .column("slow_result", "slow result", TEXT);
        Table paths = new Table("paths", "worst paths, step by step (phase = the endpoint's phase; nominal values)")
                .column("phase", "phase", COUNT)
                .column("step", "step", COUNT)
                .column("driver", "driver", TEXT)
                .column("stage", "stage", TEXT)
                .column("edge", "edge", TEXT)
                .column("delay", "delay", SECONDS)
                .column("arrival", "arrival", SECONDS)
                .column("net", "net", TEXT, "a net named by the elaborator is shown as its expression and file:line")
                .column("module", "module", TEXT);
        for (int q = 0; q < r.perPhase().size(); q++) {
            PhaseTiming p = r.perPhase().get(q);
            PhaseTiming ps = slow.perPhase().get(q);
            if (!p.hasPath()) {
                t.row(p.phase(), Absent.NONE, Absent.NONE, NO_PATH, Absent.NONE, Absent.NONE, Absent.NONE, Absent.NONE,
                        "ok", Absent.NONE, Absent.NONE, "ok");
                continue;
            }
            t.row(p.phase(), p.launchPhase(), p.span(), p.endpoint(), p.setup(), p.arrival(), p.budget(), p.slack(),
                    verdict(p), ps.arrival(), ps.slack(), verdict(ps));
            int i = 0;
            for (PathStep st : p.path()) {
                paths.row(p.phase(), i++, st.kind(), st.stage(), st.edge() == 'r' ? "rise" : "fall", st.delay(),
                        st.arrival(), labels.label(st.net()), st.module());
            }
        }
        rep.table(t).table(paths);
        if (c == null) {
            rep.text("no path constrains the clock");
        } else {
            rep.text(String.format(Locale.ROOT, "critical path: into %s on phase %d, %s + set-up %s over %s",
                            c.endpoint(), c.phase(), Numbers.si(c.arrival(), SECONDS), Numbers.si(c.setup(), SECONDS),
                            Nouns.count(c.span(), "phase width")),
                    String.format(Locale.ROOT, "shortest safe period %s: highest safe clock rate %s nominal, %s at the "
                                    + "slow corner", Numbers.si(r.minPeriodSeconds(), SECONDS),
                            Numbers.si(r.maxClockHertz(), HERTZ), Numbers.si(slow.maxClockHertz(), HERTZ)));
        }
        rep.text(String.format(Locale.ROOT, "at %s: %s", Numbers.si(r.periodSeconds(), SECONDS),
                a.passes() ? "every path settles in time and every short-path check holds"
                        : !r.passes() ? "a path does not settle in time"
                        : !slow.passes() ? "a path settles in time at nominal values but not at the slow corner"
                        : "a short-path check fails"));
        rep.text("");
        TimingSections.advice(rep, a.advice());
        rep.text("");
        TimingSections.checks(rep, a.checks());
        rep.text("");
        for (String w : TimingSections.stageFigures(rep, a.machine(), a.calc())) {
            rep.text("  warning: " + w);
        }
        if (stages) {
            rep.text("");
            Table st = new Table("stages", "stage delays, nominal (declared, or ln 9 R C with R from the circuit or "
                    + "the declared load and ron)")
                    .column("kind", "kind", TEXT)
                    .column("index", "index", COUNT)
                    .column("stage", "stage", TEXT)
                    .column("module", "module", TEXT)
                    .column("output", "output", TEXT)
                    .column("driven", "drives", FARADS, "the capacitance the output drives")
                    .column("fan_out", "fan-out", COUNT)
                    .column("rise", "rise", SECONDS)
                    .column("fall", "fall", SECONDS)
                    .column("rise_ohms", "rise R", OHMS, "output resistance of the rising edge")
                    .column("fall_ohms", "fall R", OHMS)
                    .column("basis", "R from", TEXT, "computed from the circuit, or declared")
                    .column("rise_given", "rise given", FLAG, "a delay declared by the stage")
                    .column("fall_given", "fall given", FLAG)
                    .column("note", "note", TEXT);
            for (InstanceDelay d : r.instances()) {
                st.row(d.kind(), d.index(), d.stage(), d.module(), d.netName(), d.delay().farads(), d.delay().fanOut(),
                        d.delay().rise(), d.delay().fall(), ohmsOrAbsent(d.delay().riseOhms()),
                        ohmsOrAbsent(d.delay().fallOhms()), d.delay().basis(), d.delay().riseGiven(),
                        d.delay().fallGiven(), d.delay().note().isEmpty() ? Absent.NONE : d.delay().note());
            }
            rep.table(st);
        }
        return rep;
    }

    private static Object ohmsOrAbsent(double v) {
        return Double.isFinite(v) ? v : Absent.NONE;
    }

    private static String verdict(PhaseTiming p) {
        return !p.passes() ? "FAILS" : PathAdvice.tight(p) ? "tight" : "ok";
    }

    private static String percent(double f) {
        return "+/-" + Math.round(f * 100) + " %";
    }
}
