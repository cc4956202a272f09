package org.thermion.model;

/** Program memory: words, bits per word, the nets its data drive (LSB first), off-board or not. */
public record Rom(int words, int width, int[] dataNets, boolean offBoard) {
    public Rom {
        dataNets = dataNets.clone();
    }

    /** A copy of the data nets. */
    @Override
    public int[] dataNets() {
        return dataNets.clone();
    }
}
