package org.thermion.tui;

import org.thermion.text.Nouns;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import org.thermion.faults.Diagnosis;
import org.thermion.faults.FaultSimulator;
import org.thermion.faults.Step;
import org.thermion.model.Machine;

import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.function.Supplier;

/**
 * The bench mode on screen: the plan's current step (switches to set, cycles to clock), each
 * lamp as the working machine shows it beside what the builder says they see, and the suspects
 * best first. The plan is made on a background thread the first time the mode opens, so the UI
 * keeps drawing meanwhile. Keys: Up/Down pick a lamp, Space lit/dark, x not looked, e all as
 * expected, Enter records the step and goes on, Left/Right move between steps.
 */
final class BenchView {
    private final Supplier<BenchSession> maker;
    private CompletableFuture<BenchSession> bench;

    BenchView(Machine machine, long[] rom) {
        this.maker = () -> new BenchSession(machine, rom);
    }

    /** Starts making the plan (once). */
    void start() {
        if (bench == null) {
            bench = CompletableFuture.supplyAsync(maker);
        }
    }

    /** Waits for the plan (tests, and drawing a golden screen). */
    BenchSession await() {
        start();
        return bench.join();
    }

    /** The bench, or null while the plan is being made or when it failed. */
    BenchSession ready() {
        return bench != null && bench.isDone() && !bench.isCompletedExceptionally() ? bench.join() : null;
    }

    /** Acts on a key meant for the bench; false when the key is not the bench's (the UI's usual keys then apply). */
    boolean handle(KeyStroke k) {
        BenchSession b = ready();
        if (b == null) {
            return false;
        }
        KeyType t = k.getKeyType();
        if (t == KeyType.ArrowUp) {
            b.moveLamp(-1);
        } else if (t == KeyType.ArrowDown) {
            b.moveLamp(1);
        } else if (t == KeyType.Enter) {
            b.record();
        } else if (t == KeyType.ArrowLeft || t == KeyType.PageUp) {
            b.goTo(b.step() - 1);
        } else if (t == KeyType.ArrowRight || t == KeyType.PageDown) {
            b.goTo(b.step() + 1);
        } else if (t == KeyType.Character && !k.isCtrlDown()) {
            switch (k.getCharacter()) {
                case ' ': b.toggleLamp(); break;
                case 'x': b.skipLamp(); break;
                case 'e': b.asExpected(); break;
                case 'k': b.moveLamp(-1); break;
                case 'j': b.moveLamp(1); break;
                default: return false;
            }
        } else {
            return false;
        }
        return true;
    }

    void draw(Canvas c, Rect r) {
        c.fill(r, Palette.BACKGROUND);
        BenchSession b = ready();
        if (b == null) {
            String why = bench != null && bench.isCompletedExceptionally() ? failure() : "making the bring-up plan ...";
            c.box(r, "bench");
            c.text(r.col() + 2, r.row() + 2, Canvas.fit(why, r.width() - 4), Palette.TEXT);
            return;
        }
        int lampWidth = Math.min(30, Math.max(24, r.width() / 3));
        Rect left = new Rect(r.col(), r.row(), lampWidth, r.height());
        Rect right = new Rect(r.col() + lampWidth, r.row(), r.width() - lampWidth, r.height());
        drawStep(c, left, b);
        drawSuspects(c, right, b);
    }

    private String failure() {
        try {
            bench.join();
            return "";
        } catch (RuntimeException e) {
            Throwable cause = e.getCause() != null ? e.getCause() : e;
            return "no plan: " + cause.getMessage();
        }
    }

