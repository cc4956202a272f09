package org.thermion.model;

/**
 * A series resistor on a rail, bypassed by a relay once its trigger fires; {@code cover} says
 * which of the rail's loads sit behind it (the others are fed ahead of it).
 */
public record SoftStart(String name, int rail, double resistorOhms, double ratedWatts, Relay relay,
                        BypassTrigger trigger, SoftStartCover cover) {
}
