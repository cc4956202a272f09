package org.thermion.elab;

import org.thermion.lang.Diagnostics;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Orders the gates so each comes after the gates that drive its inputs (Kahn's
 * algorithm, linear time). A combinational loop is reported with its nets in order.
 */
final class Levelizer {
    private final NetBuilder nb;
    private final Diagnostics diags;

    Levelizer(NetBuilder nb, Diagnostics diags) {
        this.nb = nb;
        this.diags = diags;
    }

    /** Gate indices in evaluation order, or null after reporting a loop. */
    int[] order() {
        int n = nb.gates.size();
        int[] pending = new int[n];
        int[] fanStart = new int[n + 1];
        for (NetBuilder.GateB g : nb.gates) {
            for (int in : g.in) {
                int d = nb.driver.get(in);
                if (d >= 0) {
                    fanStart[d + 1]++;
                }
            }
        }
        for (int i = 0; i < n; i++) {
            fanStart[i + 1] += fanStart[i];
        }
        int[] fan = new int[fanStart[n]];
        int[] fill = fanStart.clone();
        for (int gi = 0; gi < n; gi++) {
            for (int in : nb.gates.get(gi).in) {
                int d = nb.driver.get(in);
                if (d >= 0) {
                    fan[fill[d]++] = gi;
                    pending[gi]++;
                }
            }
        }
        int[] order = new int[n];
        int head = 0, tail = 0;
        for (int i = 0; i < n; i++) {
            if (pending[i] == 0) {
                order[tail++] = i;
            }
        }
        while (head < tail) {
            int g = order[head++];
            for (int k = fanStart[g]; k < fanStart[g + 1]; k++) {
                if (--pending[fan[k]] == 0) {
                    order[tail++] = fan[k];
                }
            }
        }
        if (tail == n) {
            return order;
        }
        reportLoops(pending);
        return null;
    }

    private void reportLoops(int[] pending) {
        Set<Integer> reported = new HashSet<>();
        // Each gate is walked at most once: walkedBy[g] is the start whose walk passed g and
        // at[g] its position there. A walk that runs into an earlier walk would only find the
        // loop that walk found, which has a reported gate, so it stops. (Searching the walk's
        // own list for repeats, and re-walking shared tails, was quadratic in the loop's reach.)
        int[] walkedBy = new int[pending.length];
        int[] at = new int[pending.length];
        java.util.Arrays.fill(walkedBy, -1);
        for (int start = 0; start < pending.length && !diags.full(); start++) {
            if (pending[start] == 0 || reported.contains(start)) {
                continue;
            }
            List<Integer> path = new ArrayList<>();
            List<Integer> seenAt = new ArrayList<>();
            int g = start;
            boolean joined = false;
            while (walkedBy[g] != start) {
                if (walkedBy[g] >= 0) {
                    joined = true;
                    break;
                }
                walkedBy[g] = start;
                at[g] = seenAt.size();
                seenAt.add(g);
                int next = -1;
                for (int in : nb.gates.get(g).in) {
                    int d = nb.driver.get(in);
                    if (d >= 0 && pending[d] > 0) {
                        next = d;
                        break;
                    }
                }
                if (next < 0) {
                    break;
                }
                g = next;
            }
            if (joined) {
                continue;
            }
            int from = at[g];
            List<Integer> cycle = new ArrayList<>(seenAt.subList(from, seenAt.size()));
            if (cycle.stream().anyMatch(reported::contains)) {
                continue;
            }
            reported.addAll(cycle);
            Collections.reverse(cycle);
            List<String> nets = new ArrayList<>();
            for (int c : cycle) {
                nets.add(pretty(nb.gates.get(c).out));
            }
            nets.add(nets.get(0));
            NetBuilder.GateB first = nb.gates.get(cycle.get(0));
            for (int c : cycle) {
                if (!nb.isTemp(nb.gates.get(c).out)) {
                    first = nb.gates.get(c);
                    break;
                }
            }
            path.add(0);
            diags.error(first.span, "combinational loop: " + String.join(" -> ", nets),
                    "break the loop with a latch, or rewrite the logic so no net depends on itself");
        }
    }

    private String pretty(int net) {
        return nb.isTemp(net) ? "(" + nb.names.get(net) + ")" : nb.names.get(net);
    }
}
