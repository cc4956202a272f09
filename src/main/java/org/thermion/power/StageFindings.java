package org.thermion.power;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What the budget says about its stage figures: a declared draw more than 25 % from what the
 * stage's circuit gives at the machine's rails (one warning per stage, every such figure named),
 * a circuit with no DC solution there (the declared figures, or nothing, stand in), and a stage
 * with neither a circuit nor draw lines (it would pass every supply check drawing nothing).
 */
final class StageFindings {
    private StageFindings() {
    }

    /** Findings about the stages named in {@code used} (the machine's stages with instances). */
    static List<Finding> of(StageDraw draw, java.util.Set<String> used) {
        List<Finding> out = new ArrayList<>();
        Map<String, List<StageDraw.Mismatch>> byStage = new LinkedHashMap<>();
        for (StageDraw.Mismatch mm : draw.mismatches()) {
            if (!used.contains(mm.stage())) {
                continue;
            }
            byStage.computeIfAbsent(mm.stage(), k -> new ArrayList<>()).add(mm);
        }
        for (Map.Entry<String, List<StageDraw.Mismatch>> e : byStage.entrySet()) {
            StringBuilder what = new StringBuilder("declared draws differ from its circuit's at the machine's rails by more than ")
                    .append(Math.round(StageDraw.MISMATCH_FRACTION * 100)).append(" %: ");
            boolean first = true;
            for (StageDraw.Mismatch mm : e.getValue()) {
                what.append(first ? "" : "; ").append(mm.rail()).append(", output ").append(mm.outputHigh() ? "high" : "low")
                        .append(": ").append(HeaterAnalysis.amps(mm.declaredAmps())).append(" declared, ")
                        .append(HeaterAnalysis.amps(mm.computedAmps())).append(" computed");
                first = false;
            }
            out.add(new Finding(Finding.Severity.WARNING, "stage " + e.getKey(), what.toString(),
                    "the declared figures are used; remove the stage's `draw` lines to use the computed ones, "
                            + "or correct them"));
        }
        for (StageDraw.Unsolved u : draw.unsolved()) {
            if (!used.contains(u.stage())) {
                continue;
            }
            out.add(new Finding(Finding.Severity.WARNING, "stage " + u.stage(),
                    "its circuit has no DC solution at the machine's rails (" + u.reason() + ")",
                    u.usedInstead() == StageDraw.Origin.DECLARED ? "its declared draws are used"
                            : "it is counted as drawing nothing: declare its draws or fix its circuit"));
        }
        for (org.thermion.model.StageType st : draw.machine().stages()) {
            if (used.contains(st.name()) && draw.drawsNothing(st)) {
                out.add(new Finding(Finding.Severity.WARNING, "stage " + st.name(),
                        "has neither a circuit nor draw lines: it is counted as drawing nothing from any rail",
                        "describe its circuit (tube, load, grid network) or give its currents with `draw` lines"));
            }
        }
        return out;
    }
}
