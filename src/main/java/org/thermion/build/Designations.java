package org.thermion.build;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.lang.Span;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The designators a builder has already written on the chassis, kept in a small file beside the
 * description ({@code NAME.designators}, our own format) so that parts that did not change keep
 * theirs when others are added or removed. One part a line: its designator, then what it is (the
 * part's role, e.g. {@code plate load A of held[0]}, {@code tube 12AU7 for line[0], line[1]}); a
 * line {@code retired REF WHAT} keeps the number of a removed part from being given to another.
 * {@code #} starts a comment. Sockets follow their tubes and are not listed.
 */
public record Designations(Map<String, String> byRole, Map<String, String> retired) {
    /** How the file begins (so that a later save knows it may replace it). */
    public static final String HEADER = "# designators of machine ";

    /** No file: every part numbered afresh. */
    public static final Designations NONE = new Designations(Map.of(), Map.of());

    /** IEEE 315 designator: optional assembly prefix A1.., class letters, number. */
    static final Pattern REF = Pattern.compile("(?:A([1-9][0-9]{0,5})(?=[A-Z]))?([A-Z]{1,3})([1-9][0-9]{0,5})");

    public Designations {
        byRole = Collections.unmodifiableMap(new LinkedHashMap<>(byRole));
        retired = Collections.unmodifiableMap(new LinkedHashMap<>(retired));
    }

    /** The file beside {@code machine}: the same name with {@code .designators} for its extension. */
    public static Path beside(Path machine) {
        String name = machine.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return machine.resolveSibling((dot > 0 ? name.substring(0, dot) : name) + ".designators");
    }

    /** True when the file records {@code ref} for a part (not retired). */
    public boolean records(String ref) {
        return byRole.containsValue(ref);
    }

    /** Every designator the file gives out, assigned or retired (their numbers are not given again). */
    public List<String> refs() {
        List<String> all = new ArrayList<>(byRole.values());
        all.addAll(retired.keySet());
        return all;
    }

    /**
     * Reads {@code text} (the file {@code file}, its lines kept in {@code sources} for diagnostics);
     * errors (a line without a part, a malformed designator, one designator or one part twice) at
     * file:line:col in {@code diags}.
     */
    public static Designations read(Path file, String text, SourceSet sources, Diagnostics diags) {
        sources.put(file, text);
        Map<String, String> byRole = new LinkedHashMap<>();
        Map<String, String> retired = new LinkedHashMap<>();
        Map<String, Integer> seen = new LinkedHashMap<>();
        List<String> lines = SourceSet.split(text);
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i);
            int hash = line.indexOf('#');
            String body = hash >= 0 ? line.substring(0, hash) : line;
            if (body.isBlank()) {
                continue;
            }
            int lineNo = i + 1;
            int col = firstNonBlank(body);
            boolean old = false;
            String rest = body.substring(col);
            if (rest.startsWith("retired ") || rest.startsWith("retired\t")) {
                old = true;
                int skip = "retired".length();
                col += skip + firstNonBlank(rest.substring(skip));
                rest = body.substring(col);
            }
            int end = firstBlank(rest);
            String ref = rest.substring(0, end);
            Span at = new Span(file, lineNo, col + 1, lineNo, col + 1 + Math.max(1, ref.length()));
            if (!REF.matcher(ref).matches()) {
                diags.error(at, "'" + ref + "' is not a designator",
                        "expected class letters and a number, with an assembly prefix on a machine of several boards "
                                + "(R14, XV3, A2CR7)");
                continue;
            }
            String role = rest.substring(end).strip();
            if (role.isEmpty()) {
                diags.error(new Span(file, lineNo, col + 1 + ref.length(), lineNo, col + 2 + ref.length()),
                        "designator " + ref + " names no part", "expected what the part is after it, as "
                                + "`sheets designators` prints it (e.g. R3  plate load of x)");
                continue;
            }
            Integer before = seen.put(ref, lineNo);
            if (before != null) {
                diags.error(at, "designator " + ref + " is given twice (first on line " + before + ")",
                        "give each part its own designator");
                continue;
            }
            if (old) {
                retired.put(ref, role);
            } else if (byRole.containsKey(role)) {
                diags.error(at, "the part '" + role + "' has two designators (" + byRole.get(role) + " and " + ref + ")",
                        "keep one line for it");
            } else {
                byRole.put(role, ref);
            }
        }
        return new Designations(byRole, retired);
    }

    /**
     * The file's text for {@code wiring}: every part but sockets with its designator, then the parts
     * this file had that the wiring no longer has, retired (and those retired before).
     */
    public String write(String machine, Wiring wiring) {
        StringBuilder b = new StringBuilder();
        b.append(HEADER).append(machine).append(": one part a line, its designator, then what it is\n");
        b.append("# (written by `thermion sheets designators --save`; a retired number is not given out again)\n");
        java.util.Set<String> present = new java.util.HashSet<>();
        for (Part p : wiring.parts()) {
            if (p.cls() != PartClass.SOCKET) {
                b.append(pad(p.ref())).append(p.role()).append('\n');
                present.add(p.ref());
            }
        }
        for (Map.Entry<String, String> e : byRole.entrySet()) {
            if (!present.contains(e.getValue())) {
                b.append("retired ").append(pad(e.getValue())).append(e.getKey()).append('\n');
            }
        }
        for (Map.Entry<String, String> e : retired.entrySet()) {
            if (!present.contains(e.getKey())) {
                b.append("retired ").append(pad(e.getKey())).append(e.getValue()).append('\n');
            }
        }
        return b.toString();
    }

    /** The board, class letters and number of a designator; null when it is not one. */
    static Matcher parse(String ref) {
        Matcher m = REF.matcher(ref);
        return m.matches() ? m : null;
    }

    private static String pad(String ref) {
        return ref.length() >= 8 ? ref + " " : ref + " ".repeat(8 - ref.length());
    }

    private static int firstNonBlank(String s) {
        int i = 0;
        while (i < s.length() && Character.isWhitespace(s.charAt(i))) {
            i++;
        }
        return i;
    }

    private static int firstBlank(String s) {
        int i = 0;
        while (i < s.length() && !Character.isWhitespace(s.charAt(i))) {
            i++;
        }
        return i;
    }
}
