package org.thermion.cli;

import org.thermion.asm.Assembly;

import com.googlecode.lanterna.screen.Screen;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.DefaultTerminalFactory;
import com.googlecode.lanterna.terminal.Terminal;
import com.googlecode.lanterna.terminal.ansi.UnixLikeTerminal;
import org.thermion.model.Machine;
import org.thermion.sim.InitMode;
import org.thermion.tui.DecodeLamp;
import org.thermion.tui.PowerUpView;
import org.thermion.tui.Session;
import org.thermion.tui.TerminalUi;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/** {@code ui MACHINE PROGRAM}: step a program in the terminal, watching registers, decode lines and power. */
@Command(name = "ui", mixinStandardHelpOptions = true,
        description = {"Step and run a program on a machine in the terminal: the listing, every state bit, "
            + "the decode lines, switches and lamps, and the power drawn per module and rail.",
            "Press ? inside for the keys; q or Ctrl-C quits."})
public final class UiCommand extends CommandBase {
    @Parameters(index = "0", paramLabel = "MACHINE", description = "The .machine file.")
    Path machine;

    @Parameters(index = "1", arity = "0..1", paramLabel = "PROGRAM",
            description = "The .asm program to load into the ROM (none for a machine whose word comes from switches).")
    Path program;

    @Option(names = "--inputs", paramLabel = "STIM.csv",
            description = "Input changes by cycle (cycle, then one column per named input); the switches still flip them.")
    Path inputs;

    @Option(names = "--init", paramLabel = "MODE", defaultValue = "zero",
            description = "Power-up state of the latches: zero, random:SEED or unknown (default: ${DEFAULT-VALUE}).")
    String init;

    @Option(names = "--decode-net", paramLabel = "NAME", defaultValue = DecodeLamp.DEFAULT_NAME,
            description = "Decode lines are the top module's nets NAME[k], k an opcode (default: ${DEFAULT-VALUE}).")
    String decodeNet;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = err();
        String why = whyNoTerminal();
        if (why != null) {
            err.println("error: ui needs an interactive terminal, but " + why + ".");
            err.println("Run it in a terminal window; for a run without a screen use the other commands (see thermion --help).");
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        UiReload reload = new UiReload(machine, program, inputs, init, decodeNet);
        Session session = reload.first(err);
        if (session == null) {
            return ExitCodes.BAD_INPUT;
        }
        return show(session, program == null ? "word from switches" : program.getFileName().toString(), reload);
    }

    /** Null when this process runs on a terminal, else the reason it does not. */
    static String whyNoTerminal() {
        String term = System.getenv("TERM");
        if (System.console() == null) {
            return "standard input or output is not a terminal (piped or redirected)";
        }
        if (term == null || term.isBlank()) {
            return "TERM is not set";
        }
        if (term.equals("dumb")) {
            return "TERM is 'dumb', which cannot place text on the screen";
        }
        return null;
    }

    /** Loads the machine and program into a session, printing diagnostics; null on bad input. */
    static Session open(Path machineFile, Path programFile, Path stimulusFile, String initText, String decodeName,
                        PrintWriter err) {
        return open(machineFile, programFile, stimulusFile, initText, decodeName, err, new MachineLoader());
    }

    /** As above, reading through {@code loader} (whose sources then name every file read). */
    static Session open(Path machineFile, Path programFile, Path stimulusFile, String initText, String decodeName,
                        PrintWriter err, MachineLoader loader) {
        InitMode mode;
        try {
            mode = InitMode.parse(initText);
        } catch (IllegalArgumentException e) {
            err.println("error: --init: " + e.getMessage());
            err.flush();
            return null;
        }
        Machine m = loader.load(machineFile, err, false);
        if (m == null) {
            err.flush();
            return null;
        }
        boolean switchFed = m.isa() != null && m.isa().wordFromSwitches();
        if (programFile == null && !switchFed) {
            err.println("error: machine " + m.name() + " takes its instructions from a ROM: name the PROGRAM to load");
            err.flush();
            return null;
        }
        if (programFile != null && (m.rom() == null || m.isa() == null)) {
            err.println("error: machine " + m.name() + " has no ROM to load a program into"
                    + (switchFed ? "; its word comes from switches: leave out PROGRAM" : ""));
            err.flush();
            return null;
        }
        ProgramInput in = ProgramInput.read(m, programFile, stimulusFile, loader, err);
        if (in == null) {
            err.flush();
            return null;
        }
        Assembly asm = programFile == null ? new Assembly(new long[0], java.util.List.of()) : in.assembly();
        return new Session(m, asm, decodeName, mode, in.stimulus());
    }

    /** Runs the screen until quit, reloading when a file {@code reload} read is saved; the terminal is restored however the loop ends. */
    static int show(Session session, String programName, UiReload reload) throws IOException {
        Terminal terminal = new DefaultTerminalFactory(System.out, System.in, StandardCharsets.UTF_8)
                .setForceTextTerminal(true)
                .setUnixTerminalCtrlCBehaviour(UnixLikeTerminal.CtrlCBehaviour.TRAP)
                .createTerminal();
        Screen screen = new TerminalScreen(terminal);
        screen.startScreen();
        try {
            TerminalUi ui = new TerminalUi(screen, session, programName, new PowerUpView(session.machine()));
            if (reload != null) {
                ui.reloadOnSave(reload);
            }
            ui.loop();
        } finally {
            screen.stopScreen();
        }
        return ExitCodes.OK;
    }
}
