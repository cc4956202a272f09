package org.thermion.cli;

import org.thermion.cli.report.Format;
import org.thermion.lang.SourceText;
import org.thermion.model.Machine;
import org.thermion.power.startup.BypassDelay;
import org.thermion.power.startup.CurrentPlot;
import org.thermion.power.startup.DrawMode;
import org.thermion.power.startup.PowerUpOptions;
import org.thermion.power.startup.PowerUpResult;
import org.thermion.power.startup.ResistorSweep;
import org.thermion.power.startup.SoftStartSizing;
import org.thermion.power.startup.StartupNetwork;
import org.thermion.power.startup.TransientFailure;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

/** {@code powerup MACHINE}: the switch-on transient of every rail, the soft start and its relay driver. */
@Command(name = "powerup", mixinStandardHelpOptions = true,
        description = {"Simulate switch-on: heaters warming from cold, rail currents, the soft-start resistor and its "
                + "bypass relay, and the thyratron relay driver. Exit 1 when a supply goes into its current limit, a "
                + "soft-start resistor runs over its rating or is never bypassed, or the relay driver check fails.",
                "Rail currents: switch-on peak = the inrush before any bypass (none when the current only rises), "
                        + "bypass peak = the highest after the bypass, steady state = the end of the run once settled "
                        + "(moved under 1 %% over its last tenth). Every current is a magnitude; volts are signed as declared."})
final class PowerUpCommand extends CommandBase {
    @Parameters(paramLabel = "MACHINE", description = "The .machine file.")
    Path file;

    @Option(names = "--time", paramLabel = "T", description = "Simulated time with its unit (default: ${DEFAULT-VALUE}).",
            defaultValue = "30s")
    String time;

    @Option(names = "--resistor", paramLabel = "[NAME=]R",
            description = "Soft-start resistor instead of the declared one, with unit (2ohm, \"2 ohm\", 500mohm); NAME picks the soft start when there are several.")
    List<String> resistors = List.of();

    @Option(names = "--sweep", paramLabel = "[NAME=]RMIN..RMAX:STEP",
            description = "Tabulate both current peaks against the resistor (e.g. 0.5ohm..5ohm:0.25ohm) and recommend a value.")
    String sweep;

    @Option(names = "--bypass", paramLabel = "TMIN..TMAX:STEP",
            description = "With --sweep on a machine without a soft start: the bypass times to tabulate against the "
                    + "resistor (default: ${DEFAULT-VALUE}).", defaultValue = "2s..20s:2s")
    String bypass;

    @Option(names = "--fit", paramLabel = "TRACE.csv", description = "Fit the model to a current measured at switch-on "
            + "(CSV: time_seconds, then a current column such as current_amps) and report the fitted figures, their "
            + "uncertainty and what the trace cannot tell.")
    Path fit;

    @Option(names = "--calibrate", paramLabel = "TRACE.csv", description = "Fit the model to the trace as --fit does, then "
            + "run the prediction asked for (the power-up, or --sweep) with the fitted figures.")
    Path calibrate;

    @Option(names = "--trace-rail", paramLabel = "RAIL", description = "The rail the trace measured (default: the rail its "
            + "current column names, as RAIL_amps, else the one with the largest switch-on current).")
    String traceRail;

    @Option(names = "--csv", paramLabel = "FILE", description = "Write the time series to FILE (RFC 4180): time_seconds, "
            + "RAIL_amps and RAIL_volts per rail (signed as declared), heater_N_kelvin per row N of the heaters table.")
    Path csv;

    @Option(names = "--svg", paramLabel = "FILE", description = "Also draw the curves as a picture (SVG): the rails' "
            + "currents and load voltages against time; with --sweep, the peaks against the resistor.")
    Path svg;

    @Option(names = OutputFiles.REPLACE, description = "Let --csv or --svg replace an existing file that is not an "
            + "earlier output of the same kind.")
    boolean replace;

    @Option(names = "--format", paramLabel = "FORMAT", description = "text, csv or json (the report's tables; --csv FILE writes the time series); default ${DEFAULT-VALUE}.",
            defaultValue = "text")
    Format format;

    @Option(names = "--draw", paramLabel = "MODE", description = "Steady stage draws: highest (of output low and high) or mean; default ${DEFAULT-VALUE}.",
            defaultValue = "highest")
    String draw;

    @Option(names = "--width", paramLabel = "N", description = "Plot width in columns (default ${DEFAULT-VALUE}).", defaultValue = "78")
    int width;

    @Option(names = "--no-plot", description = "Leave out the current plots.")
    boolean noPlot;

    @Option(names = "--ascii", description = "Draw plots with ASCII characters only.")
    boolean ascii;

