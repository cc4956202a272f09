package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.model.BasePin;
import org.thermion.model.Basing;
import org.thermion.model.Electrode;
import org.thermion.model.TubeKind;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Reads a tube block's {@code basing BASE "PINS" from "SOURCE"} lines. PINS is a comma-separated
 * list of {@code N electrode.section} (heater, tap, ic and nc take no section). Each error points
 * into the quoted text at the item that is wrong.
 */
final class BasingReader {
    private final Diagnostics diags;

    BasingReader(Diagnostics diags) {
        this.diags = diags;
    }

    /** The basings of a tube with {@code sections} sections of {@code kind}; lines in error are left out. */
    List<Basing> read(List<PropLine> lines, TubeKind kind, int sections) {
        List<Basing> out = new ArrayList<>();
        for (PropLine line : lines) {
            Basing b = one(line, kind, sections, out.isEmpty());
            if (b != null) {
                out.add(b);
            }
        }
        return out;
    }

    /** One line; {@code wired} for the first, which must name every electrode (later ones may say `?`). */
    private Basing one(PropLine line, TubeKind kind, int sections, boolean wired) {
        String base = line.word("base");
        int count = Basing.pinsOf(base);
        String text = line.word("pins");
        Span at = line.span("pins");
        List<BasePin> pins = new ArrayList<>();
        boolean[] seen = new boolean[count + 1];
        boolean ok = true;
        int offset = 0;
        for (String item : text.split(",", -1)) {
            int lead = item.length() - item.stripLeading().length();
            Span here = shift(at, offset + lead, item.strip().length());
            offset += item.length() + 1;
            BasePin p = pin(item.strip(), here, count, sections);
            if (p == null) {
                ok = false;
                continue;
            }
            if (wired && p.electrode() == Electrode.UNKNOWN) {
                diags.error(here, "the first basing is the one wired and must say what pin " + p.pin() + " carries",
                        "give the pin, or put a basing that knows it first");
                ok = false;
            }
            if (seen[p.pin()]) {
                diags.error(here, "pin " + p.pin() + " is given twice in this basing", "give each pin once");
                ok = false;
            }
            seen[p.pin()] = true;
            pins.add(p);
        }
        if (!ok) {
            return null;
        }
        long heaters = pins.stream().filter(p -> p.electrode() == Electrode.HEATER).count();
        if (heaters != 2 && wired) {
            diags.error(at, "a basing needs exactly two heater pins, not " + heaters, "mark the heater's ends `N heater`");
            return null;
        }
        for (int s = 1; wired && s <= sections; s++) {
            for (Electrode e : needed(kind)) {
                final int sec = s;
                if (pins.stream().noneMatch(p -> p.electrode() == e && p.section() == sec)) {
                    diags.error(at, "no pin carries the " + e.word() + " of section " + s,
                            "add `N " + e.word() + "." + s + "`");
                    ok = false;
                }
            }
        }
        for (int pin = 1; pin <= count; pin++) {
            if (!seen[pin]) {
                diags.error(at, "pin " + pin + " of the " + base + " base is not given", "add `" + pin + " nc` for a pin not connected");
                ok = false;
            }
        }
        pins.sort((a, b) -> Integer.compare(a.pin(), b.pin()));
        return ok ? new Basing(base, count, pins, line.word("from")) : null;
    }

    /** The electrodes every section of a kind has on some pin. */
    private static List<Electrode> needed(TubeKind kind) {
        switch (kind) {
            case PENTODE:
                return List.of(Electrode.PLATE, Electrode.GRID, Electrode.SCREEN, Electrode.CATHODE);
            case DIODE:
                return List.of(Electrode.PLATE, Electrode.CATHODE);
            default:
                return List.of(Electrode.PLATE, Electrode.GRID, Electrode.CATHODE);
        }
    }

    private BasePin pin(String item, Span here, int count, int sections) {
        String[] parts = item.split("\\s+");
        if (parts.length != 2 || !parts[0].matches("[0-9]{1,2}")) {
            diags.error(here, "expected a pin number and what it carries, found '" + item + "'", "write e.g. `7 grid.1` or `4 heater`");
            return null;
        }
        int pin = Integer.parseInt(parts[0]);
        if (pin < 1 || pin > count) {
            diags.error(here, "pin " + pin + " is not on a base of " + count + " pins", "use a pin from 1 to " + count);
            return null;
        }
        String[] es = parts[1].split("\\.", -1);
        Electrode e = Electrode.of(es[0]);
        if (e == null || es.length > 2) {
            diags.error(here, "unknown electrode '" + parts[1] + "'",
                    "expected one of " + String.join(", ", Arrays.stream(Electrode.values()).map(Electrode::word).toList())
                            + " (with `.SECTION` where a tube has several sections)");
            return null;
        }
        if (!e.perSection()) {
            if (es.length == 2) {
                diags.error(here, e.word() + " belongs to the whole tube and takes no section", "write `" + pin + " " + e.word() + "`");
                return null;
            }
            return new BasePin(pin, e, 0);
        }
        int section = 1;
        if (es.length == 2) {
            if (!es[1].matches("[0-9]{1,2}") || Integer.parseInt(es[1]) < 1 || Integer.parseInt(es[1]) > sections) {
                diags.error(here, "section '" + es[1] + "' is not one of the tube's " + sections, "use a section from 1 to " + sections);
                return null;
            }
            section = Integer.parseInt(es[1]);
        } else if (sections > 1) {
            diags.error(here, "which section's " + e.word() + "? the tube has " + sections, "write `" + pin + " " + e.word() + ".1`");
            return null;
        }
        return new BasePin(pin, e, section);
    }

    /** The span of {@code length} characters {@code offset} into a quoted string at {@code s}. */
    private static Span shift(Span s, int offset, int length) {
        if (!s.isKnown() || s.line() != s.endLine()) {
            return s;
        }
        int col = s.col() + 1 + offset;
        return new Span(s.file(), s.line(), col, s.line(), col + Math.max(1, length) - 1);
    }
}
