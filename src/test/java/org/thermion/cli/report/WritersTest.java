package org.thermion.cli.report;

import org.junit.jupiter.api.Test;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.function.BiConsumer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The three writers on small reports written by hand. */
class WritersTest {

    private static String write(BiConsumer<PrintWriter, Report> writer, Report r) {
        StringWriter s = new StringWriter();
        writer.accept(new PrintWriter(s), r);
        return s.toString();
    }

    private static Report rails() {
        Table t = new Table("rails", "rails")
                .column("rail", "rail", ReportUnit.TEXT)
                .column("peak", "peak", ReportUnit.AMPS, "the highest current")
                .column("nominal", "nominal", ReportUnit.VOLTS);
        t.row("heat", 20.7, 12.6).row("bias", 0.029, -24.0).row("spare", new Absent("none"), 5.0);
        return new Report("demo", 3).field("machine", "m, \"quoted\"").field("run", ReportUnit.SECONDS, 30.0).table(t);
    }

    @Test
    void textGivesOneUnitPerTableInTheHeadingAndTheAbsentWord() {
        String text = write(TextWriter::write, rails());
        // 20.7 A and 29 mA share the table: both in A, three decimals so 0.029 keeps two figures
        assertThat(text).contains("peak A", "nominal V", "20.700", "0.029", "none", "-24.0")
                .contains("  peak A: the highest current");
    }

    @Test
    void aWideTableSplitsIntoGroupsThatRepeatTheFirstColumn() {
        Table t = new Table("wide", "wide").column("name", "name", ReportUnit.TEXT);
        for (int i = 0; i < 14; i++) {
            t.column("c" + i, "column " + i, ReportUnit.COUNT);
        }
        Object[] row = new Object[15];
        row[0] = "first";
        for (int i = 1; i < 15; i++) {
            row[i] = (long) i;
        }
        t.row(row);
        String text = write(TextWriter::write, new Report("wide", 1).table(t));
        assertThat(text.lines()).allSatisfy(l -> assertThat(l.length()).isLessThanOrEqualTo(TextWriter.WIDTH));
        assertThat(text).contains("(wide, continued)");
        assertThat(text.lines().filter(l -> l.startsWith("  first"))).hasSizeGreaterThan(1);
    }

    @Test
    void csvQuotesPerRfc4180AndKeysCarryTheUnit() {
        String csv = write(CsvWriter::write, rails());
        assertThat(csv).startsWith("table,field,value,\r\n")
                .contains("report,machine,\"m, \"\"quoted\"\"\",\r\n", "report,run_seconds,30,\r\n",
                        "table,rail,peak_amps,nominal_volts\r\n", "rails,bias,0.029,-24\r\n", "rails,spare,,5\r\n");
    }

    @Test
    void jsonHasTheSameNamesWithNullForAbsent() {
        var tree = JsonWriter.tree(rails());
        assertThat(tree.path("report").asString()).isEqualTo("demo");
        assertThat(tree.path("schema_version").asInt()).isEqualTo(3);
        assertThat(tree.path("run_seconds").asDouble()).isEqualTo(30.0);
        assertThat(tree.path("tables").path("rails").path(2).path("peak_amps").isNull()).isTrue();
        assertThat(tree.path("tables").path("rails").path(1).path("nominal_volts").asDouble()).isEqualTo(-24.0);
    }

    @Test
    void numbersKeepSixFiguresForToolsAndThreeForPeople() {
        assertThat(Numbers.plain(0.1 + 0.2)).isEqualTo("0.3");
        assertThat(Numbers.plain(1200.0)).isEqualTo("1200");
        assertThat(Numbers.plain(Double.NaN)).isEmpty();
        assertThat(Numbers.si(0.243357, ReportUnit.AMPS)).isEqualTo("243 mA");
        assertThat(Numbers.si(4.0, ReportUnit.OHMS)).isEqualTo("4.00 ohm");
        assertThat(Numbers.si(-3.23, ReportUnit.PERCENT)).isEqualTo("-3.2 %");
    }

    @Test
    void keysAndCellsAreChecked() {
        assertThatThrownBy(() -> new Table("Bad Name", "x")).isInstanceOf(IllegalArgumentException.class);
        Table t = new Table("t", "t").column("a", "a", ReportUnit.AMPS);
        assertThatThrownBy(() -> t.row("text in a number column")).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> t.column("a", "again", ReportUnit.AMPS)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new Report("r", 1).field("schema_version", 2)).isInstanceOf(IllegalArgumentException.class);
    }
}
