package org.thermion.build;

import org.junit.jupiter.api.Test;
import org.thermion.model.Basing;
import org.thermion.model.Electrode;
import org.thermion.model.Machine;
import org.thermion.model.TubeType;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The library's basing lines against published pinouts, two independent sources per tube where we have them. */
class BasingTest {
    private static final Machine DEMO = BuildMachines.file(BuildMachines.PUMPSTATION);

    private static TubeType tube(Machine m, String name) {
        return m.tubes().stream().filter(t -> t.name().equals(name)).findFirst().orElseThrow();
    }

    /** Checks the noval twin-triode pinout shared by the 12AU7 family. */
    private static void assertTwinTriode(Basing b) {
        assertThat(b.base()).isEqualTo("noval");
        // Source 1: boxed-roc.com/misc/12ax7/12ax7.htm: pin 1 plate, 2 grid, 3 cathode; the other triode
        // 6 plate, 7 grid, 8 cathode; heater 9-4 and 9-5, 4 and 5 tied for 6.3 V.
        // Source 2: tubeofile.com/tubes/12BH7 (same pinout; REFERENCES.md): 1 plate (2), 2 grid (2),
        // 3 cathode (2), 4 and 5 heater, 9 centre tap.
        assertThat(b.pinsFor(Electrode.PLATE, 2)).containsExactly(1);
        assertThat(b.pinsFor(Electrode.GRID, 2)).containsExactly(2);
        assertThat(b.pinsFor(Electrode.CATHODE, 2)).containsExactly(3);
        assertThat(b.pinsFor(Electrode.HEATER, 0)).containsExactly(4, 5);
        assertThat(b.pinsFor(Electrode.TAP, 0)).containsExactly(9);
        // Source 1 gives these, and source 3 for the ECC82 (the 12AU7's European equivalent):
        // radio-electronics.com/info/data/thermionic-valves/pin_connections/tube_connections.php, row
        // ECC82: a'' g'' k'' h h a' g' k' hct (pins 1 to 9; ' the first triode, '' the second).
        assertThat(b.pinsFor(Electrode.PLATE, 1)).containsExactly(6);
        assertThat(b.pinsFor(Electrode.GRID, 1)).containsExactly(7);
        assertThat(b.pinsFor(Electrode.CATHODE, 1)).containsExactly(8);
    }

    @Test
    void twelveAU7MatchesTwoSources() {
        assertTwinTriode(tube(DEMO, "12AU7").basing());
    }

    @Test
    void twelveAX7MatchesTwoSources() {
        Machine m = BuildMachines.text(WireListTestData.usesTube("12AX7"));
        assertTwinTriode(tube(m, "12AX7").basing());
    }

    @Test
    void twoD21KeepsBothDisagreeingSourcesAndFlagsEveryPinTheyDifferOn() {
        Machine m = BuildMachines.text(WireListTestData.usesTube("2D21"));
        TubeType t = tube(m, "2D21");
        assertThat(t.basings()).hasSize(2);
        // r-type.org EN91 page: 1 grid 1, 2 cathode, 3 heater, 4 heater, 5 grid 2, 6 anode, 7 grid 2.
        Basing first = t.basings().get(0);
        assertThat(first.pinsFor(Electrode.GRID, 1)).containsExactly(1);
        assertThat(first.pinsFor(Electrode.CATHODE, 1)).containsExactly(2);
        assertThat(first.pinsFor(Electrode.PLATE, 1)).containsExactly(6);
        assertThat(first.pinsFor(Electrode.SCREEN, 1)).containsExactly(5, 7);
        // vacuumtubes.io 2D21W page: 1 nc, 2 grid 1, 3 cathode, 4 heater, 5 heater, 6 grid 2.
        Basing second = t.basings().get(1);
        assertThat(second.pinsFor(Electrode.GRID, 1)).containsExactly(2);
        assertThat(second.pinsFor(Electrode.HEATER, 0)).containsExactly(4, 5);
        // They agree on pin 4 only (a heater in both).
        assertThat(t.doubtfulPins()).containsExactly(1, 2, 3, 5, 6, 7);
    }

    @Test
    void sixAL5MatchesThePublishedTableOfItsEuropeanEquivalent() {
        Basing b = tube(DEMO, "6AL5").basing();
        // radio-electronics.com tube_connections table, row EB91: k' a'' h h k'' s a' (pins 1 to 7).
        assertThat(b.base()).isEqualTo("miniature7");
        assertThat(b.pinsFor(Electrode.CATHODE, 1)).containsExactly(1);
        assertThat(b.pinsFor(Electrode.PLATE, 2)).containsExactly(2);
        assertThat(b.pinsFor(Electrode.HEATER, 0)).containsExactly(3, 4);
        assertThat(b.pinsFor(Electrode.CATHODE, 2)).containsExactly(5);
        assertThat(b.pinsFor(Electrode.SHIELD, 0)).containsExactly(6);
        assertThat(b.pinsFor(Electrode.PLATE, 1)).containsExactly(7);
    }

