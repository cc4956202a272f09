package org.thermion.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.Screen;
import org.thermion.asm.ListingLine;
import org.thermion.model.Port;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

/**
 * The terminal screen over a {@link Session}: turns keys into session commands, runs the
 * machine in batches between frames while it is running, and draws about 25 frames a
 * second. {@link #handle} and {@link #draw} work on any Lanterna screen, so tests drive a
 * virtual terminal with them; {@link #loop} is the real thing.
 */
public final class TerminalUi {
    static final long FRAME_NANOS = 40_000_000L;
    /** Share of a frame given to simulation while running; the rest draws and reads keys. */
    static final long RUN_NANOS = 34_000_000L;
    /** Cycles between clock reads while running; breakpoints are still checked every cycle. */
    static final long BATCH = 2_000;

    private final Screen screen;
    private final View view = new View();
    private final String program;
    private final Frame frame = new Frame(new Cells());
    // The session and what is made from its machine: all replaced together when a reload succeeds.
    private Session session;
    private PowerUpView powerUp;
    /** The bench mode, made when first opened (its plan takes a while on a large machine). */
    private BenchView bench;
    private List<Keymap.HelpLine> help;
    private Pace pace;
    private boolean quit;
    private long rateCycles;
    private long rateSince = System.nanoTime();
    /** Reads the files again after a save; null when the UI does not watch them. */
    private Reloader reloader;
    private FileStamps stamps;
    private long lastPoll;

    public TerminalUi(Screen screen, Session session, String program, PowerUpView powerUp) {
        this.screen = screen;
        this.program = program;
        use(session, powerUp);
        int first = session.listingIndex(session.pc());
        view.cursor = Math.max(0, first);
        // Open at the instruction, not at the file's header comments: a few lines of context above it.
        view.top = Math.max(0, first - 3);
    }

    private void use(Session s, PowerUpView p) {
        this.session = s;
        this.powerUp = p;
        this.bench = null;
        List<String> names = new ArrayList<>();
        for (Port port : s.machine().inputs()) {
            names.add(port.name());
        }
        this.help = Keymap.help(names, s.switchFed());
        this.pace = new Pace(s.machine().clock().periodSeconds());
    }

    /** Watches the files {@code r} read and reloads when one is saved (polled between frames). */
    public TerminalUi reloadOnSave(Reloader r) {
        this.reloader = r;
        this.stamps = new FileStamps(r.files());
        return this;
    }

    /** Polls the watched files at most every {@link FileStamps#POLL_MILLIS}; reloads after a save. */
    void pollFiles(long nowNanos) {
        if (reloader == null || nowNanos - lastPoll < FileStamps.POLL_MILLIS * 1_000_000L) {
            return;
        }
        lastPoll = nowNanos;
        java.nio.file.Path saved = stamps.poll();
        if (saved != null) {
            reload(saved.getFileName().toString());
        }
    }

    /**
     * Reads the files again. Good files: a new session carrying the old one's state where the
     * machine still fits, and a notice of what changed. Bad files: the old session runs on and
     * the notice shows the located errors.
     */
    void reload(String savedName) {
        Reloader.Result r = reloader.load();
        stamps = new FileStamps(r.files());
        if (r instanceof Reloader.Failed f) {
            view.notice = new Notice(savedName + " has errors: the machine before the save runs on", f.lines(), true);
            view.message = "fix the error and save again";
            return;
        }
        Session fresh = ((Reloader.Loaded) r).session();
        boolean wasRunning = session.running();
        List<String> lines = Carry.over(session, fresh, view);
        if (view.mode == View.Mode.BENCH) {
            view.mode = View.Mode.MAIN;
        }
        use(fresh, new PowerUpView(fresh.machine()));
        view.notice = new Notice("reloaded after " + savedName + " was saved", lines, false);
        view.message = wasRunning ? "the reload stopped the run; Space runs on" : "";
    }

