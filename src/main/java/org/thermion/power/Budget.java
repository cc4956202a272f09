package org.thermion.power;

import org.thermion.model.Machine;
import org.thermion.model.Rail;
import org.thermion.model.StageType;

import java.util.ArrayList;
import java.util.List;

/**
 * A machine's tube and power budget: the tube count, the heater strings, plate and bias
 * current per module and rail at every stage instance's lowest and highest possible draw
 * (static), optionally the same measured over a simulation (a {@link CurrentMeter}), and
 * the supply check: each rail's peak (heaters plus plate and bias) against its limit.
 * The static lowest and highest add up each instance's own extremes, so they bound every
 * state the logic can reach; the simulation shows the states a program really reaches.
 */
public final class Budget {

    /**
     * One rail's supply check at the rail's voltage under that load ({@code voltsAtPeak},
     * magnitude: nominal less the source resistance's drop, solved with the load it carries).
     * {@code heaterAmps} is the heater strings' current at that voltage; {@code stageAmps} the
     * plate and bias peak (the simulation's when there is one, else the static highest), scaled
     * from the nominal rail to the loaded one as the power-up model scales its loads, so the
     * peak is the power-up's steady state for the same rail and draws.
     */
    public record Supply(int rail, double heaterAmps, double stageAmps, boolean simulated, double peakAmps,
                         double limitAmps, double marginAmps, double voltsAtPeak) {
        public boolean limited() {
            return !Double.isInfinite(limitAmps) && !Double.isNaN(limitAmps);
        }

        public boolean over() {
            return limited() && peakAmps > limitAmps;
        }

        /** Margin as a fraction of the limit; NaN without a limit. */
        public double marginFraction() {
            return limited() ? marginAmps / limitAmps : Double.NaN;
        }
    }

    private final Machine m;
    private final StageDraw draw;
    private final TubeCount tubes;
    private final HeaterAnalysis heaters;
    private final CurrentMeter meter;
    private final double[][] low;
    private final double[][] high;
    private final boolean[][] draws;
    private final double[][] plate;
    private final List<Supply> supply;
    /** Heater strings at the rails' declared voltages: what a loaded rail's heaters are solved from. */
    private final HeaterAnalysis nominalHeaters;
    private final List<Finding> findings;

    /** The static budget, without a simulation, stage figures from the circuits, heaters at hot resistance. */
    public Budget(Machine m) {
        this(m, null);
    }

    /** The budget with a simulation's meter; {@code meter} may be null or hold no samples. */
    public Budget(Machine m, CurrentMeter meter) {
        this(meter != null ? meter.draw() : StageDraw.of(m), meter, HeaterLaw.HOT);
    }

    /**
     * The budget of {@code draw}'s machine with those stage figures, a simulation's meter (null or
     * empty: none; it must meter the same figures) and heater resistance by {@code law}.
     */
    public Budget(StageDraw draw, CurrentMeter meter, HeaterLaw law) {
        Machine m = draw.machine();
        this.m = m;
        this.draw = draw;
        this.tubes = new TubeCount(m);
        this.meter = meter != null && meter.samples() > 0 ? meter : null;
        int mods = m.modules().size();
        int rails = m.rails().size();
        low = new double[mods][rails];
        high = new double[mods][rails];
        draws = new boolean[mods][rails];
        plate = new double[mods][2];
        java.util.Set<String> used = new java.util.HashSet<>();
        for (DrawingInstance d : DrawingInstances.of(m)) {
            StageType st = m.stages().get(d.stage());
            used.add(st.name());
            for (int r = 0; r < rails; r++) {
                if (d.followsNet() || d.unsimulated()) {
                    low[d.module()][r] += draw.minAmps(st, r);
                    high[d.module()][r] += draw.maxAmps(st, r);
                } else {
                    double a = draw.amps(st, r, d.fixedHigh());
                    low[d.module()][r] += a;
                    high[d.module()][r] += a;
                }
                draws[d.module()][r] |= draw.drawsOn(st, r);
            }
            double pl = draw.plateWatts(st, false);
            double ph = draw.plateWatts(st, true);
            boolean free = d.followsNet() || d.unsimulated();
            plate[d.module()][0] += free ? Math.min(pl, ph) : draw.plateWatts(st, d.fixedHigh());
            plate[d.module()][1] += free ? Math.max(pl, ph) : draw.plateWatts(st, d.fixedHigh());
        }
        HeaterAnalysis nominal = new HeaterAnalysis(m, HeaterAnalysis.nominalVolts(m), law);
        this.nominalHeaters = nominal;
        double[] loaded = new double[rails];
        double[] stageNominal = new double[rails];
        for (int r = 0; r < rails; r++) {
            stageNominal[r] = this.meter != null ? this.meter.peakRail(r) : staticHighRail(r);
            loaded[r] = LoadedRail.volts(m.rails().get(r), nominal, r, stageNominal[r]);
        }
        this.heaters = new HeaterAnalysis(m, loaded, law);
        List<Supply> s = new ArrayList<>();
        List<Finding> f = new ArrayList<>(heaters.findings());
        f.addAll(StageFindings.of(draw, used));
        for (int r = 0; r < rails; r++) {
            Rail rail = m.rails().get(r);
            double scale = LoadedRail.scale(rail, loaded[r]);
            double heat = heaters.railAmps(r);
            double stage = stageNominal[r] * scale;
            double peak = heat + stage;
            Supply line = new Supply(r, heat, stage, this.meter != null, peak, rail.limitAmps(),
                    rail.limitAmps() - peak, loaded[r]);
            s.add(line);
            String subject = "rail " + rail.name();
            double staticPeak = heat + staticHighRail(r) * scale;
            if (line.over()) {
                f.add(new Finding(Finding.Severity.ERROR, subject,
                        "peak " + HeaterAnalysis.amps(peak) + " ("
                                + (heat > 0 ? "heaters " + HeaterAnalysis.amps(heat) + ", " : "")
                                + "plate and bias " + HeaterAnalysis.amps(stage)
                                + (line.simulated() ? " in the simulation" : " with every stage at its highest draw")
                                + ") exceeds its limit of " + HeaterAnalysis.amps(rail.limitAmps()),
                        "raise the supply's rating or move load to another rail"));
            } else if (this.meter != null && line.limited() && staticPeak > rail.limitAmps()) {
                f.add(new Finding(Finding.Severity.WARNING, subject,
                        "with every stage at its highest draw the rail would take "
                                + HeaterAnalysis.amps(staticPeak) + ", over its limit of "
                                + HeaterAnalysis.amps(rail.limitAmps()) + "; the program run stays within it",
                        "other programs or inputs may reach the limit"));
            }
        }
        supply = List.copyOf(s);
        findings = List.copyOf(f);
    }

