package org.thermion.tui;

import org.thermion.model.Machine;

/** Rail current against time from switch-on; solved once, in the background. */
public final class PowerUpView {
    private final Machine machine;

    public PowerUpView(Machine machine) {
        this.machine = machine;
    }

    void start() {
    }

    void draw(Canvas c, Rect r, View v) {
        c.box(r, "power-up");
        c.text(r.col() + 2, r.row() + 1, "the power-up solver is not built into this version", Palette.DIM);
    }
}
