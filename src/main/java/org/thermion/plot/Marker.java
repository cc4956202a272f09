package org.thermion.plot;

/** A marked point with its label (the balance point of a sweep, a relay closing). */
public record Marker(String label, double x, double y) {
}
