package org.thermion.cli;

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
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;

/** {@code verify MACHINE}: the logic against the ISA, every opcode, state and input; optional fault seeding. */
@Command(name = "verify", mixinStandardHelpOptions = true,
        description = {"Check the logic against the ISA: every instruction, every select value (jump targets: "
                + "a set of patterns), every combination of state bits and inputs, one machine cycle each. "
                + "Also checks that each instruction activates exactly one decode line.",
                "Exit 1 with counterexamples when the logic does not do what the ISA says."})
final class VerifyCommand implements Callable<Integer> {
    @Parameters(paramLabel = "MACHINE", description = "The .machine file.")
    Path file;

    @Option(names = "--decode", paramLabel = "NAME", description = "Name of the decode-line bus (default: ${DEFAULT-VALUE}).")
    String decode = "line";

    @Option(names = "--all-targets", description = "Check every jump target value, not just the patterns.")
    boolean allTargets;

    @Option(names = "--samples", paramLabel = "N",
            description = "Cases to check when the space is too large to check fully (default: ${DEFAULT-VALUE}).")
    long samples = 1L << 22;

    @Option(names = "--mutate", paramLabel = "N", description = "Seed N single faults into copies of the logic and report how many the check catches.")
    int mutate;

    @Option(names = "--seed", paramLabel = "S", description = "Seed for fault seeding, free word bits and samples (default: ${DEFAULT-VALUE}).")
    long seed = 1;

    @Option(names = "--max", paramLabel = "N", description = "Counterexamples to print (default: ${DEFAULT-VALUE}).")
    int max = 10;

