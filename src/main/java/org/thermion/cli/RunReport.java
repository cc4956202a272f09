package org.thermion.cli;

import org.thermion.model.Machine;
import org.thermion.sim.OutputChange;
import org.thermion.sim.RunResult;
import org.thermion.sim.UnknownReport;
import org.thermion.sim.WatchRow;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;

/** Prints a program run: output changes, watched nets, unknown values, final state. */
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

    void print(PrintWriter out, Format format) {
        switch (format) {
            case text -> text(out);
            case csv -> csv(out);
            case json -> json(out);
        }
    }

    private String pcText() {
        if (!r.pcKnown()) {
            return "x";
        }
        int digits = (machine.pc().width() + 3) / 4;
        return String.format("0x%0" + digits + "X (%d)", r.pc(), r.pc());
    }

    private void text(PrintWriter out) {
        out.println("run " + machine.name() + ": " + (program == null ? "no program" : "program " + program) + ", "
                + level + " level, init " + init);
        out.println(r.cycles() + " cycles; stopped: " + r.stop());
        if (!init.equals("zero")) {
            StringBuilder sb = new StringBuilder("outputs at power-up:");
            for (int i = 0; i < machine.outputs().size(); i++) {
                sb.append(' ').append(machine.outputs().get(i).name()).append('=').append(r.initialOutputs().charAt(i));
            }
            out.println(sb);
        }
        out.println();
        if (r.changes().isEmpty()) {
            out.println("output changes: none");
        } else {
            out.println("output changes:");
            Table t = new Table("cycle", "phase", "output", "value");
            for (OutputChange c : r.changes()) {
                t.row(Long.toString(c.cycle()), Integer.toString(c.phase()), c.output(), String.valueOf(c.value()));
            }
            t.print(out, "  ");
        }
        if (!r.watchNames().isEmpty()) {
            out.println();
            boolean pc = machine.pc() != null;
            int first = pc ? 2 : 1;
            out.println(pc ? "watched, at the end of each cycle (pc: the instruction the cycle ran):"
                    : "watched, at the end of each cycle:");
            String[] header = new String[r.watchNames().size() + first];
            header[0] = "cycle";
            if (pc) {
                header[1] = "pc";
            }
            for (int i = 0; i < r.watchNames().size(); i++) {
                header[i + first] = r.watchNames().get(i);
            }
            Table t = new Table(header);
            for (WatchRow w : r.watch()) {
                String[] row = new String[header.length];
                row[0] = Long.toString(w.cycle());
                if (pc) {
                    row[1] = Integer.toString(w.pc());
                }
                for (int i = 0; i < w.values().size(); i++) {
                    row[i + first] = w.values().get(i);
                }
                t.row(row);
            }
            t.print(out, "  ");
        }
        if (!r.unknowns().isEmpty()) {
            out.println();
            out.println("unknown values reached outputs or the jump:");
            Table t = new Table("cycle", "phase", "net", "what");
            for (UnknownReport u : r.unknowns()) {
                t.row(Long.toString(u.cycle()), u.phase() == 0 ? "-" : Integer.toString(u.phase()), u.net(), u.what());
            }
            t.print(out, "  ");
        }
        out.println();
        out.println("final state after " + r.cycles() + (r.cycles() == 1 ? " cycle:" : " cycles:"));
        Table t = new Table("state", "value");
        for (int i = 0; i < r.stateNames().size(); i++) {
            t.row(r.stateNames().get(i), String.valueOf(r.state().charAt(i)));
        }
        if (machine.pc() != null) {
            t.row("pc", pcText());
        }
        t.print(out, "  ");
    }

    private void csv(PrintWriter out) {
        out.print("record,cycle,phase,name,value\r\n");
        for (OutputChange c : r.changes()) {
            row(out, "change", Long.toString(c.cycle()), Integer.toString(c.phase()), c.output(), String.valueOf(c.value()));
        }
        for (WatchRow w : r.watch()) {
            if (machine.pc() != null) {
                row(out, "watch", Long.toString(w.cycle()), "", "pc", Integer.toString(w.pc()));
            }
            for (int i = 0; i < w.values().size(); i++) {
                row(out, "watch", Long.toString(w.cycle()), "", r.watchNames().get(i), w.values().get(i));
            }
        }
        for (UnknownReport u : r.unknowns()) {
            row(out, "unknown", Long.toString(u.cycle()), u.phase() == 0 ? "" : Integer.toString(u.phase()), u.net(),
                    u.what());
        }
        for (int i = 0; i < r.stateNames().size(); i++) {
            row(out, "state", Long.toString(r.cycles()), "", r.stateNames().get(i), String.valueOf(r.state().charAt(i)));
        }
        if (machine.pc() != null) {
            row(out, "state", Long.toString(r.cycles()), "", "pc", r.pcKnown() ? Integer.toString(r.pc()) : "x");
        }
        row(out, "stop", Long.toString(r.cycles()), "", "reason", r.stop());
    }

    private static void row(PrintWriter out, String... fields) {
        out.print(ReportCsv.row(fields) + "\r\n");
    }

    private void json(PrintWriter out) {
        StringBuilder sb = new StringBuilder("{\n");
        sb.append("  \"machine\": ").append(ReportJson.quote(machine.name())).append(",\n");
        sb.append("  \"program\": ").append(program == null ? "null" : ReportJson.quote(program.toString())).append(",\n");
        sb.append("  \"level\": ").append(ReportJson.quote(level)).append(",\n");
        sb.append("  \"init\": ").append(ReportJson.quote(init)).append(",\n");
        sb.append("  \"cycles\": ").append(r.cycles()).append(",\n");
        sb.append("  \"stop\": ").append(ReportJson.quote(r.stop())).append(",\n");
        sb.append("  \"initial\": {");
        for (int i = 0; i < machine.outputs().size(); i++) {
            sb.append(i == 0 ? "" : ", ").append(ReportJson.quote(machine.outputs().get(i).name())).append(": ")
                    .append(val(r.initialOutputs().charAt(i)));
        }
        sb.append("},\n");
        sb.append("  \"changes\": [");
        List<OutputChange> ch = r.changes();
        for (int i = 0; i < ch.size(); i++) {
            OutputChange c = ch.get(i);
            sb.append(i == 0 ? "\n" : ",\n").append("    {\"cycle\": ").append(c.cycle()).append(", \"phase\": ")
                    .append(c.phase()).append(", \"output\": ").append(ReportJson.quote(c.output())).append(", \"value\": ")
                    .append(val(c.value())).append('}');
        }
        sb.append(ch.isEmpty() ? "],\n" : "\n  ],\n");
        sb.append("  \"watch\": {\"names\": [");
        for (int i = 0; i < r.watchNames().size(); i++) {
            sb.append(i == 0 ? "" : ", ").append(ReportJson.quote(r.watchNames().get(i)));
        }
        sb.append("], \"rows\": [");
        for (int i = 0; i < r.watch().size(); i++) {
            WatchRow w = r.watch().get(i);
            sb.append(i == 0 ? "\n" : ",\n").append("    {\"cycle\": ").append(w.cycle()).append(", \"pc\": ")
                    .append(w.pc()).append(", \"values\": [");
            for (int k = 0; k < w.values().size(); k++) {
                sb.append(k == 0 ? "" : ", ").append(val(w.values().get(k)));
            }
            sb.append("]}");
        }
        sb.append(r.watch().isEmpty() ? "]},\n" : "\n  ]},\n");
        sb.append("  \"unknowns\": [");
        for (int i = 0; i < r.unknowns().size(); i++) {
            UnknownReport u = r.unknowns().get(i);
            sb.append(i == 0 ? "\n" : ",\n").append("    {\"cycle\": ").append(u.cycle()).append(", \"phase\": ")
                    .append(u.phase() == 0 ? "null" : Integer.toString(u.phase())).append(", \"net\": ")
                    .append(ReportJson.quote(u.net())).append(", \"what\": ").append(ReportJson.quote(u.what())).append('}');
        }
        sb.append(r.unknowns().isEmpty() ? "],\n" : "\n  ],\n");
        sb.append("  \"state\": {");
        for (int i = 0; i < r.stateNames().size(); i++) {
            sb.append(i == 0 ? "" : ", ").append(ReportJson.quote(r.stateNames().get(i))).append(": ").append(val(r.state().charAt(i)));
        }
        sb.append("},\n");
        sb.append("  \"pc\": ").append(machine.pc() != null && r.pcKnown() ? Integer.toString(r.pc()) : "null")
                .append('\n');
        sb.append("}\n");
        out.print(sb);
    }

    /** 0 and 1 as numbers, unknown as the string "x". */
    private static String val(char c) {
        return c == 'x' ? "\"x\"" : String.valueOf(c);
    }

    /** A bit as 0 or 1 (an unknown one as "x"); a bus or PC value (hex) as a string. */
    private static String val(String v) {
        return v.length() == 1 ? val(v.charAt(0)) : ReportJson.quote(v);
    }
}
