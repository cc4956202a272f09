package org.thermion.sim;

/**
 * How latches power up: all zero, seeded random (repeatable), or unknown (three-valued
 * simulation that shows where an unset register is used).
 */
public sealed interface InitMode {

    /** Every latch starts at 0. */
    record Zero() implements InitMode {
        @Override
        public String toString() {
            return "zero";
        }
    }

    /** Every latch starts at a pseudo-random value drawn from {@code seed}; lanes differ. */
    record Random(long seed) implements InitMode {
        @Override
        public String toString() {
            return "random:" + seed;
        }
    }

    /** Every latch starts unknown (X) until it is loaded with a known value. */
    record Unknown() implements InitMode {
        @Override
        public String toString() {
            return "unknown";
        }
    }

    /** Parses {@code zero}, {@code random:SEED} or {@code unknown}. */
    static InitMode parse(String text) {
        if (text == null) {
            throw new IllegalArgumentException("missing init mode: expected zero, random:SEED or unknown");
        }
        String t = text.trim();
        if (t.equals("zero")) {
            return new Zero();
        }
        if (t.equals("unknown")) {
            return new Unknown();
        }
        if (t.startsWith("random:")) {
            String s = t.substring("random:".length());
            try {
                return new Random(Long.parseLong(s));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("bad seed '" + s + "' in init mode '" + t
                        + "': expected a whole number, e.g. random:42");
            }
        }
        if (t.equals("random")) {
            throw new IllegalArgumentException("init mode 'random' needs a seed: random:SEED, e.g. random:42");
        }
        throw new IllegalArgumentException("unknown init mode '" + t + "': expected zero, random:SEED or unknown");
    }
}
