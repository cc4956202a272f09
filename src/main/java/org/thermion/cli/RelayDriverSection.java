package org.thermion.cli;

import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.Table;
import org.thermion.power.startup.RelayDriverCheck;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static org.thermion.cli.report.ReportUnit.AMPS;
import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.FLAG;
import static org.thermion.cli.report.ReportUnit.OHMS;
import static org.thermion.cli.report.ReportUnit.SECONDS;
import static org.thermion.cli.report.ReportUnit.TEXT;
import static org.thermion.cli.report.ReportUnit.VOLTS;

/** The power-up report's relay-driver section: one table row and one block of text per thyratron-driven relay. */
final class RelayDriverSection {
    private final List<RelayDriverCheck> checks;

    RelayDriverSection(List<RelayDriverCheck> checks) {
        this.checks = checks;
    }

    Table table() {
        Table t = new Table("relay_drivers", "relay drivers")
                .column("tube", "tube", TEXT)
                .column("rail", "rail", TEXT)
                .column("rail", "rail", VOLTS)
                .column("arc_drop", "arc drop", VOLTS)
                .column("plate", "plate", OHMS)
                .column("coil", "coil", OHMS)
                .column("coil", "coil", VOLTS)
                .column("coil", "coil", AMPS)
                .column("picks_up", "picks up", FLAG)
                .column("coil_not_overdriven", "not overdriven", FLAG)
                .column("average_ok", "average ok", FLAG)
                .column("peak_ok", "peak ok", FLAG)
                .column("fire", "fired", SECONDS)
                .column("heated_long_enough", "heated", FLAG)
                .column("coil_at_fire", "coil at fire", VOLTS, "the coil's voltage when the tube fired")
                .column("coil_max", "coil max", VOLTS, "the most the coil saw during the run")
                .column("openings", "openings", COUNT, "times the relay opened again below its drop-out (chatter)")
                .column("closed", "closed", FLAG)
                .column("ok", "ok", FLAG);
        for (RelayDriverCheck c : checks) {
            t.row(c.tube(), c.railName(), c.railVolts(), c.arcDropVolts(), c.plateOhms(), c.relay().coilOhms(), c.coilVolts(),
                    c.coilAmps(), c.picksUp(), c.coilNotOverdriven(), c.averageOk(), c.peakOk(),
                    Double.isNaN(c.fireTime()) ? new Absent("did not fire") : c.fireTime(), c.heatedLongEnough(),
                    c.coil() == null || Double.isNaN(c.coil().atFireVolts()) ? new Absent("did not fire") : c.coil().atFireVolts(),
                    c.coil() == null ? new Absent("not followed") : c.coil().maxVolts(),
                    c.coil() == null ? new Absent("not followed") : (Object) (long) c.coil().openings(),
                    c.coil() == null ? new Absent("not followed") : c.coil().closed(), c.ok());
        }
        return t;
    }

    List<String> lines() {
        List<String> out = new ArrayList<>();
        for (RelayDriverCheck c : checks) {
            out.add("relay driver: " + c.tube() + " from " + c.railName() + " " + Numbers.si(c.railVolts(), VOLTS) + " through "
                    + Numbers.si(c.plateOhms(), OHMS) + ", coil " + Numbers.si(c.relay().coilOhms(), OHMS) + ", arc drop "
                    + Numbers.si(c.arcDropVolts(), VOLTS));
            double pick = c.relay().pickupVolts();
            out.add("  coil      " + Numbers.si(c.coilVolts(), VOLTS) + String.format(Locale.ROOT, " (%.0f %% of rated %s), pick-up %s: ",
                    100 * c.ratedRatio(), Numbers.si(c.relay().ratedVolts(), VOLTS), Numbers.si(pick, VOLTS))
                    + (!c.picksUp() ? "DOES NOT PICK UP" : !c.coilNotOverdriven() ? "OVERDRIVEN (over +10 %)" : "ok"));
            if (c.coil() != null && !Double.isNaN(c.coil().atFireVolts())) {
                out.add("  in run    coil " + Numbers.si(c.coil().atFireVolts(), VOLTS) + " at firing, at most "
                        + Numbers.si(c.coil().maxVolts(), VOLTS) + " at " + Numbers.si(c.coil().maxTime(), SECONDS)
                        + (c.chatters() ? "; CHATTER: opened " + c.coil().openings() + " times below drop-out, first at "
                        + Numbers.si(c.coil().firstOpening(), SECONDS) : ""));
            }
            if (c.coil() != null && !c.coil().closed()) {
                out.add("  why open  " + c.coil().whyOpen());
            }
            out.add("  tube      " + Numbers.si(c.coilAmps(), AMPS) + " continuous against " + Numbers.si(c.avgRatingAmps(), AMPS)
                    + " average and " + Numbers.si(c.peakRatingAmps(), AMPS) + " peak: " + (c.averageOk() && c.peakOk() ? "ok" : "OVER RATING"));
            out.add("  heating   " + (Double.isNaN(c.fireTime()) ? "did not fire" : "fired " + Numbers.si(c.fireTime(), SECONDS) + " after switch-on")
                    + (Double.isNaN(c.heatingSeconds()) ? "" : "; asks " + Numbers.si(c.heatingSeconds(), SECONDS) + " of cathode heating: "
                    + (c.heatedLongEnough() ? "ok" : "TOO EARLY")));
            out.add("  note      once fired it conducts until its anode supply is broken, so the relay holds in; the relay "
                    + "contacts carry the whole rail current: rate them for the bypass peak");
            out.add("");
        }
        return out;
    }
}
