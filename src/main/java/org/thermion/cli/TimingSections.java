package org.thermion.cli;

import org.thermion.circuit.StageCircuit;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.model.Machine;
import org.thermion.model.StageType;
import org.thermion.timing.DelayCalculator;
import org.thermion.timing.PathAdvice;
import org.thermion.timing.RaceChecks;
import org.thermion.timing.StageDrive;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.FARADS;
import static org.thermion.cli.report.ReportUnit.FLAG;
import static org.thermion.cli.report.ReportUnit.NUMBER;
import static org.thermion.cli.report.ReportUnit.OHMS;
import static org.thermion.cli.report.ReportUnit.SECONDS;
import static org.thermion.cli.report.ReportUnit.TEXT;

/** The parts of the timing report beyond the paths: stage figures, remedies and the short-path checks. */
final class TimingSections {
    private static final Absent NOT_STATED = new Absent("not stated");

    /** A declared figure this far from the computed one is warned about (issue's rule: 25 %). */
    static final double DECLARED_LIMIT = 0.25;

    private TimingSections() {
    }

    /**
     * Each stage type's output resistances (no loads, nominal) and Miller gain: computed from its
     * circuit, or declared; a declared ron or gain beside a computed one that differs by more than
     * {@link #DECLARED_LIMIT} is warned about. Returns the warnings.
     */
    static List<String> stageFigures(Report rep, Machine m, DelayCalculator calc) {
        Table t = new Table("stage_figures", "stage figures (output resistance with no loads, nominal values)")
                .column("stage", "stage", TEXT)
                .column("basis", "basis", TEXT, "computed from the stage's circuit, or declared in its block")
                .column("rise_ohms", "rise R", OHMS, "effective output resistance of the rising edge")
                .column("fall_ohms", "fall R", OHMS, "effective output resistance of the falling edge")
                .column("declared_ron", "ron", OHMS, "the conducting resistance the stage declares (used where no circuit solves)")
                .column("gain", "gain", NUMBER, "Miller gain |dVout/dVgrid| of a triode input: to the plate, or to the cathode of a follower")
                .column("gain_basis", "gain from", TEXT, "computed at the operating point, declared in the block, or the default")
                .column("declared_gain", "decl. gain", NUMBER, "the gain the block states")
                .column("input_farads", "input C", FARADS, "one input's capacitance with the Miller effect: per grid Cgk (1 - Ak) + Cgp (1 - Ap) for a triode, else cin; times the sections the input drives")
                .column("note", "note", TEXT);
        List<String> warnings = new ArrayList<>();
        Set<Integer> used = new LinkedHashSet<>();
        m.netlist().gates().forEach(g -> used.add(g.stage()));
        m.netlist().latches().forEach(l -> used.add(l.stage()));
        StageDrive drive = calc.drive();
        for (int i = 0; i < m.stages().size(); i++) {
            if (!used.contains(i)) {
                continue;
            }
            StageType st = m.stages().get(i);
            StageCircuit c = calc.circuit(st);
            StageDrive.Edges e = c == null ? null : drive.edges(c, List.of(), org.thermion.circuit.Corner.NOMINAL);
            boolean computed = e != null && e.solved() && e.problem().isEmpty();
            double rise = computed ? e.riseOhms() : calc.pullsDown(st) ? st.outputOhmsLow() : st.loadOhms();
            double fall = computed ? e.fallOhms() : calc.pullsDown(st) ? st.loadOhms() : st.outputOhmsLow();
            double gain = calc.gain(st);
            boolean gainComputed = calc.gainComputed(st);
            List<String> notes = new ArrayList<>();
            if (e != null && !computed) {
                notes.add("circuit: " + e.problem());
            }
            double tubeSide = calc.pullsDown(st) ? rise : fall;
            if (computed && st.declared().ron() && differs(st.outputOhmsLow(), tubeSide)) {
                notes.add(String.format(Locale.ROOT, "declared ron %s is %s from the computed %s",
                        Numbers.si(st.outputOhmsLow(), OHMS), percent(st.outputOhmsLow(), tubeSide),
                        Numbers.si(tubeSide, OHMS)));
            }
            if (gainComputed && st.declared().gain() && differs(st.gain(), gain)) {
                notes.add(String.format(Locale.ROOT, "declared gain %.3g is %s from the computed %.3g", st.gain(),
                        percent(st.gain(), gain), gain));
            }
            for (String n : notes) {
                if (n.startsWith("declared")) {
                    warnings.add("stage " + st.name() + ": " + n);
                }
            }
            t.row(st.name(), computed ? "computed" : "declared", orAbsent(rise), orAbsent(fall),
                    st.declared().ron() ? orAbsent(st.outputOhmsLow()) : NOT_STATED, orAbsent(gain),
                    Double.isNaN(gain) ? Absent.NONE : gainComputed ? "computed" : st.declared().gain() ? "declared" : "default",
                    st.declared().gain() ? orAbsent(st.gain()) : NOT_STATED, calc.inputFarads(st),
                    notes.isEmpty() ? Absent.NONE : String.join("; ", notes));
        }
        rep.table(t);
        return warnings;
    }

