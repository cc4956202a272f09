package org.thermion.model;

/** The logic function a stage realizes. */
public enum StageFunction {
    NOT(1, true), NAND(2, true), NOR(2, true), AND(2, false), OR(2, false), XOR(2, false),
    BUFFER(1, false), LATCH(1, false), LAMP(1, false), RELAY(1, false);

    /** Default fan-in when the stage does not declare one. */
    public final int defaultFanIn;
    /** True when the output is the complement of the plain function (a conducting tube pulls low). */
    public final boolean inverting;

    StageFunction(int defaultFanIn, boolean inverting) {
        this.defaultFanIn = defaultFanIn;
        this.inverting = inverting;
    }

    /** True for stages that drive a load rather than other logic (lamps, relays). */
    public boolean isDriver() {
        return this == LAMP || this == RELAY;
    }
}
