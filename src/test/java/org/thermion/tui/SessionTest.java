package org.thermion.tui;

import org.junit.jupiter.api.Test;
import org.thermion.sim.InitMode;
import org.thermion.sim.OutputChange;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The session without a screen: pump.asm on the demo machine. Expected values follow from
 * the program's rule (see programs/pump.asm): run := !high & (!low | run), pump := run |
 * manual, alarm := high & !low, one pass of ten instructions, ST pump at address 05, ST alarm
 * at 08, JMP loop at 09.
 */
class SessionTest {
    private static final int LOW = 0;
    private static final int HIGH = 1;
    private static final int MANUAL = 2;

    private static int output(Session s, String name) {
        return s.machine().outputs().indexOf(s.machine().output(name));
    }

    @Test
    void aDryTankStartsThePumpOnTheSixthInstruction() {
        Session s = UiFixture.session(new InitMode.Zero());
        for (int i = 0; i < 5; i++) {
            s.stepCycle();
        }
        assertThat(s.output(output(s, "pump"))).isEqualTo(Level.OFF);
        s.stepCycle();
        assertThat(s.output(output(s, "pump"))).isEqualTo(Level.ON);
        assertThat(s.stateBit(s.machine().isa().stateIndex("s0"))).isEqualTo(Level.ON);
        assertThat(s.pc()).isEqualTo(6);
        assertThat(s.cycle()).isEqualTo(6);
        // The pump latch loads at the end of phase 2 of cycle 5 (0-based), the ST pump cycle.
        assertThat(s.outputChanges()).containsExactly(new OutputChange(5, 2, "pump", "1"));
    }

    @Test
    void aPhaseStepFetchesAndTheDecodeLineOfTheFetchedWordLights() {
        Session s = UiFixture.session(new InitMode.Zero());
        s.stepPhase();
        assertThat(s.nextPhase()).isEqualTo(2);
        assertThat(s.midCycle()).isTrue();
        assertThat(s.cycle()).isZero();
        assertThat(s.instructionAtPc().mnemonic()).isEqualTo("LDN");
        DecodeLamp ldn = s.decodeLines().stream().filter(d -> d.mnemonic().equals("LDN")).findFirst().orElseThrow();
        assertThat(s.level(ldn.net())).isEqualTo(Level.ON);
        for (DecodeLamp d : s.decodeLines()) {
            if (d != ldn) {
                assertThat(s.level(d.net())).as(d.mnemonic()).isEqualTo(Level.OFF);
            }
        }
        s.stepPhase();
        assertThat(s.nextPhase()).isEqualTo(1);
        assertThat(s.cycle()).isEqualTo(1);
        assertThat(s.pc()).isEqualTo(1);
    }

    @Test
    void aRunStopsAtABreakpointEachPassAndGoesOnWhenAskedAgain() {
        Session s = UiFixture.session(new InitMode.Zero());
        s.toggleBreakpoint(8);
        s.toggleRun();
        long ran = s.run(100_000);
        assertThat(ran).isEqualTo(8);
        assertThat(s.running()).isFalse();
        assertThat(s.stop().reason()).isEqualTo(Stop.Reason.BREAKPOINT);
        assertThat(s.stop().text()).isEqualTo("breakpoint at 08");
        s.toggleRun();
        assertThat(s.run(100_000)).isEqualTo(10);
        assertThat(s.cycle()).isEqualTo(18);
        s.toggleBreakpoint(8);
        assertThat(s.breakpointCount()).isZero();
        s.toggleRun();
        assertThat(s.run(1_000)).isEqualTo(1_000);
        assertThat(s.running()).isTrue();
        s.toggleRun();
        assertThat(s.stop().reason()).isEqualTo(Stop.Reason.PAUSED);
    }

    @Test
    void aFullTankStopsThePumpAndDisagreeingSwitchesRaiseTheAlarm() {
        Session s = UiFixture.session(new InitMode.Zero());
        s.toggleRun();
        s.run(10);
        assertThat(s.output(output(s, "pump"))).isEqualTo(Level.ON);
        s.toggleInput(LOW);
        s.toggleInput(HIGH);
        s.run(10);
        assertThat(s.output(output(s, "pump"))).isEqualTo(Level.OFF);
        assertThat(s.output(output(s, "alarm"))).isEqualTo(Level.OFF);
        s.toggleInput(LOW); // high wet, low dry: the switches disagree
        s.run(10);
        assertThat(s.output(output(s, "alarm"))).isEqualTo(Level.ON);
        assertThat(s.output(output(s, "pump"))).isEqualTo(Level.OFF);
        s.toggleInput(MANUAL);
        s.run(10);
        assertThat(s.output(output(s, "pump"))).isEqualTo(Level.ON);
        assertThat(s.outputChangeCount()).isEqualTo(4);
    }

    @Test
    void resetKeepsTheSwitchesAndForgetsPeaksAndChanges() {
        Session s = UiFixture.session(new InitMode.Zero());
        s.toggleInput(MANUAL);
        s.toggleRun();
        s.run(50);
        assertThat(s.outputChangeCount()).isEqualTo(1);
        s.reset();
        assertThat(s.input(MANUAL)).isTrue();
        assertThat(s.cycle()).isZero();
        assertThat(s.pc()).isZero();
        assertThat(s.outputChanges()).isEmpty();
        assertThat(s.meter().samples()).isEqualTo(1);
        assertThat(s.stop().reason()).isEqualTo(Stop.Reason.RESET);
        assertThat(s.running()).isFalse();
    }

    @Test
    void withUnknownPowerUpARunStopsWhereTheUnsetRunBitReachesTheAccumulator() {
        Session s = UiFixture.session(new InitMode.Unknown());
        assertThat(s.stateBit(s.machine().isa().stateIndex("s0"))).isEqualTo(Level.UNKNOWN);
        s.toggleInput(LOW); // low wet: LDN low_sw gives 0, then OR run reads the unset s0
        s.toggleRun();
        long ran = s.run(100_000);
        assertThat(ran).isEqualTo(2);
        assertThat(s.stop().reason()).isEqualTo(Stop.Reason.UNKNOWN);
        assertThat(s.stop().text()).isEqualTo("unknown value on acc");
        assertThat(s.stateBit(s.machine().isa().stateIndex("acc"))).isEqualTo(Level.UNKNOWN);
    }

    @Test
    void withUnknownPowerUpADryTankSetsEveryBitItUsesAndRunsOn() {
        Session s = UiFixture.session(new InitMode.Unknown());
        s.toggleRun();
        assertThat(s.run(1_000)).isEqualTo(1_000);
        assertThat(s.running()).isTrue();
        assertThat(s.output(output(s, "pump"))).isEqualTo(Level.ON);
        assertThat(s.output(output(s, "alarm"))).isEqualTo(Level.OFF);
        // Nothing in pump.asm writes sum or ready: they stay unset.
        assertThat(s.output(output(s, "sum"))).isEqualTo(Level.UNKNOWN);
    }

    @Test
    void decodeLinesAreTheTopModulesLineNetsLabelledByMnemonic() {
        Session s = UiFixture.session(new InitMode.Zero());
        assertThat(s.decodeLines()).hasSize(16);
        assertThat(s.decodeLines().get(0).mnemonic()).isEqualTo("NOP");
        assertThat(s.decodeLines().get(13).mnemonic()).isEqualTo("JMP");
        for (DecodeLamp d : s.decodeLines()) {
            assertThat(s.machine().netlist().netName(d.net())).isEqualTo("line[" + d.opcode() + "]");
        }
        assertThat(DecodeLamp.find(s.machine(), "no_such_net")).isEmpty();
    }
}