    @Option(names = "--format", paramLabel = "FORMAT", description = "text, csv or json (default: ${DEFAULT-VALUE}).")
    Format format = Format.text;

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (mutate < 0 || samples < 64 || max < 0) {
            err.println("error: --mutate and --max take a count >= 0, --samples at least 64");
            return ExitCodes.BAD_INPUT;
        }
        Machine m = new MachineLoader().load(file, err, false);
        if (m == null) {
            return ExitCodes.BAD_INPUT;
        }
        if (m.isa() == null) {
            err.println(file + ": error: machine '" + m.name() + "' has no isa block to verify against");
            return ExitCodes.BAD_INPUT;
        }
        ProgressLine progress = new ProgressLine(err);
        Verifier.Options opt = Verifier.Options.defaults().withDecode(decode, allTargets ? 16 : 4)
                .withSampling(Verifier.EXHAUSTIVE_LIMIT, samples, seed)
                .withProgress(mutate > 0 ? null : progress::update);
        VerifyReport r;
        try {
            r = new Verifier(m, opt).run();
        } catch (IllegalArgumentException e) {
            err.println(file + ": error: " + e.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        progress.done();
        MutationReport mr = null;
        if (mutate > 0) {
            mr = new MutationRun(m, opt, r).run(mutate, seed, progress::mutant);
            progress.done();
        }
        switch (format) {
            case text -> text(r, mr, out);
            case csv -> csv(r, mr, out);
            case json -> json(r, mr, out);
        }
        out.flush();
        boolean ok = r.passes() && (mr == null || mr.allIsaChangingCaught());
        return ok ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }

    /** A progress line on stderr for runs longer than a second. */
    static final class ProgressLine {
        private final PrintWriter err;
        private final long start = System.nanoTime();
        private long last;
        private boolean shown;

        ProgressLine(PrintWriter err) {
            this.err = err;
        }

        void update(long done, long total) {
            long now = System.nanoTime();
            if (now - start < 1_000_000_000L || now - last < 250_000_000L) {
                return;
            }
            last = now;
            shown = true;
            err.printf(Locale.ROOT, "\rverify: %d of %d cases (%d %%)", done, total, total == 0 ? 100 : done * 100 / total);
            err.flush();
        }

        void mutant(int done, int total) {
            long now = System.nanoTime();
            if (now - start < 1_000_000_000L || now - last < 250_000_000L) {
                return;
            }
            last = now;
            shown = true;
            err.printf(Locale.ROOT, "\rverify: mutant %d of %d", done, total);
            err.flush();
        }

        void done() {
            if (shown) {
                err.println();
                err.flush();
                shown = false;
            }
        }
    }

    private void text(VerifyReport r, MutationReport mr, PrintWriter out) {
        out.printf(Locale.ROOT, "verify %s: %d instructions, %s%n", r.machine(), r.plans().size(),
                r.exhaustive() ? String.format(Locale.ROOT, "%,d cases checked, every one of the plan", r.cases())
                        : String.format(Locale.ROOT, "%,d cases checked: a seeded random sample (seed %d), the full space "
                        + "is larger than %,d", r.cases(), r.seed(), Verifier.EXHAUSTIVE_LIMIT));
        out.println("  each case: one instruction from a state (every combination of state bits and inputs),");
        out.println("  compared bit by bit with the ISA's meaning; operands per instruction:");
        for (String p : r.plans()) {
            out.println("    " + p);
        }
        for (String n : r.notes()) {
            out.println("  note: " + n);
        }
        if (!r.decode().isEmpty()) {
            out.println();
            out.println("decode lines (" + r.decodeName() + "[k], exactly one per instruction):");
            Table t = new Table("mnemonic", "opcode", "line", "check");
            for (DecodeVerdict d : r.decode()) {
                t.row(d.mnemonic(), String.format(Locale.ROOT, "0x%X", d.opcode()), d.net() == null ? "-" : d.net(),
                        d.ok() ? "ok" : "FAILS: " + d.problem());
            }
            t.print(out, "  ");
        }
        out.println();
        if (r.counterexamples().isEmpty()) {
            out.println("every instruction does what the ISA says" + (r.decodeOk() ? "" : ", but the decode lines fail"));
        } else {
            out.printf(Locale.ROOT, "%d mismatch%s (instruction, item), %s:%n", r.counterexamples().size(),
                    r.counterexamples().size() == 1 ? "" : "es",
                    r.counterexamples().size() > max ? "the first " + max : "each with one counterexample");
            int i = 0;
            for (Counterexample c : r.counterexamples()) {
                if (i++ >= max) {
                    break;
                }
                out.println();
                counterexample(c, out);
            }
        }
        if (mr != null) {
            out.println();
            mutation(mr, out);
        }
    }

    private static void counterexample(Counterexample c, PrintWriter out) {
        out.printf(Locale.ROOT, "%s (0x%X), word 0x%X, %s: %s %s in %,d case%s%n", c.mnemonic(), c.opcode(), c.word(),
                c.operand(), c.item(), c.kind(), c.cases(), c.cases() == 1 ? "" : "s");
        out.println("  before    " + c.before());
        out.println("  inputs    " + c.inputs());
        out.println("  expected  " + c.expected() + "  pc " + c.expectedPc());
        out.println("  actual    " + c.actual() + "  pc " + c.actualPc());
        out.println("  " + c.explanation());
        if (c.nets().isEmpty()) {
            out.println("  compared with " + c.comparedWith() + ": no net differs");
        } else {
            out.println("  nets that differ from " + c.comparedWith() + " (first in levelized order):");
            Table t = new Table("phase", "net", "module", "here", "there");
            for (NetDiff d : c.nets()) {
                t.row(Integer.toString(d.phase()), d.name(), d.module(), d.value() ? "1" : "0", d.other() ? "1" : "0");
            }
            t.print(out, "    ");
        }
        if (!c.trace().isEmpty()) {
            out.println("  logic feeding it in this case (nearest first):");
            for (TraceLine l : c.trace()) {
                out.println("    " + "  ".repeat(Math.min(l.depth(), 6)) + l.net() + " = " + l.function() + "("
                        + l.inputs() + ") = " + (l.value() ? "1" : "0") + "   [" + l.module() + "]");
            }
        }
    }

    private static void mutation(MutationReport mr, PrintWriter out) {
        out.printf(Locale.ROOT, "fault seeding (seed %d): %d mutants, %d caught, %d equivalent, %d not caught%n",
                mr.seed(), mr.outcomes().size(), mr.caught(), mr.equivalent(), mr.missed());
        Table t = new Table("#", "fault", "result", "first evidence");
        int i = 1;
        for (MutantOutcome o : mr.outcomes()) {
            t.row(Integer.toString(i++), o.fault(), o.status().text(), o.evidence());
        }
        t.print(out, "  ");
        if (mr.missed() > 0) {
            out.println("some mutants that may change ISA behaviour were not caught: the check sampled the space");
        }
        out.printf(Locale.ROOT, "catch rate: %d of %d ISA-changing mutants%n", mr.caught(), mr.caught() + mr.missed());
    }

    private void csv(VerifyReport r, MutationReport mr, PrintWriter out) {
        if (mr != null) {
            out.println(ReportCsv.row("mutant", "fault", "result", "evidence"));
            int i = 1;
            for (MutantOutcome o : mr.outcomes()) {
                out.println(ReportCsv.row(Integer.toString(i++), o.fault(), o.status().name().toLowerCase(Locale.ROOT),
                        o.evidence()));
            }
            return;
        }
        out.println(ReportCsv.row("mnemonic", "opcode", "word", "operand", "item", "kind", "cases", "before", "inputs",
                "expected", "actual", "expected_pc", "actual_pc", "explanation", "nets"));
        for (Counterexample c : r.counterexamples()) {
            StringBuilder nets = new StringBuilder();
            for (NetDiff d : c.nets()) {
                nets.append(nets.length() == 0 ? "" : " ").append(d.name());
            }
            out.println(ReportCsv.row(c.mnemonic(), String.format(Locale.ROOT, "0x%X", c.opcode()),
                    String.format(Locale.ROOT, "0x%X", c.word()), c.operand(), c.item(), c.kind(),
                    Long.toString(c.cases()), c.before(), c.inputs(), c.expected(), c.actual(),
                    Integer.toString(c.expectedPc()), Integer.toString(c.actualPc()), c.explanation(), nets.toString()));
        }
    }

    private void json(VerifyReport r, MutationReport mr, PrintWriter out) {
        ReportJson j = new ReportJson().begin();
        j.field("machine", r.machine()).field("passes", r.passes()).field("cases", r.cases())
                .field("exhaustive", r.exhaustive()).field("seed", r.seed());
        j.beginArray("plans");
        r.plans().forEach(j::element);
        j.endArray();
        j.beginArray("notes");
        r.notes().forEach(j::element);
        j.endArray();
        j.beginArray("decode");
        for (DecodeVerdict d : r.decode()) {
            j.begin().field("mnemonic", d.mnemonic()).field("opcode", d.opcode()).field("line", d.net())
                    .field("ok", d.ok()).field("problem", d.problem()).end();
        }
        j.endArray();
        j.beginArray("counterexamples");
        for (Counterexample c : r.counterexamples()) {
            j.begin().field("mnemonic", c.mnemonic()).field("opcode", c.opcode()).field("word", c.word())
                    .field("operand", c.operand()).field("item", c.item()).field("kind", c.kind())
                    .field("cases", c.cases()).field("before", c.before()).field("inputs", c.inputs())
                    .field("expected", c.expected()).field("actual", c.actual()).field("expected_pc", c.expectedPc())
                    .field("actual_pc", c.actualPc()).field("explanation", c.explanation())
                    .field("compared_with", c.comparedWith());
            j.beginArray("nets");
            for (NetDiff d : c.nets()) {
                j.begin().field("net", d.name()).field("module", d.module()).field("phase", d.phase())
                        .field("value", d.value()).field("other", d.other()).end();
            }
            j.endArray();
            j.beginArray("trace");
            for (TraceLine l : c.trace()) {
                j.begin().field("depth", l.depth()).field("net", l.net()).field("module", l.module())
                        .field("function", l.function()).field("inputs", l.inputs()).field("value", l.value()).end();
            }
            j.endArray().end();
        }
        j.endArray();
        if (mr != null) {
            j.beginObject("mutation").field("seed", mr.seed()).field("caught", mr.caught())
                    .field("equivalent", mr.equivalent()).field("not_caught", mr.missed());
            j.beginArray("mutants");
            for (MutantOutcome o : mr.outcomes()) {
                j.begin().field("fault", o.fault()).field("result", o.status().name().toLowerCase(Locale.ROOT))
                        .field("evidence", o.evidence()).end();
            }
            j.endArray().end();
        }
        j.end();
        out.println(j);
    }
}
