package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.model.BuiltBlock;
import org.thermion.model.ModuleInstance;
import org.thermion.model.StageType;

import java.util.ArrayList;
import java.util.List;

/**
 * Turns the pc, rom and clock blocks' {@code uses} lines into counted stage instances: each block
 * stated becomes a module of its own (path "pc", "rom", "clock") whose instances the packer
 * places in envelopes, so heater strings, tube counts and draws include them. A block declared
 * {@code offboard}, or one that states no stages, is left out and says why.
 */
final class BuiltBlocks {
    private final Parts parts;
    private final Packer packer;
    private final Diagnostics diags;

    BuiltBlocks(Parts parts, Packer packer, Diagnostics diags) {
        this.parts = parts;
        this.packer = packer;
        this.diags = diags;
    }

    /**
     * The machine's built blocks. {@code pcWidth} 0 and {@code romWords} 0 mean the machine has no
     * program counter or ROM (words from switches): nothing to count or leave out.
     */
    List<BuiltBlock> build(MachineBlock mb, int pcWidth, int romWords, int romWidth, List<ModuleInstance> modules) {
        List<BuiltBlock> out = new ArrayList<>();
        if (pcWidth > 0 || !mb.pcSpec.uses().isEmpty()) {
            out.add(block("pc", "program counter", mb.pcSpec, modules, unit -> pcWidth));
        }
        if (romWords > 0 || !mb.romSpec.uses().isEmpty()) {
            int address = 32 - Integer.numberOfLeadingZeros(Math.max(1, romWords - 1));
            int lines = (1 << ((address + 1) / 2)) + (1 << (address / 2));
            out.add(block("rom", "ROM", mb.romSpec, modules, unit -> switch (unit) {
                case "word" -> romWords;
                case "bit" -> romWidth;
                case "address" -> address;
                default -> lines;
            }));
        }
        out.add(block("clock", "clock generator", mb.clockSpec, modules, unit -> mb.phases));
        return out;
    }

    private BuiltBlock block(String key, String what, BlockSpec spec, List<ModuleInstance> modules,
                             java.util.function.ToIntFunction<String> perUnit) {
        if (spec.offboard()) {
            if (!spec.uses().isEmpty()) {
                diags.error(spec.offboardSpan(), "the " + what + " is declared offboard but states the stages it uses",
                        "keep `offboard` for parts not made of tubes, or drop it to count the stages");
            }
            return new BuiltBlock(key, what, -1, List.of(), what + ": declared offboard"
                    + (spec.because() != null ? " (" + spec.because() + ")" : "") + ", not made of tubes");
        }
        if (spec.uses().isEmpty()) {
            return new BuiltBlock(key, what, -1, List.of(), what + ": its stages are not stated (`uses` lines in its "
                    + "block count it; `offboard` says it is not made of tubes)");
        }
        int module = modules.size();
        modules.add(new ModuleInstance(module, key, what.replace(' ', '_'), 0));
        List<BuiltBlock.Instances> stages = new ArrayList<>();
        for (BlockSpec.Use u : spec.uses()) {
            int s = parts.stage(u.stage(), u.stageSpan());
            if (s < 0) {
                continue;
            }
            StageType st = parts.stages.get(s);
            int n = u.count() * (u.unit() == null ? 1 : perUnit.applyAsInt(u.unit()));
            if (n > 1_000_000) {
                diags.error(u.stageSpan(), "the " + what + " would need " + n + " instances of '" + u.stage() + "'",
                        "at most 1000000");
                continue;
            }
            int[] env = new int[n];
            for (int i = 0; i < n; i++) {
                env[i] = packer.place(st.tube(), module, st.sectionsFor(st.fanIn()));
            }
            stages.add(new BuiltBlock.Instances(s, env));
        }
        return new BuiltBlock(key, what, module, stages, null);
    }
}
