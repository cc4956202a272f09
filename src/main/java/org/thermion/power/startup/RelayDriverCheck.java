package org.thermion.power.startup;

import org.thermion.model.Relay;

/**
 * A thyratron driving a relay coil from a DC rail through a plate resistor. Once fired, a gas
 * thyratron holds a nearly constant arc drop and its grid loses control, so the coil current
 * is simply {@code (V_rail - V_arc) / (R_source + R_plate + R_coil)} and flows until the anode
 * supply is broken: on a DC supply the average and peak tube currents are both that current.
 *
 * @param tube             thyratron type
 * @param railName         the rail feeding the plate circuit
 * @param railVolts        its voltage (magnitude)
 * @param sourceOhms       its source resistance
 * @param arcDropVolts     tube drop while conducting
 * @param plateOhms        plate resistor
 * @param relay            the relay's coil data
 * @param coilVolts        voltage across the coil while conducting
 * @param coilAmps         coil (and tube) current
 * @param avgRatingAmps    the tube's average cathode current rating (NaN if unknown)
 * @param peakRatingAmps   the tube's peak cathode current rating (NaN if unknown)
 * @param fireTime         when the tube fired in the transient (NaN: not simulated or never)
 * @param heatingSeconds   cathode heating time the tube asks before anode current (NaN if none declared)
 * @param coil             what the coil saw in the transient (null: not simulated)
 */
public record RelayDriverCheck(String tube, String railName, double railVolts, double sourceOhms, double arcDropVolts,
                               double plateOhms, Relay relay, double coilVolts, double coilAmps, double avgRatingAmps,
                               double peakRatingAmps, double fireTime, double heatingSeconds, CoilTransient coil) {

    /** Works out the coil circuit. */
    public static RelayDriverCheck of(String tube, String railName, double railVolts, double sourceOhms,
                                      double arcDropVolts, double plateOhms, Relay relay, double avgRatingAmps,
                                      double peakRatingAmps, double fireTime, double heatingSeconds) {
        double drive = Math.abs(railVolts) - arcDropVolts;
        double amps = drive > 0 ? drive / (sourceOhms + plateOhms + relay.coilOhms()) : 0;
        return new RelayDriverCheck(tube, railName, Math.abs(railVolts), sourceOhms, arcDropVolts, plateOhms, relay,
                amps * relay.coilOhms(), amps, avgRatingAmps, peakRatingAmps, fireTime, heatingSeconds, null);
    }

    /** The same check with what the transient found. */
    RelayDriverCheck simulated(double fired, CoilTransient c) {
        return new RelayDriverCheck(tube, railName, railVolts, sourceOhms, arcDropVolts, plateOhms, relay, coilVolts,
                coilAmps, avgRatingAmps, peakRatingAmps, fired, heatingSeconds, c);
    }

    /**
     * The coil picks up: in the transient, the contacts closed; without one, the coil's steady
     * voltage on the nominal supply reaches the pick-up voltage (a relay without one declared has
     * {@link Relay#PICKUP_FRACTION} of rated).
     */
    public boolean picksUp() {
        return coil != null ? coil.closed() : coilVolts >= relay.pickupVolts();
    }

    /** The contacts opened again under a sagging supply (chatter). */
    public boolean chatters() {
        return coil != null && coil.chattered();
    }

    /** Coil voltage over rated. */
    public double ratedRatio() {
        return coilVolts / relay.ratedVolts();
    }

    /** Coil within +10 % of its rated voltage (common practice for continuous duty). */
    public boolean coilNotOverdriven() {
        return ratedRatio() <= 1.10;
    }

    public boolean averageOk() {
        return Double.isNaN(avgRatingAmps) || coilAmps <= avgRatingAmps;
    }

    public boolean peakOk() {
        return Double.isNaN(peakRatingAmps) || coilAmps <= peakRatingAmps;
    }

    /** The tube fired only after its required cathode heating time (true when either is unknown). */
    public boolean heatedLongEnough() {
        return Double.isNaN(fireTime) || Double.isNaN(heatingSeconds) || fireTime >= heatingSeconds;
    }

    /**
     * The coil and the tube's current ratings. The cathode heating time is not part of it: the anode
     * has its voltage from switch-on by design, a rating a builder may knowingly bend (noted instead).
     */
    public boolean ok() {
        return picksUp() && !chatters() && coilNotOverdriven() && averageOk() && peakOk();
    }
}
