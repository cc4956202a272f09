package org.thermion.cli;

import org.thermion.text.Nouns;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.faults.FaultCircuit;
import org.thermion.faults.Fault;
import org.thermion.faults.FaultList;
import org.thermion.faults.FaultPlace;
import org.thermion.faults.FaultSimulator;
import org.thermion.faults.Outcome;
import org.thermion.faults.Plan;
import org.thermion.faults.Separation;
import org.thermion.faults.Step;
import org.thermion.model.Machine;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.TEXT;

/** The plan command's report: counts, the numbered steps, and every collapsed fault's outcome. */
final class PlanReport {
    /** The schema version of plan's JSON ({@code org/thermion/schema/plan.schema.json}). */
    static final int VERSION = 2;

    private final Machine m;
    private final FaultCircuit c;
    private final FaultList faults;
    private final Plan plan;
    private final List<Step> steps;
    private final byte[][] expected;
    private final Path program;
    private final List<Path> nextPrograms;
    private final int largest;
    private final int above;
    private final List<Separation.Alike> alike;
    private final List<long[]> written;

    PlanReport(Machine m, FaultCircuit c, FaultList faults, Plan plan, List<Step> steps, byte[][] expected, Path program,
               List<Path> nextPrograms, int largest, int above, Separation sep) {
        this.m = m;
        this.c = c;
        this.faults = faults;
        this.plan = plan;
        this.steps = steps;
        this.expected = expected;
        this.program = program;
        this.nextPrograms = List.copyOf(nextPrograms);
        this.largest = largest;
        this.above = above;
        this.alike = sep.alike();
        this.written = sep.written();
    }

    Report report() {
        Report r = new Report("plan", VERSION);
        int bridges = faults.bridges().size();
        int tube = faults.all().size() - faults.stuckAtCount() - bridges;
        r.field("machine", m.name());
        r.field("program", program == null ? new Absent("none") : program.toString());
        r.field("stuck_at_faults", faults.stuckAtCount());
        r.field("stuck_at_collapsed", faults.stuckAtCollapsedCount());
        r.field("stuck_at_targets", faults.stuckAtTargetCount());
        r.field("tube_faults", tube);
        r.field("bridge_faults", bridges);
        r.field("bridge_collapsed", faults.bridgeCollapsedCount());
        r.field("steps", steps.size());
        for (Outcome o : Outcome.values()) {
            r.field(o.name().toLowerCase(Locale.ROOT), plan.count(o));
        }
        r.field("largest_group", largest < 0 ? new Absent("not asked") : (Object) largest);
        List<String> head = new ArrayList<>();
        head.add(String.format(Locale.ROOT, "bring-up plan for machine %s%s", m.name(),
                program == null ? "" : " running " + program));
        head.add(String.format(Locale.ROOT, "  faults: %d stuck-at (%d after equivalence collapsing, %d aimed at after "
                + "dominance), %d tube, heater, relay and lamp faults, %d solder bridges between neighbouring "
                + "socket pins (%d pairs of nets)", faults.stuckAtCount(), faults.stuckAtCollapsedCount(),
                faults.stuckAtTargetCount(), tube, bridges, faults.bridgeCollapsedCount()));
        head.add("  switch on, then follow the steps: set the switches, clock the cycles, compare the lamps");
        head.add("  lamps: lit = expect lit, dark = every other lamp dark, unknown = not yet settled, ignore");
        head.add("");
        r.text(head);
        r.table(stepTable());
        r.table(faultTable());
        if (!written.isEmpty()) {
            r.table(writtenTable());
        }
        if (!alike.isEmpty()) {
            r.table(groupTable());
        }
        List<String> tail = new ArrayList<>();
        tail.add("");
        StringBuilder counts = new StringBuilder();
        for (Outcome o : Outcome.values()) {
            counts.append(counts.length() == 0 ? "" : "; ").append(o.words).append(' ').append(plan.count(o));
        }
        tail.add(counts.toString());
        if (largest >= 0) {
            tail.add("largest group of faults the steps cannot tell apart: " + largest);
            if (above > 0) {
                tail.add(Nouns.count(above, "group") + " still " + (above == 1 ? "holds" : "hold") + " more than "
                        + PlanInputs.MOST_IN_GROUP + " faults (table groups): " + alike());
            }
        }
        r.text(tail);
        return r;
    }

    // Why such groups stay: on a machine without a ROM the switches are all a builder has, so a proven
    // group is alike for good; on one with a ROM only the programs the plan fits were searched, and
    // column other program says whether a random one would tell the group apart.
    private String alike() {
        boolean proven = alike.stream().allMatch(Separation.Alike::proven);
        String how = proven ? "proven for each: " : "proven where the table says yes (elsewhere the search budget ran out): ";
        if (program != null) {
            long other = alike.stream().filter(a -> Boolean.TRUE.equals(a.otherProgram())).count();
            List<String> names = new ArrayList<>();
            names.add(program.toString());
            nextPrograms.forEach(p -> names.add(p.toString()));
            for (int k = 1; k <= written.size(); k++) {
                names.add("written program " + k);
            }
            String run = names.size() == 1 ? "while this program runs"
                    : "while each of the programs the steps fit runs (" + String.join(", ", names) + ")";
            return how + "no run of steps after the plan, under any switch settings, tells its faults apart at the lamps "
                    + run + "; " + other + " of them a random program splits (column other program: another program"
                    + " would tell those apart, --next-program), the other " + (alike.size() - other)
                    + " no program tried splits; column lamp on says which net's lamp would split each";
        }
        return how + "no run of steps after the plan, under any switch settings, tells its faults apart at the lamps;"
                + " the switches are all this machine has, so no bench procedure can: they differ inside the machine"
                + " only, and a lamp on the net named would split them";
    }

