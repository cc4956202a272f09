package org.thermion.spice;

/**
 * One element line of a SPICE3 deck, restricted to the four kinds Thermion writes: resistor,
 * capacitor, independent DC voltage source and behavioural current source. Node "0" is ground.
 */
public sealed interface SpiceCard permits SpiceCard.Resistor, SpiceCard.Capacitor, SpiceCard.VoltageSource,
        SpiceCard.CurrentExpression {

    /** The element name, its first letter the SPICE3 element kind. */
    String name();

    /** The card as one logical line. */
    String line();

    /** The two nodes the element joins, in card order. */
    default java.util.List<String> nodes() {
        if (this instanceof Resistor r) {
            return java.util.List.of(r.a(), r.b());
        }
        if (this instanceof Capacitor c) {
            return java.util.List.of(c.a(), c.b());
        }
        if (this instanceof VoltageSource v) {
            return java.util.List.of(v.plus(), v.minus());
        }
        CurrentExpression b = (CurrentExpression) this;
        return java.util.List.of(b.from(), b.to());
    }

    /** {@code Rname a b ohms}. */
    record Resistor(String name, String a, String b, double ohms) implements SpiceCard {
        public String line() {
            return name + " " + a + " " + b + " " + SpiceNumber.format(ohms);
        }
    }

    /** {@code Cname a b farads}. */
    record Capacitor(String name, String a, String b, double farads) implements SpiceCard {
        public String line() {
            return name + " " + a + " " + b + " " + SpiceNumber.format(farads);
        }
    }

    /** {@code Vname plus minus DC volts}. */
    record VoltageSource(String name, String plus, String minus, double volts) implements SpiceCard {
        public String line() {
            return name + " " + plus + " " + minus + " DC " + SpiceNumber.format(volts);
        }
    }

    /**
     * {@code Bname from to I=expression}: a current that flows from node {@code from} through the
     * source into node {@code to} (SPICE3's sign: out of the first node).
     */
    record CurrentExpression(String name, String from, String to, String expression) implements SpiceCard {
        public String line() {
            return name + " " + from + " " + to + " I=" + expression;
        }
    }
}
