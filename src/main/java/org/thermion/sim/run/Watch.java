package org.thermion.sim.run;

import java.util.Arrays;

/**
 * One watched name: a net, a bus (its nets LSB first, shown as a number) or the program counter
 * ({@code nets} empty).
 */
public record Watch(String name, int[] nets) {
    public Watch {
        nets = nets.clone();
    }

    /** The program counter. */
    public static Watch pc() {
        return new Watch("pc", new int[0]);
    }

    public boolean isPc() {
        return nets.length == 0;
    }

    @Override
    public int[] nets() {
        return nets.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Watch w && w.name.equals(name) && Arrays.equals(w.nets, nets);
    }

    @Override
    public int hashCode() {
        return name.hashCode() * 31 + Arrays.hashCode(nets);
    }

    @Override
    public String toString() {
        return name + Arrays.toString(nets);
    }
}
