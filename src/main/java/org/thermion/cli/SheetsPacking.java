package org.thermion.cli;

import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.model.Envelope;
import org.thermion.model.Machine;
import org.thermion.model.TubeType;
import picocli.CommandLine.Command;

import java.io.PrintWriter;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.TEXT;

/** {@code sheets packing MACHINE}: every envelope, its tube, module and spare sections. */
@Command(name = "packing", mixinStandardHelpOptions = true,
        description = "Envelopes: which tube type, in which module, how many sections used and spare.")
final class SheetsPacking extends SheetsDocument {

    @Override
    Report report(Machine m, PrintWriter err) {
        Table t = new Table("envelopes", "Envelopes")
                .column("designator", "env", TEXT)
                .column("tube", "tube", TEXT)
                .column("module", "module", TEXT)
                .column("used", "used", COUNT, "sections its stages use")
                .column("spare", "spare", COUNT, "sections left free");
        int spare = 0;
        for (Envelope e : m.envelopes()) {
            TubeType tube = m.tubes().get(e.tube());
            int free = tube.sections() - e.sectionsUsed();
            spare += free;
            t.row(e.designator(), tube.name(), moduleName(m, e.module()), e.sectionsUsed(), free);
        }
        return start(m, "packing")
                .field("envelopes", m.envelopes().size())
                .field("spare_sections", spare)
                .table(t);
    }
}
