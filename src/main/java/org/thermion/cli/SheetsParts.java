package org.thermion.cli;

import org.thermion.build.BuildDocuments;
import org.thermion.build.PartsList;
import org.thermion.cli.report.Numbers;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.model.Machine;
import org.thermion.power.TubeCount;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.PrintWriter;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.NUMBER;
import static org.thermion.cli.report.ReportUnit.OHMS;
import static org.thermion.cli.report.ReportUnit.PERCENT;
import static org.thermion.cli.report.ReportUnit.TEXT;
import static org.thermion.cli.report.ReportUnit.WATTS;

/** {@code sheets parts MACHINE}: what to order, one row per orderable item. */
@Command(name = "parts", mixinStandardHelpOptions = true,
        description = {"Parts list: tubes with spares, sockets per base, resistors at their E24 value (IEC 60063) with "
                + "a wattage rating from their dissipation and the derating, relays, lamps, switches, connectors.",
                "Exit 1 when the tubes listed differ from the packing's envelopes or budget's tube count."})
final class SheetsParts extends SheetsDocument {
    @Option(names = "--spares", paramLabel = "PERCENT",
            description = "Spare tubes per type, percent of those used, rounded up, at least one "
                    + "(default: ${DEFAULT-VALUE}, common practice).")
    double spares = PartsList.DEFAULT_SPARE_PERCENT;

    @Option(names = "--derating", paramLabel = "FRACTION",
            description = "Fraction of its rating a resistor may dissipate in service (default: ${DEFAULT-VALUE}, common practice).")
    double derating = PartsList.DEFAULT_DERATING;

    @Option(names = "--program", paramLabel = "FILE",
            description = "The program of a machine whose ROM is a diode matrix: its diodes are ordered too (see `sheets rom`).")
    java.nio.file.Path program;

    private boolean failed;

    @Override
    Report report(Machine m, PrintWriter err) {
        if (!(spares >= 0 && spares <= 1000) || !(derating > 0 && derating <= 1)) {
            err.println("error: --spares takes 0 to 1000 (percent) and --derating a fraction above 0 up to 1");
            return null;
        }
        long diodes = 0;
        if (program != null) {
            if (m.rom() == null) {
                err.println("error: --program: machine " + m.name() + " has no ROM");
                return null;
            }
            ProgramInput in = ProgramInput.read(m, program, null, options.loader, err);
            if (in == null) {
                return null;
            }
            if (in.rom().length > m.rom().words()) {
                err.println("error: " + program + " assembles to " + in.rom().length + " words; the ROM holds " + m.rom().words());
                return null;
            }
            diodes = org.thermion.build.DiodeMatrix.of(m.rom(), in.rom()).diodes().size();
        }
        BuildDocuments docs = documents(m);
        PartsList list = PartsList.of(docs.wiring(), diodes, spares, derating);
        int budget = new TubeCount(m).total();
        failed = list.tubesUsed() != budget || list.tubesUsed() != m.envelopes().size();
        Table t = partsTable(OHMS, WATTS);
        // for people each value carries its own unit: one scale for 0.2 ohm and 2.2 Mohm would print 0.000
        Table view = partsTable(TEXT, TEXT);
        for (PartsList.Row r : list.rows()) {
            t.row(r.item(), r.type(), SheetsHeaters.num(r.ohms()), SheetsHeaters.num(r.ratedWatts()),
                    SheetsHeaters.num(r.maxWatts()), r.used(), r.spares(), r.order());
            view.row(r.item(), r.type(), ohms(r.ohms()), watts(r.ratedWatts()), watts(r.maxWatts()), r.used(), r.spares(),
                    r.order());
        }
        Report rep = start(m, "parts")
                .field("tubes", list.tubesUsed())
                .field("budget_tubes", budget)
                .field("envelopes", m.envelopes().size())
                .field("spare_percent", PERCENT, spares)
                .field("derating", NUMBER, derating)
                .view(view).data(t);
        if (failed) {
            rep.text("check: the parts list has " + list.tubesUsed() + " tubes, the packing " + m.envelopes().size()
                    + " envelopes and budget " + budget + " tubes; they must agree");
        }
        return rep;
    }

    /** The parts table with its value and wattage columns in {@code value}, {@code watts} (numbers for tools, text for people). */
    private static Table partsTable(org.thermion.cli.report.ReportUnit value, org.thermion.cli.report.ReportUnit watts) {
        return new Table("parts", "Parts to order")
                .column("item", "item", TEXT).column("type", "type", TEXT).column("value", "value", value)
                .column("rating", "rating", watts).column("dissipation", "max", watts,
                        "the most one of them dissipates (operating points; a rail-span bound where none solved)")
                .column("used", "used", COUNT).column("spares", "spare", COUNT).column("order", "order", COUNT);
    }

    /** Ohms for people: an SI prefix from 1 ohm up, three significant figures below ("0.2 ohm", "47.0 kohm"). */
    static String ohms(double v) {
        if (Double.isNaN(v)) {
            return "none";
        }
        return v >= 1 ? Numbers.si(v, OHMS) : figures(v) + " ohm";
    }

    /** Watts for people, three significant figures ("0.125 W", "200 W"). */
    static String watts(double v) {
        return Double.isNaN(v) ? "none" : figures(v) + " W";
    }

    private static String figures(double v) {
        return v == 0 ? "0" : new java.math.BigDecimal(v).round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString();
    }

    @Override
    int exitCode() {
        return failed ? ExitCodes.CHECK_FAILED : ExitCodes.OK;
    }
}
