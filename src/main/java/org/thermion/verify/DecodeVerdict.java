package org.thermion.verify;

/**
 * The decode line an instruction activates: {@code net} its name, or null when not exactly
 * one line is active in all of its cases ({@code problem} then says what was seen).
 */
public record DecodeVerdict(String mnemonic, long opcode, String net, String problem) {
    public boolean ok() {
        return problem == null;
    }
}
