package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Prop;
import org.thermion.lang.ast.Value;
import org.thermion.model.Envelope;
import org.thermion.model.HeaterString;
import org.thermion.model.BypassTrigger;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Relay;
import org.thermion.model.SoftStart;
import org.thermion.model.SoftStartCover;
import org.thermion.model.StageFunction;
import org.thermion.model.StageType;
import org.thermion.model.TubeKind;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Reads {@code softstart NAME on RAIL { ... }} blocks against {@link PropertyTable#SOFTSTART}.
 * A thyratron bypass driver gets a module of its own and its envelope, so it is counted
 * and heated like any stage. A {@code covers} line names what sits behind the resistor;
 * its tube types are checked against the heaters once they are wired ({@link #checkCovers}).
 */
final class SoftStartReader {
    private final Parts parts;
    private final Packer packer;
    private final Diagnostics diags;
    /** The names each soft start's {@code covers} line was written with, for the checks after wiring. */
    private final Map<SoftStart, PropLine> coverLines = new IdentityHashMap<>();

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
        if (relay == null) {
            return null;
        }
        SoftStart ss = new SoftStart(name, rail, resistor.num(), watts, relay, trigger, SoftStartCover.wholeRail());
        PropLine covers = b.line("covers");
        if (covers != null) {
            coverLines.put(ss, covers);
        }
        return ss;
    }

    /**
     * {@code ss} with the loads its {@code covers} line names; null when reported. Called once every
     * soft start is read, so that a thyratron another soft start's bypass brings in can be covered
     * whichever block comes first.
     */
    SoftStart withCovers(SoftStart ss, List<ModuleInstance> modules) {
        PropLine line = coverLines.remove(ss);
        if (line == null) {
            return ss;
        }
        List<Value> names = line.tokens("loads");
        if (names.isEmpty()) {
            diags.error(line.span("loads"), "soft start '" + ss.name() + "' covers nothing",
                    "name the module instances or tube types behind its resistor, or leave out the `covers` line");
            return null;
        }
        SoftStartCover cover = cover(names, ss.name(), ss.rail(), modules);
        if (cover == null) {
            return null;
        }
        SoftStart covered = new SoftStart(ss.name(), ss.rail(), ss.resistorOhms(), ss.ratedWatts(), ss.relay(),
                ss.trigger(), cover);
        coverLines.put(covered, line);
        return covered;
    }

    /** The loads named in a {@code covers} line: module instances (with their subtrees), else tube types. */
    private SoftStartCover cover(List<Value> names, String soft, int rail, List<ModuleInstance> modules) {
        List<String> written = new ArrayList<>();
        Set<Integer> ids = new HashSet<>();
        Set<Integer> tubes = new HashSet<>();
        boolean ok = true;
        for (Value v : names) {
            String n = v.text();
            if (written.contains(n)) {
                diags.error(v.span(), "'" + n + "' is named twice in the covers of soft start '" + soft + "'", "name it once");
                ok = false;
                continue;
            }
            written.add(n);
            boolean module = false;
            for (ModuleInstance mi : modules) {
                if (mi.parent() >= 0 && (mi.path().equals(n) || mi.path().startsWith(n + "."))) {
                    ids.add(mi.id());
                    module |= mi.path().equals(n);
                }
            }
            if (module) {
                continue;
            }
            if (parts.usedTube(n) >= 0) {
                tubes.add(parts.usedTube(n));
                continue;
            }
            if (parts.hasTube(n)) {
                notHeated(v, soft, parts.rails.get(rail).name());
                ok = false;
                continue;
            }
            List<String> known = new ArrayList<>();
            modules.stream().filter(m -> m.parent() >= 0).forEach(m -> known.add(m.path()));
            diags.error(v.span(), "soft start '" + soft + "' covers '" + n + "', which is neither a module instance nor a tube type",
                    Declarations.hintFor(n, known, "name a module instance (as in its `use` line) or a tube type whose "
                            + "heaters are on the rail"));
            ok = false;
        }
        return ok ? new SoftStartCover(written, ids, tubes) : null;
    }

    /**
     * Checks, once heaters are wired, that each tube type a soft start covers heats something on
     * its rail, and that no load sits behind two soft starts' resistors.
     */
    void checkCovers(List<SoftStart> softStarts, List<HeaterString> strings, List<Envelope> envelopes,
                     List<String> tubeNames) {
        for (SoftStart ss : softStarts) {
            PropLine written = coverLines.get(ss);
            if (written == null) {
                continue;
            }
            for (Value v : written.tokens("loads")) {
                for (int t : ss.cover().tubes()) {
                    if (!tubeNames.get(t).equals(v.text())) {
                        continue;
                    }
                    boolean heated = strings.stream().anyMatch(hs -> hs.rail() == ss.rail()
                            && hs.envelopes().stream().anyMatch(e -> envelopes.get(e).tube() == t));
                    if (!heated) {
                        notHeated(v, ss.name(), parts.rails.get(ss.rail()).name());
                    }
                }
            }
        }
        for (int i = 0; i < softStarts.size(); i++) {
            for (int j = i + 1; j < softStarts.size(); j++) {
                SoftStart a = softStarts.get(i);
                SoftStart b = softStarts.get(j);
                if (a.rail() != b.rail() || a.cover().isWholeRail() || b.cover().isWholeRail()) {
                    continue;
                }
                List<String> both = new ArrayList<>();
                for (String n : a.cover().names()) {
                    if (b.cover().names().contains(n)) {
                        both.add(n);
                    }
                }
                for (HeaterString hs : strings) {
                    if (both.isEmpty() && hs.rail() == a.rail() && a.cover().coversString(hs, envelopes)
                            && b.cover().coversString(hs, envelopes)) {
                        both.add("a heater string of " + tubeNames.get(envelopes.get(hs.envelopes().get(0)).tube()));
                    }
                }
                for (int m : a.cover().modules()) {
                    if (both.isEmpty() && b.cover().modules().contains(m)) {
                        both.add("a module instance in both");
                    }
                }
                if (!both.isEmpty()) {
                    diags.error(coverLines.get(b).tokens("loads").get(0).span(), "soft starts '" + a.name() + "' and '" + b.name()
                                    + "' both cover " + String.join(", ", both),
                            "a load sits behind one soft-start resistor at most: take it out of one `covers` line");
                }
            }
        }
    }

    private void notHeated(Value v, String soft, String rail) {
        diags.error(v.span(), "soft start '" + soft + "' covers " + v.text() + ", but no heater of " + v.text()
                + " is on rail '" + rail + "'", "name a tube type wired by a `heaters on " + rail
                + "` block, or a module instance");
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

    /**
     * The relay block's figures; a pick-up above the coil's rating or a drop-out at or above the pick-up is an
     * error at the line that breaks the order (defaults count: pick-up 60 % and drop-out 10 % of rated), and the
     * soft start is not built.
     */
    private Relay relay(PropBlock r) {
        Relay relay = new Relay(r.num("coil"), r.num("rated"), r.num("pickup"), r.num("dropout"), r.num("operate"),
                r.num("contacts"));
        PropLine pickup = r.line("pickup");
        PropLine dropout = r.line("dropout");
        boolean ok = true;
        if (relay.pickupVolts() > relay.ratedVolts()) {
            PropLine at = pickup != null ? pickup : r.line("rated");
            diags.error(at == null ? null : at.span("value"), "pick-up voltage " + volts(relay.pickupVolts()) + " above the coil's rated "
                    + volts(relay.ratedVolts()) + ": the relay would need more than its rating to close",
                    "a relay picks up below its rated voltage (at most 60 % of it on a typical data sheet): check "
                            + "`rated` and `pickup` against the relay's sheet");
            ok = false;
        }
        if (relay.dropoutVolts() >= relay.pickupVolts()) {
            PropLine at = dropout != null ? dropout : pickup != null ? pickup : r.line("rated");
            diags.error(at == null ? null : at.span("value"), "drop-out voltage " + volts(relay.dropoutVolts())
                    + " at or above the pick-up voltage " + volts(relay.pickupVolts()),
                    "a relay releases below the voltage that pulls it in (about 10 % of rated on a typical data "
                            + "sheet): check `pickup` and `dropout`");
            ok = false;
        }
        return ok ? relay : null;
    }

    private static String volts(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(4)).stripTrailingZeros().toPlainString() + " V";
    }
}
