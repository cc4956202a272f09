package org.thermion.spice;

import org.thermion.circuit.ChildDiode;
import org.thermion.circuit.GridCurrentLaw;
import org.thermion.circuit.KorenPentode;
import org.thermion.circuit.KorenTriode;

import static org.thermion.spice.SpiceNumber.format;

/**
 * The tube laws Thermion solves with, written as SPICE3 behavioural-source expressions from the
 * published equations (each method names its source through the model it reads). Every guard a
 * Java model takes with an {@code if} is written with uramp(), and ln(1 + e^z) in the overflow-free
 * form uramp(z) + ln(1 + exp(-abs(z))), so the expressions are defined at every node voltage.
 * {@code scale} multiplies the law: sections in parallel times the emission factor.
 */
public final class TubeExpressions {
    /** Added to a pentode's screen voltage where it divides, so a screen at 0 V reads 0, not 0/0. */
    static final double SCREEN_FLOOR = 1e-30;

    private TubeExpressions() {
    }

    /** v(a) - v(b), ground written as 0 and left out. */
    public static String across(String a, String b) {
        String va = a.equals("0") ? "" : "v(" + a + ")";
        String vb = b.equals("0") ? "" : "v(" + b + ")";
        if (va.isEmpty() && vb.isEmpty()) {
            return "0";
        }
        if (vb.isEmpty()) {
            return va;
        }
        return "(" + (va.isEmpty() ? "" : va) + "-" + vb + ")";
    }

    private static String softplus(String z) {
        return "(uramp(" + z + ") + ln(1 + exp(-abs(" + z + "))))";
    }

    /**
     * Koren's triode plate current (as {@link KorenTriode#plateCurrent}): Ip = 2 E1^Ex / Kg1,
     * E1 = (Ep/Kp) ln(1 + exp(Kp (1/µ + Eg/√(Kvb + Ep²)))), Ep held at or above 0.
     */
    public static String triodePlate(KorenTriode m, double scale, String p, String g, String k) {
        String ep = "uramp(" + across(p, k) + ")";
        String eg = across(g, k);
        String z = format(m.kp()) + " * (" + format(1 / m.mu()) + " + " + eg + " / sqrt(" + format(m.kvb()) + " + "
                + ep + "^2))";
        String e1 = "(" + ep + "/" + format(m.kp()) + " * " + softplus(z) + ")";
        return format(2 * scale / m.kg1()) + " * " + e1 + "^" + format(m.ex());
    }

    /**
     * Koren's pentode plate current (as {@link KorenPentode#plateCurrent}), with the model's
     * continuity factor Eg2²/(Eg2² + 1): Ip = 2 E1^Ex / Kg1 · atan(Ep/Kvb) · fade, E1 =
     * (Eg2/Kp) ln(1 + exp(Kp (1/µ + Eg1/Eg2))), written as uramp(Eg2/µ + Eg1) + (Eg2/Kp) ln(1 + exp(-|z|)).
     */
    public static String pentodePlate(KorenPentode m, double scale, String p, String g1, String g2, String k) {
        String ep = "uramp(" + across(p, k) + ")";
        String es = "uramp(" + across(g2, k) + ")";
        String eg = across(g1, k);
        String z = format(m.kp()) + " * (" + format(1 / m.mu()) + " + " + eg + " / (" + es + " + "
                + format(SCREEN_FLOOR) + "))";
        String e1 = "(uramp(" + es + "/" + format(m.mu()) + " + " + eg + ") + " + es + "/" + format(m.kp())
                + " * ln(1 + exp(-abs(" + z + "))))";
        return format(2 * scale / m.kg1()) + " * " + e1 + "^" + format(m.ex()) + " * atan(" + ep + "/"
                + format(m.kvb()) + ") * " + fade(es);
    }

    /** Koren's pentode screen current (as {@link KorenPentode#screenCurrent}): (Eg1 + Eg2/µ)^Ex / Kg2 · fade. */
    public static String pentodeScreen(KorenPentode m, double scale, String g1, String g2, String k) {
        String es = "uramp(" + across(g2, k) + ")";
        return format(scale / m.kg2()) + " * uramp(" + across(g1, k) + " + " + es + "/" + format(m.mu()) + ")^"
                + format(m.ex()) + " * " + fade(es);
    }

    private static String fade(String es) {
        return "(" + es + "^2/(" + es + "^2 + 1))";
    }

    /** The 3/2-power (Child–Langmuir) law of {@link ChildDiode}: I = G·Va^1.5 for Va &gt; 0. */
    public static String diode(ChildDiode m, double scale, String a, String k) {
        return format(scale * m.perveance()) + " * uramp(" + across(a, k) + ")^1.5";
    }

    /** The grid current law of {@link GridCurrentLaw}: Ig = K·Vgk^1.5 for Vgk &gt; 0. */
    public static String grid(GridCurrentLaw law, double scale, String g, String k) {
        return format(scale * law.k()) + " * uramp(" + across(g, k) + ")^1.5";
    }

    /**
     * A lamp as the model solves it: V / (Rcold + (Rhot - Rcold)(|V|/Vr)^a), a = 0.45/(1 - 1/ratio)
     * (the tungsten rule of {@code circuit.Lamp}).
     */
    public static String lamp(double ratedVolts, double ratedAmps, double coldRatio, String a, String b) {
        double hot = ratedVolts / ratedAmps;
        double cold = hot / coldRatio;
        double exponent = 0.45 / (1 - 1 / coldRatio);
        String v = across(a, b);
        return v + "/(" + format(cold) + " + " + format(hot - cold) + " * (abs(" + v + ")/" + format(ratedVolts)
                + ")^" + format(exponent) + ")";
    }

    /** A fired thyratron's arc: the drop above {@code arcDrop} across {@code ohms}. */
    public static String arc(double arcDrop, double ohms, String a, String k) {
        return "uramp(" + across(a, k) + " - " + format(arcDrop) + ")/" + format(ohms);
    }
}
