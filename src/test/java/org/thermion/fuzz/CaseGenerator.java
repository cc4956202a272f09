package org.thermion.fuzz;

import org.thermion.cli.FuzzEntry;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;

/**
 * Builds fuzz cases from seeds: the example machines, programs and stimulus, one or two of
 * them mutated or replaced by generated pathological text, and a command line drawn from the
 * options every command declares (so a new command or option is fuzzed without a change here).
 */
final class CaseGenerator {
    /** The files every case starts from, by the name they get in the case's folder. */
    static final Map<String, Path> SEEDS = seeds();
    static final String MACHINE = "pumpstation.machine";
    static final String PROGRAM = "pump.asm";
    static final String STIMULUS = "pump-day.csv";

    /** Options left out: help and version print and stop, --replace may legitimately replace a file, --watch never ends. */
    private static final Set<String> SKIPPED = Set.of("--help", "--version", "-h", "-V", "--replace", "--debug",
            "--watch");
    /** Options whose large valid values mean long but legitimate work: only small or invalid values. */
    private static final Set<String> WORK = Set.of("--cycles", "--samples", "--max", "--sizes", "--seconds", "--compile-max",
            "--time", "--mutate", "--sweep", "--width");
    /** Commands that need a terminal or run for minutes: fuzzed only with arguments they must refuse. */
    private static final Set<String> GUARDED = Set.of("ui", "bench", "help");

    private final Map<String, byte[]> originals = new LinkedHashMap<>();

