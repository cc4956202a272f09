package org.thermion.cli;

import org.thermion.asm.ListingLine;
import org.thermion.cli.report.Absent;
import org.thermion.cli.report.Format;
import org.thermion.cli.report.Report;
import org.thermion.cli.report.Table;

import org.thermion.asm.Assembly;
import org.thermion.asm.IntelHex;
import org.thermion.asm.Listing;
import org.thermion.lang.SourceText;
import org.thermion.model.Machine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

import static org.thermion.cli.report.ReportUnit.COUNT;
import static org.thermion.cli.report.ReportUnit.TEXT;

/** {@code asm MACHINE PROGRAM}: assemble a program for a machine into Intel HEX and a listing. */
@Command(name = "asm", mixinStandardHelpOptions = true,
        description = {"Assemble a program for a machine's instruction set.",
                "Writes Intel HEX (I8HEX; past 64 KiB, I32HEX with type-04 records) to FILE with -o, else to standard output; --listing prints the listing "
                        + "(instead of the HEX when there is no -o)."})
final class AsmCommand extends CommandBase {
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

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "The listing as text, csv or json (csv and json imply --listing; default: ${DEFAULT-VALUE}).")
    Format format;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = out();
        PrintWriter err = err();
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
        if (format != Format.text) {
            listing = true;
        }
        if (listing) {
            format.write(out, listingReport(a, m.isa().wordBits(), m.pc().width()));
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

    /** The schema version of the listing's JSON ({@code org/thermion/schema/asm_listing.schema.json}). */
    static final int VERSION = 1;

    /** The listing as a report: text shows it as {@link Listing} lays it out, CSV and JSON with numbers. */
    Report listingReport(Assembly a, int wordBits, int addressBits) {
        Report rep = new Report("asm_listing", VERSION);
        rep.field("program", program.toString());
        rep.field("word_bits", wordBits);
        rep.field("address_bits", addressBits);
        rep.field("rom_words", a.words().length);
        rep.field("words_used", a.listing().stream().filter(ListingLine::hasWord).count());
        rep.text(Listing.render(a, wordBits, addressBits));
        Table t = new Table("listing", "listing")
                .column("address", "addr", COUNT)
                .column("word", "word", COUNT)
                .column("bits", "bits", TEXT)
                .column("line", "line", COUNT)
                .column("source", "source", TEXT);
        Absent none = new Absent("no word");
        for (ListingLine l : a.listing()) {
            t.row(l.hasWord() ? (Object) (long) l.address() : none, l.hasWord() ? (Object) l.word() : none,
                    l.hasWord() ? Long.toBinaryString(l.word() | 1L << wordBits).substring(1) : none, l.sourceLine(),
                    l.sourceText());
        }
        rep.data(t);
        return rep;
    }
}
