package org.thermion.timing;

import org.thermion.text.Quantities;

import org.thermion.model.NetLabels;
import org.thermion.circuit.Corner;
import org.thermion.circuit.DiodeGate;
import org.thermion.circuit.FlipFlop;
import org.thermion.circuit.KorenPentode;
import org.thermion.circuit.KorenTriode;
import org.thermion.circuit.Load;
import org.thermion.circuit.LoadResistor;
import org.thermion.circuit.StageCircuit;
import org.thermion.circuit.TubeModel;
import org.thermion.circuit.TubeStage;
import org.thermion.model.Machine;
import org.thermion.model.StageType;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * What would make a failing or tight path meet its budget. The path's slowest step is the
 * dominant stage; for it each remedy is worked out from the same figures the delays came from:
 * a lower plate (or pull) load down the E12 series (IEC 60063), fewer loads on its output, another
 * library tube of the same kind, and the longer phase that would fit the path as it is. A step's
 * new delay is its delay scaled by the change in its nominal output resistance (and capacitance,
 * for loads moved away), so each figure is computed, never a rule of thumb.
 */
public final class PathAdvice {
    /** A path is tight when its slack is under this share of its budget (our own threshold). */
    public static final double TIGHT = 0.10;
    private static final double[] E12 = {1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2};

    /** One remedy: its kind, what to change, and the step's delay and the path's slack after it. */
    public record Remedy(int phase, String stage, String net, String kind, String change, double delayBefore,
                         double delayAfter, double slackAfter) {
        public boolean enough() {
            return slackAfter >= 0;
        }
    }

    private final Machine machine;
    private final DelayCalculator calc;
    private final NetLabels labels;

    public PathAdvice(Machine machine, DelayCalculator calc) {
        this.machine = machine;
        this.calc = calc;
        this.labels = new NetLabels(machine.netlist());
    }

    /** True when {@code p} fails or has under {@link #TIGHT} of its budget to spare. */
    public static boolean tight(PhaseTiming p) {
        return p.hasPath() && p.slack() < TIGHT * p.budget();
    }

    /** Remedies for every failing or tight phase path of {@code r}, and for the critical one. */
    public List<Remedy> advise(TimingReport r) {
        List<Remedy> out = new ArrayList<>();
        for (PhaseTiming p : r.perPhase()) {
            if (tight(p)) {
                out.addAll(advise(p, r.phases(), r.periodSeconds()));
            }
        }
        return out;
    }

    /** Remedies for one path at clock period {@code period}. */
    public List<Remedy> advise(PhaseTiming p, int phases, double period) {
        List<Remedy> out = new ArrayList<>();
        PathStep dom = dominant(p);
        if (dom == null) {
            return out;
        }
        String net = labels.label(dom.net());
        StageType st = stage(dom.stage());
        StageCircuit c = st == null ? null : calc.circuit(st);
        boolean rise = dom.edge() == 'r';
        List<Load> loads = calc.loadsOn(dom.net());
        double baseOhms = c == null ? Double.NaN : ohms(c, loads, rise);
        // A lower load.
        double load = c != null ? loadOhms(c) : st != null ? st.loadOhms() : Double.NaN;
        if (Double.isFinite(load)) {
            Remedy best = null;
            for (double v : e12Below(load)) {
                double after;
                if (c != null) {
                    after = dom.delay() * ohms(withLoad(c, v), loads, rise) / baseOhms;
                } else if (viaLoad(st, rise)) {
                    after = dom.delay() * v / load;
                } else {
                    break;
                }
                if (!(after < dom.delay() * 0.99)) {
                    break;
                }
                best = new Remedy(p.phase(), dom.stage(), net, "lower load", "load " + Quantities.ohms(load) + " -> "
                        + Quantities.ohms(v), dom.delay(), after, p.slack() + dom.delay() - after);
                if (best.enough()) {
                    break;
                }
            }
            if (best != null) {
                out.add(best);
            }
        }
        // Fewer loads.
        int pins = calc.pinsOn(dom.net()).size();
        if (pins > 1 && st != null) {
            int sections = st.sectionsFor(dom.kind().equals("gate")
                    ? machine.netlist().gates().get(dom.index()).arity() : 1);
            double farads = calc.drivenFarads(st, sections, dom.net());
            double perPin = (farads - calc.ownFarads(st, sections)) / pins;
            Remedy best = null;
            for (int k = 1; k < pins; k++) {
                double rScale = 1;
                if (c != null && k <= loads.size()) {
                    rScale = ohms(c, loads.subList(0, loads.size() - k), rise) / baseOhms;
                }
                double after = dom.delay() * rScale * (farads - k * perPin) / farads;
                best = new Remedy(p.phase(), dom.stage(), net, "fewer loads", "move " + k + " of its " + pins
                        + " loads to a buffer", dom.delay(), after, p.slack() + dom.delay() - after);
                if (best.enough()) {
                    break;
                }
            }
            if (best != null && best.delayAfter() < dom.delay() * 0.99) {
                out.add(best);
            }
        }
        // A faster tube of the same kind.
        if (c instanceof TubeStage t) {
            Remedy best = null;
            for (TubeModel m : calc.circuits().tubes().models()) {
                if (m.getClass() != t.tube().getClass() || m.name().equals(t.tube().name())) {
                    continue;
                }
                double after = dom.delay() * ohms(withTube(t, m), loads, rise) / baseOhms;
                if (after < dom.delay() * 0.99 && (best == null || after < best.delayAfter())) {
                    best = new Remedy(p.phase(), dom.stage(), net, "faster tube", "tube " + t.tube().name() + " -> "
                            + m.name() + " (same circuit)", dom.delay(), after, p.slack() + dom.delay() - after);
                }
            }
            if (best != null) {
                out.add(best);
            }
        }
        // A longer phase.
        if (p.span() > 0) {
            double width = (p.arrival() + p.setup()) / p.span();
            double newPeriod = width * phases;
            out.add(new Remedy(p.phase(), dom.stage(), net, "longer phase", String.format(Locale.ROOT,
                    "phase width %s -> %s (period %s, %s)", seconds(period / phases), seconds(width),
                    seconds(newPeriod), hertz(1 / newPeriod)), dom.delay(), dom.delay(),
                    p.slack() + (width - period / phases) * p.span()));
        }
        return out;
    }