    /** Reads keys, runs and draws until quit. The caller owns starting and stopping the screen. */
    public void loop() throws IOException {
        draw();
        while (!quit) {
            long start = System.nanoTime();
            KeyStroke k;
            while (!quit && (k = screen.pollInput()) != null) {
                handle(k);
            }
            if (quit) {
                break;
            }
            runFor(RUN_NANOS);
            pollFiles(System.nanoTime());
            draw();
            long left = FRAME_NANOS - (System.nanoTime() - start);
            if (left > 0) {
                try {
                    Thread.sleep(left / 1_000_000L, (int) (left % 1_000_000L));
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                }
            }
        }
    }

    /** While the session runs, runs it for about {@code nanos}; returns the cycles run. */
    long runFor(long nanos) {
        if (!session.running()) {
            view.cyclesPerSecond = 0;
            rateCycles = 0;
            rateSince = System.nanoTime();
            pace.restart();
            return 0;
        }
        long start = System.nanoTime();
        long done = 0;
        if (view.machineSpeed) {
            long due = pace.due(start);
            while (session.running() && done < due && System.nanoTime() - start < nanos) {
                done += session.run(Math.min(BATCH, due - done));
            }
            pace.ran(done);
        } else {
            while (session.running() && System.nanoTime() - start < nanos) {
                done += session.run(BATCH);
            }
        }
        rateCycles += done;
        long now = System.nanoTime();
        if (now - rateSince >= 500_000_000L) {
            view.cyclesPerSecond = rateCycles * 1e9 / (now - rateSince);
            rateCycles = 0;
            rateSince = now;
        }
        return done;
    }

    public boolean quitRequested() {
        return quit;
    }

    /** The session on screen (a new one after each good reload). */
    Session session() {
        return session;
    }

    View view() {
        return view;
    }

    PowerUpView powerUpView() {
        return powerUp;
    }

    private static boolean benchLets(Command c) {
        return c == Command.BENCH_VIEW || c == Command.CLOSE || c == Command.HELP || c == Command.QUIT;
    }

    /** The bench mode (made on first use). */
    BenchView bench() {
        if (bench == null) {
            bench = new BenchView(session.machine(), session.assembly() == null ? null : session.assembly().words());
        }
        return bench;
    }

