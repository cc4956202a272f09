package org.thermion.faults;

/**
 * A solder bridge between two neighbouring pins of a socket that carry different logic nets: both
 * nets take one joined value. Where the two drivers agree it is their value; where they disagree
 * the table says what wins ({@link BridgeRule}): {@code whenA0B1} for net A driven 0 and B driven 1,
 * {@code whenA1B0} the other way round, each 0, 1 or {@link FaultSimulator#UNKNOWN} (a fight
 * neither side wins: the level sits between the thresholds).
 *
 * @param slotA   the stem slot (= net) of the lower-numbered net
 * @param slotB   the stem slot of the other net
 * @param socket  the socket's designator ({@code A1XV5}); {@code tube} its tube's ({@code A1V5})
 * @param pinA    the pin carrying net A; {@code pinB} the pin carrying net B
 */
public record Bridge(int slotA, int slotB, byte whenA0B1, byte whenA1B0, String socket, String tube, String type,
                     int envelope, int pinA, int pinB) {

    /** The joined value of one machine, three-valued (0, 1, 2 = unknown), as Kleene logic extends the table. */
    public byte join(byte a, byte b) {
        boolean one = false;
        boolean zero = false;
        for (int va = 0; va < 2; va++) {
            for (int vb = 0; vb < 2; vb++) {
                if (!may(a, va) || !may(b, vb)) {
                    continue;
                }
                byte r = va == vb ? (byte) va : va == 0 ? whenA0B1 : whenA1B0;
                one |= r != 0;
                zero |= r != 1;
            }
        }
        return one && zero ? FaultSimulator.UNKNOWN : one ? (byte) 1 : 0;
    }

    private static boolean may(byte v, int value) {
        return v == FaultSimulator.UNKNOWN || v == value;
    }

    /** The wired function in a builder's words, the nets named {@code a} and {@code b}: "low wins (wired AND)". */
    public String behaviour(String a, String b) {
        if (whenA0B1 == whenA1B0) {
            return whenA0B1 == 0 ? "low wins (wired AND)" : whenA0B1 == 1 ? "high wins (wired OR)"
                    : "the two drivers fight (level unknown)";
        }
        if (whenA0B1 == 0 && whenA1B0 == 1) {
            return a + " wins";
        }
        if (whenA0B1 == 1 && whenA1B0 == 0) {
            return b + " wins";
        }
        return a + " low, " + b + " high: " + word(whenA0B1) + "; " + a + " high, " + b + " low: " + word(whenA1B0);
    }

    private static String word(byte v) {
        return v == 0 ? "low" : v == 1 ? "high" : "unknown";
    }
}
