package org.thermion.cli;

import org.thermion.build.BuildDocuments;
import org.thermion.build.HeaterWiring;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.model.Machine;
import picocli.CommandLine.Command;

import java.io.PrintWriter;

import static org.thermion.cli.report.ReportUnit.AMPS;
import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.FLAG;
import static org.thermion.cli.report.ReportUnit.OHMS;
import static org.thermion.cli.report.ReportUnit.TEXT;
import static org.thermion.cli.report.ReportUnit.VOLTS;
import static org.thermion.cli.report.ReportUnit.WATTS;

/** {@code sheets heaters MACHINE}: every heater string in order, pins, centre taps, droppers and shunts. */
@Command(name = "heaters", mixinStandardHelpOptions = true,
        description = {"Heater wiring: every string in order from its rail to the return, the socket pins at each "
                + "heater's ends (a centre-tapped tube at its lower rating: both heater pins joined, the tap the other "
                + "end), dropping resistors and shunts with value and wattage, and a dropper where a string is short.",
                "Heater supplies can injure: confirm every figure by measurement before the tubes go in."})
final class SheetsHeaters extends SheetsDocument {

    @Override
    Report report(Machine m, PrintWriter err) {
        BuildDocuments docs = documents(m);
        Table strings = new Table("strings", "Heater strings")
                .column("string", "string", COUNT).column("rail", "rail", TEXT).column("rail_volts", "rail", VOLTS)
                .column("current", "current", AMPS).column("heaters", "heaters", COUNT)
                .column("dropper", "dropper", TEXT).column("drop", "drop", OHMS).column("drop_power", "drop", WATTS)
                .column("suggested", "suggest", OHMS, "a dropper that would bring a short string to its rating")
                .column("suggested_power", "suggest", WATTS);
        Table steps = new Table("heaters", "Heaters in order")
                .column("string", "str", COUNT).column("position", "pos", COUNT).column("tube", "tube", TEXT)
                .column("socket", "socket", TEXT).column("type", "type", TEXT)
                .column("start_pins", "in", TEXT, "pins at the end nearer the rail (4+5: both heater pins joined)")
                .column("end_pins", "out", TEXT).column("from", "from", TEXT).column("to", "to", TEXT)
                .column("volts", "gets", VOLTS).column("shunt", "shunt", TEXT).column("shunt_resistance", "shunt", OHMS)
                .column("shunt_power", "shunt", WATTS)
                .column("doubtful", "doubt", FLAG, "a heater pin depends on a basing whose sources disagree");
        for (HeaterWiring.HeaterRun r : docs.heaters()) {
            strings.row(r.index() + 1, r.rail(), r.railVolts(), r.amps(), r.steps().size(), word(r.dropper()),
                    num(r.dropOhms() > 0 ? r.dropOhms() : Double.NaN), num(r.dropOhms() > 0 ? r.dropWatts() : Double.NaN),
                    num(r.suggestOhms()), num(r.suggestWatts()));
            for (HeaterWiring.HeaterStep s : r.steps()) {
                steps.row(r.index() + 1, s.position(), s.tubeRef(), s.socketRef(), s.tube(), s.startPins(), s.endPins(),
                        s.from(), s.to(), s.volts(), word(s.shunt()), num(s.shuntOhms()), num(s.shuntWatts()), s.doubtful());
            }
        }
        return start(m, "heaters").field("strings", docs.heaters().size()).table(strings).table(steps)
                .text("Heater and B+ supplies can injure or kill; these figures are estimates for planning, to be "
                        + "confirmed by measurement on the bench.");
    }

    static Object word(String s) {
        return s == null ? new Absent("none") : s;
    }

    static Object num(double v) {
        return Double.isNaN(v) ? new Absent("none") : v;
    }
}
