package org.thermion.cli;

import org.thermion.asm.Assembler;
import org.thermion.asm.Assembly;
import org.thermion.asm.IntelHex;
import org.thermion.asm.Listing;
import org.thermion.lang.DiagnosticPrinter;
import org.thermion.lang.Diagnostics;
import org.thermion.model.Machine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.concurrent.Callable;

/** {@code asm MACHINE PROGRAM}: assemble a program for a machine into Intel HEX and a listing. */
@Command(name = "asm", mixinStandardHelpOptions = true,
        description = {"Assemble a program for a machine's instruction set.",
                "Writes Intel HEX (I8HEX) to FILE with -o, else to standard output; --listing prints the listing "
                        + "(instead of the HEX when there is no -o)."})
final class AsmCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "MACHINE", description = "The .machine file.")
    Path machineFile;

    @Parameters(index = "1", paramLabel = "PROGRAM", description = "The .asm program.")
    Path program;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE.hex", description = "Write the Intel HEX image here (atomically).")
    Path output;

    @Option(names = "--listing", description = "Print the listing: address, word in hex and binary, source line.")
    boolean listing;

    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (output != null && (sameFile(output, machineFile) || sameFile(output, program) || isSource(output))) {
            err.println("error: refusing to write the HEX image over " + output + ", a source file");
            err.println("  = name another output file, e.g. -o " + hexNameFor(program));
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        if (output != null) {
            Path dir = output.toAbsolutePath().getParent();
            if (dir == null || !Files.isDirectory(dir)) {
                err.println("error: cannot write " + output + ": directory " + dir + " does not exist");
                err.flush();
                return ExitCodes.BAD_INPUT;
            }
        }
        MachineLoader loader = new MachineLoader();
        Machine m = loader.load(machineFile, err, false);
        if (m == null) {
            return ExitCodes.BAD_INPUT;
        }
        Diagnostics diags = new Diagnostics();
        Assembly a = Assembler.assemble(m, program, loader.sources(), diags);
        if (!diags.all().isEmpty()) {
            new DiagnosticPrinter(loader.sources()).print(diags, err);
        }
        if (a == null) {
            return ExitCodes.BAD_INPUT;
        }
        List<String> hex = IntelHex.encode(a.words(), m.isa().wordBits());
        if (listing) {
            Listing.render(a, m.isa().wordBits(), m.pc().width()).forEach(out::println);
        }
        if (output != null) {
            writeAtomically(output, String.join("\n", hex) + "\n");
            long used = a.listing().stream().filter(l -> l.hasWord()).count();
            if (!listing) {
                out.println(program + ": " + used + " of " + a.words().length + " ROM words used, Intel HEX written to " + output);
            }
        } else if (!listing) {
            hex.forEach(out::println);
        }
        out.flush();
        return ExitCodes.OK;
    }

    private static boolean sameFile(Path a, Path b) throws IOException {
        if (Files.exists(a) && Files.exists(b)) {
            return Files.isSameFile(a, b);
        }
        return a.toAbsolutePath().normalize().equals(b.toAbsolutePath().normalize());
    }

    /** Existing descriptions and programs are never replaced by an image. */
    private static boolean isSource(Path p) {
        String n = p.getFileName() == null ? "" : p.getFileName().toString();
        return Files.exists(p) && (n.endsWith(".machine") || n.endsWith(".asm"));
    }

    private static String hexNameFor(Path program) {
        String n = program.getFileName().toString();
        int dot = n.lastIndexOf('.');
        return (dot > 0 ? n.substring(0, dot) : n) + ".hex";
    }

    /** Writes beside the target, then renames over it, so a reader never sees half a file. */
    private static void writeAtomically(Path target, String text) throws IOException {
        Path dir = target.toAbsolutePath().getParent();
        Path tmp = Files.createTempFile(dir, "." + target.getFileName(), ".tmp");
        try {
            Files.writeString(tmp, text, StandardCharsets.US_ASCII);
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
