package org.thermion.model;

/** A field of the instruction word, bits {@code hi..lo} inclusive. */
public record IsaField(String name, int hi, int lo) {
    public int width() {
        return hi - lo + 1;
    }

    public long extract(long word) {
        return (word >>> lo) & ((1L << width()) - 1);
    }

    public long place(long value) {
        return (value & ((1L << width()) - 1)) << lo;
    }
}
