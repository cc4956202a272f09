package org.thermion.model;

/** One glass envelope: a tube of a type in a module, with the sections its stages use. */
public record Envelope(int id, String designator, int tube, int module, int sectionsUsed) {
}
