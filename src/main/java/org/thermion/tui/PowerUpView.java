package org.thermion.tui;

import com.googlecode.lanterna.TextColor;
import org.thermion.model.Machine;
import org.thermion.power.startup.CurrentPlot;
import org.thermion.power.startup.PowerUpOptions;
import org.thermion.power.startup.PowerUpResult;
import org.thermion.power.startup.PowerUpSolver;
import org.thermion.power.startup.RailTransient;
import org.thermion.power.startup.SoftStartResult;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;

/**
 * The power-up screen: one rail's current against time from switch-on, with its peaks and
 * the bypass. The transient is solved once, on a background thread, the first time the view
 * opens, so the machine screen never waits for it.
 */
public final class PowerUpView {
    private static final String[] CAUTION = {"Caution: B+, heater and mains supplies can injure or kill.",
        "These are planning estimates: confirm them on the bench; follow local codes and qualified practice."};

    private final Machine machine;
    private final PowerUpOptions options;
    private CompletableFuture<PowerUpResult> solving;

    public PowerUpView(Machine machine) {
        this(machine, PowerUpOptions.defaults());
    }

    public PowerUpView(Machine machine, PowerUpOptions options) {
        this.machine = machine;
        this.options = options;
    }

    /** Starts the solve if it has not started. */
    void start() {
        if (solving == null) {
            solving = new CompletableFuture<>();
            Thread t = new Thread(() -> {
                try {
                    solving.complete(PowerUpSolver.solve(machine, options));
                } catch (RuntimeException | Error e) {
                    solving.completeExceptionally(e);
                }
            }, "power-up solve");
            t.setDaemon(true);
            t.start();
        }
    }

    /** Waits for the solve (tests); false when it did not finish in time. */
    boolean await(Duration d) throws InterruptedException {
        start();
        try {
            solving.get(d.toMillis(), TimeUnit.MILLISECONDS);
            return true;
        } catch (ExecutionException e) {
            return true;
        } catch (TimeoutException e) {
            return false;
        }
    }

    void draw(Canvas c, Rect r, View v) {
        if (solving == null || !solving.isDone()) {
            c.box(r, "power-up");
            c.text(r.col() + 2, r.row() + 2, "solving the power-up transient (heaters warming, rails, soft start)\u2026",
                    Palette.DIM);
            return;
        }
        PowerUpResult result;
        try {
            result = solving.getNow(null);
        } catch (RuntimeException e) {
            Throwable cause = e.getCause() != null ? e.getCause() : e;
            c.box(r, "power-up");
            c.text(r.col() + 2, r.row() + 2, Canvas.fit("the power-up solve failed: " + cause.getMessage(), r.width() - 4),
                    Palette.STOPPED);
            return;
        }
        List<RailTransient> rails = result.rails();
        if (rails.isEmpty()) {
            c.box(r, "power-up");
            c.text(r.col() + 2, r.row() + 2, "the machine declares no rails", Palette.DIM);
            return;
        }
        int index = Math.floorMod(firstInteresting(rails) + v.rail, rails.size());
        RailTransient rt = rails.get(index);
        c.box(r, "power-up \u00B7 rail " + rt.name() + " (" + (index + 1) + " of " + rails.size() + ")");
        Rect in = Canvas.inside(r);
        List<String> summary = summary(rt, result);
        int plotHeight = Math.max(7, in.height() - summary.size() - 1);
        List<CurrentPlot.Marker> markers = new ArrayList<>();
        if (!Double.isNaN(rt.bypassTime())) {
            markers.add(new CurrentPlot.Marker(rt.bypassTime(), "bypass"));
        }
        String title = String.format("%s, %.1f V: current from switch-on", rt.name(), rt.volts());
        List<String> plot = CurrentPlot.render(rt.t(), rt.amps(), in.width() - 2, plotHeight, title, markers,
                rt.limitAmps(), CurrentPlot.Style.BLOCKS);
        Canvas cc = c.within(in);
        int row = in.row();
        for (int i = 0; i < plot.size() && row < in.bottom(); i++, row++) {
            plotLine(cc, in.col() + 1, row, plot.get(i), i == 0);
        }
        row++;
        for (String s : summary) {
            if (row >= in.bottom()) {
                break;
            }
            cc.text(in.col() + 1, row++, Canvas.fit(s, in.width() - 2), s.startsWith("Caution") || s == CAUTION[1] ? Palette.DIM : Palette.TEXT);
        }
    }

    /** Starts on a rail with a soft start, where the inrush story is; else the first rail. */
    private static int firstInteresting(List<RailTransient> rails) {
        for (int i = 0; i < rails.size(); i++) {
            if (rails.get(i).hasSoftStart()) {
                return i;
            }
        }
        return 0;
    }

    private static List<String> summary(RailTransient rt, PowerUpResult result) {
        List<String> s = new ArrayList<>();
        String limit = Double.isInfinite(rt.limitAmps()) ? "no limit declared" : "limit " + PowerPanel.amps(rt.limitAmps());
        s.add(String.format("switch-on peak %s at %s;  settles at %s;  %s", PowerPanel.amps(rt.switchOnPeak()),
                seconds(rt.switchOnTime()), PowerPanel.amps(rt.finalAmps()), limit));
        if (rt.hasSoftStart()) {
            String bypass = Double.isNaN(rt.bypassTime()) ? "the bypass relay did not close in the run"
                    : String.format("bypass relay closes at %s, peak after it %s", seconds(rt.bypassTime()),
                    PowerPanel.amps(rt.bypassPeak()));
            for (SoftStartResult ss : result.softStarts()) {
                if (ss.rail() == rt.rail()) {
                    bypass += String.format(";  %s: %.2f ohm, %.0f J, peak %.0f W", ss.name(), ss.ohms(), ss.joules(),
                            ss.peakWatts());
                }
            }
            s.add(bypass);
        }
        if (rt.secondsInLimit() > 0) {
            s.add(String.format("the supply held its limit for %s", seconds(rt.secondsInLimit())));
        }
        s.addAll(List.of(CAUTION));
        return s;
    }

    static String seconds(double t) {
        if (Double.isNaN(t)) {
            return "-";
        }
        return t < 1 ? String.format("%.0f ms", t * 1000) : String.format("%.2f s", t);
    }

    /** Blocks glow, the limit line warns, axes and labels stay quiet. */
    private static void plotLine(Canvas c, int col, int row, String line, boolean title) {
        if (title) {
            c.text(col, row, line, Palette.HEADING);
            return;
        }
        int i = 0;
        while (i < line.length()) {
            TextColor color = colorOf(line.charAt(i));
            int j = i + 1;
            while (j < line.length() && colorOf(line.charAt(j)) == color) {
                j++;
            }
            c.text(col + i, row, line.substring(i, j), color);
            i = j;
        }
    }

    private static TextColor colorOf(char ch) {
        if (ch >= '\u2581' && ch <= '\u2588') {
            return Palette.LIT;
        }
        if (ch == '\u254C') {
            return Palette.STOPPED;
        }
        return Palette.DIM;
    }
}
