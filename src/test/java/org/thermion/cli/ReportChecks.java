package org.thermion.cli;

import com.networknt.schema.Error;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import org.thermion.cli.report.TextWriter;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * What every report must be, whatever the command: text at most 100 columns, CSV of
 * RFC 4180 records of one width with plain identifier headers, JSON that its command's
 * schema accepts, with snake_case keys and the schema's version.
 */
final class ReportChecks {
    static final JsonMapper JSON = JsonMapper.builder().enable(DeserializationFeature.USE_LONG_FOR_INTS).build();
    private static final Pattern IDENTIFIER = Pattern.compile("[a-z][a-z0-9]*(_[a-z0-9]+)*");
    private static final SchemaRegistry SCHEMAS = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12);

    private ReportChecks() {
    }

    record Result(int code, String out, String err) {
    }

    /** JSON text as plain values: Map, List, String, Long, Double, Boolean, null. */
    static Object parse(String text) {
        return JSON.readValue(text, Object.class);
    }

    static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine().setOut(new PrintWriter(out, true)).setErr(new PrintWriter(err, true)).execute(args);
        return new Result(code, out.toString(), err.toString());
    }

    /** Lines wider than the text limit (plots, whose width the user sets, are drawn within it by default). */
    static void assertText(String text) {
        for (String line : text.split("\n", -1)) {
            assertThat(line.length()).as("text line within %d columns: %s", TextWriter.WIDTH, line)
                    .isLessThanOrEqualTo(TextWriter.WIDTH);
        }
    }

    /** Records of one width; header records ({@code table,...}) name their columns with plain identifiers. */
    static List<List<String>> assertCsv(String text) {
        assertThat(text).as("CSV lines end in CRLF").doesNotContainPattern("[^\\r]\\n");
        List<List<String>> records = csv(text);
        assertThat(records).isNotEmpty();
        int width = records.get(0).size();
        for (List<String> r : records) {
            assertThat(r).as("record %s", r).hasSize(width);
            if (r.get(0).equals("table")) {
                r.stream().filter(f -> !f.isEmpty()).forEach(f -> assertThat(f).as("CSV header").matches(IDENTIFIER));
            }
        }
        return records;
    }

    /** The JSON, parsed; it must satisfy its command's schema, with snake_case keys throughout. */
    static JsonNode assertJson(String text) {
        JsonNode tree = JSON.readTree(text);
        String command = tree.path("report").asString();
        assertThat(command).as("JSON names its report").isNotEmpty();
        JsonNode schemaTree = schemaTree(command);
        Schema schema = SCHEMAS.getSchema(schemaTree);
        List<Error> errors = schema.validate(tree);
        assertThat(errors).as("%s JSON against its schema", command).isEmpty();
        assertThat(tree.path("schema_version").asInt()).as("schema version")
                .isEqualTo(schemaTree.path("properties").path("schema_version").path("const").asInt(-1));
        assertKeys(tree, "$");
        return tree;
    }

    static JsonNode schemaTree(String command) {
        String name = "/org/thermion/schema/" + command + ".schema.json";
        try (InputStream in = ReportChecks.class.getResourceAsStream(name)) {
            assertThat(in).as("schema %s", name).isNotNull();
            return JSON.readTree(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void assertKeys(JsonNode node, String path) {
        if (node.isObject()) {
            for (String key : node.propertyNames()) {
                assertThat(key).as("key at %s", path).matches(IDENTIFIER);
                assertKeys(node.get(key), path + "." + key);
            }
        } else if (node.isArray()) {
            Iterator<JsonNode> it = node.iterator();
            int i = 0;
            while (it.hasNext()) {
                assertKeys(it.next(), path + "[" + i++ + "]");
            }
        }
    }

    /** RFC 4180 records (quoted fields, doubled quotes, CRLF). */
    static List<List<String>> csv(String text) {
        List<List<String>> out = new ArrayList<>();
        List<String> rec = new ArrayList<>();
        StringBuilder f = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
                    f.append('"');
                    i++;
                } else if (c == '"') {
                    quoted = false;
                } else {
                    f.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                rec.add(f.toString());
                f.setLength(0);
            } else if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
                rec.add(f.toString());
                f.setLength(0);
                out.add(rec);
                rec = new ArrayList<>();
                i++;
            } else {
                f.append(c);
            }
        }
        return out;
    }
}
