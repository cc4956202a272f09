package org.thermion.cli;

import org.junit.jupiter.api.Test;
import org.thermion.spice.SpiceCard;
import org.thermion.spice.SpiceDeck;
import org.thermion.spice.SpiceReader;

import static org.assertj.core.api.Assertions.assertThat;

/** {@code sheets spice}: decks the reader accepts, for a stage, a module and the machine; bad selections exit 2. */
class SheetsSpiceTest {
    private static final String DEMO = "examples/pumpstation/pumpstation.machine";

    @Test
    void oneStageWithItsInputsAndLoads() {
        TimingCommandTest.Run r = TimingCommandTest.run("sheets", "spice", DEMO, "--stage", "triode_nor2", "--inputs",
                "01", "--loads", "2");
        assertThat(r.code()).isEqualTo(ExitCodes.OK);
        SpiceDeck d = SpiceReader.read(r.out());
        // Input 1 is held at the machine's highest rail (48 V), input 0 at 0 V.
        assertThat(d.card("Vin1")).isEqualTo(new SpiceCard.VoltageSource("Vin1", "in1", "0", 48));
        assertThat(d.card("Vin0")).isEqualTo(new SpiceCard.VoltageSource("Vin0", "in0", "0", 0));
        // The library's 100 k plate load and two receivers' grid dividers.
        assertThat(d.card("Rload")).isEqualTo(new SpiceCard.Resistor("Rload", "bplus", "plate", 100000));
        assertThat(d.cards()).filteredOn(c -> c.name().startsWith("Rreceiver_grid_series")).hasSize(2);
        assertThat(r.out().lines()).allSatisfy(l -> assertThat(l.length()).isLessThanOrEqualTo(SpiceDeck.WIDTH));
    }

    @Test
    void aModuleAndTheMachineReadBack() {
        TimingCommandTest.Run mod = TimingCommandTest.run("sheets", "spice", DEMO, "--module", "lu");
        TimingCommandTest.Run all = TimingCommandTest.run("sheets", "spice", DEMO);
        assertThat(mod.code()).isEqualTo(ExitCodes.OK);
        assertThat(all.code()).isEqualTo(ExitCodes.OK);
        assertThat(SpiceReader.read(mod.out()).cards().size()).isLessThan(SpiceReader.read(all.out()).cards().size());
        assertThat(mod.out()).startsWith("* Thermion module lu");
    }

    @Test
    void badSelectionsSayWhatExists() {
        TimingCommandTest.Run r = TimingCommandTest.run("sheets", "spice", DEMO, "--stage", "no_such");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("no stage named 'no_such'").contains("triode_nor2");
        r = TimingCommandTest.run("sheets", "spice", DEMO, "--stage", "triode_nor2", "--inputs", "1");
        assertThat(r.err()).contains("give 2 digits");
        r = TimingCommandTest.run("sheets", "spice", DEMO, "--module", "nowhere");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("paths: dec, osel, lu");
        assertThat(r.out()).isEmpty();
    }
}