    /** Acts on one key. */
    public void handle(KeyStroke stroke) {
        Key key = Keymap.resolve(stroke, session.machine().inputs().size());
        if (view.notice != null) {
            // The notice closes on any key, and the key still does its work (Esc only closes).
            view.notice = null;
            if (key != null && key.command() == Command.CLOSE) {
                return;
            }
        }
        if (view.help) {
            boolean turn = stroke.getKeyType() == KeyType.PageDown
                    || stroke.getKeyType() == KeyType.Character && stroke.getCharacter() == ' ';
            if (turn && HelpOverlay.hasPage(view.helpPage + 1, help, screenRows())) {
                view.helpPage++;
                return;
            }
            view.help = false;
            if (key != null && key.command() == Command.QUIT && stroke.isCtrlDown()) {
                quit = true;
            }
            return;
        }
        if (key == null && !(view.mode == View.Mode.BENCH && bench.ready() != null)) {
            view.message = "that key does nothing here; ? lists the keys";
            return;
        }
        view.message = "";
        if (view.mode == View.Mode.BENCH && bench.handle(stroke)) {
            return;
        }
        if (view.mode == View.Mode.BENCH && key != null && !benchLets(key.command())) {
            // The machine's own keys stay off while the builder types lamps in (Enter and Space would step and run).
            view.message = bench.ready() == null ? "the plan is still being made" : "d leaves the bench for the machine's keys";
            return;
        }
        if (key == null) {
            view.message = "that key does nothing here; ? lists the keys";
            return;
        }
        List<ListingLine> listing = session.assembly().listing();
        int last = Math.max(0, listing.size() - 1);
        switch (key.command()) {
            case STEP_PHASE -> {
                session.stepPhase();
                view.followPc = true;
            }
            case STEP_CYCLE -> {
                session.stepCycle();
                view.followPc = true;
            }
            case RUN_PAUSE -> {
                session.toggleRun();
                view.followPc = true;
            }
            case RESET -> {
                session.reset();
                view.followPc = true;
            }
            case TOGGLE_INPUT -> session.toggleInput(key.arg());
            case WORD_UP, WORD_DOWN, WORD_CLEAR -> WordPanel.handle(key.command(), session, view);
            case BREAKPOINT -> {
                ListingLine l = listing.isEmpty() ? null : listing.get(view.cursor);
                if (l == null || !l.hasWord()) {
                    view.message = "no instruction on this line for a breakpoint";
                } else {
                    session.toggleBreakpoint(l.address());
                    view.message = (session.breakpoint(l.address()) ? "breakpoint set at " : "breakpoint cleared at ")
                            + Hex.address(l.address(), session.machine());
                }
            }
            case CLEAR_BREAKPOINTS -> {
                session.clearBreakpoints();
                view.message = "every breakpoint cleared";
            }
            case CURSOR_UP -> moveCursor(view.cursor - 1, last);
            case CURSOR_DOWN -> moveCursor(view.cursor + 1, last);
            case PAGE_UP -> moveCursor(view.cursor - pageRows(), last);
            case PAGE_DOWN -> moveCursor(view.cursor + pageRows(), last);
            case FIRST_LINE -> moveCursor(0, last);
            case LAST_LINE -> moveCursor(last, last);
            case CURSOR_TO_PC -> {
                int pcLine = session.listingIndex(session.pc());
                if (pcLine >= 0) {
                    moveCursor(pcLine, last);
                }
                view.followPc = true;
            }
            case PACE -> {
                view.machineSpeed = !view.machineSpeed;
                pace.restart();
                view.message = view.machineSpeed ? "runs at the machine's own clock" : "runs flat out";
            }
            case NEXT_PANEL, PREVIOUS_PANEL -> {
                Layout.Plan now = plan(screen.getTerminalSize());
                view.front = Layout.next(view.front, now.hidden(), key.command() == Command.NEXT_PANEL ? 1 : -1);
                view.mode = View.Mode.MAIN;
            }
            case SHOW_PANEL -> {
                view.front = Panel.values()[key.arg()];
                view.mode = View.Mode.MAIN;
            }
            case POWER_UP_VIEW -> {
                view.mode = view.mode == View.Mode.MAIN ? View.Mode.POWER_UP : View.Mode.MAIN;
                if (view.mode == View.Mode.POWER_UP) {
                    powerUp.start();
                }
            }
            case BENCH_VIEW -> {
                view.mode = view.mode == View.Mode.BENCH ? View.Mode.MAIN : View.Mode.BENCH;
                if (view.mode == View.Mode.BENCH) {
                    bench().start();
                }
            }
            case BUS_BITS -> {
                view.bits = !view.bits;
                view.message = view.bits ? "every bus bit on its own row" : "buses as numbers";
            }
            case NEXT_RAIL -> view.rail++;
            case PREVIOUS_RAIL -> view.rail--;
            case HELP -> {
                view.help = true;
                view.helpPage = 0;
            }
            case CLOSE -> view.mode = View.Mode.MAIN;
            case QUIT -> quit = true;
            default -> {
            }
        }
    }

    private void moveCursor(int to, int last) {
        view.cursor = Math.max(0, Math.min(last, to));
        view.followPc = false;
    }

    private int pageRows() {
        return Math.max(1, screenRows() - 8);
    }

    private int screenRows() {
        return screen.getTerminalSize().getRows();
    }

    private Layout.Plan plan(TerminalSize size) {
        return Layout.plan(size.getColumns(), size.getRows(), this::panelHeight,
                (p, w) -> p == Panel.POWER ? PowerPanel.leastHeight(session) : panelHeight(p, w), view.front);
    }

