package org.thermion.verify;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.thermion.model.Machine;

import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;

class VerifierTest {

    static VerifyReport verify(Machine m) {
        return new Verifier(m, Verifier.Options.defaults()).run();
    }

    @Test
    void theTinyMachinePassesEveryCase() {
        VerifyReport r = verify(VerifyMachines.tiny());
        // By hand: 3 state bits and 2 inputs give 32 combinations; LD, ANDN, ST x 4 select
        // values, JMPC x 16 targets (4 target bits: all of them): (3 x 4 + 16) x 32 = 896.
        assertThat(r.cases()).isEqualTo(896);
        assertThat(r.exhaustive()).isTrue();
        assertThat(r.counterexamples()).isEmpty();
        assertThat(r.decode()).extracting(DecodeVerdict::net).containsExactly("line[0]", "line[1]", "line[2]", "line[3]");
        assertThat(r.passes()).isTrue();
    }

    @Test
    void aDecoderLineWiredToTheWrongOpcodeIsFoundAndNamed() {
        Machine m = VerifyMachines.tiny("line[1] = op == 1", "line[1] = op == 3");
        VerifyReport r = verify(m);
        assertThat(r.passes()).isFalse();
        DecodeVerdict andn = r.decode().get(1);
        assertThat(andn.mnemonic()).isEqualTo("ANDN");
        assertThat(andn.problem()).startsWith("no line active");
        assertThat(r.decode().get(3).problem()).contains("line[1] and line[3] active together");

        Counterexample c = r.counterexamples().stream().filter(x -> x.mnemonic().equals("ANDN")).findFirst().orElseThrow();
        assertThat(c.item()).isEqualTo("acc");
        assertThat(c.kind()).isEqualTo("missed write");
        assertThat(c.explanation()).contains("enable acc_load = 0");
        // The trace leads from the enable to the decode line that stayed low.
        assertThat(c.trace()).anySatisfy(t -> {
            assertThat(t.net()).isEqualTo("line[1]");
            assertThat(t.value()).isFalse();
        });
        // JMPC now also loads the accumulator: a write the ISA does not make.
        Counterexample j = r.counterexamples().stream().filter(x -> x.mnemonic().equals("JMPC")).findFirst().orElseThrow();
        assertThat(j.kind()).isEqualTo("unexpected write");
        assertThat(j.item()).isEqualTo("acc");
    }

    @Test
    void aLogicUnitWithAnInvertedInputIsFoundAndNamed() {
        Machine m = VerifyMachines.tiny("(line[1] & acc & !src)", "(line[1] & acc & src)");
        VerifyReport r = verify(m);
        assertThat(r.decodeOk()).isTrue();
        assertThat(r.counterexamples()).hasSize(1);
        Counterexample c = r.counterexamples().get(0);
        assertThat(c.mnemonic()).isEqualTo("ANDN");
        assertThat(c.opcode()).isEqualTo(1);
        assertThat(c.item()).isEqualTo("acc");
        assertThat(c.kind()).isEqualTo("wrong value");
        assertThat(c.explanation()).contains("data acc_next");
        // By hand: ANDN gives acc & !src, the faulty logic acc & src: they differ exactly when
        // acc = 1, 16 of the 32 state/input combinations, for each of 4 select values: 64 cases.
        assertThat(c.cases()).isEqualTo(64);
        assertThat(c.before()).contains("acc=1");
        // The gate that forms acc & src in the unit shows up in the trace with its inputs.
        assertThat(c.trace()).anySatisfy(t -> {
            assertThat(t.module()).startsWith("u (unit)");
            assertThat(t.inputs()).contains("line[1]=1").contains("acc=1").contains("src=");
        });
    }

