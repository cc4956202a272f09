package org.thermion.power.startup;

import org.thermion.elab.Elaborator;
import org.thermion.lang.Diagnostics;
import org.thermion.lang.SourceSet;
import org.thermion.model.Machine;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** Machine descriptions written for the power-up tests (our own scenarios). */
final class StartupMachines {
    private StartupMachines() {
    }

    /**
     * A chain of {@code tubes} 6AU6 inverters (6.3 V 0.3 A heaters), heaters four to a string on
     * a 24 V rail behind a soft-start resistor bypassed after {@code bypass}.
     */
    static String inverters(int tubes, String resistor, String bypass, String heaterLimit) {
        return """
                rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
                rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
                rail heat  { voltage 24 V; source 0.05 ohm; limit %s }

                heaters on heat {
                  series 4 of 6AU6 across machine
                }

                softstart heat_soft on heat {
                  resistor %s rated 150 W
                  bypass %s
                }

                realize { not pentode_inverter }

                module chain {
                  in a
                  out y
                  net n[%d]
                  n[0] = !a
                  for k in 1..%d {
                    n[k] = !n[k - 1]
                  }
                  y = !n[%d]
                }

                machine inverters {
                  clock { phases 1; period 100 us }
                  top chain
                  inputs a
                  outputs y
                }
                """.formatted(heaterLimit, resistor, bypass, tubes - 1, tubes - 2, tubes - 2);
    }

    /** The inverter machine with its bypass worked by a 2D21 whose own heater sits on a stiff 6.3 V rail. */
    static String invertersWithThyratron(int tubes, String plate) {
        String base = inverters(tubes, "2 ohm", "when pilot_relay warm", "40 A");
        return base.replace("rail bias ", """
                rail pilot { voltage 6.3 V; source 0.01 ohm; limit 5 A }
                rail relay { voltage 24 V; source 0 ohm; limit 500 mA }
                stage pilot_relay : relay {
                  tube 2D21
                  sections 1
                  fanin 1
                  load %s from relay
                  draw high relay 100 mA
                  draw low relay 0 mA
                }
                rail bias """.formatted(plate)).replace("heaters on heat {", """
                heaters on pilot {
                  parallel 2D21
                }
                heaters on heat {""").replace("  bypass when", """
                  relay { coil 100 ohm; rated 12 V; pickup 7.2 V; dropout 1.2 V; operate 10 ms }
                  bypass when""");
    }

    /** The thyratron machine with a second heater rail and soft start, bypassed by an identical 2D21. */
    static String twoThyratronRails(int tubes) {
        String one = invertersWithThyratron(tubes, "50 ohm");
        return one.replace("rail heat  {", "rail heat2 { voltage 24 V; source 0.05 ohm; limit 40 A }\nrail heat  {")
                .replace("heaters on heat {", "heaters on heat2 {\n  series 4 of 6AU6 across machine\n}\nheaters on heat {")
                .replace("softstart heat_soft on heat {", """
                        softstart heat2_soft on heat2 {
                          resistor 2 ohm rated 150 W
                          relay { coil 100 ohm; rated 12 V; pickup 7.2 V; dropout 1.2 V; operate 10 ms }
                          bypass when pilot_relay warm
                        }
                        softstart heat_soft on heat {""");
    }

    /** A 6AU6 in series with a slow heater of our own type (30 s warm-up) on 12.6 V. */
    static String mixedString() {
        return """
                tube SLOW6 {
                  kind triode
                  sections 1
                  heater 6.3 V 300 mA
                  warmup 30 s
                  source "a test type of our own: a slow heater"
                }
                stage slow_follower : buffer {
                  tube SLOW6
                  sections 1
                  fanin 1
                  load 10 k from bias
                  draw always bplus 3.0 mA
                  draw always bias 3.0 mA
                }
                rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
                rail bias  { voltage -24 V; source 10 ohm; limit 150 mA }
                rail heat  { voltage 12.6 V; source 0.05 ohm; limit 40 A }
                heaters on heat { series 2 of 6AU6 SLOW6 across machine }
                realize { not pentode_inverter }
                module pair {
                  in a
                  out y
                  net n
                  n = !a
                  y = slow_follower(n)
                }
                machine mixed {
                  clock { phases 1; period 100 us }
                  top pair
                  inputs a
                  outputs y
                }
                """;
    }

    /**
     * Two boards ({@code front}, {@code back}) of two buffers each on a test tube type of our own
     * (6.3 V 0.3 A heater, cold-to-hot ratio 7, each buffer drawing 3 mA from a 48 V B+ behind
     * 4 ohm); per board one string of two heaters on a 12.6 V rail behind 0.1 ohm. {@code soft} is
     * the soft-start block (or empty).
     */
    static String boards(String soft) {
        return """
                tube TT6 {
                  kind triode
                  sections 1
                  heater 6.3 V 300 mA
                  coldratio 7
                  warmup 11 s
                  source "a test type of our own"
                }
                stage tt_buffer : buffer {
                  tube TT6
                  sections 1
                  fanin 1
                  draw always bplus 3 mA
                }
                rail bplus { voltage 48 V; source 4 ohm; limit 800 mA }
                rail heat  { voltage 12.6 V; source 0.1 ohm; limit 40 A }
                heaters on heat { series 2 of TT6 per module }
                %s
                module pair {
                  in a
                  out y
                  net n
                  n = tt_buffer(a)
                  y = tt_buffer(n)
                }
                module boards {
                  in a
                  out y, z
                  use pair as front (a: a, y: y)
                  use pair as back (a: a, y: z)
                }
                machine boards {
                  clock { phases 1; period 100 us }
                  top boards
                  inputs a
                  outputs y z
                }
                """.formatted(soft);
    }

    /**
     * {@code m} with soft start {@code index}'s bypass relay replaced by {@code relay}: figures the language
     * refuses (a drop-out above the pick-up), for paths only a sagging supply reaches in a real machine.
     */
    static Machine withRelay(Machine m, int index, org.thermion.model.Relay relay) {
        java.util.List<org.thermion.model.SoftStart> soft = new java.util.ArrayList<>(m.softStarts());
        org.thermion.model.SoftStart s = soft.get(index);
        soft.set(index, new org.thermion.model.SoftStart(s.name(), s.rail(), s.resistorOhms(), s.ratedWatts(), relay,
                s.trigger(), s.cover()));
        return new Machine(m.name(), m.clock(), m.tubes(), m.stages(), m.rails(), m.heaterRules(), java.util.List.copyOf(soft),
                m.modules(), m.netlist(), m.rom(), m.pc(), m.inputs(), m.outputs(), m.envelopes(), m.heaterStrings(),
                m.isa(), m.gateEnvelope(), m.latchEnvelope(), m.built(), m.radixes());
    }

    static Machine elaborate(String text) {
        Diagnostics d = new Diagnostics();
        Machine m = new Elaborator(new SourceSet(), d).elaborateText(Path.of("test.machine"), text);
        assertThat(d.hasErrors()).as(d.all().toString()).isFalse();
        assertThat(m).isNotNull();
        return m;
    }
}
