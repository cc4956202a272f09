package org.thermion.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.Set;

/**
 * Files a command writes: never one the user named as an input, and always through a
 * temporary file in the same directory moved into place, so no reader sees half a file.
 */
final class OutputFiles {
    private OutputFiles() {
    }

    /** The input among {@code inputs} that {@code output} would overwrite, or null. */
    static Path clash(Path output, List<Path> inputs) {
        for (Path in : inputs) {
            if (in != null && same(output, in)) {
                return in;
            }
        }
        return null;
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

    /** True when {@code p} exists and its name ends in one of {@code endings}: a source, never replaced by an output. */
    static boolean isExistingSource(Path p, String... endings) {
        String n = p.getFileName() == null ? "" : p.getFileName().toString();
        if (!Files.exists(p)) {
            return false;
        }
        for (String e : endings) {
            if (n.endsWith(e)) {
                return true;
            }
        }
        return false;
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
        private boolean committed;

        /** An ASCII file (a VCD, an Intel HEX image). */
        Pending(Path target) throws IOException {
            this(target, StandardCharsets.US_ASCII);
        }

        Pending(Path target, Charset charset) throws IOException {
            this.target = target;
            Path dir = target.toAbsolutePath().getParent();
            this.tmp = Files.createTempFile(dir, "." + target.getFileName(), ".tmp");
            keepUsualPermissions(target, tmp);
            this.writer = Files.newBufferedWriter(tmp, charset);
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
            if (!committed) {
                writer.close();
                Files.deleteIfExists(tmp);
            }
        }
    }
}
