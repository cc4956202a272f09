package org.thermion.model;

import java.util.List;

/**
 * A part of the machine the logic description does not contain but a builder still builds: the
 * program counter, the ROM's address decoding and sense drivers, the clock generator. Its stages
 * are stated in its block ({@code uses N STAGE per UNIT}); counted, it is a module of its own with
 * envelopes, heaters and draws like any other. {@code module} is -1 and {@code leftOut} says why
 * when it is not counted (declared {@code offboard}, or no stages stated).
 *
 * @param block   "pc", "rom" or "clock"
 * @param what    what it is, for people ("program counter")
 * @param stages  each stated stage and the envelope of each of its instances
 * @param leftOut null when counted; else what is left out and why
 */
public record BuiltBlock(String block, String what, int module, List<Instances> stages, String leftOut) {
    public BuiltBlock {
        stages = List.copyOf(stages);
    }

    /** Instances of one stage: the envelope holding each. */
    public record Instances(int stage, int[] envelopes) {
        public Instances {
            envelopes = envelopes.clone();
        }

        /** A copy of the envelopes, one per instance. */
        @Override
        public int[] envelopes() {
            return envelopes.clone();
        }

        /** The envelope of instance {@code i}. */
        public int envelope(int i) {
            return envelopes[i];
        }

        public int count() {
            return envelopes.length;
        }
    }

    /** True when the block's tubes are counted. */
    public boolean counted() {
        return leftOut == null;
    }
}
