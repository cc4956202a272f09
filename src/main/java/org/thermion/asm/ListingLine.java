package org.thermion.asm;

/**
 * One source line in the listing: the address and word it produced ({@code hasWord}), or
 * address -1 for lines that produce no word (comments, labels alone, directives).
 */
public record ListingLine(int address, long word, boolean hasWord, int sourceLine, String sourceText) {
}
