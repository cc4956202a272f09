package org.thermion.tui;

import org.thermion.model.Machine;
import org.thermion.model.ModuleInstance;
import org.thermion.power.HeaterAnalysis;
import org.thermion.power.TubeCount;

import java.util.ArrayList;
import java.util.List;

/**
 * The fixed part of a module's row in the power table: its envelopes (from the tube count)
 * and its share of the heater supply current (from the heater analysis, all heater rails).
 */
public record ModuleLoad(int module, String name, int tubes, double heaterAmps) {

    /** One row per module instance that holds at least one envelope, top first. */
    public static List<ModuleLoad> of(Machine m, TubeCount count, HeaterAnalysis heaters) {
        List<ModuleLoad> rows = new ArrayList<>();
        for (ModuleInstance mi : m.modules()) {
            int tubes = count.module(mi.id()).envelopes();
            if (tubes == 0) {
                continue;
            }
            double amps = 0;
            for (int r = 0; r < m.rails().size(); r++) {
                amps += heaters.moduleAmps(mi.id(), r);
            }
            rows.add(new ModuleLoad(mi.id(), label(mi), tubes, amps));
        }
        return List.copyOf(rows);
    }

    /** The top module has an empty path: show its type instead. */
    static String label(ModuleInstance mi) {
        return mi.path().isEmpty() ? mi.type() : mi.path();
    }
}
