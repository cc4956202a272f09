package org.thermion.power.startup;

import org.thermion.model.HeaterString;
import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.model.RailDraw;
import org.thermion.model.SoftStart;
import org.thermion.model.StageType;

import java.util.ArrayList;
import java.util.List;

/** The figures of a machine the power-up transient reads, checked before a run: all must be finite. */
final class FiniteInputs {
    private FiniteInputs() {
    }

    /** Every value the transient uses must be a finite number: an infinity leaves no solution. */
    static void check(Machine m) {
        List<String> bad = new ArrayList<>();
        for (Rail r : m.rails()) {
            if (!Double.isFinite(r.volts()) || !Double.isFinite(r.sourceOhms()) || Double.isNaN(r.limitAmps())) {
                bad.add("rail " + r.name() + " (voltage " + r.volts() + " V, source " + r.sourceOhms() + " ohm, limit "
                        + r.limitAmps() + " A)");
            }
        }
        for (SoftStart s : m.softStarts()) {
            if (!Double.isFinite(s.resistorOhms())) {
                bad.add("soft start " + s.name() + " (resistor " + s.resistorOhms() + " ohm)");
            }
        }
        for (StageType st : m.stages()) {
            for (List<RailDraw> ds : List.of(st.drawLow(), st.drawHigh(), st.drawAlways())) {
                for (RailDraw d : ds) {
                    if (!Double.isFinite(d.amps())) {
                        bad.add("stage " + st.name() + " (draw " + d.amps() + " A from rail "
                                + m.rails().get(d.rail()).name() + ")");
                    }
                }
            }
        }
        for (HeaterString hs : m.heaterStrings()) {
            if (!Double.isFinite(hs.dropOhms())) {
                bad.add("a heater string on rail " + m.rails().get(hs.rail()).name() + " (dropping resistor "
                        + hs.dropOhms() + " ohm)");
            }
        }
        if (!bad.isEmpty()) {
            throw new TransientFailure("the power-up model needs finite values; not finite: " + String.join("; ", bad));
        }
    }
}
