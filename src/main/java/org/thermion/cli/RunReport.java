package org.thermion.cli;

import org.thermion.text.Nouns;
import org.thermion.model.Machine;
import org.thermion.sim.OutputChange;
import org.thermion.sim.RunResult;
import org.thermion.sim.UnknownReport;
import org.thermion.sim.WatchRow;

import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.ReportUnit;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.TEXT;

/** A program run as one report: output changes, watched nets, unknown values, final state. */
final class RunReport {
    private final Machine machine;
    private final Path program;
    private final String level;
    private final String init;
    private final RunResult r;

    RunReport(Machine machine, Path program, String level, String init, RunResult result) {
        this.machine = machine;
        this.program = program;
        this.level = level;
        this.init = init;
        this.r = result;
    }

    /** The schema version of run's JSON ({@code org/thermion/schema/run.schema.json}). */
    static final int VERSION = 2;

    /** How long the real machine takes for the cycles run, at its declared clock period. */
    double machineSeconds() {
        return r.cycles() * machine.clock().periodSeconds();
    }

    /** The run as one report: values 0, 1 or x (unknown) as text, in every format alike. */
    Report report() {
        Report rep = new Report("run", VERSION);
        rep.field("machine", machine.name());
        rep.field("program", program == null ? new Absent("no program") : program.toString());
        rep.field("level", level);
        rep.field("init", init);
        rep.field("cycles", r.cycles());
        rep.field("machine_time_seconds", machineSeconds());
        rep.field("stop", r.stop());
        Object pc = machine.pc() == null ? new Absent("no pc") : r.pcKnown() ? (Object) (long) r.pc() : new Absent("x");
        rep.field("pc", pc);
        List<String> head = new ArrayList<>();
        head.add("run " + machine.name() + ": " + (program == null ? "no program" : "program " + program) + ", "
                + level + " level, init " + init);
        head.add(Nouns.count(r.cycles(), "cycle") + "; stopped: " + r.stop());
        head.add("machine time " + Numbers.si(machineSeconds(), ReportUnit.SECONDS) + " (a cycle is "
                + Numbers.si(machine.clock().periodSeconds(), ReportUnit.SECONDS) + " on the real machine)");
        if (!init.equals("zero")) {
            StringBuilder sb = new StringBuilder("outputs at power-up:");
            for (int i = 0; i < machine.outputs().size(); i++) {
                sb.append(' ').append(machine.outputs().get(i).name()).append('=').append(r.initialOutputs().charAt(i));
            }
            head.add(sb.toString());
        }
        head.add("");
        rep.text(head);
        Table initial = new Table("initial", "outputs at power-up")
                .column("output", "output", TEXT)
                .column("value", "value", TEXT);
        for (int i = 0; i < machine.outputs().size(); i++) {
            initial.row(machine.outputs().get(i).name(), String.valueOf(r.initialOutputs().charAt(i)));
        }
        rep.data(initial);
        Table changes = new Table("changes", "output changes")
                .column("cycle", "cycle", COUNT, "cycles count from 0")
                .column("phase", "phase", COUNT, "phases count from 1")
                .column("output", "output", TEXT)
                .column("value", "value", TEXT);
        for (OutputChange c : r.changes()) {
            changes.row(c.cycle(), c.phase(), c.output(), String.valueOf(c.value()));
        }
        rep.table(changes);
        Table watch = new Table("watch", "watched nets at the end of each cycle (pc: the instruction the cycle ran)")
                .column("cycle", "cycle", COUNT)
                .column("pc", "pc", COUNT)
                .column("net", "net", TEXT)
                .column("value", "value", TEXT);
        for (WatchRow w : r.watch()) {
            for (int i = 0; i < w.values().size(); i++) {
                watch.row(w.cycle(), machine.pc() == null ? new Absent("no pc") : (Object) (long) w.pc(),
                        r.watchNames().get(i), w.values().get(i));
            }
        }
        rep.data(watch);
        if (!r.watchNames().isEmpty()) {
            rep.view(watchGrid());
        }
        Table unknowns = new Table("unknowns", "unknown values that reached outputs or the jump")
                .column("cycle", "cycle", COUNT)
                .column("phase", "phase", COUNT)
                .column("net", "net", TEXT)
                .column("what", "what", TEXT);
        for (UnknownReport u : r.unknowns()) {
            unknowns.row(u.cycle(), u.phase() == 0 ? Absent.NONE : (Object) (long) u.phase(), u.net(), u.what());
        }
        if (r.unknowns().isEmpty()) {
            rep.data(unknowns);
        } else {
            rep.table(unknowns);
        }
        Table state = new Table("state", "final state after " + Nouns.count(r.cycles(), "cycle"))
                .column("name", "state", TEXT)
                .column("value", "value", TEXT);
        for (int i = 0; i < r.stateNames().size(); i++) {
            state.row(r.stateNames().get(i), String.valueOf(r.state().charAt(i)));
        }
        rep.table(state);
        if (machine.pc() != null) {
            rep.text("  pc  " + pcText());
        }
        return rep;
    }

    /** The watched nets side by side, one row per cycle, for people. */
    private Table watchGrid() {
        boolean pc = machine.pc() != null;
        // "ran", not "pc": a watched pc beside it holds the next address, and two columns named pc read as one
        Table t = new Table("watch_grid", pc ? "watched, at the end of each cycle (ran: the address of the instruction"
                + " the cycle ran)" : "watched, at the end of each cycle");
        t.column("cycle", "cycle", COUNT);
        if (pc) {
            t.column("ran", "ran", COUNT);
        }
        for (int i = 0; i < r.watchNames().size(); i++) {
            t.column("net_" + (i + 1), r.watchNames().get(i), TEXT);
        }
        for (WatchRow w : r.watch()) {
            List<Object> row = new ArrayList<>();
            row.add(w.cycle());
            if (pc) {
                row.add((long) w.pc());
            }
            for (int i = 0; i < w.values().size(); i++) {
                row.add(w.values().get(i));
            }
            t.row(row.toArray());
        }
        return t;
    }

    private String pcText() {
        if (!r.pcKnown()) {
            return "x";
        }
        int digits = (machine.pc().width() + 3) / 4;
        return String.format("0x%0" + digits + "X (%d)", r.pc(), r.pc());
    }
}
