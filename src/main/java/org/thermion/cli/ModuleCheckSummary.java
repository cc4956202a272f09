package org.thermion.cli;

import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;
import org.thermion.elab.ModuleCheck;
import org.thermion.elab.ModulesAlone;
import org.thermion.text.Nouns;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.TEXT;

/**
 * {@code check} on a file of modules only (meant for {@code include}): each module on its own,
 * and first what was assumed in place of the including machine (library stages for the
 * operators the file does not map, rails it does not declare).
 */
final class ModuleCheckSummary {
    /** The schema version of this JSON ({@code org/thermion/schema/check_modules.schema.json}). */
    static final int VERSION = 2;

    private final Path file;
    private final ModulesAlone checked;

    ModuleCheckSummary(Path file, ModulesAlone checked) {
        this.file = file;
        this.checked = checked;
    }

    Report report() {
        List<ModuleCheck> modules = checked.modules();
        Report rep = new Report("check_modules", VERSION);
        rep.field("file", file.toString());
        rep.field("library_stages", checked.libraryStages());
        rep.field("assumed_rails", checked.assumedRails());
        List<String> top = new ArrayList<>();
        top.add(file + ": modules only (no machine block, so nothing to simulate); "
                + (modules.size() == 1 ? "its module was expanded and checked on its own."
                : "its " + Nouns.count(modules.size(), "module") + " were expanded and checked each on its own."));
        if (!checked.libraryStages().isEmpty()) {
            List<String> pairs = new ArrayList<>();
            for (Map.Entry<String, String> e : checked.libraryStages().entrySet()) {
                pairs.add(e.getKey() + " " + e.getValue());
            }
            top.add("Where this file has no realize line, the parts library's first stage of each function was taken,"
                    + " as if it had `realize { " + String.join("; ", pairs) + " }`.");
        }
        if (!checked.assumedRails().isEmpty()) {
            top.add("Rails taken as the including machine's (not declared here): "
                    + String.join(", ", checked.assumedRails()) + ".");
        }
        top.add("");
        rep.text(top);
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