    @Test
    void aStoreThatAlsoWritesAnotherOutputIsAnUnexpectedWrite() {
        Machine m = VerifyMachines.tiny("we[1] = line[2] & ir[1..0] == 3", "we[1] = line[2] & ir[1] == 1");
        VerifyReport r = verify(m);
        assertThat(r.counterexamples()).hasSize(1);
        Counterexample c = r.counterexamples().get(0);
        assertThat(c.mnemonic()).isEqualTo("ST");
        assertThat(c.item()).isEqualTo("out1");
        assertThat(c.kind()).isEqualTo("unexpected write");
        assertThat(c.operand()).isEqualTo("sel 2 (out0)");
        assertThat(c.explanation()).contains("enable we[1] = 1");
    }

    @Test
    void aJumpOnTheWrongConditionIsAPcMismatch() {
        Machine m = VerifyMachines.tiny("jump = line[3] & acc", "jump = line[3] & !acc");
        VerifyReport r = verify(m);
        assertThat(r.counterexamples()).hasSize(1);
        Counterexample c = r.counterexamples().get(0);
        assertThat(c.mnemonic()).isEqualTo("JMPC");
        assertThat(c.item()).isEqualTo("pc");
        assertThat(c.kind()).isEqualTo("jump");
        assertThat(c.explanation()).contains("jump net jump");
    }

    @Test
    void aLargeSpaceIsSampledAndSaysSo() {
        Machine m = VerifyMachines.tiny("(line[1] & acc & !src)", "(line[1] & acc & src)");
        Verifier.Options o = Verifier.Options.defaults().withSampling(100, 4096, 9);
        VerifyReport r = new Verifier(m, o).run();
        assertThat(r.exhaustive()).isFalse();
        assertThat(r.cases()).isEqualTo(4096);
        assertThat(r.seed()).isEqualTo(9);
        assertThat(r.counterexamples()).extracting(Counterexample::mnemonic).containsExactly("ANDN");
    }

    @Test
    @Timeout(value = 180, unit = TimeUnit.SECONDS)
    void theDemoMachinePassesExhaustively() {
        VerifyReport r = verify(VerifyMachines.demo());
        // By hand: 10 state bits + 6 inputs = 65536 combinations; NOP 1 word, 12 data
        // instructions x 16 select values, 3 jumps x 18 target patterns: 247 x 65536.
        assertThat(r.cases()).isEqualTo(247L * 65536);
        assertThat(r.exhaustive()).isTrue();
        assertThat(r.counterexamples()).isEmpty();
        assertThat(r.decode()).hasSize(16).allMatch(DecodeVerdict::ok);
        assertThat(r.decode().get(13).net()).isEqualTo("line[13]");
        // NOP does nothing and the demo gives it no line: allowed for an empty meaning.
        assertThat(r.decode().get(0).net()).isEqualTo("(none: does nothing)");
        assertThat(r.notes()).isEmpty();
    }

    @Test
    void twoThreadsGiveTheReportOfOneWhetherItPassesOrFails() {
        // Broken machines give counterexamples and decode problems that must come out in the same order.
        for (Machine m : java.util.List.of(VerifyMachines.tiny(), VerifyMachines.tiny("line[1] = op == 1", "line[1] = op == 3"),
                VerifyMachines.skip("en = !skip", "en = 1"),
                VerifyMachines.skip("line[0] = en & op == 0\n  line[1] = en & op == 1",
                        "line[0] = (en & op == 0) | !en\n  line[1] = (en & op == 1) | !en"))) {
            VerifyReport one = verify(m);
            VerifyReport two = new Verifier(m, Verifier.Options.defaults().withThreads(2)).run();
            VerifyReport three = new Verifier(m, Verifier.Options.defaults().withThreads(3)).run();
            assertThat(two).isEqualTo(one);
            assertThat(three).isEqualTo(one);
        }
    }