    private static void drawStep(Canvas c, Rect r, BenchSession b) {
        c.box(r, "step " + (b.step() + 1) + " of " + b.stepCount() + (b.recorded(b.step()) ? " (recorded)" : ""));
        Rect in = Canvas.inside(r);
        int w = in.width();
        int row = in.row();
        List<String> on = b.switchesOn();
        String set = on.isEmpty() ? "every switch off" : "on: " + String.join(" ", on);
        for (String line : wrap(set, w)) {
            c.text(in.col(), row++, line, Palette.KEY);
        }
        c.text(in.col(), row++, Canvas.fit("clock " + Nouns.count(b.cycles(), "cycle"), w), Palette.KEY);
        c.text(in.col(), row++, Canvas.fit("lamp        expect  seen", w), Palette.DIM);
        int rows = in.bottom() - row;
        int first = Math.max(0, Math.min(b.lamp() - rows / 2, b.lampCount() - rows));
        for (int i = first; i < b.lampCount() && row < in.bottom(); i++, row++) {
            byte e = b.expected(i);
            byte s = b.entry(i);
            boolean differs = s != Diagnosis.BLANK && e != FaultSimulator.UNKNOWN && s != e;
            String mark = i == b.lamp() ? String.valueOf(Glyphs.CURSOR) : " ";
            int x = c.text(in.col(), row, mark + Canvas.pad(Canvas.fit(b.lampName(i), 10), 11), Palette.TEXT);
            x = c.text(x, row, Canvas.pad(word(e), 8), Palette.DIM);
            c.text(x, row, Canvas.fit(word(s) + (differs ? " !" : ""), Math.max(0, in.right() - x)),
                    differs ? Palette.BREAKPOINT : s == 1 ? Palette.LIT : Palette.TEXT);
        }
    }

    private static String word(byte v) {
        return v == 1 ? Glyphs.LAMP_ON + " lit" : v == 0 ? Glyphs.LAMP_OFF + " dark" : v == FaultSimulator.UNKNOWN
                ? Glyphs.LAMP_UNKNOWN + " ?" : "-";
    }

    private static void drawSuspects(Canvas c, Rect r, BenchSession b) {
        int n = b.recordedCount();
        c.box(r, "suspects after " + Nouns.count(n, "step") + ", best first");
        Rect in = Canvas.inside(r);
        int w = in.width();
        int row = in.row();
        List<Diagnosis.Suspect> ranked = b.ranked();
        if (n == 0) {
            for (String line : wrap("Set the switches, clock the cycles, then mark each lamp as you see it and press "
                    + "Enter. The suspects narrow with every step.", w)) {
                c.text(in.col(), row++, line, Palette.DIM);
            }
            return;
        }
        int footer = b.done() ? 3 : 0;
        c.text(in.col(), row++, Canvas.fit("rank wrong  fault (wrong: lamps it contradicts)", w), Palette.DIM);
        for (Diagnosis.Suspect s : ranked) {
            if (row >= in.bottom() - footer) {
                break;
            }
            String rank = Canvas.pad(String.valueOf(s.rank()), 4) + Canvas.pad(String.valueOf(s.contradicted()), 3);
            for (String what : b.words(s)) {
                if (row >= in.bottom() - footer) {
                    break;
                }
                c.text(in.col(), row, rank, s.contradicted() == 0 ? Palette.HEADING : Palette.DIM);
                c.text(in.col() + 7, row, Canvas.fit(what, w - 7), s.rank() == 1 ? Palette.TEXT : Palette.DIM);
                row++;
            }
        }
        if (footer > 0) {
            Step next = b.nextStep();
            String words = next == null && b.leadingCount() <= 1 ? "every step recorded: look first at the fault at the top"
                    : next == null ? "every step recorded; no further step tells the leaders apart: check them by hand"
                    : (b.nextWidened() ? "to tell the leaders from the nearest (" + b.nextSplits() + " groups): after the plan, "
                    : "to split the leaders: after the plan, ") + (b.switchesOn(next).isEmpty() ? "every switch off"
                    : "on: " + String.join(" ", b.switchesOn(next))) + ", clock " + Nouns.count(next.cycles(), "cycle");
            int y = in.bottom() - footer;
            for (String line : wrap(words, w)) {
                if (y < in.bottom()) {
                    c.text(in.col(), y++, line, Palette.KEY);
                }
            }
        }
    }

    /** Breaks {@code s} at spaces into lines of at most {@code width}. */
    static List<String> wrap(String s, int width) {
        List<String> out = new java.util.ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : s.split(" ")) {
            if (line.length() > 0 && line.length() + 1 + word.length() > width) {
                out.add(line.toString());
                line.setLength(0);
            }
            line.append(line.length() == 0 ? "" : " ").append(word);
        }
        if (line.length() > 0) {
            out.add(Canvas.fit(line.toString(), width));
        }
        return out;
    }
}
