package org.thermion.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.function.LongSupplier;

/**
 * One progress bar on standard error for the long commands (sweeps, verify, plan): the share done,
 * the rate and the time left, redrawn in place at most four times a second, and only once the work
 * has run a second (short runs stay silent). By default it shows only when standard error is a
 * terminal: Java 17 can ask that of the console as a whole, not of standard error alone, so on
 * Linux it reads where {@code /proc/self/fd/2} points; elsewhere it stays off. {@code --progress}
 * and {@code --quiet} override. Safe to update from several threads.
 */
final class ProgressBar implements AutoCloseable {
    /** When to draw. */
    enum Mode { AUTO, ALWAYS, NEVER }

    static final int WIDTH = 79;
    private static final long DELAY = 1_000_000_000L, INTERVAL = 250_000_000L;

    private final PrintWriter err;
    private final String what;
    private final String unit;
    private final boolean enabled;
    private final LongSupplier clock;
    private final long start;
    private long last = Long.MIN_VALUE;
    private boolean drawn;
    private Thread ticker;

    ProgressBar(PrintWriter err, String what, String unit, boolean enabled, LongSupplier clock) {
        this.err = err;
        this.what = what;
        this.unit = unit;
        this.enabled = enabled;
        this.clock = clock;
        this.start = clock.getAsLong();
    }

    /** A bar for {@code what} counted in {@code unit} (plural), drawn as {@code mode} asks. */
    static ProgressBar start(PrintWriter err, String what, String unit, Mode mode) {
        boolean on = mode == Mode.ALWAYS || mode == Mode.AUTO && stderrIsTerminal();
        return new ProgressBar(err, what, unit, on, System::nanoTime);
    }

    /**
     * A bar for work that reports no count (a plan's generation): the time so far, redrawn by a
     * daemon thread until {@link #close}.
     */
    static ProgressBar ticking(PrintWriter err, String what, Mode mode) {
        ProgressBar bar = start(err, what, "", mode);
        if (bar.enabled) {
            bar.ticker = new Thread(() -> {
                try {
                    while (!Thread.currentThread().isInterrupted()) {
                        bar.update(-1, 0);
                        Thread.sleep(INTERVAL / 1_000_000L);
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }, "progress");
            bar.ticker.setDaemon(true);
            bar.ticker.start();
        }
        return bar;
    }

    /** True when standard error is a terminal (Linux: {@code /proc/self/fd/2} points at a tty). */
    static boolean stderrIsTerminal() {
        try {
            Path fd = Path.of("/proc/self/fd/2");
            if (!Files.isSymbolicLink(fd)) {
                return false;
            }
            String target = Files.readSymbolicLink(fd).toString();
            return target.startsWith("/dev/pts/") || target.startsWith("/dev/tty") || target.equals("/dev/console");
        } catch (java.io.IOException | UnsupportedOperationException | SecurityException e) {
            return false;
        }
    }

    /** {@code done} of {@code total} (total 0 or less: not known, so elapsed time and count only). */
    synchronized void update(long done, long total) {
        if (!enabled) {
            return;
        }
        long now = clock.getAsLong();
        if (now - start < DELAY || drawn && now - last < INTERVAL) {
            return;
        }
        last = now;
        drawn = true;
        err.print("\r" + line(what, unit, done, total, (now - start) / 1e9));
        err.flush();
    }

    /** Clears the bar's line, when one was drawn. */
    @Override
    public void close() {
        Thread t = ticker;
        if (t != null) {
            t.interrupt();
            try {
                t.join(1000);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
        clear();
    }

    private synchronized void clear() {
        if (drawn) {
            err.print("\r" + " ".repeat(WIDTH) + "\r");
            err.flush();
            drawn = false;
        }
    }

    /** The bar's text, {@link #WIDTH} characters wide. */
    static String line(String what, String unit, long done, long total, double seconds) {
        String rate = seconds > 0 && done > 0 ? rate(done / seconds) + " " + unit + "/s" : "";
        String text;
        if (total > 0) {
            double share = Math.min(1, Math.max(0, (double) done / total));
            String left = done > 0 && done < total ? "  " + duration(seconds * (total - done) / done) + " left" : "";
            String tail = String.format(Locale.ROOT, " %3d %%  %d of %d %s  %s%s", Math.round(share * 100), done, total, unit,
                    rate, left);
            int room = Math.max(10, WIDTH - what.length() - tail.length() - 4);
            int full = (int) Math.round(share * room);
            text = what + " [" + "#".repeat(full) + "-".repeat(room - full) + "]" + tail;
        } else if (done < 0) {
            text = what + ": working, " + duration(seconds) + " so far";
        } else {
            text = what + ": " + done + " " + unit + ", " + duration(seconds) + (rate.isEmpty() ? "" : "  " + rate);
        }
        if (text.length() > WIDTH) {
            text = text.substring(0, WIDTH);
        }
        return text + " ".repeat(WIDTH - text.length());
    }

    private static String rate(double r) {
        return r >= 100 ? String.format(Locale.ROOT, "%.0f", r) : String.format(Locale.ROOT, "%.3g", r);
    }

    /** A duration for people: {@code 45 s}, {@code 3 min 20 s}, {@code 2 h 5 min}. */
    static String duration(double s) {
        long t = Math.round(s);
        if (t < 60) {
            return t + " s";
        }
        if (t < 3600) {
            return t / 60 + " min " + t % 60 + " s";
        }
        return t / 3600 + " h " + t % 3600 / 60 + " min";
    }
}
