package org.thermion.build;

/**
 * Classes of parts by the class letters of IEEE 315 (ASME Y14.44) reference designations: V electron
 * tube, XV its socket (X: a socket, followed by the letter of what it holds), R resistor, C capacitor,
 * K relay, DS lamp, CR diode, S switch, J connector, TB terminal board.
 */
public enum PartClass {
    TUBE("V"), SOCKET("XV"), RESISTOR("R"), CAPACITOR("C"), RELAY("K"), LAMP("DS"), DIODE("CR"), SWITCH("S"),
    CONNECTOR("J"), TERMINAL("TB");

    private final String letters;

    PartClass(String letters) {
        this.letters = letters;
    }

    /** The class letters that begin a designator. */
    public String letters() {
        return letters;
    }
}
