package org.thermion.cli;

import org.thermion.text.Nouns;
import org.thermion.cli.report.Numbers;
import org.thermion.tui.FileStamps;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalTime;
import java.time.format.DateTimeFormatter;
import java.util.Set;
import java.util.function.Supplier;

/**
 * {@code check --watch}: after each check, waits until one of the files it read (the
 * description and its includes) is saved again, then checks again, until stopped (Ctrl-C)
 * or interrupted. Saves are seen by {@link FileStamps}.
 */
final class CheckWatch {
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
            FileStamps seen = new FileStamps(check.get());
            done++;
            out.println("-- watching " + Nouns.count(seen.size(), "file") + " for changes; Ctrl-C stops");
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
    private static Path waitForChange(FileStamps stamps) {
        try {
            while (true) {
                Thread.sleep(FileStamps.POLL_MILLIS);
                Path changed = stamps.poll();
                if (changed != null) {
                    return changed;
                }
            }
        } catch (InterruptedException ie) {
            Thread.currentThread().interrupt();
            return null;
        }
    }
}
