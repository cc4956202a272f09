package org.thermion.tui;

import org.thermion.model.Envelope;
import org.thermion.model.HeaterRating;
import org.thermion.model.HeaterString;
import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;

import java.util.ArrayList;
import java.util.List;

/**
 * The fixed part of a module's row in the power table: how many envelopes it holds and
 * the heater current they take at their wired ratings (a series string passes one current
 * through every heater, so each heater counts its own rated current).
 */
public record ModuleLoad(int module, String name, int tubes, double heaterAmps) {

    /** One row per module instance that holds at least one envelope, top first. */
    public static List<ModuleLoad> of(Machine m) {
        int count = m.modules().size();
        int[] tubes = new int[count];
        double[] amps = new double[count];
        double[] envelopeAmps = new double[m.envelopes().size()];
        for (Envelope e : m.envelopes()) {
            envelopeAmps[e.id()] = m.tubes().get(e.tube()).defaultHeater().amps();
        }
        for (HeaterString s : m.heaterStrings()) {
            for (int i = 0; i < s.envelopes().size(); i++) {
                HeaterRating r = s.ratings().get(i);
                envelopeAmps[s.envelopes().get(i)] = r.amps();
            }
        }
        for (Envelope e : m.envelopes()) {
            tubes[e.module()]++;
            amps[e.module()] += envelopeAmps[e.id()];
        }
        List<ModuleLoad> rows = new ArrayList<>();
        for (ModuleInstance mi : m.modules()) {
            if (tubes[mi.id()] > 0) {
                rows.add(new ModuleLoad(mi.id(), label(mi), tubes[mi.id()], amps[mi.id()]));
            }
        }
        return List.copyOf(rows);
    }

    /** The top module has an empty path: show its type instead. */
    static String label(ModuleInstance mi) {
        return mi.path().isEmpty() ? mi.type() : mi.path();
    }
}
