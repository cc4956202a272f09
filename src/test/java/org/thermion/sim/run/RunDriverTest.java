package org.thermion.sim.run;

import org.junit.jupiter.api.Test;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;
import org.thermion.sim.SimMachines;
import org.thermion.sim.Simulator;
import org.thermion.sim.Stimulus;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.thermion.sim.SimMachines.word;

/** The run loop on the demo (two phases, PC loads in phase 2): limits, stops, observers, stimulus. */
class RunDriverTest {
    static final Machine DEMO = SimMachines.demo();
    static final int LDN = 0x2, ST = 0x3, JMP = 0xD;
    // 0: LDN 6   1: ST alarm   2: JMP 0 -- a loop of three addresses.
    static final long[] LOOP = {word(LDN, 6), word(ST, 9), word(JMP, 0)};

    private static LogicLane lane(long[] rom) {
        Simulator sim = new Simulator(DEMO);
        sim.loadRom(rom);
        sim.reset(new InitMode.Zero());
        return new LogicLane(sim);
    }

    @Test
    void theCycleLimitEndsARunThatCanGoOn() {
        LogicLane m = lane(LOOP);
        RunDriver d = new RunDriver(m, DEMO.inputs().size(), null).stopAtFixedPoint(true);
        d.start();
        Halt h = d.run(7);
        assertThat(h.kind()).isEqualTo(Halt.Kind.CYCLE_LIMIT);
        assertThat(h.resumable()).isTrue();
        assertThat(m.cycle()).isEqualTo(7);
        // The loop of three: after 7 cycles the PC is 7 mod 3.
        assertThat(m.pc()).isEqualTo(1);
        d.run(2);
        assertThat(m.cycle()).isEqualTo(9);
    }

    @Test
    void aJumpToItselfIsAFixedPoint() {
        // 0: LDN 6   1: JMP 1 -- the instruction register holds JMP 1 from cycle 1, so cycle 2 repeats it.
        LogicLane m = lane(new long[] {word(LDN, 6), word(JMP, 1)});
        RunDriver d = new RunDriver(m, DEMO.inputs().size(), null).stopAtFixedPoint(true);
        d.start();
        Halt h = d.run(100);
        assertThat(h.kind()).isEqualTo(Halt.Kind.FIXED_POINT);
        assertThat(h.words()).startsWith("fixed point at address 1");
        assertThat(h.resumable()).isFalse();
        assertThat(m.cycle()).isLessThan(5);
    }

    @Test
    void aBreakpointStopsAfterTheCycleThatReachesIt() {
        LogicLane m = lane(LOOP);
        RunDriver d = new RunDriver(m, DEMO.inputs().size(), null).breakpoints(pc -> pc == 2);
        d.start();
        Halt h = d.run(100);
        assertThat(h.kind()).isEqualTo(Halt.Kind.BREAKPOINT);
        assertThat(m.cycle()).isEqualTo(2);
        assertThat(m.pc()).isEqualTo(2);
    }

    @Test
    void aStopRequestEndsTheRunBetweenCyclesAndTheRunResumes() {
        LogicLane m = lane(LOOP);
        RunDriver d = new RunDriver(m, DEMO.inputs().size(), null);
        d.observe(new RunObserver() {
            @Override
            public Halt cycleDone(long cycle, int pcStart) {
                if (cycle == 4) {
                    d.requestStop();
                }
                return null;
            }
        });
        d.start();
        Halt h = d.run(1000);
        assertThat(h.kind()).isEqualTo(Halt.Kind.STOPPED);
        assertThat(m.cycle()).isEqualTo(5);
        assertThat(d.run(3).kind()).isEqualTo(Halt.Kind.CYCLE_LIMIT);
        assertThat(m.cycle()).isEqualTo(8);
    }

