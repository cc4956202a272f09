package org.thermion.cli;

import org.thermion.text.Nouns;
import org.thermion.build.BuildDocuments;
import org.thermion.build.ChartStates;
import org.thermion.build.PinVoltages;
import org.thermion.build.Wiring;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.faults.FaultCircuit;
import org.thermion.faults.FaultList;
import org.thermion.faults.SocketPins;
import org.thermion.faults.FaultSimulator;
import org.thermion.faults.Step;
import org.thermion.model.Machine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.TEXT;
import static org.thermion.cli.report.ReportUnit.VOLTS;

/**
 * {@code sheets volts MACHINE}: the voltage chart, what a meter between chassis and each socket pin
 * should read at rest after reset and, with {@code --plan}, after each step of the bring-up plan.
 */
@Command(name = "volts", mixinStandardHelpOptions = true,
        description = {"Voltage chart: the DC voltage to ground at every socket pin, from the stages' operating "
                + "points at the rails as each state loads them (a rail sags by its source resistance times its load), at rest after reset (latches cleared, switches off) and, with --plan, "
                + "after each step of the bring-up plan (what `plan` prints).",
                "Text shows the rest state pin by pin and, for each plan step, the pins that move by more than "
                        + "0.5 V; CSV and JSON carry every pin in every state. '?' where no voltage is known "
                        + "(state unknown, a stage without a circuit): the reasons are listed below the table."})
final class SheetsVolts extends SheetsDocument {
    /** A pin whose reading moves by more than this (volts) between two states is listed as a change. */
    static final double CHANGE = 0.5;

    @Option(names = "--program", paramLabel = "FILE", description = "The program in the ROM (machines with a ROM).")
    Path program;

    @Option(names = "--plan", description = "Also chart the state after each step of the bring-up plan.")
    boolean plan;

    @Override
    Report report(Machine m, PrintWriter err) {
        long[] rom = null;
        if (program != null) {
            ProgramInput in = ProgramInput.read(m, program, null, options.loader, err);
            if (in == null) {
                return null;
            }
            rom = in.rom();
        }
        List<PinVoltages.State> states = new ArrayList<>();
        states.add(ChartStates.atRest(m, rom));
        if (plan) {
            List<Step> steps = planSteps(m, rom, err);
            if (steps == null) {
                return null;
            }
            states.addAll(ChartStates.afterSteps(m, rom, steps));
        }
        BuildDocuments docs = documents(m);
        PinVoltages volts = new PinVoltages(docs);
        List<PinVoltages.Chart> charts = new ArrayList<>();
        for (PinVoltages.State s : states) {
            charts.add(volts.at(s));
        }
        return report(m, docs.wiring(), charts);
    }

    /** The plan's steps as {@code plan} makes them; null after saying why there are none (exit 2). */
    private List<Step> planSteps(Machine m, long[] rom, PrintWriter err) {
        if (m.rom() != null && rom == null) {
            err.println("error: machine " + m.name() + " runs from a ROM: give the program it runs with --program");
            return null;
        }
        FaultCircuit c = FaultCircuit.of(m);
        if (c.lamps().isEmpty()) {
            err.println(options.machineFile + ": " + PlanInputs.nothingToWatch(m));
            return null;
        }
        PlanInputs in = new PlanInputs(m, program, rom, c, FaultList.of(c, SocketPins.of(m)), options.loader);
        try (FaultSimulator sim = in.simulator(2)) {
            return in.plan(sim).steps();
        }
    }