    private static boolean differs(double declared, double computed) {
        return Double.isFinite(declared) && Double.isFinite(computed) && computed != 0
                && Math.abs(declared - computed) > DECLARED_LIMIT * Math.abs(computed);
    }

    private static String percent(double declared, double computed) {
        return String.format(Locale.ROOT, "%+.0f %%", (declared - computed) / computed * 100);
    }

    private static Object orAbsent(double v) {
        return Double.isFinite(v) ? v : Absent.NONE;
    }

    /** The remedies for failing or tight paths at the slow corner. */
    static void advice(Report rep, List<PathAdvice.Remedy> remedies) {
        Table t = new Table("advice", "what would help each failing or tight path (at the slow corner; tight: slack "
                + "under " + Math.round(PathAdvice.TIGHT * 100) + " % of the budget)")
                .column("phase", "phase", COUNT)
                .column("stage", "slowest stage", TEXT)
                .column("net", "its output", TEXT)
                .column("remedy", "remedy", TEXT)
                .column("change", "change", TEXT)
                .column("delay_before", "delay", SECONDS, "the stage's delay now")
                .column("delay_after", "after", SECONDS, "its delay with the change")
                .column("slack_after", "slack after", SECONDS, "the path's slack with the change alone")
                .column("enough", "enough", FLAG, "the change alone makes the path meet its budget");
        for (PathAdvice.Remedy r : remedies) {
            t.row(r.phase(), r.stage(), r.net(), r.kind(), r.change(), r.delayBefore(), r.delayAfter(),
                    r.slackAfter(), r.enough());
        }
        if (remedies.isEmpty()) {
            rep.text("", "no path fails or is tight at the slow corner: nothing to advise");
        } else {
            rep.table(t);
        }
    }

    /** Hold, pulse-width and overlap checks. */
    static void checks(Report rep, List<RaceChecks.Check> checks) {
        Table t = new Table("checks", "hold (nominal values), pulse width and phase overlap (slow corner)")
                .column("check", "check", TEXT)
                .column("phase", "phase", COUNT)
                .column("endpoint", "endpoint", TEXT)
                .column("have", "have", SECONDS, "earliest change; phase width; overlap the paths allow")
                .column("need", "need", SECONDS, "hold time; switching time; overlap the clock has (none)")
                .column("slack", "slack", SECONDS)
                .column("result", "result", TEXT)
                .column("detail", "detail", TEXT);
        for (RaceChecks.Check c : checks) {
            t.row(c.kind(), c.phase(), c.endpoint(), c.have(), c.need(), c.slack(), c.passes() ? "ok" : "FAILS",
                    c.detail());
        }
        rep.table(t);
    }
}
