package org.thermion.cli;

import org.thermion.text.Nouns;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.model.Machine;
import org.thermion.verify.Counterexample;
import org.thermion.verify.DecodeVerdict;
import org.thermion.verify.MutantOutcome;
import org.thermion.verify.MutationReport;
import org.thermion.verify.MutationRun;
import org.thermion.verify.NetDiff;
import org.thermion.verify.TraceLine;
import org.thermion.verify.Verifier;
import org.thermion.verify.VerifyReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.FLAG;
import static org.thermion.cli.report.ReportUnit.TEXT;

/** {@code verify MACHINE}: the logic against the ISA, every opcode, state and input; optional fault seeding. */
@Command(name = "verify", mixinStandardHelpOptions = true,
        description = {"Check the logic against the ISA: every instruction, every select value (jump targets: "
                + "a set of patterns), every combination of state bits and inputs, one machine cycle each. "
                + "Also checks that each instruction activates exactly one decode line.",
                "Exit 1 with counterexamples when the logic does not do what the ISA says."})
final class VerifyCommand extends ReportCommand {
    @Parameters(paramLabel = "MACHINE", description = "The .machine file.")
    Path file;

    @Option(names = "--decode", paramLabel = "NAME", description = "Name of the decode-line bus (default: ${DEFAULT-VALUE}).")
    String decode = "line";

    @Option(names = "--all-targets", description = "Check every jump target value, not just the patterns.")
    boolean allTargets;

    @Option(names = "--samples", paramLabel = "N",
            description = "Check a seeded sample of N cases when the space holds more than N (given) or more than 2^28 (default sample: ${DEFAULT-VALUE}).")
    long samples = 1L << 22;

    @Option(names = "--mutate", paramLabel = "N", description = "Seed N single faults into copies of the logic and report how many the check catches.")
    int mutate;

    @Option(names = "--seed", paramLabel = "S", description = "Seed for fault seeding, free word bits and samples (default: ${DEFAULT-VALUE}).")
    long seed = 1;

    @Option(names = "--max", paramLabel = "N", description = "Counterexamples to print (default: ${DEFAULT-VALUE}).")
    int max = 10;

    @Option(names = "--threads", paramLabel = "N",
            description = "Instructions checked at once, each on its own simulator; the report is the same for any N"
                    + " (default: the processors, ${DEFAULT-VALUE}).")
    int threads = Runtime.getRuntime().availableProcessors();

    @Mixin
    ProgressOptions progressOptions = new ProgressOptions();

