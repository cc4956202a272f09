package org.thermion.cli;

import org.thermion.build.Wiring;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.model.Machine;
import picocli.CommandLine.Command;

import java.io.PrintWriter;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.FLAG;
import static org.thermion.cli.report.ReportUnit.TEXT;

/** {@code sheets sockets MACHINE}: every socket pin by pin, and the net it goes to. */
@Command(name = "sockets", mixinStandardHelpOptions = true,
        description = "Socket by socket, pin by pin: what the tube's basing puts on the pin and the net it is wired to.")
final class SheetsSockets extends SheetsDocument {

    @Override
    Report report(Machine m, PrintWriter err) {
        Wiring w = documents(m).wiring();
        Table t = new Table("pins", "Socket pins")
                .column("socket", "socket", TEXT).column("tube", "tube", TEXT).column("type", "type", TEXT)
                .column("base", "base", TEXT).column("pin", "pin", COUNT).column("electrode", "carries", TEXT)
                .column("net", "wired to", TEXT)
                .column("doubtful", "doubt", FLAG, "the pin depends on a basing whose sources disagree");
        for (Wiring.Socket s : w.sockets()) {
            for (int p = 1; p <= s.pins(); p++) {
                int node = s.node(p);
                t.row(s.ref(), s.tubeRef(), s.tube(), s.base(), p, s.electrodes().get(p - 1),
                        node < 0 ? new Absent("open") : w.nodes().get(node).name(), s.doubtful(p));
            }
        }
        Report r = start(m, "sockets").field("sockets", w.sockets().size()).table(t);
        if (!w.problems().isEmpty()) {
            r.text(w.problems());
        }
        return r;
    }
}
