package org.thermion.power.startup;

/** How a single heater is fed in a bench test: the current it carries at a given resistance. */
public sealed interface HeaterDrive {

    /** Current through a heater of resistance {@code ohms}. */
    double amps(double ohms);

    /** A stiff voltage source across the heater. */
    record ConstantVoltage(double volts) implements HeaterDrive {
        @Override
        public double amps(double ohms) {
            return volts / ohms;
        }
    }

    /** A voltage source behind a series resistor (the series-string warm-up test). */
    record SeriesResistor(double volts, double seriesOhms) implements HeaterDrive {
        @Override
        public double amps(double ohms) {
            return volts / (seriesOhms + ohms);
        }
    }

    /** A current source. */
    record ConstantCurrent(double amps) implements HeaterDrive {
        @Override
        public double amps(double ohms) {
            return amps;
        }
    }

    /** The standard warm-up test circuit for a heater rating: 4 x rated voltage through 3 x rated hot resistance. */
    static HeaterDrive warmupTest(org.thermion.model.HeaterRating r) {
        return new SeriesResistor(4 * r.volts(), 3 * r.hotOhms());
    }
}
