package org.thermion.model;

/** One base pin: its number, the electrode it carries and the section (1-based; 0 for heater and spare pins). */
public record BasePin(int pin, Electrode electrode, int section) {
    /** How a basing line writes it: {@code 7 grid.1}, {@code 4 heater}. */
    public String label() {
        return electrode.perSection() ? electrode.word() + "." + section : electrode.word();
    }
}