    private Table groupTable() {
        Table t = new Table("groups", "groups the steps cannot split")
                .column("faults", "faults", COUNT, "distinct faults in the group")
                .column("proven", "proven", TEXT, "yes: no run of steps after the plan tells them apart")
                .column("lamp_on", "lamp on", TEXT, "the net whose lamp would split the group best")
                .column("split", "split", TEXT, "the parts that lamp would split it into")
                .column("other_program", "other program", TEXT, "splits: a random program ("
                        + Separation.PROGRAMS + " tried) shows them apart; no: none did; -: no ROM")
                .column("members", "members", TEXT);
        for (Separation.Alike a : alike) {
            List<String> names = new ArrayList<>();
            for (Fault f : a.faults()) {
                names.add(FaultPlace.of(c, f).text());
            }
            t.row(a.faults().size(), a.proven() ? "yes" : "no", a.net() == null ? "(none)" : a.net(),
                    a.parts().isEmpty() ? "(none)" : a.parts().stream().map(String::valueOf)
                            .collect(java.util.stream.Collectors.joining(" + ")),
                    a.otherProgram() == null ? "-" : a.otherProgram() ? "splits" : "no", String.join("; ", names));
        }
        return t;
    }

    private Table stepTable() {
        boolean restarts = steps.stream().anyMatch(Step::restarts);
        Table t = new Table("steps", "steps").column("step", "step", COUNT);
        if (restarts) {
            t.column("first", "first", TEXT, "before setting the switches: switch off, fit the program named, switch on");
        }
        t.column("switches_on", "switches on", TEXT, "every other switch off")
                .column("cycles", "cycles", COUNT, "single-step the clock this many whole cycles")
                .column("lit", "lit", TEXT, "lamps expected lit; every other known lamp dark")
                .column("unknown", "unknown", TEXT, "lamps the plan cannot predict yet");
        List<String> names = m.inputs().stream().map(p -> p.name()).toList();
        for (int s = 0; s < steps.size(); s++) {
            Step st = steps.get(s);
            boolean[] in = st.inputs();
            List<String> on = new ArrayList<>();
            for (int i = 0; i < in.length; i++) {
                if (in[i]) {
                    on.add(names.get(i));
                }
            }
            List<String> lit = new ArrayList<>();
            List<String> unknown = new ArrayList<>();
            for (int i = 0; i < c.lamps().size(); i++) {
                if (expected[s][i] == FaultSimulator.ONE) {
                    lit.add(c.lamps().get(i).name());
                } else if (expected[s][i] == FaultSimulator.UNKNOWN) {
                    unknown.add(c.lamps().get(i).name());
                }
            }
            List<Object> row = new ArrayList<>(List.of(s + 1));
            if (restarts) {
                row.add(st.restarts() ? "fit " + programName(st.program()) : Absent.NONE);
            }
            row.addAll(List.of(on.isEmpty() ? "(none)" : String.join(" ", on), st.cycles(),
                    lit.isEmpty() ? "(none)" : String.join(" ", lit), String.join(" ", unknown)));
            t.row(row.toArray());
        }
        return t;
    }

    // The program a restarting step fits: the first is --program, then each --next-program, then those written.
    private String programName(int k) {
        if (k == 0) {
            return String.valueOf(program);
        }
        return k <= nextPrograms.size() ? nextPrograms.get(k - 1).toString()
                : "written program " + (k - nextPrograms.size()) + " (table written)";
    }

    // The words of each program the plan wrote, as a builder wires them into the ROM.
    private Table writtenTable() {
        Table t = new Table("written", "programs the plan wrote (every word not listed holds 0)")
                .column("program", "program", COUNT, "written program 1, 2 ... as the steps name them")
                .column("address", "address", TEXT, "hexadecimal")
                .column("word", "word", TEXT, "hexadecimal, " + m.rom().width() + " bits");
        int addressDigits = m.pc() == null ? 2 : Math.max(1, (m.pc().width() + 3) / 4);
        int wordDigits = Math.max(1, (m.rom().width() + 3) / 4);
        for (int k = 0; k < written.size(); k++) {
            long[] words = written.get(k);
            for (int a = 0; a < words.length; a++) {
                if (words[a] != 0L) {
                    t.row(k + 1, String.format(Locale.ROOT, "0x%0" + addressDigits + "X", a),
                            String.format(Locale.ROOT, "0x%0" + wordDigits + "X", words[a]));
                }
            }
        }
        return t;
    }

    private Table faultTable() {
        Table t = new Table("faults", "faults (one per equivalence class)")
                .column("fault", "fault", TEXT)
                .column("tube", "tube", TEXT)
                .column("outcome", "outcome", TEXT)
                .column("step", "step", COUNT, "the first step that shows it");
        for (int i = 0; i < plan.faults().size(); i++) {
            Fault f = plan.faults().get(i);
            FaultPlace p = FaultPlace.of(c, f);
            int at = plan.detectedAt()[i];
            t.row(p.text(), p.envelope(), plan.outcome()[i].words,
                    at >= 0 ? (Object) (at + 1) : Absent.NONE);
        }
        return t;
    }
}