    @Mixin
    ProgressOptions progressOptions = new ProgressOptions();

    /** The fit --calibrate made (null without one). */
    private PowerUpFit.Done fitted;

    @Override
    public Integer call() {
        PrintWriter out = out();
        PrintWriter err = err();
        PowerUpOptions o;
        PowerUpArgs.Named<PowerUpArgs.Range> range = null;
        List<PowerUpArgs.Named<Double>> rs;
        DrawMode mode;
        try {
            double seconds = PowerUpArgs.seconds(time, "--time");
            if (!(seconds >= PowerUpOptions.MIN_SECONDS) || seconds > PowerUpOptions.MAX_SECONDS) {
                throw new IllegalArgumentException("--time must be between 10 ms and 1 h, got '" + time + "'");
            }
            mode = switch (draw.toLowerCase(java.util.Locale.ROOT)) {
                case "highest" -> DrawMode.HIGHEST;
                case "mean" -> DrawMode.MEAN;
                default -> throw new IllegalArgumentException("--draw takes highest or mean, got '" + draw + "'");
            };
            if (width < 30 || width > 400) {
                throw new IllegalArgumentException("--width must be between 30 and 400 columns");
            }
            rs = resistors.stream().map(PowerUpArgs::resistor).toList();
            if (sweep != null) {
                range = PowerUpArgs.sweep(sweep);
            }
            o = PowerUpOptions.defaults().withSeconds(seconds).withDrawMode(mode)
                    .withSampleSeconds(Math.max(0.001, seconds / 3000));
        } catch (IllegalArgumentException e) {
            return badInput(e.getMessage());
        }
        MachineLoader loader = new MachineLoader();
        Machine m = loader.load(file, err, false);
        if (m == null) {
            return ExitCodes.BAD_INPUT;
        }
        if (fit != null && calibrate != null) {
            return badInput("give --fit (report the fit) or --calibrate (predict with it), not both");
        }
        if (fit != null || calibrate != null) {
            fitted = PowerUpFit.fit(m, fit != null ? fit : calibrate, traceRail, o, mode, loader, err);
            if (fitted == null) {
                return ExitCodes.BAD_INPUT;
            }
            if (fit != null) {
                if (svg != null) {
                    int code = PlotFile.write(svg, PowerUpFit.figure(fitted), replace, List.of(file, fit), loader.sources(), err);
                    if (code != 0) {
                        return code;
                    }
                }
                format.write(out, PowerUpFit.report(fitted));
                out.flush();
                return ExitCodes.OK;
            }
            o = o.withAssumptions(fitted.result().assumptions());
        }
        if (m.softStarts().isEmpty() && !rs.isEmpty()) {
            return badInput(file + " declares no soft start, so --resistor has nothing to change; "
                    + "--sweep sizes one");
        }
        if (m.softStarts().isEmpty() && range != null) {
            return size(m, o, mode, range, loader, out, err);
        }
        StartupNetwork net;
        try {
            net = network(m, o, mode);
        } catch (TransientFailure e) {
            return badInput(file + ": " + e.getMessage());
        }
        try {
            for (PowerUpArgs.Named<Double> r : rs) {
                o = o.withResistor(softStartName(net, r.softStart(), "--resistor"), r.value());
            }
            if (range != null) {
                String name = softStartName(net, range.softStart(), "--sweep");
                double[] values = ResistorSweep.range(range.value().from(), range.value().to(), range.value().step());
                ResistorSweep.Result sr;
                try (ProgressBar bar = ProgressBar.start(err, "resistor sweep", "resistors", progressOptions.mode())) {
                    sr = ResistorSweep.run(net, o, name, values, Runtime.getRuntime().availableProcessors(),
                            done -> bar.update(done, values.length));
                }
                if (svg != null) {
                    int code = PlotFile.write(svg, PowerUpFigures.sweep(sr), replace, inputs(), loader.sources(), err);
                    if (code != 0) {
                        return code;
                    }
                }
                format.write(out, calibrated(PowerUpSweepReport.of(sr)));
                return sr.recommended() == null ? ExitCodes.CHECK_FAILED : ExitCodes.OK;
            }
        } catch (IllegalArgumentException | TransientFailure e) {
            return badInput(e.getMessage());
        }
        PowerUpResult result;
        List<BypassDelay.Advice> advice;
        try {
            result = net.solve(o);
            advice = BypassDelay.suggest(net, o);
        } catch (TransientFailure e) {
            return badInput(file + ": " + e.getMessage());
        }
        PowerUpReport report = new PowerUpReport(result, advice);
        if (csv != null) {
            OutputFiles.Refusal no = OutputFiles.check(csv, OutputFiles.Kind.POWERUP_CSV, replace, inputs(), loader.sources());
            if (no == null) {
                try {
                    OutputFiles.write(csv, PowerUpSeries.of(result), StandardCharsets.UTF_8);
                } catch (IOException e) {
                    no = new OutputFiles.Refusal("cannot write " + csv + ": " + SourceText.reason(csv, e), null);
                }
            }
            if (no != null) {
                return no.print(err);
            }
        }
        if (svg != null) {
            int code = PlotFile.write(svg, PowerUpFigures.curves(result), replace, inputs(), loader.sources(), err);
            if (code != 0) {
                return code;
            }
        }
        format.write(out, calibrated(report.report(width, !noPlot, ascii ? CurrentPlot.Style.ASCII : CurrentPlot.Style.BLOCKS)));
        return report.ok() ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }

