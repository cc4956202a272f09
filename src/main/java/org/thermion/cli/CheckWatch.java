package org.thermion.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.LocalTime;
import java.time.format.DateTimeFormatter;
import java.util.HashMap;
import java.util.Map;
import java.util.Set;
import java.util.function.Supplier;

/**
 * {@code check --watch}: after each check, waits until one of the files it read (the
 * description and its includes) is saved again, then checks again, until stopped (Ctrl-C)
 * or interrupted. Saves are seen by polling modification times and sizes, which works on every
 * file system, and a save is acted on once the file has stopped changing for one poll (an
 * editor writing in pieces is not checked half-written).
 */
final class CheckWatch {
    static final long POLL_MILLIS = 300;

    private final PrintWriter out;

    CheckWatch(PrintWriter out) {
        this.out = out;
    }

    /**
     * Runs {@code check} (which returns the files it read) now and after every save; returns
     * when the thread is interrupted, or after {@code rounds} checks when it is positive.
     */
    void run(Supplier<Set<Path>> check, int rounds) {
        int done = 0;
        while (true) {
            Map<Path, String> seen = stamps(check.get());
            done++;
            out.println("-- watching " + seen.size() + (seen.size() == 1 ? " file" : " files")
                    + " for changes; Ctrl-C stops");
            out.flush();
            if (rounds > 0 && done >= rounds) {
                return;
            }
            Path changed = waitForChange(seen);
            if (changed == null) {
                return;
            }
            out.println();
            out.println("-- " + LocalTime.now().format(DateTimeFormatter.ofPattern("HH:mm:ss")) + " " + changed
                    + " changed: checking again");
            out.flush();
        }
    }

    // The first file whose stamp changed and then held still for a poll; null when interrupted.
    private static Path waitForChange(Map<Path, String> seen) {
        try {
            while (true) {
                Thread.sleep(POLL_MILLIS);
                for (Map.Entry<Path, String> e : seen.entrySet()) {
                    String now = stamp(e.getKey());
                    if (!now.equals(e.getValue())) {
                        Thread.sleep(POLL_MILLIS);
                        while (!stamp(e.getKey()).equals(now)) {
                            now = stamp(e.getKey());
                            Thread.sleep(POLL_MILLIS);
                        }
                        return e.getKey();
                    }
                }
            }
        } catch (InterruptedException ie) {
            Thread.currentThread().interrupt();
            return null;
        }
    }

    private static Map<Path, String> stamps(Set<Path> files) {
        Map<Path, String> m = new HashMap<>();
        for (Path f : files) {
            if (Files.isRegularFile(f)) {
                m.put(f, stamp(f));
            }
        }
        return m;
    }

    // Modification time and size: either moves when an editor saves.
    private static String stamp(Path f) {
        try {
            FileTime t = Files.getLastModifiedTime(f);
            return t.toMillis() + ":" + Files.size(f);
        } catch (IOException e) {
            return "gone";
        }
    }
}
