package org.thermion.circuit;

/** No plate load: the plate is tied to its rail (a cathode follower). */
public record DirectToRail() implements PlateLoad {
    public void attach(CircuitBuilder b, int rail, int plate) {
        throw new IllegalStateException("a direct plate is the rail node itself");
    }

    @Override
    public boolean direct() {
        return true;
    }
}