    /** {@code --sweep} on a machine without a soft start: a resistor and bypass-time table for one rail. */
    private int size(Machine m, PowerUpOptions o, DrawMode mode, PowerUpArgs.Named<PowerUpArgs.Range> range,
                     MachineLoader loader, PrintWriter out, PrintWriter err) {
        try {
            StartupNetwork net = network(m, o, mode);
            int rail = range.softStart() == null ? inrushRail(m, net, o) : m.railIndex(range.softStart());
            if (rail < 0) {
                throw new IllegalArgumentException("--sweep: no rail named '" + range.softStart() + "'");
            }
            PowerUpArgs.Range times = PowerUpArgs.timeRange(bypass, "--bypass");
            double[] ohms = ResistorSweep.range(range.value().from(), range.value().to(), range.value().step());
            double[] secs = SoftStartSizing.times(times.from(), times.to(), times.step());
            if ((long) ohms.length * secs.length > 10_000) {
                throw new IllegalArgumentException("--sweep x --bypass: " + ohms.length + " x " + secs.length
                        + " cells is too many (at most 10000)");
            }
            PowerUpOptions run = o.withSeconds(Math.max(o.seconds(), secs[secs.length - 1]));
            SoftStartSizing.Table t;
            try (ProgressBar bar = ProgressBar.start(err, "sizing", "resistors", progressOptions.mode())) {
                t = SoftStartSizing.run(net, run, rail, ohms, secs, Runtime.getRuntime().availableProcessors(),
                        done -> bar.update(done, ohms.length));
            }
            if (svg != null) {
                int code = PlotFile.write(svg, PowerUpFigures.sizing(t), replace, inputs(), loader.sources(), err);
                if (code != 0) {
                    return code;
                }
            }
            format.write(out, calibrated(PowerUpSizingReport.of(t)));
            out.flush();
            return t.best() == null ? ExitCodes.CHECK_FAILED : ExitCodes.OK;
        } catch (IllegalArgumentException | TransientFailure e) {
            return badInput(e.getMessage());
        }
    }

    /** The files this run reads (never to be written over). */
    private List<Path> inputs() {
        return calibrate == null ? List.of(file) : List.of(file, calibrate);
    }

    /** {@code r} with a line naming the fitted figures when the model was calibrated. */
    private org.thermion.cli.report.Report calibrated(org.thermion.cli.report.Report r) {
        return fitted == null ? r : r.text("", PowerUpFit.note(fitted));
    }

    /** The machine's network, with the figures a trace fitted when --calibrate gave one. */
    private StartupNetwork network(Machine m, PowerUpOptions o, DrawMode mode) {
        return fitted == null ? StartupNetwork.of(m, o.assumptions(), mode)
                : StartupNetwork.of(m, o.assumptions(), mode, fitted.result().adjustment());
    }

    /** The rail with heater strings whose switch-on current is largest: the one a soft start is for. */
    static int inrushRail(Machine m, StartupNetwork net, PowerUpOptions o) {
        PowerUpResult r = net.solve(o.withSampleSeconds(0));
        int best = -1;
        for (org.thermion.model.HeaterString hs : m.heaterStrings()) {
            if (best < 0 || r.rail(hs.rail()).switchOnPeak() > r.rail(best).switchOnPeak()) {
                best = hs.rail();
            }
        }
        if (best < 0) {
            throw new IllegalArgumentException("the machine has no heater string, so there is no inrush to soften");
        }
        return best;
    }

    private String softStartName(StartupNetwork net, String given, String option) {
        List<String> names = net.softStartNames();
        if (given != null) {
            if (!names.contains(given)) {
                throw new IllegalArgumentException(option + ": no soft start named '" + given + "'; the machine has: " + String.join(", ", names));
            }
            return given;
        }
        if (names.size() > 1) {
            throw new IllegalArgumentException(option + ": the machine has several soft starts (" + String.join(", ", names)
                    + "); write NAME=VALUE");
        }
        return names.get(0);
    }
}
