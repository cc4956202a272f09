package org.thermion.verify;

/**
 * One gate of the logic feeding a wrong latch pin, with the values it saw in the failing case:
 * {@code net} = {@code function}({@code inputs}) = {@code value}, {@code depth} gates back from the pin.
 */
public record TraceLine(int depth, String net, String module, String function, String inputs, boolean value) {
}
