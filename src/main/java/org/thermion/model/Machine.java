package org.thermion.model;

import java.util.List;

/**
 * An elaborated machine: parts, supplies, the module hierarchy, the netlist, its
 * physical packing into envelopes and heater strings, and its instruction set.
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
        int[] latchEnvelope) {

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
