package org.thermion.circuit;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;

/**
 * The Jacobian of a circuit's free-node currents, kept sparse. Each part is differenced only
 * over its own nodes (a part touching three nodes costs four evaluations, not one per node of
 * the circuit), and the matrix is factored in a minimum-degree order over its fixed pattern, so
 * a stage loaded by a long chain of diode gates and dividers (mostly a tree) factors with
 * little fill. A pivot that is too small for elimination without row exchanges sends the
 * solve to dense elimination with partial pivoting. One per solve; not thread-safe.
 */
final class NodalJacobian {
    /** A pivot smaller than this fraction of its row's largest entry is not trusted without row exchanges. */
    private static final double PIVOT_RATIO = 1e-9;

    private final Circuit circuit;
    private final int n;
    /** Free-node index of each circuit node, -1 for a fixed node. */
    private final int[] slot;
    /** Elimination position of each free-node index, and the reverse. */
    private final int[] position;
    private final int[] atPosition;
    /** For each position, the later positions it shares an entry with after fill (the pattern is symmetric). */
    private final int[][] later;
    /** Values by position, only the pattern's entries are used. */
    private final double[][] a;
    private final double[] scratch;
    private final int[][] elementNodes;
    /** The most nodes one part touches. */
    private final int widest;

    NodalJacobian(Circuit c, int[] free) {
        this.circuit = c;
        this.n = free.length;
        this.slot = new int[c.size()];
        java.util.Arrays.fill(slot, -1);
        for (int i = 0; i < n; i++) {
            slot[free[i]] = i;
        }
        this.elementNodes = new int[c.elements.length][];
        BitSet[] adj = new BitSet[n];
        for (int i = 0; i < n; i++) {
            adj[i] = new BitSet(n);
        }
        for (int e = 0; e < c.elements.length; e++) {
            int[] nodes = distinct(c.elements[e].nodes());
            elementNodes[e] = nodes;
            for (int x : nodes) {
                for (int y : nodes) {
                    if (x != y && slot[x] >= 0 && slot[y] >= 0) {
                        adj[slot[x]].set(slot[y]);
                    }
                }
            }
        }
        int w = 0;
        for (int[] e : elementNodes) {
            w = Math.max(w, e.length);
        }
        this.widest = w;
        this.position = new int[n];
        this.atPosition = new int[n];
        this.later = order(adj);
        this.a = new double[n][n];
        this.scratch = new double[c.size()];
    }

    /**
     * Minimum-degree order: eliminate the free node with fewest remaining neighbours (lowest index
     * on a tie), joining its neighbours (the fill). Returns each position's later neighbours.
     */
    private int[][] order(BitSet[] adj) {
        boolean[] done = new boolean[n];
        List<int[]> rows = new ArrayList<>(n);
        for (int p = 0; p < n; p++) {
            int best = -1;
            int bestDegree = Integer.MAX_VALUE;
            for (int i = 0; i < n; i++) {
                if (!done[i] && adj[i].cardinality() < bestDegree) {
                    best = i;
                    bestDegree = adj[i].cardinality();
                }
            }
            done[best] = true;
            position[best] = p;
            atPosition[p] = best;
            BitSet nb = adj[best];
            int[] ns = nb.stream().toArray();
            for (int x : ns) {
                adj[x].clear(best);
                adj[x].or(nb);
                adj[x].clear(x);
            }
            rows.add(ns);
        }
        int[][] out = new int[n][];
        for (int p = 0; p < n; p++) {
            int[] ns = rows.get(p);
            int[] ps = new int[ns.length];
            for (int i = 0; i < ns.length; i++) {
                ps[i] = position[ns[i]];
            }
            java.util.Arrays.sort(ps);
            out[p] = ps;
        }
        return out;
    }

    private static int[] distinct(int[] nodes) {
        return java.util.Arrays.stream(nodes).distinct().toArray();
    }

