package org.thermion.build;

import org.junit.jupiter.api.Test;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Designators kept by the designators file, and the changes between two revisions of a machine. */
class RewiringTest {
    static final Path DIR = Path.of("src/test/resources/org/thermion/build/revisions");
    private final Machine a = BuildMachines.file(DIR.resolve("rev-a.machine"));
    private final Machine b = BuildMachines.file(DIR.resolve("rev-b.machine"));

    private static Designations read(Path file) throws IOException {
        Diagnostics d = new Diagnostics();
        Designations out = Designations.read(file, Files.readString(file, StandardCharsets.UTF_8), new SourceSet(), d);
        assertThat(d.all()).isEmpty();
        return out;
    }

    @Test
    void aMachineAgainstItselfNeedsNoChange() {
        Wiring w = BuildDocuments.of(a).wiring();
        assertThat(Rewiring.between(w, BuildDocuments.of(a).wiring()).changes()).isEmpty();
    }

    @Test
    void partsThatDidNotChangeKeepTheirDesignatorsAndNewOnesTakeFreshNumbers() throws IOException {
        Designations saved = read(DIR.resolve("rev-a.designators"));
        Wiring before = BuildDocuments.of(a, saved).wiring();
        Wiring after = BuildDocuments.of(b, saved).wiring();
        for (Part p : after.parts()) {
            before.parts().stream().filter(q -> q.role().equals(p.role()) && q.cls() != PartClass.SOCKET).findFirst()
                    .ifPresent(q -> assertThat(p.ref()).as(p.role()).isEqualTo(q.ref()));
        }
        // x's three resistors were R1..R3 and stay retired; z's take R8..R10, past every number the file gives out
        assertThat(after.parts()).noneMatch(p -> List.of("R1", "R2", "R3").contains(p.ref()));
        assertThat(after.parts()).filteredOn(p -> p.role().endsWith(" of z")).extracting(Part::ref)
                .containsExactlyInAnyOrder("R8", "R9", "R10");
        // the twin triode lost x and gained z: it keeps V1, as the tube in the same socket
        assertThat(after.parts()).anyMatch(p -> p.ref().equals("V1") && p.role().equals("tube 12AU7 for y, z"));
    }

    @Test
    void theRevisionRemovesXChangesTheLoadsAndMovesYsInput() throws IOException {
        Designations saved = read(DIR.resolve("rev-a.designators"));
        Rewiring r = Rewiring.between(BuildDocuments.of(a, saved).wiring(), BuildDocuments.of(b, saved).wiring());
        assertThat(r.changes()).filteredOn(c -> c.action() == Rewiring.Action.REMOVE_PART).extracting(Rewiring.Change::ref)
                .containsExactly("R1", "R2", "R3");
        assertThat(r.changes()).contains(new Rewiring.Change(Rewiring.Action.CHANGE_PART, "R4", "", "plate load of y",
                "resistor 47 kohm", "resistor 56 kohm"));
        assertThat(r.changes()).contains(new Rewiring.Change(Rewiring.Action.MOVE_WIRE, "R5", "1", "end 1", "b", "c"));
        // every lead of a new part is a wire to add; removals come before additions
        assertThat(r.changes()).filteredOn(c -> c.ref().equals("R8") && c.action() == Rewiring.Action.ADD_WIRE).hasSize(2);
        assertThat(r.changes().indexOf(r.changes().stream().filter(c -> c.action() == Rewiring.Action.REMOVE_PART)
                .findFirst().orElseThrow())).isLessThan(r.changes().indexOf(r.changes().stream()
                .filter(c -> c.action() == Rewiring.Action.ADD_PART).findFirst().orElseThrow()));
    }

    @Test
    void stagesThePackingMovedAreListedAsMovesBeforeTheirWires() throws IOException {
        Designations saved = read(DIR.resolve("rev-a.designators"));
        Rewiring r = Rewiring.between(BuildDocuments.of(a, saved).wiring(), BuildDocuments.of(b, saved).wiring());
        // x is gone, so y moves from the twin triode's second section to its first; w's OR grows a third diode
        assertThat(r.changes()).filteredOn(c -> c.action() == Rewiring.Action.MOVE_STAGE).containsExactly(
                new Rewiring.Change(Rewiring.Action.MOVE_STAGE, "V1", "", "stage y", "V1.2", "V1.1"),
                new Rewiring.Change(Rewiring.Action.MOVE_STAGE, "V2", "", "stage w", "V2.1 V2.2", "V2.1 V2.2 V3.1"));
        int firstStage = r.changes().indexOf(r.changes().stream()
                .filter(c -> c.action() == Rewiring.Action.MOVE_STAGE).findFirst().orElseThrow());
        int firstWire = r.changes().indexOf(r.changes().stream()
                .filter(c -> c.action() == Rewiring.Action.MOVE_WIRE).findFirst().orElseThrow());
        assertThat(firstStage).isLessThan(firstWire);
        assertThat(r.count(Rewiring.Action.MOVE_STAGE)).isEqualTo(2);
    }

    @Test
    void savingKeepsEveryRecordedNumberAndRetiresTheGoneParts() throws IOException {
        Designations saved = read(DIR.resolve("rev-a.designators"));
        String text = saved.write("panel", BuildDocuments.of(b, saved).wiring());
        assertThat(text).startsWith(Designations.HEADER).contains("\nretired R1      plate load of x\n")
                .contains("\nR8      plate load of z\n").doesNotContain("XV1");
        Diagnostics d = new Diagnostics();
        Designations again = Designations.read(Path.of("x.designators"), text, new SourceSet(), d);
        assertThat(d.all()).isEmpty();
        assertThat(again.retired()).containsKeys("R1", "R2", "R3");
    }

    @Test
    void aBadLineIsReportedWhereItIsAndTheOthersAreStillRead() {
        Diagnostics d = new Diagnostics();
        String text = "R1  plate load of x\n  r2x grid series 0 of x\nR1  grid to bias 0 of x\nV4\nS1 input a\n";
        Designations got = Designations.read(Path.of("p.designators"), text, new SourceSet(), d);
        assertThat(d.all()).hasSize(3);
        assertThat(d.all().get(0).span().line()).isEqualTo(2);
        assertThat(d.all().get(0).span().col()).isEqualTo(3);
        assertThat(d.all().get(0).message()).contains("'r2x' is not a designator");
        assertThat(d.all().get(1).message()).contains("R1 is given twice");
        assertThat(d.all().get(2).message()).contains("V4 names no part");
        assertThat(got.byRole()).containsEntry("input a", "S1").containsEntry("plate load of x", "R1");
    }
}
