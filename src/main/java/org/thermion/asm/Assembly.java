package org.thermion.asm;

import java.util.List;

/**
 * An assembled program: the whole ROM image (one entry per ROM word, unused words 0) and
 * one listing line per source line.
 */
public record Assembly(long[] words, List<ListingLine> listing) {
}