    CaseGenerator() {
        try {
            for (Map.Entry<String, Path> e : SEEDS.entrySet()) {
                originals.put(e.getKey(), Files.readAllBytes(e.getValue()));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Map<String, Path> seeds() {
        Map<String, Path> m = new LinkedHashMap<>();
        m.put(MACHINE, Path.of("examples/pumpstation/pumpstation.machine"));
        m.put("decoder.machine", Path.of("examples/pumpstation/decoder.machine"));
        m.put("decoder-board.machine", Path.of("examples/decoder-board/decoder-board.machine"));
        m.put(PROGRAM, Path.of("programs/pump.asm"));
        m.put("serial-add.asm", Path.of("programs/serial-add.asm"));
        m.put(STIMULUS, Path.of("programs/pump-day.csv"));
        return m;
    }

    FuzzCase make(long seed) {
        Random rnd = new Random(seed);
        Map<String, byte[]> files = new LinkedHashMap<>(originals);
        InputMutator mutator = new InputMutator(rnd);
        String shape;
        int pick = rnd.nextInt(10);
        if (pick < 6) {
            List<String> names = new ArrayList<>(files.keySet());
            String victim = names.get(rnd.nextInt(names.size()));
            files.put(victim, mutator.mutate(files.get(victim)));
            shape = "mutated " + victim;
        } else if (pick < 8) {
            shape = generated(rnd, files);
        } else {
            shape = "command line";
        }
        return new FuzzCase(seed, shape, files, commandLine(rnd));
    }

    /** Pathological files no mutation is likely to reach. */
    private static String generated(Random rnd, Map<String, byte[]> files) {
        int n = List.of(10, 63, 64, 65, 300, 3000).get(rnd.nextInt(6));
        switch (rnd.nextInt(5)) {
            case 4: {
                // Expressions the elaborator and the ISA really use, at and just past the documented limits.
                int depth = List.of(98, 99, 100, 101).get(rnd.nextInt(4));
                int ops = List.of(998, 999, 1000, 1001).get(rnd.nextInt(4));
                String expr = rnd.nextBoolean() ? "(".repeat(depth - 2) + "low_sw" + ")".repeat(depth - 2)
                        : "low_sw" + " | high_sw".repeat(ops);
                String top = new String(files.get(MACHINE), StandardCharsets.UTF_8)
                        .replace("  latch ir[12] on phase 1 = word", "  net deepnet = " + expr + "\n  latch ir[12] on phase 1 = word")
                        .replace("op LD 0x1 { acc <- [sel] }", "op LD 0x1 { acc <- " + "(".repeat(depth - 2) + "[sel]"
                                + ")".repeat(depth - 2) + " }");
                files.put(MACHINE, utf8(top));
                return "used expressions, depth " + depth + ", operators " + ops;
            }
            case 0: {
                for (int i = 0; i < n; i++) {
                    files.put("inc" + i + ".machine", utf8(i + 1 < n ? "include \"inc" + (i + 1) + ".machine\"\n" : "# end\n"));
                }
                String top = new String(files.get(MACHINE), StandardCharsets.UTF_8);
                files.put(MACHINE, utf8("include \"inc0.machine\"\n" + top));
                return "include chain of " + n;
            }
            case 1: {
                StringBuilder b = new StringBuilder(".const C0 = 1\n");
                boolean down = rnd.nextBoolean();
                for (int i = 1; i < n; i++) {
                    b.append(".const C").append(i).append(" = C").append(down ? i - 1 : i + 1).append(" + C")
                            .append(down ? i - 1 : i + 1).append('\n');
                }
                b.append(down ? "" : ".const C" + n + " = 1\n").append(".word C").append(down ? n - 1 : 1).append(" & 1\n");
                files.put(PROGRAM, utf8(b + new String(files.get(PROGRAM), StandardCharsets.UTF_8)));
                return "constant chain of " + n + (down ? " top-down" : " bottom-up");
            }
            case 2: {
                StringBuilder b = new StringBuilder("module notes {\n");
                for (int i = 0; i < n * 10; i++) {
                    b.append("  # line ").append(i).append('\n');
                }
                files.put(MACHINE, utf8(new String(files.get(MACHINE), StandardCharsets.UTF_8) + b + "}\n"));
                return "comment block of " + n * 10 + " lines";
            }
            default: {
                String deep = "(".repeat(n) + "acc" + ")".repeat(n);
                files.put(PROGRAM, utf8(".const D = " + "(".repeat(n) + "1" + ")".repeat(n) + "\n"
                        + new String(files.get(PROGRAM), StandardCharsets.UTF_8)));
                files.put("decoder-board.machine", utf8(new String(files.get("decoder-board.machine"), StandardCharsets.UTF_8)
                        + "\nmodule deep {\n  in acc\n  out y\n  y = " + deep + "\n}\n"));
                return "nesting of " + n;
            }
        }
    }

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private List<String> commandLine(Random rnd) {
        CommandLine root = FuzzEntry.commandLine();
        List<String> names = new ArrayList<>(root.getSubcommands().keySet());
        String name = names.get(rnd.nextInt(names.size()));
        List<String> args = new ArrayList<>();
        args.add(name);
        if (GUARDED.contains(name)) {
            args.addAll(guarded(name, rnd));
            return args;
        }
        CommandSpec spec = root.getSubcommands().get(name).getCommandSpec();
        int positionals = spec.positionalParameters().size();
        String machine = rnd.nextInt(4) == 0 ? "decoder-board.machine" : MACHINE;
        if (positionals >= 1) {
            args.add(rnd.nextInt(30) == 0 ? path(rnd) : FuzzCase.DIR + "/" + machine);
        }
        if (positionals >= 2 && rnd.nextInt(8) != 0) {
            args.add(rnd.nextInt(30) == 0 ? path(rnd) : FuzzCase.DIR + "/" + (rnd.nextBoolean() ? PROGRAM : "serial-add.asm"));
        }
        List<OptionSpec> options = spec.options().stream().filter(o -> !SKIPPED.contains(o.longestName())).toList();
        for (int k = rnd.nextInt(4); k > 0 && !options.isEmpty(); k--) {
            OptionSpec o = options.get(rnd.nextInt(options.size()));
            args.add(o.longestName());
            if (o.arity().max() > 0) {
                args.add(value(o, rnd));
            }
        }
        if (rnd.nextInt(20) == 0) {
            args.add(List.of("--bogus", "extra", "-", "--").get(rnd.nextInt(4)));
        }
        return args;
    }

    private static List<String> guarded(String name, Random rnd) {
        return switch (name) {
            case "ui" -> List.of(FuzzCase.DIR + "/missing.machine");
            case "bench" -> List.of("--sizes", List.of("5", "-1", "abc", "3000000", "").get(rnd.nextInt(5)));
            default -> List.of(List.of("run", "nope", "asm").get(rnd.nextInt(3)));
        };
    }

    private static String path(Random rnd) {
        List<String> pool = List.of(FuzzCase.DIR + "/out.hex", FuzzCase.DIR + "/out.vcd", FuzzCase.DIR + "/out.csv",
                FuzzCase.DIR + "/" + PROGRAM, FuzzCase.DIR + "/decoder.machine", FuzzCase.DIR + "/" + STIMULUS,
                FuzzCase.DIR + "/" + MACHINE, FuzzCase.DIR, "", FuzzCase.DIR + "/missing/x", FuzzCase.DIR + "/a\u0000b",
                FuzzCase.DIR + "/serial-add.asm", FuzzCase.DIR + "/decoder-board.machine");
        return pool.get(rnd.nextInt(pool.size()));
    }

    private static String value(OptionSpec o, Random rnd) {
        Class<?> type = o.auxiliaryTypes().length > 0 && o.type().isAssignableFrom(List.class) ? o.auxiliaryTypes()[0] : o.type();
        if (type == Path.class) {
            return path(rnd);
        }
        if (type.isEnum()) {
            Object[] c = type.getEnumConstants();
            return rnd.nextInt(5) == 0 ? "nonsense" : c[rnd.nextInt(c.length)].toString();
        }
        String n = o.longestName();
        List<String> odd = List.of("", "0", "-1", "NaN", "Infinity", "-Infinity", "1e400", "1e-300", "abc", "99999999999999999999999",
                "0x10", " ", "1,2");
        if (WORK.contains(n)) {
            List<String> small = List.of("1", "7", "100", "30s", "2 s", "1e-300s", "NaN s", "1e400 s", "-5 s", "0.5ohm..5ohm:0.25ohm",
                    "5ohm..0.5ohm:1ohm", "1ohm..2ohm:0ohm", "1ohm..1e400ohm:1ohm", "x=1ohm..2ohm:0.5ohm", "1000,2000", "5");
            return rnd.nextBoolean() ? odd.get(rnd.nextInt(odd.size())) : small.get(rnd.nextInt(small.size()));
        }
        if (type == int.class || type == long.class || type == double.class || type == Integer.class || type == Long.class
                || type == Double.class) {
            List<String> nums = List.of("1", "2", "64", "1000", "2147483648", "9223372036854775808");
            return rnd.nextBoolean() ? odd.get(rnd.nextInt(odd.size())) : nums.get(rnd.nextInt(nums.size()));
        }
        List<String> words = List.of("zero", "one", "random:5", "random", "random:x", "unknown", "auto", "compiled", "array",
                "logic", "isa", "acc", "line[3]", "line[99999999999]", "nope", "pc", "0.3 ohm", "1e400 ohm", "-1ohm", "NaN ohm",
                "heater_soft=0.5ohm", "50us", "0 s", "1e400 s", "0.2 ms", "highest", "mean", "text", "json", "csv", "x[",
                "a\u0000b", "Ω", "100 us");
        return rnd.nextInt(4) == 0 ? odd.get(rnd.nextInt(odd.size())) : words.get(rnd.nextInt(words.size()));
    }
}