    /**
     * What the totals leave out and why: built blocks declared offboard or whose stages are not
     * stated (program counter, ROM, clock generator), in the machine's order.
     */
    public List<String> leftOut() {
        return m.built().stream().filter(bb -> !bb.counted()).map(org.thermion.model.BuiltBlock::leftOut).toList();
    }

    /** The stage figures the budget adds up (computed or declared, per stage). */
    public StageDraw draw() {
        return draw;
    }

    public Machine machine() {
        return m;
    }

    public TubeCount tubes() {
        return tubes;
    }

    public HeaterAnalysis heaters() {
        return heaters;
    }

    /** The simulation's meter, or null for a static budget. */
    public CurrentMeter meter() {
        return meter;
    }

    public boolean simulated() {
        return meter != null;
    }

    /** A module's plate and bias current on a rail with every instance at its lowest draw. */
    public double staticLow(int module, int rail) {
        return low[module][rail];
    }

    /** A module's plate and bias current on a rail with every instance at its highest draw. */
    public double staticHigh(int module, int rail) {
        return high[module][rail];
    }

    /** True when some stage instance of the module declares a draw on the rail. */
    public boolean drawsOn(int module, int rail) {
        return draws[module][rail];
    }

    /** True when some stage instance of the machine declares a draw on the rail. */
    public boolean railHasDraws(int rail) {
        for (boolean[] d : draws) {
            if (d[rail]) {
                return true;
            }
        }
        return false;
    }

    public double staticLowRail(int rail) {
        double a = 0;
        for (double[] l : low) {
            a += l[rail];
        }
        return a;
    }

    /**
     * Rail {@code rail}'s voltage, signed, under the lightest static load: every stage instance at
     * its lowest draw, heaters at their steady state there (the heaviest is the supply check's
     * {@link Supply#voltsAtPeak}).
     */
    public double voltsAtLightest(int rail) {
        Rail r = m.rails().get(rail);
        return Math.signum(r.volts()) * LoadedRail.volts(r, nominalHeaters, rail, staticLowRail(rail));
    }

    public double staticHighRail(int rail) {
        double a = 0;
        for (double[] h : high) {
            a += h[rail];
        }
        return a;
    }

    /** A module's approximate plate dissipation with every instance at its lowest ({@code false}) or highest draw. */
    public double staticPlateWatts(int module, boolean highest) {
        return plate[module][highest ? 1 : 0];
    }

    /**
     * Power a module takes from all supplies: its heater share (at the loaded rails) plus plate
     * and bias current times nominal rail voltage, at the simulation's mean when there is one,
     * else at the highest draw.
     */
    public double supplyWatts(int module) {
        double w = heaters.moduleWatts(module);
        for (int r = 0; r < m.rails().size(); r++) {
            double a = meter != null ? meter.meanModule(module, r) : high[module][r];
            w += a * Math.abs(m.rails().get(r).volts());
        }
        return w;
    }

    public List<Supply> supply() {
        return supply;
    }

    /** Heater findings in string order, then supply findings in rail order. */
    public List<Finding> findings() {
        return findings;
    }

    /** True when a finding is an error: the check failed. */
    public boolean failed() {
        return findings.stream().anyMatch(Finding::isError);
    }
}
