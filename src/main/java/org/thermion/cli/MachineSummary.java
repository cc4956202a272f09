package org.thermion.cli;

import org.thermion.text.Nouns;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.model.Envelope;
import org.thermion.model.HeaterString;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Port;
import org.thermion.model.Rail;
import org.thermion.model.TubeType;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

import static org.thermion.cli.report.ReportUnit.AMPS;
import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.OHMS;
import static org.thermion.cli.report.ReportUnit.SECONDS;
import static org.thermion.cli.report.ReportUnit.TEXT;
import static org.thermion.cli.report.ReportUnit.VOLTS;

/** The summary `check` reports: sizes, tubes by type and by module, rails, heater strings. */
final class MachineSummary {
    private final Machine m;

    MachineSummary(Machine m) {
        this.m = m;
    }

    /** The schema version of check's JSON ({@code org/thermion/schema/check.schema.json}). */
    static final int VERSION = 1;

    Report report() {
        Set<String> types = new LinkedHashSet<>();
        for (ModuleInstance mi : m.modules()) {
            types.add(mi.type());
        }
        Report rep = new Report("check", VERSION);
        rep.field("machine", m.name());
        rep.field("phases", m.clock().phases());
        rep.field("period", SECONDS, m.clock().periodSeconds());
        rep.field("module_types", types.size());
        rep.field("module_instances", m.modules().size());
        rep.field("stage_instances", m.stageInstanceCount());
        rep.field("nets", m.netlist().netCount());
        rep.field("latches", m.netlist().latches().size());
        rep.field("inputs", m.inputs().stream().map(Port::name).toList());
        rep.field("outputs", m.outputs().stream().map(Port::name).toList());
        if (m.isa() != null) {
            Map<String, Object> isa = new LinkedHashMap<>();
            isa.put("instructions", m.isa().instructions().size());
            isa.put("word_bits", m.isa().wordBits());
            isa.put("state_bits", m.isa().state().size());
            rep.field("isa", isa);
        } else {
            rep.field("isa", new Absent("no isa"));
        }
        rep.field("tubes", m.envelopes().size());
        List<String> head = new ArrayList<>();
        head.add(String.format(Locale.ROOT, "machine %s: %d-phase clock, %s period", m.name(), m.clock().phases(),
                Numbers.si(m.clock().periodSeconds(), SECONDS)));
        head.add("  modules         " + Nouns.count(types.size(), "type") + ", " + Nouns.count(m.modules().size(), "instance"));
        head.add(String.format(Locale.ROOT, "  stage instances %d", m.stageInstanceCount()));
        head.add(String.format(Locale.ROOT, "  nets            %d", m.netlist().netCount()));
        head.add(String.format(Locale.ROOT, "  latches         %d", m.netlist().latches().size()));
        head.add(String.format(Locale.ROOT, "  inputs          %s", names(m.inputs())));
        head.add(String.format(Locale.ROOT, "  outputs         %s", names(m.outputs())));
        if (m.isa() != null) {
            head.add(String.format(Locale.ROOT, "  instructions    %d (%d-bit word), %d state bits", m.isa().instructions().size(),
                    m.isa().wordBits(), m.isa().state().size()));
        }
        head.add("");
        head.add(String.format(Locale.ROOT, "tubes: %d", m.envelopes().size()));
        head.add("");
        rep.text(head);
        Map<String, Integer> byType = new TreeMap<>();
        for (Envelope e : m.envelopes()) {
            byType.merge(m.tubes().get(e.tube()).name(), 1, Integer::sum);
        }
        Table tt = new Table("tube_types", "tubes by type")
                .column("type", "type", TEXT)
                .column("tubes", "tubes", COUNT);
        byType.forEach(tt::row);
        rep.table(tt);
        Table t = new Table("modules", "tubes by module")
                .column("module", "module", TEXT)
                .column("type", "type", TEXT)
                .column("tubes", "tubes", COUNT)
                .column("sections_used", "sections used", COUNT)
                .column("sections_spare", "spare", COUNT);
        // Envelopes grouped by module in one pass (a scan of all envelopes per module was
        // quadratic in the machine's size).
        Map<Integer, Map<Integer, int[]>> byModule = new java.util.HashMap<>();
        for (Envelope e : m.envelopes()) {
            int[] c = byModule.computeIfAbsent(e.module(), k -> new TreeMap<>()).computeIfAbsent(e.tube(), k -> new int[2]);
            c[0]++;
            c[1] += e.sectionsUsed();
        }
        for (ModuleInstance mi : m.modules()) {
            Map<Integer, int[]> per = byModule.getOrDefault(mi.id(), Map.of());
            for (Map.Entry<Integer, int[]> e : per.entrySet()) {
                TubeType type = m.tubes().get(e.getKey());
                int[] c = e.getValue();
                t.row(label(mi), type.name(), c[0], c[1], c[0] * type.sections() - c[1]);
            }
        }
        rep.table(t);
        Table r = new Table("rails", "rails")
                .column("rail", "rail", TEXT)
                .column("nominal", "voltage", VOLTS)
                .column("source", "source", OHMS, "the supply's internal resistance")
                .column("limit", "limit", AMPS, "the supply's current limit");
        for (Rail rail : m.rails()) {
            r.row(rail.name(), rail.volts(), rail.sourceOhms(),
                    Double.isInfinite(rail.limitAmps()) ? new Absent("none") : rail.limitAmps());
        }
        rep.table(r);
        Map<String, int[]> strings = new TreeMap<>();
        Map<String, String> railOf = new java.util.HashMap<>();
        // A big machine has tens of thousands of heaters but few distinct voltages: format each once.
        Map<Double, String> voltText = new java.util.HashMap<>();
        for (HeaterString s : m.heaterStrings()) {
            StringBuilder key = new StringBuilder();
            key.append(s.envelopes().size() == 1 ? "single " : s.envelopes().size() + " in series: ");
            Map<String, Integer> kinds = new TreeMap<>();
            for (int i = 0; i < s.envelopes().size(); i++) {
                kinds.merge(m.tubes().get(m.envelopes().get(s.envelopes().get(i)).tube()).name() + " at "
                        + voltText.computeIfAbsent(s.ratings().get(i).volts(), v -> Numbers.si(v, VOLTS)), 1, Integer::sum);
            }
            String sep = "";
            for (Map.Entry<String, Integer> e : kinds.entrySet()) {
                key.append(sep).append(e.getValue()).append(" x ").append(e.getKey());
                sep = " + ";
            }
            String rail = m.rails().get(s.rail()).name();
            String k = rail + "\u0000" + key;
            railOf.putIfAbsent(k, rail);
            strings.computeIfAbsent(k, x -> new int[1])[0]++;
        }
        Table h = new Table("heater_strings", "heater strings (" + m.heaterStrings().size() + " in all)")
                .column("rail", "rail", TEXT)
                .column("count", "count", COUNT, "strings wired alike")
                .column("wiring", "wiring", TEXT);
        for (Map.Entry<String, int[]> e : strings.entrySet()) {
            h.row(railOf.get(e.getKey()), e.getValue()[0], e.getKey().substring(e.getKey().indexOf('\u0000') + 1));
        }
        rep.table(h);
        return rep;
    }

    private String label(ModuleInstance mi) {
        return mi.path().isEmpty() ? "(top) " + mi.type() : mi.path() + " (" + mi.type() + ")";
    }

    private static String names(List<Port> ports) {
        return ports.isEmpty() ? "none" : String.join(" ", ports.stream().map(Port::name).toList());
    }
}