    /**
     * Solves J·dx = -f at node voltages {@code v} (f the free nodes' current sums there, with a
     * shunt of {@code shunt} siemens from each free node to ground). {@code f} becomes dx; false
     * when J is singular or the step is not finite. {@code v} is left as it was.
     */
    boolean step(double[] v, double[] f, double shunt) {
        assemble(v, shunt);
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[position[i]] = -f[i];
        }
        if (factorAndSolve(b)) {
            for (int i = 0; i < n; i++) {
                f[i] = b[position[i]];
            }
            return true;
        }
        double[][] dense = new double[n][n];
        for (int i = 0; i < n; i++) {
            b[i] = -f[i];
        }
        assemble(v, shunt);
        for (int r = 0; r < n; r++) {
            for (int col = 0; col < n; col++) {
                dense[r][col] = a[position[r]][position[col]];
            }
        }
        if (!gauss(dense, b)) {
            return false;
        }
        System.arraycopy(b, 0, f, 0, n);
        return true;
    }

    /** Finite differences, part by part over its own nodes (the step the dense solver took per node). */
    private void assemble(double[] v, double shunt) {
        for (int p = 0; p < n; p++) {
            a[p][p] = shunt;
            for (int q : later[p]) {
                a[p][q] = 0;
                a[q][p] = 0;
            }
        }
        Element[] elements = circuit.elements;
        double[] base = new double[widest];
        for (int e = 0; e < elements.length; e++) {
            int[] nodes = elementNodes[e];
            evaluate(elements[e], nodes, v, base);
            for (int col = 0; col < nodes.length; col++) {
                int cs = slot[nodes[col]];
                if (cs < 0) {
                    continue;
                }
                int node = nodes[col];
                double keep = v[node];
                double h = 1e-6 * Math.max(1, Math.abs(keep));
                v[node] = keep + h;
                for (int t : nodes) {
                    scratch[t] = 0;
                }
                elements[e].addCurrents(v, scratch);
                v[node] = keep;
                int cp = position[cs];
                for (int row = 0; row < nodes.length; row++) {
                    int rs = slot[nodes[row]];
                    if (rs >= 0) {
                        a[position[rs]][cp] += (scratch[nodes[row]] - base[row]) / h;
                    }
                }
            }
        }
    }

    private void evaluate(Element e, int[] nodes, double[] v, double[] into) {
        for (int t : nodes) {
            scratch[t] = 0;
        }
        e.addCurrents(v, scratch);
        for (int i = 0; i < nodes.length; i++) {
            into[i] = scratch[nodes[i]];
        }
    }

    /** Elimination in the chosen order without row exchanges, over the pattern only; b becomes x. */
    private boolean factorAndSolve(double[] b) {
        for (int k = 0; k < n; k++) {
            double pivot = a[k][k];
            double rowMax = Math.abs(pivot);
            for (int q : later[k]) {
                rowMax = Math.max(rowMax, Math.abs(a[k][q]));
            }
            if (!(Math.abs(pivot) > PIVOT_RATIO * rowMax) || !(Math.abs(pivot) > 1e-300)) {
                return false;
            }
            for (int r : later[k]) {
                double m = a[r][k] / pivot;
                if (m != 0) {
                    double[] ar = a[r];
                    double[] ak = a[k];
                    for (int q : later[k]) {
                        ar[q] -= m * ak[q];
                    }
                    b[r] -= m * b[k];
                }
            }
        }
        for (int k = n - 1; k >= 0; k--) {
            double s = b[k];
            for (int q : later[k]) {
                s -= a[k][q] * b[q];
            }
            b[k] = s / a[k][k];
            if (!Double.isFinite(b[k])) {
                return false;
            }
        }
        return true;
    }

    /** Solves a·x = b in place (b becomes x) by elimination with partial pivoting. */
    static boolean gauss(double[][] a, double[] b) {
        int n = b.length;
        for (int col = 0; col < n; col++) {
            int piv = col;
            for (int r = col + 1; r < n; r++) {
                if (Math.abs(a[r][col]) > Math.abs(a[piv][col])) {
                    piv = r;
                }
            }
            if (!(Math.abs(a[piv][col]) > 1e-300)) {
                return false;
            }
            double[] t = a[col];
            a[col] = a[piv];
            a[piv] = t;
            double tb = b[col];
            b[col] = b[piv];
            b[piv] = tb;
            for (int r = col + 1; r < n; r++) {
                double m = a[r][col] / a[col][col];
                if (m != 0) {
                    for (int k = col; k < n; k++) {
                        a[r][k] -= m * a[col][k];
                    }
                    b[r] -= m * b[col];
                }
            }
        }
        for (int r = n - 1; r >= 0; r--) {
            double s = b[r];
            for (int k = r + 1; k < n; k++) {
                s -= a[r][k] * b[k];
            }
            b[r] = s / a[r][r];
        }
        for (double x : b) {
            if (!Double.isFinite(x)) {
                return false;
            }
        }
        return true;
    }
}