    private Report report(Machine m, Wiring w, List<PinVoltages.Chart> charts) {
        Table states = new Table("states", "States")
                .column("state", "state", TEXT).column("what", "what", TEXT)
                .column("unknown", "unknown", COUNT, "nets whose logic value the simulation does not know");
        Table data = new Table("volts", "Pin voltages")
                .column("state", "state", TEXT).column("socket", "socket", TEXT).column("pin", "pin", COUNT)
                .column("electrode", "carries", TEXT).column("net", "wired to", TEXT)
                .column("volts", "volts", VOLTS).column("note", "note", TEXT);
        for (PinVoltages.Chart c : charts) {
            int unknown = 0;
            for (boolean u : c.state().unknown()) {
                unknown += u ? 1 : 0;
            }
            states.row(c.state().name(), c.state().what(), unknown);
            for (Wiring.Socket s : w.sockets()) {
                for (int p = 1; p <= s.pins(); p++) {
                    int node = s.node(p);
                    data.row(c.state().name(), s.ref(), p, s.electrodes().get(p - 1),
                            node < 0 ? new Absent("open") : w.nodes().get(node).name(), reading(c, node, "none"),
                            node < 0 ? new Absent("-") : note(c, node));
                }
            }
        }
        Report r = start(m, "volts").field("states", charts.size()).field("reference", "ground (chassis)")
                .table(states).data(data);
        PinVoltages.Chart rest = charts.get(0);
        Table view = new Table("rest", "At rest after reset (volts to chassis)")
                .column("socket", "socket", TEXT).column("type", "type", TEXT).column("pin", "pin", COUNT)
                .column("electrode", "carries", TEXT).column("net", "wired to", TEXT)
                .column("volts", "volts V", TEXT, "? = no voltage known (see below); open = pin not wired");
        Map<String, Integer> reasons = new TreeMap<>();
        for (Wiring.Socket s : w.sockets()) {
            for (int p = 1; p <= s.pins(); p++) {
                int node = s.node(p);
                view.row(s.ref(), s.tube(), p, s.electrodes().get(p - 1),
                        node < 0 ? new Absent("open") : w.nodes().get(node).name(), shown(rest, node));
                if (node >= 0 && Double.isNaN(rest.volts(node))) {
                    reasons.merge(rest.note(node), 1, Integer::sum);
                }
            }
        }
        r.view(view);
        if (charts.size() > 1) {
            r.view(changes(w, charts, reasons));
        }
        List<String> lines = new ArrayList<>();
        StringBuilder railLine = new StringBuilder("rails at rest, as that state loads them:");
        rest.rails().forEach((name, v) -> railLine.append(railLine.charAt(railLine.length() - 1) == ':' ? " " : ", ")
                .append(name).append(' ').append(String.format(java.util.Locale.ROOT, "%.1f V", v)));
        lines.add(railLine.toString());
        reasons.forEach((why, n) -> lines.add("? at " + Nouns.count(n, "pin") + ": " + why));
        Map<String, List<String>> warned = new java.util.LinkedHashMap<>();
        for (PinVoltages.Chart c : charts) {
            for (String warning : c.warnings()) {
                warned.computeIfAbsent(warning, k -> new ArrayList<>()).add(c.state().name());
            }
        }
        warned.forEach((warning, in) -> lines.add("warning (" + String.join(", ", in) + "): " + warning));
        if (!lines.isEmpty()) {
            r.text(lines);
        }
        return r;
    }

    /** Per plan step, the pins whose reading moved by more than {@link #CHANGE} since the state before. */
    private static Table changes(Wiring w, List<PinVoltages.Chart> charts, Map<String, Integer> reasons) {
        Table t = new Table("changes", "Pins that move during the plan (volts to chassis)")
                .column("state", "after", TEXT).column("socket", "socket", TEXT).column("pin", "pin", COUNT)
                .column("electrode", "carries", TEXT).column("before", "before V", TEXT)
                .column("volts", "now V", TEXT);
        for (int k = 1; k < charts.size(); k++) {
            PinVoltages.Chart before = charts.get(k - 1);
            PinVoltages.Chart now = charts.get(k);
            for (Wiring.Socket s : w.sockets()) {
                for (int p = 1; p <= s.pins(); p++) {
                    int node = s.node(p);
                    if (node < 0) {
                        continue;
                    }
                    double a = before.volts(node);
                    double b = now.volts(node);
                    if (Double.isNaN(b) && !Double.isNaN(a)) {
                        reasons.merge(now.note(node), 1, Integer::sum);
                    }
                    boolean moved = Double.isNaN(a) != Double.isNaN(b) || Math.abs(a - b) > CHANGE;
                    if (moved) {
                        t.row(now.state().name(), s.ref(), p, s.electrodes().get(p - 1), shown(before, node),
                                shown(now, node));
                    }
                }
            }
        }
        return t;
    }

    /** The reading rounded to 0.1 V, or the absent word. */
    private static Object reading(PinVoltages.Chart c, int node, String open) {
        if (node < 0) {
            return new Absent(open);
        }
        double v = c.volts(node);
        return Double.isNaN(v) ? new Absent("?") : Math.round(v * 10) / 10.0;
    }

    /** The reading as a meter on a 0.1 V resolution shows it, for text. */
    private static String shown(PinVoltages.Chart c, int node) {
        if (node < 0) {
            return "open";
        }
        double v = c.volts(node);
        return Double.isNaN(v) ? "?" : String.format(Locale.ROOT, "%.1f", Math.round(v * 10) / 10.0 + 0.0);
    }

    private static Object note(PinVoltages.Chart c, int node) {
        String n = c.note(node);
        return n == null ? new Absent("-") : n;
    }
}
