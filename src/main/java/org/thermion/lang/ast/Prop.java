package org.thermion.lang.ast;

import org.thermion.lang.Span;

import java.util.List;

/**
 * A property line {@code key value value ... { nested }}. Its values are kept as
 * written; the elaborator reads them with the units and shapes each key expects.
 */
public record Prop(Ident key, List<Value> values, List<Prop> block, boolean hasBlock, Span span) {
}
