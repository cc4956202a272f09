package org.thermion.cli;

import org.thermion.build.BuildDocuments;
import org.thermion.build.Lead;
import org.thermion.build.Node;
import org.thermion.build.Part;
import org.thermion.build.WireChecks;
import org.thermion.build.Wiring;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.model.Machine;
import picocli.CommandLine.Command;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.thermion.cli.report.ReportUnit.FLAG;
import static org.thermion.cli.report.ReportUnit.TEXT;

/** {@code sheets wires MACHINE}: every net with every pin and lead it joins; the wire checks. */
@Command(name = "wires", mixinStandardHelpOptions = true,
        description = {"Pin-level wire list: for every net (logic nets, rails, nodes inside a stage, heater links) "
                + "every socket pin and part lead it joins, from the stage circuits and the packing.",
                "A pin marked ! depends on a basing whose sources disagree. Exit 1 when a wire check fails "
                        + "(a pin in two nets, an ic or nc pin wired, an electrode of a used section left open)."})
final class SheetsWires extends SheetsDocument {
    private boolean failed;

    @Override
    Report report(Machine m, PrintWriter err) {
        BuildDocuments docs = documents(m);
        Wiring w = docs.wiring();
        List<String> checks = WireChecks.run(m, w);
        failed = !checks.isEmpty();
        Table data = new Table("leads", "Leads")
                .column("node", "node", TEXT).column("kind", "kind", TEXT)
                .column("board", "board", TEXT, "the board the part sits on (its designator's A prefix)")
                .column("part", "part", TEXT)
                .column("pin", "pin", TEXT).column("what", "what", TEXT)
                .column("doubtful", "doubt", FLAG, "the pin depends on a basing whose sources disagree");
        Table view = new Table("nets", "Nets")
                .column("node", "net", TEXT).column("kind", "kind", TEXT)
                .column("leads", "pins and leads", TEXT, "part-pin, board by board; ! = depends on a basing doubt");
        Map<String, Integer> boardOf = new HashMap<>();
        for (Part p : w.parts()) {
            boardOf.put(p.ref(), p.board());
        }
        int doubtful = 0;
        for (Node n : w.nodes()) {
            List<String> labels = new ArrayList<>();
            // a net's leads board by board, so each board's wiring of it reads together
            List<Lead> leads = new ArrayList<>(n.leads());
            leads.sort(Comparator.comparingInt(l -> boardOf.getOrDefault(l.ref(), 0)));
            for (Lead l : leads) {
                data.row(n.name(), kind(n), w.boards().get(boardOf.getOrDefault(l.ref(), 0)), l.ref(), l.pin(), l.what(),
                        l.doubtful());
                labels.add(l.label() + (l.doubtful() ? "!" : ""));
                doubtful += l.doubtful() ? 1 : 0;
            }
            view.row(n.name(), kind(n), String.join(" ", labels));
        }
        Report r = start(m, "wires")
                .field("nets", w.nodes().size())
                .field("parts", w.parts().size())
                .field("doubtful_pins", doubtful)
                .field("check_failures", checks.size())
                .view(view).data(data);
        List<String> notes = new ArrayList<>(w.problems());
        for (String c : checks) {
            notes.add("check: " + c);
        }
        if (!notes.isEmpty()) {
            r.text(notes);
        }
        return r;
    }

    static String kind(Node n) {
        return n.kind().name().toLowerCase(java.util.Locale.ROOT);
    }

    @Override
    int exitCode() {
        return failed ? ExitCodes.CHECK_FAILED : ExitCodes.OK;
    }
}
