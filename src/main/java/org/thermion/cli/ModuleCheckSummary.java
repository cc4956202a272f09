package org.thermion.cli;

import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.elab.ModuleCheck;

import java.nio.file.Path;
import java.util.List;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.TEXT;

/** {@code check} on a file of modules only (meant for {@code include}): each module on its own. */
final class ModuleCheckSummary {
    /** The schema version of this JSON ({@code org/thermion/schema/check_modules.schema.json}). */
    static final int VERSION = 1;

    private final Path file;
    private final List<ModuleCheck> modules;

    ModuleCheckSummary(Path file, List<ModuleCheck> modules) {
        this.file = file;
        this.modules = modules;
    }

    Report report() {
        Report rep = new Report("check_modules", VERSION);
        rep.field("file", file.toString());
        rep.text(List.of(file + ": no machine block, so nothing to simulate; its "
                + (modules.size() == 1 ? "module was" : modules.size() + " modules were")
                + " expanded and checked on their own.", ""));
        Table t = new Table("modules", "modules")
                .column("module", "module", TEXT)
                .column("stages", "stages", COUNT, "gate stage instances, its submodules' included (latches apart)")
                .column("latches", "latches", COUNT, "latch and flip-flop bits")
                .column("nets", "nets", COUNT, "nets, its ports' included");
        for (ModuleCheck m : modules) {
            t.row(m.name(), m.stages(), m.latches(), m.nets());
        }
        rep.table(t);
        rep.text(List.of("check passed (modules only: include the file in a description with a machine block"
                + " to count tubes and power)"));
        return rep;
    }
}
