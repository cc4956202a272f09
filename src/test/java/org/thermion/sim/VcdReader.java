package org.thermion.sim;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A small reader of value change dumps for the tests: checks the structure IEEE 1364-2005
 * clause 18 gives (header sections, balanced scopes, declared identifiers, increasing times)
 * and keeps every variable's changes by its full scope path.
 */
final class VcdReader {
    final Map<String, String> header = new HashMap<>();
    /** Full path (scope.scope.reference) to identifier. */
    final Map<String, String> vars = new LinkedHashMap<>();
    final Map<String, Integer> widths = new HashMap<>();
    /** Identifier to (time to value). */
    final Map<String, TreeMap<Long, String>> changes = new HashMap<>();
    final List<String> scopes = new ArrayList<>();
    long lastTime = -1;

    VcdReader(String text) {
        String[] tok = text.trim().split("\\s+");
        int i = 0;
        Deque<String> scope = new ArrayDeque<>();
        boolean defined = false;
        while (!defined) {
            String t = tok[i++];
            switch (t) {
                case "$date", "$version", "$timescale", "$comment" -> {
                    StringBuilder sb = new StringBuilder();
                    while (!tok[i].equals("$end")) {
                        sb.append(sb.length() == 0 ? "" : " ").append(tok[i++]);
                    }
                    i++;
                    header.put(t, sb.toString());
                }
                case "$scope" -> {
                    assertThat(tok[i]).isEqualTo("module");
                    scope.addLast(tok[i + 1]);
                    scopes.add(String.join(".", scope));
                    assertThat(tok[i + 2]).isEqualTo("$end");
                    i += 3;
                }
                case "$upscope" -> {
                    assertThat(scope).as("upscope without scope").isNotEmpty();
                    scope.removeLast();
                    assertThat(tok[i++]).isEqualTo("$end");
                }
                case "$var" -> {
                    String type = tok[i++];
                    assertThat(type).isIn("wire", "reg");
                    int width = Integer.parseInt(tok[i++]);
                    String id = tok[i++];
                    for (char c : id.toCharArray()) {
                        assertThat((int) c).as("identifier character").isBetween(33, 126);
                    }
                    StringBuilder ref = new StringBuilder(tok[i++]);
                    while (!tok[i].equals("$end")) {
                        ref.append(tok[i++]);
                    }
                    i++;
                    assertThat(scope).as("var outside any scope").isNotEmpty();
                    String path = String.join(".", scope) + "." + ref;
                    assertThat(vars).as("duplicate var %s", path).doesNotContainKey(path);
                    assertThat(changes).as("duplicate identifier %s", id).doesNotContainKey(id);
                    vars.put(path, id);
                    widths.put(id, width);
                    changes.put(id, new TreeMap<>());
                }
                case "$enddefinitions" -> {
                    assertThat(tok[i++]).isEqualTo("$end");
                    assertThat(scope).as("scopes closed").isEmpty();
                    defined = true;
                }
                default -> throw new AssertionError("unexpected token in the header: " + t);
            }
        }
        long time = -1;
        for (; i < tok.length; i++) {
            String t = tok[i];
            if (t.startsWith("#")) {
                long now = Long.parseLong(t.substring(1));
                assertThat(now).as("time increases").isGreaterThan(time);
                time = now;
            } else if (t.equals("$dumpvars") || t.equals("$end")) {
                continue;
            } else if (t.startsWith("b")) {
                String id = tok[++i];
                assertThat(changes).as("declared %s", id).containsKey(id);
                assertThat(t.length() - 1).isEqualTo(widths.get(id));
                assertThat(time).as("a time before the first change").isGreaterThanOrEqualTo(0);
                changes.get(id).put(time, t.substring(1));
            } else {
                assertThat("01xXzZ").contains(t.substring(0, 1));
                String id = t.substring(1);
                assertThat(changes).as("declared %s", id).containsKey(id);
                assertThat(time).isGreaterThanOrEqualTo(0);
                changes.get(id).put(time, t.substring(0, 1));
            }
        }
        lastTime = time;
    }

    /** The value of a variable (by full path) at a time: its last change at or before it. */
    String at(String path, long time) {
        String id = vars.get(path);
        assertThat(id).as("var %s declared; have %s", path, vars.keySet()).isNotNull();
        Map.Entry<Long, String> e = changes.get(id).floorEntry(time);
        assertThat(e).as("%s has a value at %d", path, time).isNotNull();
        return e.getValue();
    }
}
