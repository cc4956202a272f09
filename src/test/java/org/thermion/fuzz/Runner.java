package org.thermion.fuzz;

import org.thermion.cli.FuzzEntry;
import org.thermion.lang.SourceSet;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Runs one fuzz case in-process, through the same picocli command line as {@code thermion},
 * with standard output and error captured, and judges the outcome: no exception or error
 * escaping to the user, exit code 0, 1 or 2, no internal error, the work done within the
 * budget (and a watchdog for true hangs), every {@code file:line:col} inside its file, and
 * every file of the case unchanged.
 *
 * <p>The budget counts work, not the wall clock: the CPU time the process spent on the case
 * (every thread of it, so a parallel {@code verify} is counted whole), which a busy shared
 * machine does not inflate. The program's own counted limits (tokens per line and nesting in
 * {@code NestingLimit}, loop steps and instances in the elaborator, the cycle budget of a run)
 * are what keep a case inside it; the watchdog alone is wall-clock time.
 */
final class Runner implements AutoCloseable {
    /** CPU time a case may take before it counts as a budget overrun. */
    static final long BUDGET_SECONDS = 20;
    private static final com.sun.management.OperatingSystemMXBean OS =
            (com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean();
    /** A case still running after this is a hang: the run fails without waiting further. */
    static final long WATCHDOG_SECONDS = 60;
    private static final Pattern LOCATION = Pattern.compile("^(.+?):(\\d+):(\\d+): (error|warning|note): ", Pattern.MULTILINE);
    private static final int CAPTURE = 1 << 20;

    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "fuzz case");
        t.setDaemon(true);
        return t;
    });

    /** What one case did. */
    record Outcome(int code, String out, String err, double seconds, double cpuSeconds, List<String> problems) {
    }

    Outcome run(FuzzCase c) throws IOException {
        Path dir = Files.createTempDirectory("thermion-fuzz");
        try {
            Map<Path, byte[]> before = new LinkedHashMap<>();
            for (Map.Entry<String, byte[]> f : c.files().entrySet()) {
                Path p = dir.resolve(f.getKey());
                Files.write(p, f.getValue());
                before.put(p, f.getValue());
            }
            String[] args = c.args().stream().map(a -> a.replace(FuzzCase.DIR, dir.toString())).toArray(String[]::new);
            Bounded out = new Bounded();
            Bounded err = new Bounded();
            List<String> problems = new ArrayList<>();
            long t0 = System.nanoTime();
            long cpu0 = OS.getProcessCpuTime();
            Future<Integer> run = worker.submit(() -> FuzzEntry.commandLine().setOut(new PrintWriter(out, true))
                    .setErr(new PrintWriter(err, true)).execute(args));
            int code = -1;
            try {
                code = run.get(WATCHDOG_SECONDS, TimeUnit.SECONDS);
            } catch (TimeoutException e) {
                run.cancel(true);
                problems.add("hang: still running after " + WATCHDOG_SECONDS + " s (watchdog)");
            } catch (java.util.concurrent.ExecutionException e) {
                problems.add("escaped to the user: " + e.getCause());
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                problems.add("interrupted");
            }
            double seconds = (System.nanoTime() - t0) * 1e-9;
            double cpuSeconds = (OS.getProcessCpuTime() - cpu0) * 1e-9;
            if (cpuSeconds > BUDGET_SECONDS && problems.isEmpty()) {
                problems.add(String.format("budget overrun: %.1f s of CPU (budget %d s; %.1f s on the clock)",
                        cpuSeconds, BUDGET_SECONDS, seconds));
            }
            String e = err.toString();
            if (code != -1 && (code < 0 || code > 2)) {
                problems.add("exit code " + code);
            }
            if (e.contains("internal error") || e.contains("Exception") || e.contains("\tat ")) {
                problems.add("internal error or stack trace on standard error");
            }
            problems.addAll(locations(e));
            for (Map.Entry<Path, byte[]> f : before.entrySet()) {
                if (!Files.exists(f.getKey()) || !Arrays.equals(Files.readAllBytes(f.getKey()), f.getValue())) {
                    problems.add("input file changed: " + f.getKey().getFileName());
                }
            }
            return new Outcome(code, out.toString(), e, seconds, cpuSeconds, problems);
        } finally {
            delete(dir);
        }
    }

    /** Every {@code file:line:col} must name a line of the file and a column within it (or just past its end). */
    static List<String> locations(String err) throws IOException {
        List<String> problems = new ArrayList<>();
        Matcher m = LOCATION.matcher(err);
        while (m.find()) {
            Path file = Path.of(m.group(1));
            if (!Files.isRegularFile(file)) {
                continue;
            }
            List<String> lines = SourceSet.split(new String(Files.readAllBytes(file), StandardCharsets.UTF_8));
            int line = Integer.parseInt(m.group(2));
            int col = Integer.parseInt(m.group(3));
            if (line < 1 || line > Math.max(1, lines.size())) {
                problems.add("location outside the file (" + lines.size() + " lines): " + m.group());
                continue;
            }
            String text = lines.isEmpty() ? "" : lines.get(line - 1);
            if (col < 1 || col > text.codePointCount(0, text.length()) + 1) {
                problems.add("location past the end of its line: " + m.group());
            }
        }
        return problems;
    }

    private static void delete(Path dir) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }

    @Override
    public void close() {
        worker.shutdownNow();
    }

    /** Captured output, cut off after 1 MiB so a chatty run cannot fill the heap. */
    private static final class Bounded extends Writer {
        private final StringBuilder text = new StringBuilder();

        @Override
        public void write(char[] cbuf, int off, int len) {
            int room = CAPTURE - text.length();
            if (room > 0) {
                text.append(cbuf, off, Math.min(room, len));
            }
        }

        @Override
        public void flush() {
        }

        @Override
        public void close() {
        }

        @Override
        public String toString() {
            return text.toString();
        }
    }
}
