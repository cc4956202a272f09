package org.thermion.build;

import org.junit.jupiter.api.Test;
import org.thermion.model.Rom;

import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;

import static org.assertj.core.api.Assertions.assertThat;

/** The diode matrix: a diode at every 1 of the program, at a place-fixed designator; program changes. */
class DiodeMatrixTest {
    private static final Rom ROM = new Rom(16, 12, new int[12], true);

    @Test
    void aWordGetsOneDiodePerOneBitOnItsWordLine() {
        // 0x90C = 1001 0000 1100: bits 11, 8, 3 and 2
        DiodeMatrix m = DiodeMatrix.of(ROM, new long[] {0, 0x90C});
        assertThat(m.diodes()).extracting(DiodeMatrix.Diode::bit).containsExactly(2, 3, 8, 11);
        assertThat(m.diodes()).allMatch(d -> d.address() == 1);
        // word line 1 starts at crossing 12: CR13 is bit 0, so bit 2 is CR15
        assertThat(m.diodes()).extracting(DiodeMatrix.Diode::ref).containsExactly("CR15", "CR16", "CR21", "CR24");
    }

    @Test
    void theDiodeCountIsThePopulationCountOfTheImage() {
        Random r = new Random(19);
        long[] words = new long[16];
        long ones = 0;
        for (int i = 0; i < words.length; i++) {
            words[i] = r.nextInt(1 << 12);
            ones += Long.bitCount(words[i]);
        }
        assertThat(DiodeMatrix.of(ROM, words).diodes()).hasSize((int) ones);
    }

    @Test
    void takingOutAndFittingTheChangesTurnsOneProgramIntoTheOther() {
        Random r = new Random(7);
        long[] a = new long[16];
        long[] b = new long[16];
        for (int i = 0; i < 16; i++) {
            a[i] = r.nextInt(1 << 12);
            b[i] = r.nextInt(1 << 12);
        }
        DiodeMatrix was = DiodeMatrix.of(ROM, a);
        DiodeMatrix now = DiodeMatrix.of(ROM, b);
        Set<String> fitted = new HashSet<>();
        for (DiodeMatrix.Diode d : was.diodes()) {
            fitted.add(d.ref());
        }
        List<DiodeMatrix.Change> changes = now.changesFrom(was);
        for (DiodeMatrix.Change c : changes) {
            assertThat(c.add() ? fitted.add(c.diode().ref()) : fitted.remove(c.diode().ref())).as(c.toString()).isTrue();
        }
        Set<String> want = new HashSet<>();
        now.diodes().forEach(d -> want.add(d.ref()));
        assertThat(fitted).isEqualTo(want);
        // a program against itself changes nothing
        assertThat(now.changesFrom(now)).isEmpty();
    }
}
