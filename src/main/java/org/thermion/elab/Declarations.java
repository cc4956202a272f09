package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Names;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Decl;
import org.thermion.lang.ast.Prop;
import org.thermion.lang.ast.SourceFile;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Every named declaration of a run, by kind. User files may redefine a library part;
 * a name declared twice in user files is an error.
 */
final class Declarations {
    final Map<String, Prop> tubes = new LinkedHashMap<>();
    final Map<String, Prop> stages = new LinkedHashMap<>();
    final Map<String, Prop> rails = new LinkedHashMap<>();
    final Map<String, Decl.Module> modules = new LinkedHashMap<>();
    final List<Prop> heaters = new ArrayList<>();
    final List<Prop> packing = new ArrayList<>();
    final Map<String, Prop> softStarts = new LinkedHashMap<>();
    final List<Prop> realize = new ArrayList<>();
    final List<Prop> machines = new ArrayList<>();
    final List<Prop> margins = new ArrayList<>();
    final List<Decl.Isa> isas = new ArrayList<>();
    private final Map<String, Span> userNames = new LinkedHashMap<>();
    /** Declarations that did not parse, as "kind name" (and the bare kind): their uses are not reported again. */
    private final java.util.Set<String> rejected = new java.util.HashSet<>();

    static final List<String> KINDS = List.of("tube", "stage", "rail", "heaters", "softstart", "realize", "packing",
            "machine", "margins");

    void add(SourceFile file, boolean library, Diagnostics diags) {
        for (Decl d : file.decls()) {
            if (d instanceof Decl.Module m) {
                named(modules, m.name().text(), m, m.name().span(), "module", library, diags);
            } else if (d instanceof Decl.Isa i) {
                isas.add(i);
            } else if (d instanceof Decl.PropDecl pd) {
                prop(pd.prop(), library, diags);
            } else if (d instanceof Decl.Rejected r) {
                rejected.add(r.kind());
                rejected.add(r.kind() + " " + r.name());
            }
        }
    }

    private void prop(Prop p, boolean library, Diagnostics diags) {
        String kind = p.key().text();
        switch (kind) {
            case "tube" -> namedProp(tubes, p, "tube", library, diags);
            case "stage" -> namedProp(stages, p, "stage", library, diags);
            case "rail" -> namedProp(rails, p, "rail", library, diags);
            case "softstart" -> namedProp(softStarts, p, "softstart", library, diags);
            case "heaters" -> heaters.add(p);
            case "packing" -> packing.add(p);
            case "realize" -> realize.add(p);
            case "machine" -> machines.add(p);
            case "margins" -> margins.add(p);
            default -> diags.error(p.key().span(), "unknown declaration '" + kind + "'",
                    hintFor(kind, KINDS, "expected one of: " + String.join(", ", KINDS) + ", module, isa, include"));
        }
    }

    /**
     * Whether a declaration of that kind and name was written but did not parse (its error is
     * reported): a use of the name is then no new error. A null name asks about the kind alone.
     */
    boolean rejected(String kind, String name) {
        return rejected.contains(name == null ? kind : kind + " " + name);
    }

    static String hintFor(String name, List<String> known, String fallback) {
        String dym = Names.didYouMean(name, known);
        return dym != null ? dym : fallback;
    }

    private void namedProp(Map<String, Prop> into, Prop p, String kind, boolean library, Diagnostics diags) {
        if (p.values().isEmpty()) {
            diags.error(p.key().span(), kind + " needs a name", "write `" + kind + " NAME { ... }`");
            return;
        }
        String name = p.values().get(0).text();
        named(into, name, p, p.values().get(0).span(), kind, library, diags);
    }

    private <T> void named(Map<String, T> into, String name, T value, Span span, String kind, boolean library,
                           Diagnostics diags) {
        String key = kind + " " + name;
        if (!library) {
            Span earlier = userNames.get(key);
            if (earlier != null) {
                diags.error(span, "duplicate " + kind + " '" + name + "'",
                        "first declared at " + earlier + "; rename one of them");
                return;
            }
            userNames.put(key, span);
        }
        into.put(name, value);
    }
}
