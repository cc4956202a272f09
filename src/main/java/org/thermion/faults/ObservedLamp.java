package org.thermion.faults;

/**
 * Something the builder can see: a lamp on a net. {@code slot} is the value slot the
 * lamp reads (its own branch when the net is read elsewhere too). {@code why} says why
 * the net has a lamp: a machine output, a state bit, or a lamp or relay stage.
 */
public record ObservedLamp(String name, int net, int slot, String why) {
}
