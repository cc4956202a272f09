package org.thermion.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

import java.util.concurrent.Callable;

/**
 * {@code sheets SELECTION MACHINE}: the build documents a builder wires from. Each selection is
 * a subcommand of its own (a class {@code SheetsXxx} added to the list below), so a document
 * with options of its own (a netlist of one stage) needs nothing from the others.
 */
@Command(name = "sheets", mixinStandardHelpOptions = true,
        description = {"Build documents: envelopes and spare sections, the pin-level wire list, heater wiring, "
                + "the parts list and more; one selection at a time.",
                "Run `sheets SELECTION --help` for a selection's options."},
        subcommands = {SheetsPacking.class, SheetsWires.class, SheetsSockets.class, SheetsHeaters.class, SheetsParts.class,
                SheetsSpice.class, SheetsVolts.class, SheetsDesignators.class, SheetsChanges.class, SheetsRom.class})
final class SheetsCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        CommandLine cl = spec.commandLine();
        cl.getErr().println("error: sheets needs a selection: "
                + String.join(", ", cl.getSubcommands().keySet().stream().filter(k -> !k.equals("help")).toList()));
        cl.usage(cl.getErr());
        cl.getErr().flush();
        return ExitCodes.BAD_INPUT;
    }
}