    /** Draws one frame, following a resize first. */
    public void draw() throws IOException {
        TerminalSize resized = screen.doResizeIfNecessary();
        TerminalSize size = resized != null ? resized : screen.getTerminalSize();
        int cols = size.getColumns();
        int rows = size.getRows();
        if (resized != null) {
            frame.invalidate();
        }
        frame.begin(cols, rows);
        Canvas c = new Canvas(frame, new Rect(0, 0, cols, rows));
        Layout.Plan plan = plan(size);
        if (plan.tooSmall()) {
            tooSmall(c, cols, rows);
        } else if (view.mode == View.Mode.BENCH) {
            StatusLines.title(c, cols, session, program, null, view);
            bench().draw(c, new Rect(0, 1, cols, rows - 3));
            StatusLines.status(c, cols, rows - 2, session, view);
            StatusLines.keys(c, cols, rows - 1, session.machine().inputs().size(), session.switchFed(), view, false);
        } else if (view.mode == View.Mode.POWER_UP) {
            StatusLines.title(c, cols, session, program, null, view);
            powerUp.draw(c, new Rect(0, 1, cols, rows - 3), view);
            StatusLines.status(c, cols, rows - 2, session, view);
            StatusLines.keys(c, cols, rows - 1, session.machine().inputs().size(), session.switchFed(), view, !plan.hidden().isEmpty());
        } else {
            StatusLines.title(c, cols, session, program, plan, view);
            if (session.switchFed()) {
                WordPanel.draw(c, plan.rect(Panel.LISTING), session);
            } else {
                ListingPanel.draw(c, plan.rect(Panel.LISTING), session, view);
            }
            if (plan.shows(Panel.STATE)) {
                LampGrid.draw(c, plan.rect(Panel.STATE), "state", stateNames(), stateLevels(), "the ISA names no state bits");
            }
            if (plan.shows(Panel.DECODE)) {
                LampGrid.draw(c, plan.rect(Panel.DECODE), "decode lines", decodeNames(), decodeLevels(),
                        "no decode nets of the name given were found in the top module");
            }
            if (plan.shows(Panel.IO)) {
                IoPanel.draw(c, plan.rect(Panel.IO), session, view);
            }
            if (plan.shows(Panel.POWER)) {
                PowerPanel.draw(c, plan.rect(Panel.POWER), session);
            }
            StatusLines.status(c, cols, rows - 2, session, view);
            StatusLines.keys(c, cols, rows - 1, session.machine().inputs().size(), session.switchFed(), view, !plan.hidden().isEmpty());
        }
        if (view.notice != null && !view.help && !plan.tooSmall()) {
            view.notice.draw(c, cols, rows);
        }
        if (view.help && !plan.tooSmall()) {
            HelpOverlay.draw(c, cols, rows, help, view.helpPage);
        }
        frame.flush(screen);
        screen.setCursorPosition(null);
        screen.refresh();
    }

    private void tooSmall(Canvas c, int cols, int rows) {
        String[] lines = {
            "This window is " + cols + " \u00D7 " + rows + ".",
            "Thermion needs at least " + Layout.MIN_COLS + " \u00D7 " + Layout.MIN_ROWS + ".",
            "Enlarge it, or press q to quit."};
        int top = Math.max(0, rows / 2 - 1);
        for (int i = 0; i < lines.length; i++) {
            String l = Canvas.fit(lines[i], cols);
            c.text(Math.max(0, (cols - l.length()) / 2), top + i, l, i == 2 ? Palette.KEY : Palette.TEXT);
        }
    }

    private int panelHeight(Panel p, int width) {
        switch (p) {
            case STATE:
                return LampGrid.height(stateNames(), width);
            case DECODE:
                return LampGrid.height(decodeNames(), width);
            case IO:
                return IoPanel.height(session, view);
            case POWER:
                return PowerPanel.height(session);
            default:
                return 0;
        }
    }

    private List<String> stateNames() {
        List<String> n = new ArrayList<>();
        session.machine().isa().state().forEach(b -> n.add(b.name()));
        return n;
    }

    private List<Level> stateLevels() {
        List<Level> l = new ArrayList<>();
        for (int i = 0; i < session.machine().isa().state().size(); i++) {
            l.add(session.stateBit(i));
        }
        return l;
    }

    private List<String> decodeNames() {
        List<String> n = new ArrayList<>();
        session.decodeLines().forEach(d -> n.add(d.mnemonic()));
        return n;
    }

    private List<Level> decodeLevels() {
        List<Level> l = new ArrayList<>();
        session.decodeLines().forEach(d -> l.add(session.level(d.net())));
        return l;
    }
}