    /** The slowest stage step of a path, or null. */
    public static PathStep dominant(PhaseTiming p) {
        PathStep best = null;
        for (PathStep s : p.path()) {
            if ((s.kind().equals("gate") || s.kind().equals("latch")) && (best == null || s.delay() > best.delay())) {
                best = s;
            }
        }
        return best;
    }

    private double ohms(StageCircuit c, List<Load> loads, boolean rise) {
        StageDrive.Edges e = calc.drive().edges(c, loads, Corner.NOMINAL);
        return rise ? e.riseOhms() : e.fallOhms();
    }

    private boolean viaLoad(StageType st, boolean rise) {
        return calc.pullsDown(st) != rise;
    }

    private static double loadOhms(StageCircuit c) {
        if (c instanceof TubeStage t && t.load() instanceof LoadResistor r) {
            return r.ohms();
        }
        if (c instanceof DiodeGate d) {
            return d.pullOhms();
        }
        if (c instanceof FlipFlop f) {
            return f.loadOhms();
        }
        return Double.NaN;
    }

    private static StageCircuit withLoad(StageCircuit c, double ohms) {
        if (c instanceof TubeStage t) {
            return new TubeStage(t.name(), t.tube(), t.arrangement(), t.inputs(), t.sectionsPerInput(),
                    new LoadResistor(ohms), t.plateRail(), t.cathode(), t.grid(), t.screen(), t.output());
        }
        if (c instanceof DiodeGate d) {
            return new DiodeGate(d.name(), d.diode(), d.kind(), d.inputs(), ohms, d.pullRail(), d.outputLoads());
        }
        FlipFlop f = (FlipFlop) c;
        return new FlipFlop(f.name(), f.tube(), ohms, f.plateRail(), f.cross(), f.cathode());
    }

    private static StageCircuit withTube(TubeStage t, TubeModel m) {
        return new TubeStage(t.name(), m, t.arrangement(), t.inputs(), t.sectionsPerInput(), t.load(), t.plateRail(),
                t.cathode(), t.grid(), m instanceof KorenPentode ? t.screen() : null, t.output());
    }

    /** E12 values below {@code ohms}, largest first, down to a third of it. */
    static List<Double> e12Below(double ohms) {
        List<Double> out = new ArrayList<>();
        double decade = Math.pow(10, Math.floor(Math.log10(ohms)));
        for (int d = 0; d < 2; d++) {
            for (int i = E12.length - 1; i >= 0; i--) {
                double v = E12[i] * decade / Math.pow(10, d);
                if (v < ohms * 0.999 && v >= ohms / 3) {
                    out.add(v);
                }
            }
        }
        return out;
    }

    private StageType stage(String name) {
        for (StageType s : machine.stages()) {
            if (s.name().equals(name)) {
                return s;
            }
        }
        return null;
    }

    private static String trim(double v) {
        String s = String.format(Locale.ROOT, "%.3g", v);
        return s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
    }

    private static String seconds(double s) {
        return s >= 1e-3 ? trim(s * 1e3) + " ms" : trim(s * 1e6) + " us";
    }

    private static String hertz(double f) {
        return f >= 1e3 ? trim(f / 1e3) + " kHz" : trim(f) + " Hz";
    }
}
