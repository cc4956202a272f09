package org.thermion.power.startup;

import org.hipparchus.ode.OrdinaryDifferentialEquation;

import java.util.Arrays;

/**
 * The state objects of one transient (heaters, heater strings, rails, soft starts) built from a
 * {@link StartupNetwork}, the algebraic circuit solved from the temperatures at each point, and
 * the heaters' differential equations.
 */
final class TransientCircuit {
    final StartupNetwork net;
    final HeaterState[] heaters;
    final StringState[] strings;
    final RailState[] rails;
    final SoftStartState[] softs;
    final int dimension;
    /** Circuit solves so far, the integrator's own evaluations added by the run. */
    long evaluations;

    TransientCircuit(StartupNetwork net, PowerUpOptions o) {
        this.net = net;
        int n = net.states;
        int ns = net.softs.size();
        // State vector: wire temperatures, cathode temperatures, resistor energies, resistor lagged powers,
        // heater energies in, energies radiated.
        heaters = new HeaterState[n];
        for (int s = 0; s < n; s++) {
            heaters[s] = new HeaterState(net.models.get(net.stateModel[s]), net.stateGroup[s], net.statePosition[s],
                    net.stateShunt[s], s, n + s, 2 * n + 2 * ns + s, 3 * n + 2 * ns + s);
        }
        dimension = 4 * n + 2 * ns;
        strings = new StringState[net.groupRail.length];
        for (int g = 0; g < strings.length; g++) {
            HeaterState[] hs = new HeaterState[net.groupStates[g].length];
            for (int i = 0; i < hs.length; i++) {
                hs[i] = heaters[net.groupStates[g][i]];
            }
            strings[g] = new StringState(net.groupRail[g], net.groupCount[g], net.groupDrop[g], hs);
        }
        softs = new SoftStartState[ns];
        for (int k = 0; k < ns; k++) {
            StartupNetwork.Soft s = net.softs.get(k);
            double ohms = o.resistorOhms().getOrDefault(s.name(), s.declaredOhms());
            softs[k] = new SoftStartState(s, ohms, 2 * n + k, 2 * n + ns + k, o.resistorRating().tau(),
                    s.thyratron() ? heaters[s.thyState()] : null);
        }
        for (int k = 0; k < ns; k++) {
            if (softs[k].soft.partial()) {
                softs[k].node = node(softs[k].soft.covered(), -1, k);
            }
        }
        int nr = net.machine.rails().size();
        rails = new RailState[nr];
        for (int r = 0; r < nr; r++) {
            int ri = r;
            SoftStartState[] series = Arrays.stream(softs).filter(s -> s.soft.rail() == ri && !s.soft.partial())
                    .toArray(SoftStartState[]::new);
            SoftStartState[] partial = Arrays.stream(softs).filter(s -> s.soft.rail() == ri && s.soft.partial())
                    .toArray(SoftStartState[]::new);
            rails[r] = new RailState(r, net.rail(r), node(net.railLoads[r], r, -1), series, partial);
        }
    }

    /**
     * The run's state of a node's loads; its thyratron branches are those fed from rail {@code rail}'s
     * bus, or (rail -1) from behind soft start {@code soft}.
     */
    private LoadNode node(NodeLoads loads, int rail, int soft) {
        StringState[] on = Arrays.stream(loads.groups()).mapToObj(g -> strings[g]).toArray(StringState[]::new);
        HeaterState[] plates = Arrays.stream(loads.plateState()).mapToObj(s -> heaters[s]).toArray(HeaterState[]::new);
        SoftStartState[] branches = Arrays.stream(softs).filter(s -> s.soft.thyratron()
                && (rail >= 0 ? s.soft.fromRail() == rail && s.soft.branchSoft() < 0 : s.soft.branchSoft() == soft))
                .toArray(SoftStartState[]::new);
        return new LoadNode(on, plates, loads.plateSiemens().clone(), loads.alwaysSiemens(), branches);
    }

    /** Solves the circuit for the temperatures in {@code y} under the present relay states. */
    void evaluate(double[] y) {
        evaluations++;
        for (HeaterState h : heaters) {
            h.resist(y);
        }
        for (StringState s : strings) {
            s.resist();
        }
        for (RailState r : rails) {
            r.solve(y, net.emission);
        }
    }

    void updateLimits(double t) {
        for (RailState r : rails) {
            r.limit(t, r.overLimit());
        }
    }

    final OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
        @Override
        public int getDimension() {
            return dimension;
        }

        @Override
        public double[] computeDerivatives(double t, double[] y) {
            try {
                evaluate(y);
            } catch (TransientFailure e) {
                throw new TransientFailure("at t = " + StartupNetwork.fmt(t) + " s, " + e.getMessage());
            }
            double[] d = new double[dimension];
            for (HeaterState h : heaters) {
                h.derivatives(y, d);
            }
            for (SoftStartState s : softs) {
                s.derivatives(y, d);
            }
            return d;
        }
    };
}
