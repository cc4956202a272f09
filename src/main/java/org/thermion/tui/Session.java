package org.thermion.tui;

import org.thermion.asm.Assembly;
import org.thermion.asm.ListingLine;
import org.thermion.model.Instruction;
import org.thermion.model.Machine;
import org.thermion.model.Port;
import org.thermion.power.CurrentMeter;
import org.thermion.power.HeaterAnalysis;
import org.thermion.power.TubeCount;
import org.thermion.sim.InitMode;
import org.thermion.sim.OutputChange;
import org.thermion.sim.Simulator;
import org.thermion.sim.Stimulus;
import org.thermion.sim.compiled.Engine;
import org.thermion.sim.run.Halt;
import org.thermion.sim.run.LogicLane;
import org.thermion.sim.run.OutputRecorder;
import org.thermion.sim.run.RunDriver;
import org.thermion.sim.run.RunObserver;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Everything the terminal UI shows and changes, without a terminal: the machine and its
 * simulator on one lane, the program listing, breakpoints, switch positions, the current
 * meter and why the machine last stopped. Drawing code only reads it; key handling calls
 * its commands. Tests drive it directly.
 */
public final class Session {
    /** The lane the session runs; the simulator computes 64, the UI watches one. */
    static final int LANE = 0;
    private static final int CHANGE_LOG = 256;

    private final Machine machine;
    private final Assembly assembly;
    private final Simulator sim;
    private final InitMode init;
    private final RunDriver driver;
    private final OutputRecorder outputLog;
    private final List<DecodeLamp> decode;
    private final List<ModuleLoad> modules;
    private final HeaterAnalysis heaters;
    private final int[] listingIndexOfAddress;
    private final boolean[] breakpoints;
    private final int[] watched;
    /** Per watched net: known at some time since reset. A net never known is unset, not lost. */
    private final boolean[] everKnown;
    private final CurrentMeter meter;
    private boolean running;
    private Stop stop;
    /** Cycles run before a reload, so the count goes on across it. */
    private long cycleBase;

    /**
     * A session on lane 0 of a new simulator. {@code stimulus} (null for none) sets inputs
     * as cycles come; {@code decodeName} names the decode nets (see {@link DecodeLamp}).
     */
    public Session(Machine machine, Assembly assembly, String decodeName, InitMode init, Stimulus stimulus) {
        this.machine = machine;
        this.assembly = assembly;
        this.init = init;
        this.sim = Engine.DEFAULT.simulator(machine);
        this.decode = DecodeLamp.find(machine, decodeName);
        this.heaters = new HeaterAnalysis(machine);
        this.modules = ModuleLoad.of(machine, new TubeCount(machine), heaters);
        this.breakpoints = new boolean[Math.max(1, machine.rom() == null ? 1 : machine.rom().words())];
        this.listingIndexOfAddress = new int[breakpoints.length];
        Arrays.fill(listingIndexOfAddress, -1);
        List<ListingLine> listing = assembly.listing();
        for (int i = 0; i < listing.size(); i++) {
            ListingLine l = listing.get(i);
            if (l.hasWord() && l.address() >= 0 && l.address() < listingIndexOfAddress.length
                    && listingIndexOfAddress[l.address()] < 0) {
                listingIndexOfAddress[l.address()] = i;
            }
        }
        this.watched = watchedNets(machine, decode);
        this.everKnown = new boolean[watched.length];
        this.meter = new CurrentMeter(machine);
        LogicLane lane = new LogicLane(sim);
        this.outputLog = new OutputRecorder(lane, machine, CHANGE_LOG);
        this.driver = new RunDriver(lane, machine.inputs().size(), stimulus)
                .breakpoints(pc -> pc >= 0 && pc < breakpoints.length && breakpoints[pc])
                .observe(meter.observer(sim, LANE))
                .observe(outputLog)
                .observe(new RunObserver() {
                    @Override
                    public Halt cycleDone(long cycle, int pcStart) {
                        return unknownStop() ? new Halt(Halt.Kind.OBSERVED, stop.detail()) : null;
                    }
                });
        sim.loadRom(assembly.words());
        reset();
    }

