package org.thermion.sim.run;

import org.thermion.model.Machine;
import org.thermion.model.StateBit;
import org.thermion.sim.InitMode;
import org.thermion.sim.RunResult;
import org.thermion.sim.Simulator;
import org.thermion.sim.Stimulus;
import org.thermion.sim.VcdWriter;

import java.util.List;
import java.util.function.Supplier;

/**
 * A program run as {@code run} makes it: the {@link RunDriver} to the cycle limit or a fixed
 * point, with the output changes, the watch table, the unknown values (three-valued runs) and
 * optionally a value change dump, gathered into one {@link RunResult}.
 */
public final class ProgramRuns {
    private ProgramRuns() {
    }

    /**
     * Runs on the logic, lane 0 of {@code sim}.
     *
     * @param stimulus input rows, or null for all inputs 0
     * @param vcd      a writer to feed (its header takes {@code vcdDate} and {@code version}), or null
     */
    public static RunResult logic(Simulator sim, long[] rom, InitMode init, Stimulus stimulus, List<Watch> watches,
                                  long maxCycles, VcdWriter vcd, String vcdDate, String version) {
        Machine m = sim.machine();
        sim.loadRom(rom);
        sim.reset(init);
        LogicLane lane = new LogicLane(sim);
        RunDriver driver = new RunDriver(lane, m.inputs().size(), stimulus).stopAtFixedPoint(true).stopWhenPcUnknown(true);
        if (vcd != null) {
            driver.observe(vcd.observer(sim, vcdDate, version));
        }
        UnknownWatch unknowns = new UnknownWatch(sim);
        driver.observe(unknowns);
        OutputRecorder outputs = new OutputRecorder(lane, m);
        driver.observe(outputs);
        WatchTable table = new WatchTable(lane, watches, m.pc() == null ? 1 : m.pc().width());
        driver.observe(table);
        // The ISA's state bits by name; a machine without an ISA shows every latch instead.
        List<StateBit> state = m.isa() != null ? m.isa().state()
                : m.netlist().latches().stream().map(l -> new StateBit(m.netlist().netName(l.output()), l.output(), null))
                .toList();
        return run(driver, maxCycles, lane, outputs, table, unknowns, state, () -> {
            StringBuilder st = new StringBuilder();
            for (StateBit b : state) {
                st.append(b.net() >= 0 ? lane.level(b.net()) : 'x');
            }
            return st.toString();
        });
    }

    /** Runs on the instruction-set meaning: no gates, so no unknown values and no dump. */
    public static RunResult isa(Machine m, long[] rom, InitMode init, Stimulus stimulus, List<Watch> watches,
                                long maxCycles) {
        IsaLane lane = new IsaLane(m, rom, init);
        RunDriver driver = new RunDriver(lane, m.inputs().size(), stimulus).stopAtFixedPoint(true).stopWhenPcUnknown(true);
        OutputRecorder outputs = new OutputRecorder(lane, m);
        driver.observe(outputs);
        WatchTable table = new WatchTable(lane, watches, m.pc() == null ? 1 : m.pc().width());
        driver.observe(table);
        return run(driver, maxCycles, lane, outputs, table, null, m.isa().state(), () -> {
            StringBuilder st = new StringBuilder();
            for (int s = 0; s < m.isa().state().size(); s++) {
                st.append(lane.interpreter().state(s) ? '1' : '0');
            }
            return st.toString();
        });
    }

    private static RunResult run(RunDriver driver, long maxCycles, Clocked lane, OutputRecorder outputs,
                                 WatchTable table, UnknownWatch unknowns, List<StateBit> state,
                                 Supplier<String> finalState) {
        driver.start();
        Halt halt = driver.run(maxCycles);
        driver.finish(halt);
        return new RunResult(lane.cycle(), halt.words(), outputs.changes(), unknowns == null ? List.of() : unknowns.reports(),
                state.stream().map(StateBit::name).toList(), finalState.get(), lane.pc(), lane.pcKnown(), table.names(),
                table.rows(), outputs.initial());
    }
}
