package org.thermion.cli;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.MachineReader;
import org.thermion.lang.ProgramReader;
import org.thermion.lang.SourceSet;
import org.thermion.lang.ast.SourceFile;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.InputStream;
import java.io.Writer;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.Predicate;
import java.util.regex.Pattern;

/**
 * Files a command writes. An output never destroys work: it replaces an existing file only
 * when that file is an earlier output of the same {@link Kind} (told from its content) or
 * the user passed {@value #REPLACE}; it never replaces an input of the run. It is written to
 * a temporary file in the same directory and renamed into place, so no reader sees half a
 * file, and a shutdown hook removes the temporary file when the run is stopped (SIGINT,
 * SIGTERM): at most the previous version of the target remains, whole.
 */
final class OutputFiles {
    /** The option that lets an output replace a file it does not recognise as its own. */
    static final String REPLACE = "--replace";
    private static final int HEAD_BYTES = 64 * 1024;
    private static final Pattern HEX_RECORD = Pattern.compile(":([0-9A-Fa-f]{2}){5,}");

    private OutputFiles() {
    }

    /** What a command writes, and how an earlier output of it is recognised from the start of its text. */
    enum Kind {
        HEX("an Intel HEX image", OutputFiles::isHex),
        VCD("a value change dump", head -> head.startsWith("$date") && head.contains("$version\n  thermion")),
        POWERUP_CSV("a power-up time series", head -> head.startsWith("time_s,") || head.startsWith("time_seconds,")),
        DESIGNATORS("a designators file", head -> head.startsWith(org.thermion.build.Designations.HEADER)),
        SVG("a picture", head -> head.startsWith("<?xml") && head.contains("<!-- " + org.thermion.plot.SvgWriter.GENERATOR + " -->"));

        final String noun;
        private final Predicate<String> earlier;

        Kind(String noun, Predicate<String> earlier) {
            this.noun = noun;
            this.earlier = earlier;
        }
    }

    /** Why an output may not be written: the message (after "error: ") and what to do. */
    record Refusal(String message, String hint) {
        /** Prints the refusal to {@code err} and gives the exit code for bad input. */
        int print(java.io.PrintWriter err) {
            err.println("error: " + message);
            if (hint != null) {
                err.println("  = " + hint);
            }
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
    }

    /**
     * Null when {@code target} may be written as {@code kind}; otherwise why not. {@code inputs}
     * are the files named on the command line, {@code sources} every file read so far (includes).
     */
    static Refusal check(Path target, Kind kind, boolean replace, List<Path> inputs, SourceSet sources) {
        String name = target.toString();
        if (name.isBlank() || target.getFileName() == null) {
            return new Refusal("no file name given for " + kind.noun, "name the file to write");
        }
        Path abs = target.toAbsolutePath().normalize();
        if (Files.isDirectory(abs)) {
            return new Refusal("cannot write " + kind.noun + " to " + target + ": it is a directory", "name a file in it");
        }
        Path dir = abs.getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            return new Refusal("cannot write " + target + ": no such directory " + dir, null);
        }
        if (!Files.isWritable(dir)) {
            return new Refusal("cannot write " + target + ": directory " + dir + " is not writable", null);
        }
        List<Path> read = new ArrayList<>(inputs);
        if (sources != null) {
            read.addAll(sources.files());
        }
        for (Path in : read) {
            if (in != null && same(abs, in)) {
                return new Refusal("refusing to write " + kind.noun + " over " + target + ", which is an input of this run",
                        "name another file");
            }
        }
        if (!Files.exists(abs, LinkOption.NOFOLLOW_LINKS)) {
            return null;
        }
        if (!Files.isRegularFile(abs)) {
            return new Refusal("cannot write " + target + ": it is not a regular file", "name a plain file");
        }
        if (replace) {
            return null;
        }
        String head = head(abs);
        if (head != null && kind.earlier.test(head) && (kind != Kind.HEX || isHexFile(abs))) {
            return null;
        }
        return new Refusal("refusing to replace " + target + ": it exists and is not " + kind.noun + " written earlier"
                + (head == null ? "" : reads(abs, head)),
                "pass " + REPLACE + " to replace it anyway, or name another file");
    }

