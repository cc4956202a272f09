package org.thermion.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code thermion} command: one subcommand per job. */
@Command(name = "thermion", mixinStandardHelpOptions = true, version = "thermion 0.1.0",
        description = "Workbench for one-bit vacuum-tube control processors.",
        subcommands = {CheckCommand.class, LevelsCommand.class, RunCommand.class, AsmCommand.class, BudgetCommand.class,
                PowerUpCommand.class, TimingCommand.class, VerifyCommand.class, SheetsCommand.class, PlanCommand.class,
                DiagnoseCommand.class, UiCommand.class, BenchCommand.class, CommandLine.HelpCommand.class})
public final class Main implements java.util.concurrent.Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    public static void main(String[] args) {
        System.exit(run(args));
    }

    /** Runs the command line and returns the exit code, without exiting. */
    public static int run(String... args) {
        CommandLine cl = commandLine();
        return cl.execute(args);
    }

    static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new Main());
        cl.setExecutionExceptionHandler(new Failures());
        cl.registerConverter(java.nio.file.Path.class, Main::path);
        cl.setParameterExceptionHandler((ex, a) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("error: " + ex.getMessage());
            c.getErr().println("try '" + c.getCommandSpec().qualifiedName() + " --help'");
            return ExitCodes.BAD_INPUT;
        });
        return cl;
    }

    /** A file name from the command line; one the system cannot take is named as such, not as an exception. */
    private static java.nio.file.Path path(String name) {
        if (name.indexOf('\0') >= 0) {
            throw new CommandLine.TypeConversionException("'" + name.replace('\0', '?') + "' holds a NUL character, which no file name may");
        }
        try {
            return java.nio.file.Path.of(name);
        } catch (java.nio.file.InvalidPathException e) {
            throw new CommandLine.TypeConversionException("'" + name + "' is not a file name: " + e.getReason());
        }
    }

    @Override
    public Integer call() {
        return DefaultRun.run(spec.commandLine().getOut(), spec.commandLine().getErr());
    }
}