    /** Nets whose turning unknown stops a run: state bits, outputs, the jump request and the decode lines. */
    private static int[] watchedNets(Machine m, List<DecodeLamp> decode) {
        List<Integer> nets = new ArrayList<>();
        m.isa().state().forEach(b -> nets.add(b.net()));
        for (Port p : m.outputs()) {
            nets.add(p.net());
        }
        if (m.pc() != null && m.pc().jumpNet() >= 0) {
            nets.add(m.pc().jumpNet());
        }
        for (DecodeLamp d : decode) {
            nets.add(d.net());
        }
        return nets.stream().mapToInt(Integer::intValue).distinct().toArray();
    }

    // ---- commands -------------------------------------------------------------------

    /** Latches to their power-up state, PC 0, cycle 0, meter cleared; switches stay where they are. */
    public void reset() {
        running = false;
        cycleBase = 0;
        sim.reset(init);
        meter.reset();
        driver.start();
        meter.sample(sim, LANE);
        Arrays.fill(everKnown, false);
        lostKnowledge();
        stop = new Stop(Stop.Reason.RESET, "reset");
    }

    /** Runs the next clock phase. */
    public void stepPhase() {
        running = false;
        stop = new Stop(Stop.Reason.STEPPED, "stepped one phase");
        driver.stepPhase();
        sim.settle();
        unknownStop();
    }

    /** Runs phases until the current cycle is complete (a whole cycle from a cycle boundary). */
    public void stepCycle() {
        running = false;
        stop = new Stop(Stop.Reason.STEPPED, "stepped one cycle");
        driver.run(1);
        sim.settle();
        unknownStop();
    }

    /** Starts or pauses a run; {@link #run(long)} does the work between frames. */
    public void toggleRun() {
        if (running) {
            running = false;
            stop = new Stop(Stop.Reason.PAUSED, "paused");
        } else {
            running = true;
        }
    }

    public boolean running() {
        return running;
    }

    /**
     * While running, runs up to {@code maxCycles} cycles, checking after each whether the
     * PC reached a breakpoint or a watched net turned unknown; stops the run if so.
     * Returns the cycles run.
     */
    public long run(long maxCycles) {
        if (!running) {
            return 0;
        }
        long before = sim.cycle();
        Halt halt = driver.run(maxCycles);
        if (halt.kind() == Halt.Kind.BREAKPOINT) {
            running = false;
            stop = new Stop(Stop.Reason.BREAKPOINT, "breakpoint at " + Hex.address(pc(), machine));
        } else if (!halt.resumable()) {
            // The unknown-value observer has said why.
            running = false;
        }
        // Lamps show the logic settled on what the latches now hold.
        sim.settle();
        return sim.cycle() - before;
    }

    /** After a step: if the PC or a watched net that was known went unknown, says so in the stop. */
    private boolean unknownStop() {
        if (!sim.threeValued()) {
            return false;
        }
        if ((sim.pcUnknown() >>> LANE & 1L) != 0) {
            stop = new Stop(Stop.Reason.UNKNOWN, "the PC is unknown: a jump was decided by an unknown value");
            return true;
        }
        int lost = lostKnowledge();
        if (lost >= 0) {
            stop = new Stop(Stop.Reason.UNKNOWN, "unknown value on " + machine.netlist().netName(lost));
            return true;
        }
        return false;
    }

    /** Updates which watched nets were known since reset; returns the first that had been known and now is not, or -1. */
    private int lostKnowledge() {
        int lost = -1;
        for (int i = 0; i < watched.length; i++) {
            boolean unknown = (sim.unknown(watched[i]) >>> LANE & 1L) != 0;
            if (!unknown) {
                everKnown[i] = true;
            } else if (everKnown[i]) {
                // Reported once; it counts again only after it has been known again.
                everKnown[i] = false;
                if (lost < 0) {
                    lost = watched[i];
                }
            }
        }
        return lost;
    }

    /** Flips a switch and lets the logic settle so lamps and decode lines follow at once. */
    public void toggleInput(int index) {
        driver.setInput(index, !driver.input(index));
        sim.settle();
    }

    public void toggleBreakpoint(int address) {
        if (address >= 0 && address < breakpoints.length) {
            breakpoints[address] = !breakpoints[address];
        }
    }

    public void clearBreakpoints() {
        Arrays.fill(breakpoints, false);
    }

    // ---- carrying state over from the session before a reload (see Carry) ---------------

    /** Sets latch {@code index} (netlist order) to a known level without running a phase. */
    void carryLatch(int index, boolean on) {
        sim.setLatch(index, on ? -1L : 0L);
    }