    @Test
    void aSkipDoneByInhibitingTheDecoderPassesWhenTheIsaDeclaresTheInhibit() {
        VerifyReport r = verify(VerifyMachines.skip("", ""));
        // By hand: 3 state bits and 2 inputs: 32 states; LD and ST x 4 select values, SKZ 1 word,
        // JMPC x 16 targets: 25 x 32 = 800 cases, run twice (free, then inhibited).
        assertThat(r.cases()).isEqualTo(1600);
        assertThat(r.counterexamples()).isEmpty();
        assertThat(r.decode()).extracting(DecodeVerdict::net).containsExactly("line[0]", "line[1]", "line[2]", "line[3]");
        assertThat(r.passes()).isTrue();
    }

    @Test
    void withoutTheInhibitDeclaredTheSameSkipIsAWrongPc() {
        VerifyReport r = verify(VerifyMachines.skip("  inhibit skip\n", ""));
        assertThat(r.passes()).isFalse();
        Counterexample c = r.counterexamples().stream().filter(x -> x.mnemonic().equals("SKZ")).findFirst().orElseThrow();
        assertThat(c.item()).isEqualTo("pc");
        assertThat(c.expectedPc()).isEqualTo(2);
        assertThat(c.actualPc()).isEqualTo(1);
    }

    @Test
    void aDecoderThatIgnoresTheInhibitRunsTheSkippedInstructionAndIsCaught() {
        VerifyReport r = verify(VerifyMachines.skip("en = !skip", "en = 1"));
        assertThat(r.passes()).isFalse();
        assertThat(r.counterexamples()).anySatisfy(c -> {
            assertThat(c.mnemonic()).isEqualTo("LD while skipped");
            assertThat(c.item()).isEqualTo("acc");
        });
    }

    @Test
    void twoLinesAtOnceWhileInhibitedAreStillCaught() {
        VerifyReport r = verify(VerifyMachines.skip("line[0] = en & op == 0\n  line[1] = en & op == 1",
                "line[0] = (en & op == 0) | !en\n  line[1] = (en & op == 1) | !en"));
        assertThat(r.decodeOk()).isFalse();
        assertThat(r.decode()).anySatisfy(d -> {
            assertThat(d.mnemonic()).isEqualTo("ST while skipped");
            assertThat(d.problem()).contains("line[0] and line[1] active together while the decoder is inhibited");
        });
        // Free (not inhibited), every instruction still raises its own line alone.
        assertThat(r.decode().subList(0, 4)).allMatch(DecodeVerdict::ok);
    }

    @Test
    void aSwitchFedMachineIsCheckedForEveryWordFromEveryState() {
        VerifyReport r = verify(VerifyMachines.panel(""
                , ""));
        // By hand: 4 state bits and 2 data switches (the 6 word switches carry the word): 64
        // states; NOP and CLR 1 word each, six instructions x 8 addresses: 50 x 64 = 3200.
        assertThat(r.cases()).isEqualTo(3200);
        assertThat(r.exhaustive()).isTrue();
        assertThat(r.passes()).isTrue();
        VerifyReport bad = verify(VerifyMachines.panel("(line[2] & src_n)", "(line[2] & src_b)"));
        assertThat(bad.counterexamples()).singleElement().satisfies(c -> {
            assertThat(c.mnemonic()).isEqualTo("LDN");
            assertThat(c.item()).isEqualTo("acc");
        });
    }

    @Test
    void aRelativeJumpIsCheckedFromManyAddressesSoAnAbsoluteOneFails() {
        // The logic loads the operand itself; the ISA asks for pc + operand. From PC 0 the two
        // agree, so verify starts relative jumps at other addresses too.
        VerifyReport r = verify(VerifyMachines.tiny("op JMPC 0x3 { if acc { pc <- operand } }",
                "op JMPC 0x3 { if acc { pc <- pc + operand } }"));
        assertThat(r.counterexamples()).singleElement().satisfies(c -> {
            assertThat(c.mnemonic()).isEqualTo("JMPC");
            assertThat(c.item()).isEqualTo("pc");
            assertThat(c.kind()).isEqualTo("target");
        });
    }
}