    @Override
    public Integer call() {
        PrintWriter out = out();
        PrintWriter err = err();
        if (mutate < 0 || samples < 64 || max < 0 || threads < 1) {
            return badInput("--mutate and --max take a count >= 0, --samples at least 64, --threads at least 1");
        }
        Machine m = new MachineLoader().load(file, err, false);
        if (m != null && m.modules().stream().anyMatch(mi -> !mi.built())) {
            // The built part is proved among the modules it was designed with, not against free switches.
            m = new MachineLoader().loadAsDescribed(file, err);
        }
        if (m == null) {
            return ExitCodes.BAD_INPUT;
        }
        if (m.isa() == null) {
            err.println(file + ": error: machine '" + m.name() + "' has no isa block to verify against");
            return ExitCodes.BAD_INPUT;
        }
        ProgressBar progress = ProgressBar.start(err, "verify", "cases", progressOptions.mode());
        Verifier.Options opt = Verifier.Options.defaults().withDecode(decode, allTargets ? 16 : 4)
                .withSampling(spec.commandLine().getParseResult().hasMatchedOption("--samples")
                        ? Math.min(Verifier.EXHAUSTIVE_LIMIT, samples) : Verifier.EXHAUSTIVE_LIMIT, samples, seed)
                .withProgress(mutate > 0 ? null : progress::update).withThreads(threads);
        VerifyReport r;
        try {
            r = new Verifier(m, opt).run();
        } catch (IllegalArgumentException e) {
            progress.close();
            err.println(file + ": error: " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        progress.close();
        MutationReport mr = null;
        if (mutate > 0) {
            try (ProgressBar mutants = ProgressBar.start(err, "fault seeding", "mutants", progressOptions.mode())) {
                mr = new MutationRun(m, opt, r).run(mutate, seed, mutants::update);
            }
        }
        format.write(out, report(r, mr));
        boolean ok = r.passes() && (mr == null || mr.allIsaChangingCaught());
        return ok ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }

    /** The schema version of verify's JSON ({@code org/thermion/schema/verify.schema.json}). */
    static final int VERSION = 2;

    /** The check (and the fault seeding, when asked) as one report; text shows the first {@code --max} counterexamples. */
    Report report(VerifyReport r, MutationReport mr) {
        Report rep = new Report("verify", VERSION);
        rep.field("machine", r.machine());
        rep.field("passes", r.passes());
        rep.field("cases", r.cases());
        rep.field("exhaustive", r.exhaustive());
        rep.field("seed", r.seed());
        rep.field("plans", List.copyOf(r.plans()));
        rep.field("notes", List.copyOf(r.notes()));
        if (mr == null) {
            rep.field("mutation", new Absent("no faults seeded"));
        } else {
            Map<String, Object> mut = new LinkedHashMap<>();
            mut.put("seed", mr.seed());
            mut.put("mutants", (long) mr.outcomes().size());
            mut.put("caught", mr.caught());
            mut.put("equivalent", mr.equivalent());
            mut.put("not_caught", mr.missed());
            rep.field("mutation", mut);
        }
        List<String> head = new ArrayList<>();
        head.add(String.format(Locale.ROOT, "verify %s: %d instructions, %s", r.machine(), r.plans().size(),
                r.exhaustive() ? String.format(Locale.ROOT, "%,d cases checked, every one of the plan", r.cases())
                        : String.format(Locale.ROOT, "%,d cases checked: a seeded random sample (seed %d) of a larger "
                        + "space", r.cases(), r.seed())));
        head.add("  each case: one instruction from a state (every combination of state bits and inputs), compared bit "
                + "by bit with the ISA's meaning; operands per instruction:");
        r.plans().forEach(p -> head.add("    " + p));
        r.notes().forEach(n -> head.add("  note: " + n));
        head.add("");
        rep.text(head);
        Table d = new Table("decode", "decode lines (" + r.decodeName() + "[k], exactly one per instruction)")
                .column("mnemonic", "mnemonic", TEXT)
                .column("opcode", "opcode", COUNT)
                .column("line", "line", TEXT, "the decode line the instruction raises ('none': it does nothing)")
                .column("ok", "ok", FLAG)
                .column("problem", "problem", TEXT);
        for (DecodeVerdict x : r.decode()) {
            d.row(x.mnemonic(), x.opcode(), x.net() == null ? new Absent("none") : x.net(), x.ok(),
                    x.problem() == null ? Absent.NONE : x.problem());
        }
        if (!r.decode().isEmpty()) {
            rep.table(d);
        } else {
            rep.data(d);
        }
        Table cx = new Table("counterexamples", "counterexamples")
                .column("number", "#", COUNT)
                .column("mnemonic", "mnemonic", TEXT)
                .column("opcode", "opcode", COUNT)
                .column("word", "word", COUNT)
                .column("operand", "operand", TEXT)
                .column("item", "item", TEXT)
                .column("kind", "kind", TEXT)
                .column("cases", "cases", COUNT)
                .column("before", "before", TEXT)
                .column("inputs", "inputs", TEXT)
                .column("expected", "expected", TEXT)
                .column("actual", "actual", TEXT)
                .column("expected_pc", "expected pc", COUNT)
                .column("actual_pc", "actual pc", COUNT)
                .column("explanation", "explanation", TEXT)
                .column("compared_with", "compared with", TEXT);
        Table nets = new Table("counterexample_nets", "nets that differ, per counterexample")
                .column("counterexample", "#", COUNT)
                .column("phase", "phase", COUNT)
                .column("net", "net", TEXT)
                .column("module", "module", TEXT)
                .column("value", "here", FLAG)
                .column("other", "there", FLAG);
        Table trace = new Table("counterexample_trace", "logic feeding the wrong bit, per counterexample")
                .column("counterexample", "#", COUNT)
                .column("depth", "depth", COUNT)
                .column("net", "net", TEXT)
                .column("module", "module", TEXT)
                .column("function", "function", TEXT)
                .column("inputs", "inputs", TEXT)
                .column("value", "value", FLAG);
        int n = 0;
        for (Counterexample c : r.counterexamples()) {
            n++;
            cx.row(n, c.mnemonic(), c.opcode(), c.word(), c.operand(), c.item(), c.kind(), c.cases(), c.before(), c.inputs(),
                    c.expected(), c.actual(), c.expectedPc(), c.actualPc(), c.explanation(), c.comparedWith());
            for (NetDiff x : c.nets()) {
                nets.row(n, x.phase(), x.name(), x.module(), x.value(), x.other());
            }
            for (TraceLine l : c.trace()) {
                trace.row(n, l.depth(), l.net(), l.module(), l.function(), l.inputs(), l.value());
            }
        }
        rep.data(cx).data(nets).data(trace);
        rep.text(counterexampleLines(r));
        if (mr != null) {
            rep.text("", String.format(Locale.ROOT, "fault seeding (seed %d): %d mutants, %d caught, %d equivalent, %d not caught",
                    mr.seed(), mr.outcomes().size(), mr.caught(), mr.equivalent(), mr.missed()), "");
            Table t = new Table("mutants", "seeded faults")
                    .column("number", "#", COUNT)
                    .column("fault", "fault", TEXT)
                    .column("result", "result", TEXT)
                    .column("evidence", "first evidence", TEXT);
            int i = 1;
            for (MutantOutcome o : mr.outcomes()) {
                t.row(i++, o.fault(), o.status().name().toLowerCase(Locale.ROOT), o.evidence());
            }
            rep.table(t);
            if (mr.missed() > 0) {
                rep.text("some mutants that may change ISA behaviour were not caught: the check sampled the space");
            }
            rep.text(String.format(Locale.ROOT, "catch rate: %d of %d ISA-changing mutants", mr.caught(), mr.caught() + mr.missed()));
        }
        return rep;
    }

    private List<String> counterexampleLines(VerifyReport r) {
        List<String> out = new ArrayList<>();
        if (r.counterexamples().isEmpty()) {
            out.add("every instruction does what the ISA says" + (r.decodeOk() ? "" : ", but the decode lines fail"));
            return out;
        }
        out.add(String.format(Locale.ROOT, "%s (instruction, item), %s:", Nouns.count(r.counterexamples().size(), "mismatch"),
                r.counterexamples().size() > max ? "the first " + max : "each with one counterexample"));
        int i = 0;
        for (Counterexample c : r.counterexamples()) {
            if (i++ >= max) {
                break;
            }
            out.add("");
            out.add(String.format(Locale.ROOT, "%s (0x%X), word 0x%X, %s: %s %s in %,d %s", c.mnemonic(), c.opcode(), c.word(),
                    c.operand(), c.item(), c.kind(), c.cases(), Nouns.agree(c.cases(), "case")));
            out.add("  before    " + c.before());
            out.add("  inputs    " + c.inputs());
            out.add("  expected  " + c.expected() + "  pc " + c.expectedPc());
            out.add("  actual    " + c.actual() + "  pc " + c.actualPc());
            out.add("  " + c.explanation());
            if (c.nets().isEmpty()) {
                out.add("  compared with " + c.comparedWith() + ": no net differs");
            } else {
                out.add("  nets that differ from " + c.comparedWith() + " (first in levelized order; phase net module here there):");
                for (NetDiff d : c.nets()) {
                    out.add(String.format(Locale.ROOT, "    %d  %s  %s  %d  %d", d.phase(), d.name(), d.module(),
                            d.value() ? 1 : 0, d.other() ? 1 : 0));
                }
            }
            if (!c.trace().isEmpty()) {
                out.add("  logic feeding it in this case (nearest first):");
                for (TraceLine l : c.trace()) {
                    out.add("    " + "  ".repeat(Math.min(l.depth(), 6)) + l.net() + " = " + l.function() + "("
                            + l.inputs() + ") = " + (l.value() ? "1" : "0") + "   [" + l.module() + "]");
                }
            }
        }
        return out;
    }
}
