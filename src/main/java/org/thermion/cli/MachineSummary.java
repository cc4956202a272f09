package org.thermion.cli;

import org.thermion.model.Envelope;
import org.thermion.model.HeaterString;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.model.Rail;
import org.thermion.model.TubeType;

import java.io.PrintWriter;
import java.util.LinkedHashSet;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

/** The summary `check` prints: sizes, tubes by type and by module, rails, heater strings. */
final class MachineSummary {
    private final Machine m;

    MachineSummary(Machine m) {
        this.m = m;
    }

    void print(PrintWriter out) {
        Set<String> types = new LinkedHashSet<>();
        for (ModuleInstance mi : m.modules()) {
            types.add(mi.type());
        }
        out.printf(Locale.ROOT, "machine %s: %d-phase clock, %s period%n", m.name(), m.clock().phases(),
                Units.time(m.clock().periodSeconds()));
        out.printf(Locale.ROOT, "  modules         %d types, %d instances%n", types.size(), m.modules().size());
        out.printf(Locale.ROOT, "  stage instances %d%n", m.stageInstanceCount());
        out.printf(Locale.ROOT, "  nets            %d%n", m.netlist().netCount());
        out.printf(Locale.ROOT, "  latches         %d%n", m.netlist().latches().size());
        out.printf(Locale.ROOT, "  inputs          %s%n", names(m.inputs()));
        out.printf(Locale.ROOT, "  outputs         %s%n", names(m.outputs()));
        if (m.isa() != null) {
            out.printf(Locale.ROOT, "  instructions    %d (%d-bit word), %d state bits%n", m.isa().instructions().size(),
                    m.isa().wordBits(), m.isa().state().size());
        }
        out.println();
        Map<String, Integer> byType = new TreeMap<>();
        for (Envelope e : m.envelopes()) {
            byType.merge(m.tubes().get(e.tube()).name(), 1, Integer::sum);
        }
        out.printf(Locale.ROOT, "tubes: %d%n", m.envelopes().size());
        for (Map.Entry<String, Integer> e : byType.entrySet()) {
            out.printf(Locale.ROOT, "  %-8s %4d%n", e.getKey(), e.getValue());
        }
        out.println();
        out.println("tubes by module:");
        Table t = new Table("module", "type", "tubes", "sections used", "spare");
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
                TubeType tt = m.tubes().get(e.getKey());
                int[] c = e.getValue();
                t.row(label(mi), tt.name(), String.valueOf(c[0]), String.valueOf(c[1]),
                        String.valueOf(c[0] * tt.sections() - c[1]));
            }
        }
        t.print(out, "  ");
        out.println();
        out.println("rails:");
        Table r = new Table("rail", "voltage", "source", "limit");
        for (Rail rail : m.rails()) {
            r.row(rail.name(), Units.volts(rail.volts()), Units.ohms(rail.sourceOhms()),
                    Double.isInfinite(rail.limitAmps()) ? "none" : Units.amps(rail.limitAmps()));
        }
        r.print(out, "  ");
        out.println();
        out.println("heater strings:");
        Map<String, int[]> strings = new TreeMap<>();
        // A big machine has tens of thousands of heaters but few distinct voltages: format each once.
        Map<Double, String> voltText = new java.util.HashMap<>();
        for (HeaterString s : m.heaterStrings()) {
            StringBuilder key = new StringBuilder(m.rails().get(s.rail()).name()).append(": ");
            key.append(s.envelopes().size() == 1 ? "single " : s.envelopes().size() + " in series: ");
            Map<String, Integer> kinds = new TreeMap<>();
            for (int i = 0; i < s.envelopes().size(); i++) {
                kinds.merge(m.tubes().get(m.envelopes().get(s.envelopes().get(i)).tube()).name() + " at "
                        + voltText.computeIfAbsent(s.ratings().get(i).volts(), Units::volts), 1, Integer::sum);
            }
            String sep = "";
            for (Map.Entry<String, Integer> e : kinds.entrySet()) {
                key.append(sep).append(e.getValue()).append(" x ").append(e.getKey());
                sep = " + ";
            }
            strings.computeIfAbsent(key.toString(), k -> new int[1])[0]++;
        }
        for (Map.Entry<String, int[]> e : strings.entrySet()) {
            out.printf(Locale.ROOT, "  %4d x %s%n", e.getValue()[0], e.getKey());
        }
        out.printf(Locale.ROOT, "  %d strings in all%n", m.heaterStrings().size());
    }

    private String label(ModuleInstance mi) {
        return mi.path().isEmpty() ? "(top) " + mi.type() : mi.path() + " (" + mi.type() + ")";
    }

    private static String names(java.util.List<org.thermion.model.Port> ports) {
        return ports.isEmpty() ? "none" : String.join(" ", ports.stream().map(org.thermion.model.Port::name).toList());
    }
}
