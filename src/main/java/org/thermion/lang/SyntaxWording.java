package org.thermion.lang;

/** Rephrases ANTLR's messages in the tool's own words. */
final class SyntaxWording {
    private SyntaxWording() {
    }

    /** What a grammar rule is, in a builder's words. */
    static String ruleName(String rule) {
        return switch (rule) {
            case "expr", "rexpr" -> "an expression";
            case "prop", "propBlock", "value" -> "a property line";
            case "mstmt", "moduleBody", "portDecl", "netDecl", "lvalue", "conn" -> "a module statement";
            case "index", "width" -> "a bus index";
            case "istmt", "isaBody", "rbody", "rstmt", "rtarget" -> "the isa block";
            case "decl", "file" -> "a declaration";
            default -> null;
        };
    }

    static String reword(String msg, String found, String context) {
        if ("\"".equals(found)) {
            return "syntax error: a string is not closed: '\"' without its closing '\"' on the same line";
        }
        boolean word = found != null && (found.startsWith("end of") || found.startsWith("the next"));
        String m = msg.replace("'\\n'", "end of line").replace("'\\r\\n'", "end of line")
                .replace("<EOF>", "end of file").replace("NL", "end of line");
        if (m.startsWith("token recognition error at: ")) {
            return "unexpected character " + m.substring("token recognition error at: ".length());
        }
        if (m.startsWith("mismatched input") || m.startsWith("extraneous input")) {
            int exp = m.indexOf(" expecting ");
            String expected = exp >= 0 ? m.substring(exp + " expecting ".length()) : null;
            String what = found == null ? "input" : "'" + found + "'";
            if (word) {
                what = found;
            }
            String where = context == null ? "" : " in " + context;
            if (expected != null && expected.startsWith("{") && expected.split(",").length > 6) {
                return "syntax error: unexpected " + what + where;
            }
            return "syntax error: unexpected " + what + where + (expected != null ? ", expected " + tidy(expected) : "");
        }
        if (m.startsWith("missing ")) {
            int at = m.indexOf(" at ");
            return "syntax error: " + (at >= 0 ? m.substring(0, at) : m) + " here";
        }
        if (m.startsWith("no viable alternative")) {
            return "syntax error: cannot make sense of " + (found == null ? "this" : word ? found : "'" + found + "'")
                    + (context == null ? " here" : " in " + context);
        }
        return "syntax error: " + m;
    }

    private static String tidy(String expected) {
        String e = expected.trim();
        if (e.startsWith("{") && e.endsWith("}")) {
            e = e.substring(1, e.length() - 1);
        }
        e = e.replace("'',", "").replace(", ''", "").replace("  ", " ").trim().replace("NAME", "a name")
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
        // symbols a builder copies from a sheet: the language spells its units in plain letters
        if (msg.contains("'\u00b5") || msg.contains("'\u03bc")) {
            return "write micro as u: uA, uF, us";
        }
        if (msg.contains("'\u2126") || msg.contains("'\u03a9")) {
            return "write ohm, k or M for resistance: 100 k, 4.7 M";
        }
        if (msg.contains("'\u00b1")) {
            return "write one value, with its sign; a tolerance either way is written as one figure (`margins { rails 5 percent }`)";
        }
        return null;
    }
}
