package org.thermion.model;

/** A named machine input or output bit and its net. */
public record Port(String name, int net) {
}
