package org.thermion.spice;

import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.DoubleUnaryOperator;

/**
 * A behavioural source's expression, restricted to what the SPICE3 user's manual documents for
 * B sources: numbers, node voltages {@code v(node)}, the operators + - * / ^ (power) and unary
 * minus, parentheses, and the functions abs, acos, acosh, asin, asinh, atan, atanh, cos, cosh,
 * exp, ln, log, sin, sinh, sqrt, tan, u (unit step) and uramp (ramp: x for x &gt; 0, else 0).
 * Anything else is rejected, so a deck that reads back here uses only that set.
 */
public final class SpiceExpression {
    private static final Map<String, DoubleUnaryOperator> FUNCTIONS = Map.ofEntries(
            Map.entry("abs", Math::abs), Map.entry("acos", Math::acos),
            Map.entry("acosh", x -> Math.log(x + Math.sqrt(x * x - 1))), Map.entry("asin", Math::asin),
            Map.entry("asinh", x -> Math.log(x + Math.sqrt(x * x + 1))), Map.entry("atan", Math::atan),
            Map.entry("atanh", x -> 0.5 * Math.log((1 + x) / (1 - x))), Map.entry("cos", Math::cos),
            Map.entry("cosh", Math::cosh), Map.entry("exp", Math::exp), Map.entry("ln", Math::log),
            Map.entry("log", Math::log10), Map.entry("sin", Math::sin), Map.entry("sinh", Math::sinh),
            Map.entry("sqrt", Math::sqrt), Map.entry("tan", Math::tan), Map.entry("u", x -> x > 0 ? 1 : 0),
            Map.entry("uramp", x -> x > 0 ? x : 0));

    /** The documented function names. */
    public static Set<String> functions() {
        return new TreeSet<>(FUNCTIONS.keySet());
    }

    private sealed interface Node permits Num, Volt, Neg, Bin, Call {
    }

    private record Num(double v) implements Node {
    }

    private record Volt(String node) implements Node {
    }

    private record Neg(Node x) implements Node {
    }

    private record Bin(char op, Node a, Node b) implements Node {
    }

    private record Call(DoubleUnaryOperator f, Node x) implements Node {
    }

    private final String text;
    private final Node root;
    private final Set<String> nodes = new TreeSet<>();
    private int pos;

    private SpiceExpression(String text) {
        this.text = text;
        this.root = sum();
        skip();
        if (pos < this.text.length()) {
            throw error("unexpected '" + this.text.charAt(pos) + "'");
        }
    }

    /** Parses {@code text}; throws {@link IllegalArgumentException} naming the column on anything outside the set. */
    public static SpiceExpression parse(String text) {
        return new SpiceExpression(text);
    }

    /** The nodes whose voltages the expression reads. */
    public Set<String> nodes() {
        return Set.copyOf(nodes);
    }

    /** The value with node voltages from {@code volts} (node "0" is 0 V; a missing node is an error). */
    public double evaluate(Map<String, Double> volts) {
        return eval(root, volts);
    }

    private static double eval(Node n, Map<String, Double> volts) {
        if (n instanceof Num x) {
            return x.v();
        }
        if (n instanceof Volt x) {
            if (x.node().equals("0")) {
                return 0;
            }
            Double v = volts.get(x.node());
            if (v == null) {
                // SPICE reads names without regard to case.
                for (Map.Entry<String, Double> e : volts.entrySet()) {
                    if (e.getKey().equalsIgnoreCase(x.node())) {
                        return e.getValue();
                    }
                }
                throw new IllegalArgumentException("no voltage for node " + x.node());
            }
            return v;
        }
        if (n instanceof Neg x) {
            return -eval(x.x(), volts);
        }
        if (n instanceof Call x) {
            return x.f().applyAsDouble(eval(x.x(), volts));
        }
        Bin b = (Bin) n;
        double a = eval(b.a(), volts);
        double c = eval(b.b(), volts);
        switch (b.op()) {
            case '+': return a + c;
            case '-': return a - c;
            case '*': return a * c;
            case '/': return a / c;
            default: return Math.pow(a, c);
        }
    }

    private Node sum() {
        Node a = product();
        while (true) {
            skip();
            if (peek('+') || peek('-')) {
                char op = text.charAt(pos++);
                a = new Bin(op, a, product());
            } else {
                return a;
            }
        }
    }

    private Node product() {
        Node a = unary();
        while (true) {
            skip();
            if (peek('*') || peek('/')) {
                char op = text.charAt(pos++);
                a = new Bin(op, a, unary());
            } else {
                return a;
            }
        }
    }

    private Node unary() {
        skip();
        if (peek('-')) {
            pos++;
            return new Neg(unary());
        }
        if (peek('+')) {
            pos++;
            return unary();
        }
        Node base = primary();
        skip();
        if (peek('^')) {
            pos++;
            return new Bin('^', base, unary());
        }
        return base;
    }

    private Node primary() {
        skip();
        if (peek('(')) {
            pos++;
            Node n = sum();
            expect(')');
            return n;
        }
        int end = SpiceNumber.numberEnd(text, pos);
        if (end > pos) {
            int s = end;
            while (s < text.length() && Character.isLetter(text.charAt(s))) {
                s++;
            }
            double v = Double.parseDouble(text.substring(pos, end)) * (s > end ? SpiceNumber.scale(text.substring(end, s)) : 1);
            pos = s;
            return new Num(v);
        }
        int start = pos;
        while (pos < text.length() && (Character.isLetterOrDigit(text.charAt(pos)) || text.charAt(pos) == '_')) {
            pos++;
        }
        String word = text.substring(start, pos).toLowerCase(Locale.ROOT);
        if (word.isEmpty()) {
            throw error(pos < text.length() ? "unexpected '" + text.charAt(pos) + "'" : "expression ends early");
        }
        if (word.equals("v")) {
            expect('(');
            skip();
            int s = pos;
            while (pos < text.length() && text.charAt(pos) != ')' && text.charAt(pos) != ',') {
                pos++;
            }
            String node = text.substring(s, pos).trim();
            if (peek(',')) {
                throw error("v(a,b) is not in the SPICE3 set: write v(a)-v(b)");
            }
            expect(')');
            nodes.add(node);
            return new Volt(node);
        }
        DoubleUnaryOperator f = FUNCTIONS.get(word);
        if (f == null) {
            throw new IllegalArgumentException("column " + (start + 1) + ": '" + word
                    + "' is not a SPICE3 function (documented: " + String.join(", ", functions()) + ")");
        }
        expect('(');
        Node x = sum();
        expect(')');
        return new Call(f, x);
    }

    private void expect(char c) {
        skip();
        if (!peek(c)) {
            throw error("expected '" + c + "'");
        }
        pos++;
    }

    private boolean peek(char c) {
        return pos < text.length() && text.charAt(pos) == c;
    }

    private void skip() {
        while (pos < text.length() && Character.isWhitespace(text.charAt(pos))) {
            pos++;
        }
    }

    private IllegalArgumentException error(String what) {
        return new IllegalArgumentException("column " + (pos + 1) + ": " + what);
    }
}