    @Test
    void everyLibraryTubeUsedByTheExamplesHasABasing() {
        for (TubeType t : DEMO.tubes()) {
            assertThat(t.basing()).as(t.name()).isNotNull();
            assertThat(t.basing().source()).as(t.name()).isNotBlank();
        }
        assertThat(List.of(tube(DEMO, "6AL5").basing().pinCount())).containsExactly(7);
    }

    @Test
    void sixSN7MatchesItsDataSheetsElectrodeTable() {
        Machine m = BuildMachines.text(WireListTestData.usesTube("6SN7"));
        Basing b = tube(m, "6SN7").basing();
        // 6SN7EH data sheet (Electro-Harmonix TUBEEH-72382), electrode-to-lead table: 1 second triode grid,
        // 2 second triode plate, 3 second triode cathode, 4 first triode grid, 5 first triode plate,
        // 6 first triode cathode, 7 and 8 heater. From memory the same (the 8BD basing).
        assertThat(b.base()).isEqualTo("octal");
        assertThat(b.pinsFor(Electrode.GRID, 2)).containsExactly(1);
        assertThat(b.pinsFor(Electrode.PLATE, 2)).containsExactly(2);
        assertThat(b.pinsFor(Electrode.CATHODE, 2)).containsExactly(3);
        assertThat(b.pinsFor(Electrode.GRID, 1)).containsExactly(4);
        assertThat(b.pinsFor(Electrode.PLATE, 1)).containsExactly(5);
        assertThat(b.pinsFor(Electrode.CATHODE, 1)).containsExactly(6);
        assertThat(b.pinsFor(Electrode.HEATER, 0)).containsExactly(7, 8);
    }

    @Test
    void the5670HasOneSourceWhoseLabelsTheTwinTriodeSocketBesideItFixesInPinOrder() {
        Machine m = BuildMachines.text(WireListTestData.usesTube("5670"));
        TubeType t = tube(m, "5670");
        // github.com/oomlout/oomlout_kicad_board_src, ai03_2725_5670_6922_adapter: its 5670 socket's
        // labels read, in the pin order its 6922 socket (the noval twin-triode pinout, REFERENCES.md)
        // fixes: 1 heater, 2 cathode 2, 3 grid 2, 4 plate 2, 5 shield, 6 plate 1, 7 grid 1, 8 cathode 1,
        // 9 heater. No second source was found (searched: data-sheet pages, tube tables, the Soviet
        // equivalent's tables); the basing line says "one source", and nothing disagrees, so no pin is flagged.
        Basing b = t.basing();
        assertThat(t.basings()).hasSize(1);
        assertThat(b.source()).contains("one source");
        assertThat(b.pinsFor(Electrode.HEATER, 0)).containsExactly(1, 9);
        assertThat(b.pinsFor(Electrode.CATHODE, 2)).containsExactly(2);
        assertThat(b.pinsFor(Electrode.GRID, 2)).containsExactly(3);
        assertThat(b.pinsFor(Electrode.PLATE, 2)).containsExactly(4);
        assertThat(b.pinsFor(Electrode.SHIELD, 0)).containsExactly(5);
        assertThat(b.pinsFor(Electrode.PLATE, 1)).containsExactly(6);
        assertThat(b.pinsFor(Electrode.GRID, 1)).containsExactly(7);
        assertThat(b.pinsFor(Electrode.CATHODE, 1)).containsExactly(8);
        assertThat(t.doubtfulPins()).isEmpty();
    }

    @Test
    void everyTubeOfTheLibraryHasABasingWithItsSourceButTheOneWhoseCommonCathodeNoLineCanSay() throws Exception {
        String library;
        try (java.io.InputStream in = BasingTest.class.getResourceAsStream("/org/thermion/parts/library.machine")) {
            library = new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        }
        java.util.regex.Matcher tubes = java.util.regex.Pattern.compile("(?m)^tube (\\S+) \\{").matcher(library);
        List<String> names = new java.util.ArrayList<>();
        while (tubes.find()) {
            names.add(tubes.group(1));
        }
        assertThat(names).hasSizeGreaterThanOrEqualTo(10);
        for (String name : names) {
            TubeType t = tube(BuildMachines.text(WireListTestData.usesTube(name)), name);
            if (name.equals("6J6")) {
                // its two sections share cathode pin 7 (from memory): no basing line; a stage on it is warned
                assertThat(t.basings()).isEmpty();
                continue;
            }
            assertThat(t.basings()).as(name).isNotEmpty();
            for (Basing b : t.basings()) {
                assertThat(b.source()).as(name).isNotBlank();
            }
            // where the sources disagree the pins they differ on are flagged (the 2D21 above)
            assertThat(t.doubtfulPins().isEmpty()).as(name).isEqualTo(t.basings().size() < 2);
        }
    }
}
