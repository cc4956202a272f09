package org.thermion.tui;

import org.junit.jupiter.api.Test;
import org.thermion.model.Port;

import java.io.IOException;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Buses as numbers in the switch-and-lamp panel, their bits on demand (v), and the radixes a
 * description may declare. The bring-up panel's six word switches are the bus {@code word}.
 */
class BusDisplayTest {
    private static List<Level> bits(String msbFirst) {
        List<Level> l = new java.util.ArrayList<>();
        for (int i = msbFirst.length() - 1; i >= 0; i--) {
            l.add(Level.of(msbFirst.charAt(i)));
        }
        return l;
    }

    @Test
    void eachRadixWritesTheBusAsWideAsItIs() {
        assertThat(Radix.HEX.write(bits("011100"))).isEqualTo("0x1C");
        assertThat(Radix.BINARY.write(bits("011100"))).isEqualTo("0b011100");
        assertThat(Radix.OCTAL.write(bits("011100"))).isEqualTo("0o34");
        assertThat(Radix.DECIMAL.write(bits("011100"))).isEqualTo("28");
        assertThat(Radix.HEX.write(bits("00000001"))).isEqualTo("0x01");
        // An unknown bit spoils its digit only; a decimal number has no digit of its own for it.
        assertThat(Radix.HEX.write(bits("x0000001"))).isEqualTo("0xx1");
        assertThat(Radix.DECIMAL.write(bits("x01"))).isEqualTo("x");
        assertThat(IoPanel.fromHex("0x0c", 6)).isEqualTo(bits("001100"));
        assertThat(IoPanel.fromHex("0xx3", 6)).isEqualTo(bits("xx0011"));
    }

    @Test
    void busBitsGroupUnderTheBusNameLeastSignificantFirst() {
        List<PortGroup> g = PortGroup.of(List.of(new Port("code[1]", 5), new Port("load", 6), new Port("code[0]", 4),
                new Port("code[2]", 7), new Port("one[0]", 8)));
        assertThat(g).extracting(PortGroup::name).containsExactly("code", "load", "one[0]");
        assertThat(g.get(0).ports()).containsExactly(2, 0, 3);
        assertThat(IoPanel.keys(g.get(0))).isEqualTo("3-4");
        assertThat(g.get(2).bus()).isFalse();
    }

    @Test
    void theWordSwitchesShowAsOneNumberAndBitByBitOnDemand() throws IOException {
        UiFixture f = WordPanelTest.panel(100, 30);
        f.type("+++");
        assertThat(f.line("1-6 ")).contains("1-6 □□□□▣▣ word 0x03");
        f.type("v");
        assertThat(f.line("word[0]")).contains("1 ▣ word[0] on");
        assertThat(f.line("word[2]")).contains("3 □ word[2] off");
        f.assertGolden("panel-bits-100x30.txt");
        f.type("v");
        assertThat(f.text()).doesNotContain("word[0]");
    }

    @Test
    void aDeclaredRadixIsHonoured() throws IOException {
        String text = java.nio.file.Files.readString(WordPanelTest.PANEL).replace("  inputs word d0 d1\n",
                "  inputs word d0 d1\n  radix binary word\n");
        org.thermion.lang.Diagnostics d = new org.thermion.lang.Diagnostics();
        org.thermion.model.Machine m = new org.thermion.elab.Elaborator(new org.thermion.lang.SourceSet(), d)
                .elaborateText(WordPanelTest.PANEL, text);
        assertThat(d.hasErrors()).isFalse();
        Session s = new Session(m, new org.thermion.asm.Assembly(new long[0], List.of()), DecodeLamp.DEFAULT_NAME,
                new org.thermion.sim.InitMode.Zero(), null);
        UiFixture f = new UiFixture(s, 100, 30, "word from switches");
        f.type("+++");
        assertThat(f.line("1-6 ")).contains("word 0b000011");
        assertThat(Carry.changes(WordPanelTest.panel(100, 30).session, s)).contains("bus word now written in binary (was hex)");
    }
}
