package org.thermion.model;

import java.util.List;
import java.util.Map;

/**
 * An elaborated machine: parts, supplies, the module hierarchy, the netlist, its
 * physical packing into envelopes and heater strings, its instruction set, and the built
 * blocks outside the logic (program counter, ROM decoding, clock generator; {@link BuiltBlock}).
 */
public record Machine(
        String name,
        Clock clock,
        List<TubeType> tubes,
        List<StageType> stages,
        List<Rail> rails,
        List<HeaterRule> heaterRules,
        List<SoftStart> softStarts,
        List<ModuleInstance> modules,
        Netlist netlist,
        Rom rom,
        ProgramCounter pc,
        List<Port> inputs,
        List<Port> outputs,
        List<Envelope> envelopes,
        List<HeaterString> heaterStrings,
        Isa isa,
        int[] gateEnvelope,
        int[] latchEnvelope,
        List<BuiltBlock> built,
        Map<String, Integer> radixes) {

    /** A machine without built blocks (program counter, ROM decoding and clock not described). */
    public Machine(String name, Clock clock, List<TubeType> tubes, List<StageType> stages, List<Rail> rails,
                   List<HeaterRule> heaterRules, List<SoftStart> softStarts, List<ModuleInstance> modules,
                   Netlist netlist, Rom rom, ProgramCounter pc, List<Port> inputs, List<Port> outputs,
                   List<Envelope> envelopes, List<HeaterString> heaterStrings, Isa isa, int[] gateEnvelope,
                   int[] latchEnvelope) {
        this(name, clock, tubes, stages, rails, heaterRules, softStarts, modules, netlist, rom, pc, inputs, outputs,
                envelopes, heaterStrings, isa, gateEnvelope, latchEnvelope, List.of());
    }

    /** A machine whose buses are all written in hexadecimal. */
    public Machine(String name, Clock clock, List<TubeType> tubes, List<StageType> stages, List<Rail> rails,
                   List<HeaterRule> heaterRules, List<SoftStart> softStarts, List<ModuleInstance> modules,
                   Netlist netlist, Rom rom, ProgramCounter pc, List<Port> inputs, List<Port> outputs,
                   List<Envelope> envelopes, List<HeaterString> heaterStrings, Isa isa, int[] gateEnvelope,
                   int[] latchEnvelope, List<BuiltBlock> built) {
        this(name, clock, tubes, stages, rails, heaterRules, softStarts, modules, netlist, rom, pc, inputs, outputs,
                envelopes, heaterStrings, isa, gateEnvelope, latchEnvelope, built, Map.of());
    }

    /** The radix (16, 10, 8 or 2) the machine block declares for an input or output bus; 16 when it declares none. */
    public int radix(String bus) {
        return radixes.getOrDefault(bus, 16);
    }

    public Machine {
        built = List.copyOf(built);
        radixes = Map.copyOf(radixes);
        tubes = List.copyOf(tubes);
        stages = List.copyOf(stages);
        rails = List.copyOf(rails);
        heaterRules = List.copyOf(heaterRules);
        softStarts = List.copyOf(softStarts);
        modules = List.copyOf(modules);
        inputs = List.copyOf(inputs);
        outputs = List.copyOf(outputs);
        envelopes = List.copyOf(envelopes);
        heaterStrings = List.copyOf(heaterStrings);
        gateEnvelope = gateEnvelope.clone();
        latchEnvelope = latchEnvelope.clone();
    }

    /** A copy of the envelope of every gate (-1: none); loops read {@link #gateEnvelope(int)}. */
    @Override
    public int[] gateEnvelope() {
        return gateEnvelope.clone();
    }

    /** A copy of the envelope of every latch (-1: none); loops read {@link #latchEnvelope(int)}. */
    @Override
    public int[] latchEnvelope() {
        return latchEnvelope.clone();
    }

    /** The envelope that holds gate {@code gate}, -1 for none. */
    public int gateEnvelope(int gate) {
        return gateEnvelope[gate];
    }

    /** The envelope that holds latch {@code latch}, -1 for none. */
    public int latchEnvelope(int latch) {
        return latchEnvelope[latch];
    }

    /** Stage instances: every gate and latch realized by a stage (free cells excluded). */
    public int stageInstanceCount() {
        int n = 0;
        for (Gate g : netlist.gates()) {
            if (g.stage() >= 0) {
                n++;
            }
        }
        for (Latch l : netlist.latches()) {
            if (l.stage() >= 0) {
                n++;
            }
        }
        return n;
    }

    public int railIndex(String name) {
        for (int i = 0; i < rails.size(); i++) {
            if (rails.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    public Port input(String name) {
        return inputs.stream().filter(p -> p.name().equals(name)).findFirst().orElse(null);
    }

    public Port output(String name) {
        return outputs.stream().filter(p -> p.name().equals(name)).findFirst().orElse(null);
    }
}
