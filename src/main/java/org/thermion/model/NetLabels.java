package org.thermion.model;


/**
 * How reports name a net: its own name, or for a net the elaborator generated ("lu.$22") the
 * expression that computes it, written with the language's operators (! & | ^) down to named
 * nets, and the file:line of its statement.
 */
public final class NetLabels {
    private static final int MAX_CHARS = 48;
    private final Netlist nl;
    private final int[] driver;

    public NetLabels(Netlist nl) {
        this.nl = nl;
        driver = new int[nl.netCount()];
        java.util.Arrays.fill(driver, -1);
        for (Gate g : nl.gates()) {
            driver[g.output()] = g.id();
        }
    }

    /** The name, or "EXPRESSION (file:line)" for a generated net. */
    public String label(int net) {
        if (!nl.isGenerated(net)) {
            return nl.netName(net);
        }
        String e = expression(net, 3);
        if (e.length() > MAX_CHARS) {
            e = expression(net, 1);
        }
        String place = nl.netPlace(net);
        return place == null ? e : e + " (" + place + ")";
    }

    /** The expression computing {@code net}, generated inputs expanded {@code depth} levels deep. */
    public String expression(int net, int depth) {
        if (!nl.isGenerated(net) || driver[net] < 0 || depth == 0) {
            return nl.isGenerated(net) ? "(...)" : nl.netName(net);
        }
        Gate g = nl.gates().get(driver[net]);
        StringBuilder in = new StringBuilder();
        String op = g.fn() == GateFn.AND || g.fn() == GateFn.NAND ? " & "
                : g.fn() == GateFn.XOR ? " ^ " : " | ";
        for (int i = 0; i < g.arity(); i++) {
            String a = expression(g.input(i), depth - 1);
            boolean nested = nl.isGenerated(g.input(i)) && driver[g.input(i)] >= 0 && depth > 1
                    && nl.gates().get(driver[g.input(i)]).arity() > 1;
            in.append(i == 0 ? "" : op).append(nested ? "(" + a + ")" : a);
        }
        switch (g.fn()) {
            case NOT:
                return "!" + (g.arity() == 1 ? in : "(" + in + ")");
            case NAND:
            case NOR:
                return "!(" + in + ")";
            default:
                return in.toString();
        }
    }
}
