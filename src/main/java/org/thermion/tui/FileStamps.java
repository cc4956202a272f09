package org.thermion.tui;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Notices that a file was saved, by polling modification times and sizes (works on every file
 * system). A save counts once the file has held still for one poll, so an editor writing in
 * pieces is not read half-written. Shared by {@code check --watch} and the UI's reload.
 */
public final class FileStamps {
    /** How often callers poll; a save is acted on one to two polls after it. */
    public static final long POLL_MILLIS = 300;

    private final Map<Path, String> seen = new LinkedHashMap<>();
    private Path moving;
    private String movingStamp;

    /** Takes the files' present stamps; files that do not exist are not watched. */
    public FileStamps(Collection<Path> files) {
        for (Path f : files) {
            if (Files.isRegularFile(f)) {
                seen.put(f, stamp(f));
            }
        }
    }

    /** How many files are watched. */
    public int size() {
        return seen.size();
    }

    /**
     * One poll: the file that changed and has not changed again since the previous poll, or
     * null. After it returns a file, take new stamps (a new {@code FileStamps}) once re-read.
     */
    public Path poll() {
        if (moving != null) {
            String now = stamp(moving);
            if (now.equals(movingStamp)) {
                Path p = moving;
                moving = null;
                seen.put(p, now);
                return p;
            }
            movingStamp = now;
            return null;
        }
        for (Map.Entry<Path, String> e : seen.entrySet()) {
            String now = stamp(e.getKey());
            if (!now.equals(e.getValue())) {
                moving = e.getKey();
                movingStamp = now;
                return null;
            }
        }
        return null;
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
