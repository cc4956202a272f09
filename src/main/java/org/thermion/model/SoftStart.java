package org.thermion.model;

/** A series resistor on a rail, bypassed by a relay once its trigger fires. */
public record SoftStart(String name, int rail, double resistorOhms, double ratedWatts, Relay relay,
                        BypassTrigger trigger) {
}
