package org.thermion.lang;

/** Rephrases ANTLR's messages in the tool's own words. */
final class SyntaxWording {
    private SyntaxWording() {
    }

    static String reword(String msg, String found) {
        String m = msg.replace("'\\n'", "end of line").replace("'\\r\\n'", "end of line")
                .replace("<EOF>", "end of file").replace("NL", "end of line");
        if (m.startsWith("token recognition error at: ")) {
            return "unexpected character " + m.substring("token recognition error at: ".length());
        }
        if (m.startsWith("mismatched input") || m.startsWith("extraneous input")) {
            int exp = m.indexOf(" expecting ");
            String expected = exp >= 0 ? m.substring(exp + " expecting ".length()) : null;
            String what = found == null ? "input" : "'" + found + "'";
            if ("end of line".equals(found) || "end of file".equals(found)) {
                what = found;
            }
            return "syntax error: unexpected " + what + (expected != null ? ", expected " + tidy(expected) : "");
        }
        if (m.startsWith("missing ")) {
            int at = m.indexOf(" at ");
            return "syntax error: " + (at >= 0 ? m.substring(0, at) : m) + " here";
        }
        if (m.startsWith("no viable alternative")) {
            return "syntax error: cannot make sense of " + (found == null ? "this" : "'" + found + "'") + " here";
        }
        return "syntax error: " + m;
    }

    private static String tidy(String expected) {
        String e = expected.replace("{", "").replace("}", "").replace("'',", "").replace(", ''", "").replace("NAME", "a name")
                .replace("NUMBER", "a number").replace("STRING", "a quoted string");
        if (e.length() > 90) {
            e = e.substring(0, 87) + "...";
        }
        return e;
    }

    static String hint(String msg) {
        if (msg.contains("<EOF>") && msg.contains("'}'")) {
            return "check that every '{' has its '}'";
        }
        return null;
    }
}
