package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Prop;
import org.thermion.model.BypassTrigger;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Relay;
import org.thermion.model.SoftStart;
import org.thermion.model.StageFunction;
import org.thermion.model.StageType;
import org.thermion.model.TubeKind;

import java.util.List;

/**
 * Reads {@code softstart NAME on RAIL { ... }} blocks against {@link PropertyTable#SOFTSTART}.
 * A thyratron bypass driver gets a module of its own and its envelope, so it is counted
 * and heated like any stage.
 */
final class SoftStartReader {
    private final Parts parts;
    private final Packer packer;
    private final Diagnostics diags;

    SoftStartReader(Parts parts, Packer packer, Diagnostics diags) {
        this.parts = parts;
        this.packer = packer;
        this.diags = diags;
    }

    /** The soft start declared by {@code p}; null when reported. May add a module to {@code modules}. */
    SoftStart read(Prop p, List<ModuleInstance> modules) {
        PropReader head = new PropReader(p, diags);
        String name = head.word("a name");
        head.expectWord("on");
        String railName = head.word("a rail name");
        Span rs = head.lastSpan();
        head.end();
        if (head.failed()) {
            return null;
        }
        int rail = parts.rail(railName, rs);
        PropBlock b = PropBlock.read(PropertyTable.SOFTSTART, p, "softstart '" + name + "'", p.values().get(0).span(), diags);
        PropLine resistor = b.line("resistor");
        PropLine bypass = b.line("bypass");
        BypassTrigger trigger = bypass == null ? null : trigger(bypass, name, modules);
        if (resistor == null || trigger == null || rail < 0) {
            return null;
        }
        double watts = resistor.has("rated") ? resistor.num("watts") : Double.POSITIVE_INFINITY;
        Relay relay = b.hasBlock("relay") ? relay(b.nested("relay")) : Relay.standard();
        return new SoftStart(name, rail, resistor.num(), watts, relay, trigger);
    }

    private BypassTrigger trigger(PropLine bypass, String name, List<ModuleInstance> modules) {
        if (bypass.word("trigger").equals("after")) {
            return new BypassTrigger.AfterDelay(bypass.num());
        }
        String stage = bypass.word("stage");
        Span ss = bypass.span("stage");
        int s = parts.stage(stage, ss);
        if (s < 0) {
            return null;
        }
        StageType st = parts.stages.get(s);
        if (parts.tubes.get(st.tube()).kind() != TubeKind.THYRATRON || st.function() != StageFunction.RELAY) {
            diags.error(ss, "stage '" + stage + "' is not a thyratron relay driver", "name a relay stage whose tube is a thyratron");
            return null;
        }
        int module = modules.size();
        modules.add(new ModuleInstance(module, name, "softstart", 0));
        int env = packer.place(st.tube(), module, st.sections());
        return new BypassTrigger.ThyratronWarm(env, st.tube(), st.loadOhms(), st.loadRail(), s);
    }

    private static Relay relay(PropBlock r) {
        return new Relay(r.num("coil"), r.num("rated"), r.num("pickup"), r.num("dropout"), r.num("operate"),
                r.num("contacts"));
    }
}
