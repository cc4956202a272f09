package org.thermion.power;

import org.thermion.model.Envelope;
import org.thermion.model.Machine;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Envelopes (glass bulbs) counted per module instance and tube type, per type and in all,
 * with the sections used and left spare: a twin triode with one section in use counts
 * one envelope, one section used, one spare. The packing is the elaborator's.
 */
public final class TubeCount {

    /** Envelopes of one tube type, in one module ({@code module} -1 for a machine-wide total). */
    public record Row(int module, int tube, int envelopes, int sectionsUsed, int sectionsSpare) {
        public int sections() {
            return sectionsUsed + sectionsSpare;
        }
    }

    private final List<Row> byModule;
    private final List<Row> byType;
    private final int total;

    public TubeCount(Machine m) {
        Map<Long, int[]> per = new TreeMap<>();
        Map<Integer, int[]> types = new TreeMap<>();
        for (Envelope e : m.envelopes()) {
            int size = m.tubes().get(e.tube()).sections();
            add(per.computeIfAbsent((long) e.module() << 32 | e.tube(), k -> new int[3]), e, size);
            add(types.computeIfAbsent(e.tube(), k -> new int[3]), e, size);
        }
        List<Row> rows = new ArrayList<>();
        for (Map.Entry<Long, int[]> x : per.entrySet()) {
            int[] c = x.getValue();
            rows.add(new Row((int) (x.getKey() >>> 32), (int) (long) x.getKey(), c[0], c[1], c[2]));
        }
        List<Row> t = new ArrayList<>();
        for (Map.Entry<Integer, int[]> x : types.entrySet()) {
            int[] c = x.getValue();
            t.add(new Row(-1, x.getKey(), c[0], c[1], c[2]));
        }
        byModule = List.copyOf(rows);
        byType = List.copyOf(t);
        total = m.envelopes().size();
    }

    private static void add(int[] c, Envelope e, int size) {
        c[0]++;
        c[1] += e.sectionsUsed();
        c[2] += size - e.sectionsUsed();
    }

    /** One row per module and tube type present there, by module then type index. */
    public List<Row> byModule() {
        return byModule;
    }

    /** One row per tube type in use, machine-wide. */
    public List<Row> byType() {
        return byType;
    }

    /** Envelopes, sections used and spare of one module, all types together. */
    public Row module(int module) {
        int n = 0, used = 0, spare = 0;
        for (Row r : byModule) {
            if (r.module() == module) {
                n += r.envelopes();
                used += r.sectionsUsed();
                spare += r.sectionsSpare();
            }
        }
        return new Row(module, -1, n, used, spare);
    }

    /** Envelopes in the whole machine. */
    public int total() {
        return total;
    }

    /** Sections used in the whole machine. */
    public int sectionsUsed() {
        return byType.stream().mapToInt(Row::sectionsUsed).sum();
    }

    /** Sections spare in the whole machine. */
    public int sectionsSpare() {
        return byType.stream().mapToInt(Row::sectionsSpare).sum();
    }
}
