package org.thermion.model;

import java.util.List;
import java.util.Set;

/**
 * What a soft start's resistor feeds: the whole rail (no {@code covers} line), or the loads named
 * in its {@code covers} line, the rest of the rail being fed ahead of the resistor. A named module
 * instance brings its whole subtree ({@code modules} holds every id in it): its stages' plate and
 * bias loads and every heater string whose heaters all lie in it. A named tube type brings every
 * heater string on the rail that holds a heater of that type.
 *
 * @param names   the names as written, in order (empty: the whole rail)
 * @param modules ids of the module instances covered, subtrees included
 * @param tubes   tube type indices whose heater strings are covered
 */
public record SoftStartCover(List<String> names, Set<Integer> modules, Set<Integer> tubes) {
    public SoftStartCover {
        names = List.copyOf(names);
        modules = Set.copyOf(modules);
        tubes = Set.copyOf(tubes);
    }

    /** A soft start in series with everything on its rail. */
    public static SoftStartCover wholeRail() {
        return new SoftStartCover(List.of(), Set.of(), Set.of());
    }

    /** True without a {@code covers} line. */
    public boolean isWholeRail() {
        return names.isEmpty();
    }

    /** Whether a load of module instance {@code module} sits behind the resistor. */
    public boolean coversModule(int module) {
        return isWholeRail() || modules.contains(module);
    }

    /** Whether heater string {@code s} sits behind the resistor ({@code envelopes}: the machine's). */
    public boolean coversString(HeaterString s, List<Envelope> envelopes) {
        if (isWholeRail()) {
            return true;
        }
        boolean allInModules = true;
        for (int e : s.envelopes()) {
            Envelope env = envelopes.get(e);
            if (tubes.contains(env.tube())) {
                return true;
            }
            allInModules &= modules.contains(env.module());
        }
        return allInModules;
    }
}
