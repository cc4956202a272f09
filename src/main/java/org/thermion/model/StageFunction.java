package org.thermion.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The logic function a stage realizes, and everything the pipeline needs to know about it
 * in one entry: its word in the language, its role (logic called from expressions, storage
 * declared by a {@code latch} line, or a driver of a lamp or coil), the inputs it takes when
 * its stage declares no fan-in, the fewest it accepts, and the {@link GateFn} its cells
 * compute (which carries the timing's edge rule). Packing ({@code sections N [per input]}),
 * draws and delays belong to each stage's circuit in the parts library, not to the function.
 */
public enum StageFunction {
    NOT(Role.LOGIC, GateFn.NOT, 1, 1),
    NAND(Role.LOGIC, GateFn.NAND, 2, 2),
    NOR(Role.LOGIC, GateFn.NOR, 2, 2),
    AND(Role.LOGIC, GateFn.AND, 2, 2),
    OR(Role.LOGIC, GateFn.OR, 2, 2),
    XOR(Role.LOGIC, GateFn.XOR, 2, 2),
    BUFFER(Role.LOGIC, GateFn.BUF, 1, 1),
    LATCH(Role.STORAGE, GateFn.BUF, 1, 1),
    LAMP(Role.DRIVER, GateFn.BUF, 1, 1),
    RELAY(Role.DRIVER, GateFn.BUF, 1, 1);

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

    StageFunction(Role role, GateFn gate, int defaultFanIn, int minInputs) {
        this.role = role;
        this.gate = gate;
        this.defaultFanIn = defaultFanIn;
        this.minInputs = minInputs;
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