    @Test
    void anInterruptedThreadStopsBeforeTheNextCycle() {
        LogicLane m = lane(LOOP);
        RunDriver d = new RunDriver(m, DEMO.inputs().size(), null);
        Thread.currentThread().interrupt();
        try {
            assertThat(d.run(10).kind()).isEqualTo(Halt.Kind.STOPPED);
            assertThat(m.cycle()).isZero();
        } finally {
            assertThat(Thread.interrupted()).as("the driver leaves the interrupt for its caller").isTrue();
        }
    }

    @Test
    void observersHearEachEventInOrderAndAPhaseStepFinishesItsCycleInTheNextRun() {
        LogicLane m = lane(LOOP);
        RunDriver d = new RunDriver(m, DEMO.inputs().size(), null);
        List<String> events = new ArrayList<>();
        d.observe(new RunObserver() {
            @Override
            public void begin(long cycle) {
                events.add("begin " + cycle);
            }

            @Override
            public void beforePhase(long cycle, int phase) {
                events.add("before " + cycle + "." + phase);
            }

            @Override
            public void phaseRan(long cycle, int phase) {
                events.add("ran " + cycle + "." + phase);
            }

            @Override
            public void phaseSettled(long cycle, int phase) {
                events.add("settled " + cycle + "." + phase);
            }

            @Override
            public Halt cycleDone(long cycle, int pcStart) {
                events.add("done " + cycle + " at " + pcStart);
                return null;
            }

            @Override
            public void end(long cycles, Halt halt) {
                events.add("end " + cycles);
            }
        });
        d.start();
        assertThat(d.stepPhase()).isNull();
        assertThat(m.nextPhase()).isEqualTo(2);
        Halt h = d.run(1);
        d.finish(h);
        assertThat(events).containsExactly("begin 0", "before 0.1", "ran 0.1", "settled 0.1", "before 0.2", "ran 0.2",
                "settled 0.2", "done 0 at 0", "end 1");
    }

    @Test
    void stimulusRowsApplyAtTheStartOfTheirCycleAndHold() {
        int lowSw = DEMO.inputs().stream().map(p -> p.name()).toList().indexOf("low_sw");
        Stimulus stim = new Stimulus(List.of(Stimulus.Column.bit("low_sw", lowSw)),
                List.of(new Stimulus.Row(3, 1, 2, new long[] {1})));
        LogicLane m = lane(LOOP);
        RunDriver d = new RunDriver(m, DEMO.inputs().size(), stim).stopAtFixedPoint(true);
        int net = DEMO.inputs().get(lowSw).net();
        List<Character> seen = new ArrayList<>();
        d.observe(new RunObserver() {
            @Override
            public void beforePhase(long cycle, int phase) {
                if (phase == 1) {
                    seen.add(m.level(net));
                }
            }
        });
        d.start();
        d.run(6);
        assertThat(seen).containsExactly('0', '0', '0', '1', '1', '1');
        assertThat(d.input(lowSw)).isTrue();
    }

    @Test
    void aRowForPhaseTwoChangesTheInputBetweenThePhasesOfItsCycle() {
        int lowSw = DEMO.inputs().stream().map(p -> p.name()).toList().indexOf("low_sw");
        Stimulus stim = new Stimulus(List.of(Stimulus.Column.bit("low_sw", lowSw)),
                List.of(new Stimulus.Row(1, 2, 2, new long[] {1})));
        LogicLane m = lane(LOOP);
        RunDriver d = new RunDriver(m, DEMO.inputs().size(), stim);
        int net = DEMO.inputs().get(lowSw).net();
        List<String> seen = new ArrayList<>();
        d.observe(new RunObserver() {
            @Override
            public void beforePhase(long cycle, int phase) {
                seen.add(cycle + "." + phase + "=" + m.level(net));
            }
        });
        d.start();
        d.run(3);
        assertThat(seen).containsExactly("0.1=0", "0.2=0", "1.1=0", "1.2=1", "2.1=1", "2.2=1");
    }
}
