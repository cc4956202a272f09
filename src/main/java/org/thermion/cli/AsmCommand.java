package org.thermion.cli;

import org.thermion.asm.Assembly;
import org.thermion.asm.IntelHex;
import org.thermion.asm.Listing;
import org.thermion.lang.SourceText;
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
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/** {@code asm MACHINE PROGRAM}: assemble a program for a machine into Intel HEX and a listing. */
@Command(name = "asm", mixinStandardHelpOptions = true,
        description = {"Assemble a program for a machine's instruction set.",
                "Writes Intel HEX (I8HEX; past 64 KiB, I32HEX with type-04 records) to FILE with -o, else to standard output; --listing prints the listing "
                        + "(instead of the HEX when there is no -o)."})
final class AsmCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "MACHINE", description = "The .machine file.")
    Path machineFile;

    @Parameters(index = "1", paramLabel = "PROGRAM", description = "The .asm program.")
    Path program;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE.hex", description = "Write the Intel HEX image here (atomically).")
    Path output;

    @Option(names = OutputFiles.REPLACE, description = "Let -o replace an existing file that is not an earlier HEX image.")
    boolean replace;

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
        MachineLoader loader = new MachineLoader();
        Machine m = loader.load(machineFile, err, false);
        if (m == null) {
            return ExitCodes.BAD_INPUT;
        }
        ProgramInput in = ProgramInput.read(m, program, null, loader, err);
        if (in == null) {
            return ExitCodes.BAD_INPUT;
        }
        if (output != null) {
            OutputFiles.Refusal no = OutputFiles.check(output, OutputFiles.Kind.HEX, replace, List.of(machineFile, program),
                    loader.sources());
            if (no != null) {
                return no.print(err);
            }
        }
        Assembly a = in.assembly();
        List<String> hex = IntelHex.encode(a.words(), m.isa().wordBits());
        if (listing) {
            Listing.render(a, m.isa().wordBits(), m.pc().width()).forEach(out::println);
        }
        if (output != null) {
            try {
                OutputFiles.write(output, String.join("\n", hex) + "\n", StandardCharsets.US_ASCII);
            } catch (IOException e) {
                return new OutputFiles.Refusal("cannot write " + output + ": " + SourceText.reason(output, e), null).print(err);
            }
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
}
