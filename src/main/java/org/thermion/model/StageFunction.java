package org.thermion.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The logic function a stage realizes, and everything the pipeline needs to know about it
 * in one entry: its word in the language, its role (logic called from expressions, storage
 * declared by a {@code latch} line, or a driver of a lamp or coil), the inputs it takes when
 * its stage declares no fan-in, the fewest it accepts, and the {@link GateFn} its cells
 * compute (which carries the timing's edge rule), and when its circuit conducts (the
 * default state of a draw). Packing ({@code sections N [per input]}), currents and delays
 * belong to each stage's circuit in the parts library, not to the function.
 */
public enum StageFunction {
    NOT(Role.LOGIC, GateFn.NOT, 1, 1, Conducts.OUTPUT_LOW),
    NAND(Role.LOGIC, GateFn.NAND, 2, 2, Conducts.OUTPUT_LOW),
    NOR(Role.LOGIC, GateFn.NOR, 2, 2, Conducts.OUTPUT_LOW),
    AND(Role.LOGIC, GateFn.AND, 2, 2, Conducts.OUTPUT_LOW),
    OR(Role.LOGIC, GateFn.OR, 2, 2, Conducts.OUTPUT_HIGH),
    XOR(Role.LOGIC, GateFn.XOR, 2, 2, Conducts.DEPENDS),
    BUFFER(Role.LOGIC, GateFn.BUF, 1, 1, Conducts.OUTPUT_HIGH),
    LATCH(Role.STORAGE, GateFn.BUF, 1, 1, Conducts.ALWAYS),
    LAMP(Role.DRIVER, GateFn.BUF, 1, 1, Conducts.OUTPUT_HIGH),
    RELAY(Role.DRIVER, GateFn.BUF, 1, 1, Conducts.OUTPUT_HIGH);

    /**
     * When the stage's circuit carries its working current, which a {@code draw conducting}
     * line means: a plate pulled low by its tube (inverters, NAND, NOR), a diode AND's pull-up
     * with an input low, a diode OR's pull-down, a cathode follower, lamp or coil with the
     * output high, one side of a flip-flop always. An XOR's depends on its circuit.
     */
    public enum Conducts { OUTPUT_LOW, OUTPUT_HIGH, ALWAYS, DEPENDS }

    /** What a stage of the function is for; it decides where the language lets it appear. */
    public enum Role {
        /** Called from expressions and chosen by {@code realize} for operators. */
        LOGIC,
        /** Declared with a {@code latch} line; chosen by {@code realize} for latches. */
        STORAGE,
        /** Drives a lamp or a coil rather than other logic: called, never chosen for an operator. */
        DRIVER
    }

    private final Role role;
    private final GateFn gate;
    /** Fan-in when the stage does not declare one. */
    public final int defaultFanIn;
    private final int minInputs;
    private final Conducts conducts;

    StageFunction(Role role, GateFn gate, int defaultFanIn, int minInputs, Conducts conducts) {
        this.role = role;
        this.gate = gate;
        this.defaultFanIn = defaultFanIn;
        this.minInputs = minInputs;
        this.conducts = conducts;
    }

    /** When the circuit carries its working current: the state a {@code draw conducting} line stands for. */
    public Conducts conducts() {
        return conducts;
    }

    /** The function's word in descriptions: {@code nand}. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The function written as {@code word}, or null. */
    public static StageFunction byWord(String word) {
        for (StageFunction f : values()) {
            if (f.word().equals(word)) {
                return f;
            }
        }
        return null;
    }

    /** Every function's word, in declaration order. */
    public static List<String> words() {
        List<String> out = new ArrayList<>();
        for (StageFunction f : values()) {
            out.add(f.word());
        }
        return out;
    }

    /** The words a {@code realize} block accepts: every function but the drivers. */
    public static List<String> realizableWords() {
        List<String> out = new ArrayList<>();
        for (StageFunction f : values()) {
            if (f.role != Role.DRIVER) {
                out.add(f.word());
            }
        }
        return out;
    }

    public Role role() {
        return role;
    }

    /** The fewest inputs a call of a stage of this function may pass. */
    public int minInputs() {
        return minInputs;
    }

    /** True for stages used as calls in expressions (all but storage). */
    public boolean callable() {
        return role != Role.STORAGE;
    }

    /** True for stages that drive a load rather than other logic (lamps, relays). */
    public boolean isDriver() {
        return role == Role.DRIVER;
    }

    /** What a cell of this function computes with {@code inputs} inputs. */
    public GateFn gate(int inputs) {
        return gate.withInputs(inputs);
    }
}