    /** ", it reads as ..." when the file's start looks like one of our inputs; else empty. */
    private static String reads(Path file, String head) {
        if (head.indexOf('\0') >= 0) {
            return "";
        }
        Diagnostics d = new Diagnostics();
        SourceFile f = MachineReader.parse(file, head, d);
        if (!d.hasErrors() && !f.decls().isEmpty()) {
            return " (it reads as a machine description)";
        }
        d = new Diagnostics();
        boolean statements = ProgramReader.parse(file, head, d).lines().stream().anyMatch(l -> l.statement() != null);
        if (!d.hasErrors() && statements) {
            return " (it reads as a program)";
        }
        String first = head.lines().findFirst().orElse("");
        if (first.contains(",") && first.chars().filter(Character::isLetter).count() > 0) {
            return " (it reads as a table such as a stimulus)";
        }
        return "";
    }

    /** The first 64 KiB of {@code file} as text, or null when unreadable. */
    private static String head(Path file) {
        try (InputStream in = Files.newInputStream(file)) {
            return new String(in.readNBytes(HEAD_BYTES), StandardCharsets.UTF_8);
        } catch (IOException e) {
            return null;
        }
    }

    private static boolean isHex(String head) {
        List<String> lines = head.lines().filter(l -> !l.isBlank()).toList();
        return !lines.isEmpty() && lines.stream().allMatch(l -> HEX_RECORD.matcher(l.strip()).matches());
    }

    /** A whole file of records ending with the end-of-file record (HEX images are small). */
    private static boolean isHexFile(Path file) {
        try {
            if (Files.size(file) > 64L * 1024 * 1024) {
                return false;
            }
            List<String> lines = Files.readAllLines(file, StandardCharsets.US_ASCII).stream().filter(l -> !l.isBlank()).toList();
            return !lines.isEmpty() && lines.stream().allMatch(l -> HEX_RECORD.matcher(l.strip()).matches())
                    && lines.get(lines.size() - 1).strip().equalsIgnoreCase(":00000001FF");
        } catch (IOException | RuntimeException e) {
            return false;
        }
    }

    private static boolean same(Path a, Path b) {
        try {
            if (Files.exists(a) && Files.exists(b)) {
                return Files.isSameFile(a, b);
            }
        } catch (IOException e) {
            // Fall back to comparing the names.
        }
        return a.toAbsolutePath().normalize().equals(b.toAbsolutePath().normalize());
    }

    /** Writes {@code text} to {@code target} in {@code charset}, all at once or not at all. */
    static void write(Path target, String text, Charset charset) throws IOException {
        try (Pending file = new Pending(target, charset)) {
            file.writer().write(text);
            file.commit();
        }
    }

    /** A file being written: {@link #commit()} moves it into place, {@link #close()} without commit discards it. */
    static final class Pending implements AutoCloseable {
        private final Path target;
        private final Path tmp;
        private final BufferedWriter writer;
        private final Thread cleanup;
        private boolean committed;

        /** An ASCII file (a VCD, an Intel HEX image). */
        Pending(Path target) throws IOException {
            this(target, StandardCharsets.US_ASCII);
        }

        Pending(Path target, Charset charset) throws IOException {
            this.target = target;
            Path dir = target.toAbsolutePath().getParent();
            this.tmp = Files.createTempFile(dir, "." + target.getFileName(), ".tmp");
            // Stopped by a signal, the JVM runs shutdown hooks: the temporary file goes with it.
            this.cleanup = new Thread(this::discard, "remove " + tmp.getFileName());
            Runtime.getRuntime().addShutdownHook(cleanup);
            keepUsualPermissions(target, tmp);
            this.writer = Files.newBufferedWriter(tmp, charset);
        }

        private void discard() {
            try {
                Files.deleteIfExists(tmp);
            } catch (IOException e) {
                // Nothing more can be done while the JVM stops.
            }
        }

        /** Temporary files are private to the owner; the finished file reads like any other. */
        private static void keepUsualPermissions(Path target, Path tmp) {
            try {
                if (Files.getFileStore(tmp).supportsFileAttributeView("posix")) {
                    Set<PosixFilePermission> perms = Files.exists(target) ? Files.getPosixFilePermissions(target)
                            : PosixFilePermissions.fromString("rw-r--r--");
                    Files.setPosixFilePermissions(tmp, perms);
                }
            } catch (IOException | UnsupportedOperationException e) {
                // Permissions stay as created; the contents are unaffected.
            }
        }

        Writer writer() {
            return writer;
        }

        void commit() throws IOException {
            writer.close();
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            committed = true;
        }

        @Override
        public void close() throws IOException {
            try {
                if (!committed) {
                    writer.close();
                    Files.deleteIfExists(tmp);
                }
            } finally {
                try {
                    Runtime.getRuntime().removeShutdownHook(cleanup);
                } catch (IllegalStateException e) {
                    // The JVM is stopping; the hook removes the file.
                }
            }
        }
    }
}
