package org.thermion.cli;

import org.thermion.text.Nouns;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.faults.Diagnosis;
import org.thermion.faults.Fault;
import org.thermion.faults.FaultCircuit;
import org.thermion.faults.FaultPlace;
import org.thermion.faults.FaultSimulator;
import org.thermion.faults.Step;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static org.thermion.text.Nouns.count;
import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.TEXT;

/**
 * The diagnose command's report: what was seen, the groups of faults that explain it best
 * first (each fault by module, stage, net and tube), and the next step to tell the leading
 * groups apart with what each reading of its lamps would mean.
 */
final class DiagnoseReport {
    /** The schema version of diagnose's JSON ({@code org/thermion/schema/diagnose.schema.json}). */
    static final int VERSION = 1;

    private final PlanInputs in;
    private final Path seenFile;
    private final List<Step> steps;
    private final byte[][] seen;
    private final List<Diagnosis.Suspect> ranked;
    private final int top;
    private final Step next;
    private final List<Diagnosis.Reading> readings;

    DiagnoseReport(PlanInputs in, Path seenFile, List<Step> steps, byte[][] seen, List<Diagnosis.Suspect> ranked, int top,
                   Step next, List<Diagnosis.Reading> readings) {
        this.in = in;
        this.seenFile = seenFile;
        this.steps = steps;
        this.seen = seen;
        this.ranked = ranked;
        this.top = top;
        this.next = next;
        this.readings = readings;
    }

    /** True when the lamps seen agree with a working machine (nothing to look for). */
    boolean looksGood() {
        Diagnosis.Suspect first = ranked.get(0);
        return first.looksGood() && first.contradicted() == 0;
    }

    Report report() {
        Report r = new Report("diagnose", VERSION);
        int readingsSeen = 0;
        int stepsSeen = 0;
        for (byte[] row : seen) {
            int n = 0;
            for (byte b : row) {
                n += b == Diagnosis.BLANK ? 0 : 1;
            }
            readingsSeen += n;
            stepsSeen += n > 0 ? 1 : 0;
        }
        Diagnosis.Suspect first = ranked.get(0);
        long leading = ranked.stream().filter(s -> s.rank() == first.rank()).count();
        String verdict = first.contradicted() > 0 ? "nearest" : looksGood() && leading == 1 ? "looks_good" : "exact";
        r.field("machine", in.machine().name());
        r.field("program", in.program() == null ? new Absent("none") : in.program().toString());
        r.field("seen", seenFile.toString());
        r.field("plan_steps", steps.size());
        r.field("steps_seen", stepsSeen);
        r.field("lamp_readings", readingsSeen);
        r.field("groups", ranked.size());
        r.field("leading_groups", (int) leading);
        r.field("verdict", verdict);
        r.field("next_switches_on", next == null ? new Absent("none") : switchesOn(next));
        r.field("next_cycles", next == null ? new Absent("none") : (Object) next.cycles());

        List<String> head = new ArrayList<>();
        head.add(String.format(Locale.ROOT, "diagnosis of machine %s%s from %s", in.machine().name(),
                in.program() == null ? "" : " running " + in.program(), seenFile));
        head.add(String.format(Locale.ROOT, "  seen: %s at %s of the plan's %s", count(readingsSeen, "lamp reading"),
                count(stepsSeen, "step"), count(steps.size(), "step")));
        boolean goodLeads = ranked.stream().anyMatch(s -> s.rank() == first.rank() && s.looksGood());
        head.add("  " + verdictWords(verdict, first, (int) leading, goodLeads));
        head.add("");
        r.text(head);
        r.data(suspectTable());
        r.view(suspectView());
        if (next != null) {
            String on = next.inputs().length == 0 ? "" : switchesOn(next).equals("(none)") ? "every switch off, "
                    : "switches on " + switchesOn(next) + " (every other off), ";
            r.text("", String.format(Locale.ROOT, "next step, after the plan's last step: %sclock %s, then read the lamps:",
                    on, count(next.cycles(), "cycle")), "");
            r.table(readingTable());
        } else if (!looksGood()) {
            r.text("", "no further step tells the leading faults apart: check their tubes and wiring by hand");
        }
        return r;
    }