    void carryPc(int address) {
        sim.setPc(LANE, address);
    }

    void carryCycles(long cycles) {
        cycleBase = cycles;
    }

    /** Sets a switch where the old session had it. */
    void carryInput(int index, boolean on) {
        driver.setInput(index, on);
    }

    /** After the carries: the logic settles on them, the meter starts again from here. */
    void carried(String why) {
        sim.settle();
        meter.reset();
        meter.sample(sim, LANE);
        Arrays.fill(everKnown, false);
        lostKnowledge();
        stop = new Stop(Stop.Reason.RELOADED, why);
    }

    // ---- what the screen reads ------------------------------------------------------

    public Machine machine() {
        return machine;
    }

    public Assembly assembly() {
        return assembly;
    }

    public CurrentMeter meter() {
        return meter;
    }

    public List<DecodeLamp> decodeLines() {
        return decode;
    }

    public HeaterAnalysis heaters() {
        return heaters;
    }

    public List<ModuleLoad> modules() {
        return modules;
    }

    public Stop stop() {
        return stop;
    }

    public InitMode initMode() {
        return init;
    }

    public boolean breakpoint(int address) {
        return address >= 0 && address < breakpoints.length && breakpoints[address];
    }

    public int breakpointCount() {
        int n = 0;
        for (boolean b : breakpoints) {
            if (b) {
                n++;
            }
        }
        return n;
    }

    public boolean input(int index) {
        return driver.input(index);
    }

    public int pc() {
        return sim.pc(LANE);
    }

    public long cycle() {
        return cycleBase + sim.cycle();
    }

    /** Cycles counted before the last reload; the simulator's own count starts after them. */
    long cycleBase() {
        return cycleBase;
    }

    public int nextPhase() {
        return sim.nextPhase();
    }

    /** The listing line of an address, or -1 when the program has no word there. */
    public int listingIndex(int address) {
        return address >= 0 && address < listingIndexOfAddress.length ? listingIndexOfAddress[address] : -1;
    }

    /** How the bus {@code name} (an input or output bus) is written: hexadecimal unless the description declares a radix. */
    public Radix radix(String name) {
        return Radix.of(machine.radix(name));
    }

    /** True when the instruction word comes from switches (no ROM or PC): the UI shows a switch panel for it. */
    public boolean switchFed() {
        return machine.isa() != null && machine.isa().wordFromSwitches();
    }

    /** The word the switches of a switch-fed machine set now. */
    public long switchWord() {
        int[] bits = machine.isa().wordInputs();
        long w = 0;
        for (int i = 0; i < bits.length; i++) {
            w |= input(bits[i]) ? 1L << i : 0;
        }
        return w;
    }

    /** Sets the word's switches to {@code word} (modulo the word's range). */
    public void setSwitchWord(long word) {
        int[] bits = machine.isa().wordInputs();
        for (int i = 0; i < bits.length; i++) {
            boolean on = (word >>> i & 1L) != 0;
            if (input(bits[i]) != on) {
                toggleInput(bits[i]);
            }
        }
    }

    /** The ROM word at the PC (the switches' word on a switch-fed machine): the instruction being fetched or executed this cycle. */
    private long wordAtPc() {
        if (switchFed()) {
            return switchWord();
        }
        int pc = pc();
        long[] words = assembly.words();
        return pc >= 0 && pc < words.length ? words[pc] : 0;
    }

    /** The instruction at the PC, or null when its opcode is not in the ISA. */
    public Instruction instructionAtPc() {
        return machine.isa().byOpcode(machine.isa().opcode().extract(wordAtPc()));
    }

    /** True between phases of a cycle: the instruction at the PC has started. */
    public boolean midCycle() {
        return sim.nextPhase() != 1;
    }

    public Level level(int net) {
        return Level.of(sim.value(net), sim.unknown(net), LANE);
    }

    public Level stateBit(int index) {
        return level(machine.isa().state().get(index).net());
    }

    public Level output(int index) {
        return level(machine.outputs().get(index).net());
    }

    /** The most recent output changes, oldest first. */
    public List<OutputChange> outputChanges() {
        return outputLog.changes();
    }

    /** Output changes since reset, including those the log no longer holds. */
    public long outputChangeCount() {
        return outputLog.count();
    }
}