    private static String verdictWords(String verdict, Diagnosis.Suspect first, int leading, boolean goodLeads) {
        switch (verdict) {
            case "looks_good":
                return "every lamp seen is what a working machine shows";
            case "exact":
                if (leading == 1) {
                    return "one group of faults explains every lamp seen";
                }
                return count(leading, "group") + " explain every lamp seen" + (goodLeads
                        ? ", a working machine among them: look at more lamps or take the next step" : "");
            default:
                return "no modelled fault explains every lamp seen: the nearest groups contradict "
                        + count(first.contradicted(), "lamp reading") + " (two faults at once, or one not in the list)";
        }
    }

    private Table suspectTable() {
        Table t = new Table("suspects", "suspects (best first; faults in one group look the same at every step)")
                .column("rank", "rank", COUNT, "groups explaining the lamps equally well share a rank")
                .column("group", "group", COUNT)
                .column("wrong", "wrong", COUNT, "lamp readings the group contradicts")
                .column("unsure", "unsure", COUNT, "lamps seen that the group leaves unpredictable")
                .column("fault", "fault", TEXT)
                .column("module", "module", TEXT)
                .column("stage", "stage", TEXT)
                .column("net", "net", TEXT)
                .column("tube", "tube", TEXT, "the tube's socket designator and type");
        FaultCircuit c = in.circuit();
        int shown = 0;
        for (int g = 0; g < ranked.size() && shown < top; g++) {
            Diagnosis.Suspect s = ranked.get(g);
            shown++;
            if (s.looksGood()) {
                t.row(s.rank(), g + 1, s.contradicted(), s.unpredicted(), "no fault: a working machine", "", "", "", "");
            }
            for (Fault f : Diagnosis.named(in.faults(), s)) {
                FaultPlace p = FaultPlace.of(c, f);
                t.row(s.rank(), g + 1, s.contradicted(), s.unpredicted(), p.text(), p.module(), p.stage(), p.net(),
                        p.envelope());
            }
        }
        return t;
    }

    // The same rows for people: the fault's one line already names module, stage, net and tube.
    private Table suspectView() {
        Table t = new Table("suspects", "suspects (best first; faults in one group look the same at every step)")
                .column("rank", "rank", COUNT, "groups explaining the lamps equally well share a rank")
                .column("group", "group", COUNT)
                .column("wrong", "wrong", COUNT, "lamp readings the group contradicts")
                .column("unsure", "unsure", COUNT, "lamps seen that the group leaves unpredictable")
                .column("fault", "fault", TEXT);
        for (Object[] row : suspectTable().rows()) {
            t.row(row[0], row[1], row[2], row[3], row[4]);
        }
        return t;
    }

    private Table readingTable() {
        Table t = new Table("next_readings", "if the lamps show")
                .column("lit", "lit", TEXT, "lamps lit; every other known lamp dark")
                .column("unknown", "unknown", TEXT, "lamps that may show either")
                .column("suspects", "then suspect", TEXT);
        for (Diagnosis.Reading rd : readings) {
            List<String> lit = new ArrayList<>();
            List<String> unknown = new ArrayList<>();
            for (int i = 0; i < rd.lamps().length; i++) {
                String name = in.circuit().lamps().get(i).name();
                if (rd.lamps()[i] == FaultSimulator.ONE) {
                    lit.add(name);
                } else if (rd.lamps()[i] == FaultSimulator.UNKNOWN) {
                    unknown.add(name);
                }
            }
            List<String> who = new ArrayList<>();
            if (rd.looksGood()) {
                who.add("no fault");
            }
            for (Fault f : rd.faults()) {
                who.add(FaultPlace.of(in.circuit(), f).text());
            }
            t.row(lit.isEmpty() ? "(none)" : String.join(" ", lit), String.join(" ", unknown), String.join("; ", who));
        }
        return t;
    }

    private String switchesOn(Step s) {
        boolean[] on = s.inputs();
        List<String> names = new ArrayList<>();
        for (int i = 0; i < on.length; i++) {
            if (on[i]) {
                names.add(in.machine().inputs().get(i).name());
            }
        }
        return names.isEmpty() ? "(none)" : String.join(" ", names);
    }
}
