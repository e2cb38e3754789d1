package org.arcwright.bench;

import java.awt.AWTEvent;
import java.awt.EventQueue;
import java.awt.Robot;
import java.awt.Toolkit;
import java.awt.event.InvocationEvent;
import java.awt.event.KeyEvent;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.lang.reflect.Field;
import java.lang.reflect.InvocationTargetException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.Callable;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import javax.swing.SwingUtilities;
import javax.swing.Timer;
import org.arcwright.app.shell.AppServices;
import org.arcwright.app.DesktopApp;
import org.arcwright.app.model.Settings;
import org.arcwright.app.model.ThemeChoice;
import org.arcwright.app.shell.MainWindow;

/**
 * Typing-stall harness: how long the event thread spends on each event while a robot types a query
 * into the notes search, against the same stretch of time with the window idle.
 *
 * <p>An {@link EventQueue} subclass pushed onto the system queue times every {@code dispatchEvent}
 * (so the figure is the event thread's own work per event, not the machine's scheduling of a probe
 * thread) and, for each key event, the time from its posting by the toolkit thread to the start of
 * its dispatch (the lag a typist would see). Each run clears the search, lets it settle, types
 * {@value #QUERY_LENGTH} keystrokes at {@value #KEY_INTERVAL_MS} ms apart, then records for two more
 * seconds while the last search lands; the idle stretch that follows is as long, with no input.
 *
 * <p>Two note sets: the built-in notes (a fresh config directory), and a generated pack of 100,000
 * invented notes ({@link GeneratedNotes}, fixed seed) as a team pack; its notes and index are kept
 * under {@code target/bench/typing-100k} so that only the first run pays for writing and indexing.
 *
 * <p>Run on a display after {@code mvn -B -o -q package -DskipTests && mvn -B -o -q test-compile}:
 * {@code xvfb-run -a -s "-screen 0 1600x1000x24" java -XX:+UseSerialGC -XX:TieredStopAtLevel=1
 * -cp target/arcwright.jar:target/test-classes org.arcwright.bench.TypingStallHarness [runs] [notes]}
 * (defaults 3 runs; {@code notes} 100000, or 0 for the built-in notes only). The event thread's own CPU
 * time per dispatch is reported beside the wall time, since on a shared machine a dispatch can wait
 * for a core. For diagnosis, {@code -Dtyping.sample=true} prints a stack of every event over 50 ms,
 * and {@code -Dtyping.kinds=true} (with {@code --add-opens java.desktop/java.awt.event=ALL-UNNAMED
 * --add-opens java.desktop/javax.swing=ALL-UNNAMED}) counts the events by kind and timer.
 */
public final class TypingStallHarness {
    /** The typed query: 40 keystrokes, lower-case letters and spaces. */
    static final String QUERY = "fatigue fillet shoulder radius stress kt";
    static final int QUERY_LENGTH = 40;
    static final int KEY_INTERVAL_MS = 80;
    private static final long SETTLE_AFTER_TYPING_MS = 2000;

    private TypingStallHarness() {}

    public static void main(String[] args) throws Exception {
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 3;
        int generated = args.length > 1 ? Integer.parseInt(args[1]) : 100_000;
        if (QUERY.length() != QUERY_LENGTH) throw new IllegalStateException("query length");
        Path bench = Files.createDirectories(Path.of("target", "bench"));
        System.out.printf(Locale.ROOT, "load average at start: %s%n", Files.readString(Path.of("/proc/loadavg")).trim());
        List<String> rows = new ArrayList<>();
        rows.addAll(measure("built-in notes", Files.createTempDirectory(bench, "typing-config"), Settings.DEFAULTS, runs));
        if (generated > 0) {
            Path root = Files.createDirectories(bench.resolve("typing-" + generated / 1000 + "k"));
            Path pack = root.resolve("pack");
            if (!Files.isDirectory(pack.resolve("notes"))) {
                long t0 = System.nanoTime();
                GeneratedNotes.write(pack, generated, 20261130L);
                System.out.printf(Locale.ROOT, "wrote %d generated notes in %.0f s (once)%n", generated, (System.nanoTime() - t0) / 1e9);
            }
            Settings withPack = Settings.DEFAULTS.withPacks(List.of(pack.toAbsolutePath().toString()), null);
            rows.addAll(measure(String.format(Locale.ROOT, "%,d generated notes", generated),
                    Files.createDirectories(root.resolve("config")), withPack, runs));
        }
        System.out.printf(Locale.ROOT, "load average at end: %s%n", Files.readString(Path.of("/proc/loadavg")).trim());
        System.out.println("| notes | phase | events | max dispatch ms | p99 dispatch ms | max event-thread CPU in one dispatch ms"
                + " | longest event | max key event→dispatch ms |");
        System.out.println("|---|---|---:|---:|---:|---:|---|---:|");
        rows.forEach(System.out::println);
        System.exit(0);
    }

    private static List<String> measure(String notes, Path config, Settings settings, int runs) throws Exception {
        AppServices services = AppServices.over(config);
        MainWindow window = onEdt(() -> DesktopApp.start(services, settings.withTheme(ThemeChoice.LIGHT).withDemoShown()));
        long t0 = System.nanoTime();
        waitFor(() -> onEdt(() -> window.notesPanel().queryField().isEnabled()), 900);
        System.out.printf(Locale.ROOT, "%s: notes index ready %.1f s after the window opened%n", notes, (System.nanoTime() - t0) / 1e9);
        TimingQueue queue = new TimingQueue();
        Toolkit.getDefaultToolkit().getSystemEventQueue().push(queue);
        if (Boolean.getBoolean("typing.sample")) queue.sampleSlowDispatches();
        Robot robot = new Robot();
        List<String> rows = new ArrayList<>();
        Stats typingAll = new Stats();
        Stats idleAll = new Stats();
        for (int run = 1; run <= runs; run++) {
            onEdt(() -> {
                window.notesPanel().queryField().setText("");
                window.notesPanel().focusSearch();
            });
            Thread.sleep(1500);
            queue.start();
            for (char c : QUERY.toCharArray()) {
                int code = c == ' ' ? KeyEvent.VK_SPACE : KeyEvent.getExtendedKeyCodeForChar(c);
                robot.keyPress(code);
                Thread.sleep(15);
                robot.keyRelease(code);
                Thread.sleep(KEY_INTERVAL_MS - 15);
            }
            Thread.sleep(SETTLE_AFTER_TYPING_MS);
            Stats typing = queue.stop();
            String typed = onEdt(() -> window.notesPanel().queryField().getText());
            if (!QUERY.equals(typed)) throw new IllegalStateException("the field reads \"" + typed + "\", not the query");
            long stretch = typing.durationMs;
            queue.start();
            Thread.sleep(stretch);
            Stats idle = queue.stop();
            rows.add(typing.row(notes, "typing, run " + run));
            rows.add(idle.row(notes, "idle, run " + run));
            if (!idle.kinds.isEmpty()) System.out.println("idle events: " + idle.kinds + "\ntyping events: " + typing.kinds);
            typingAll.add(typing);
            idleAll.add(idle);
        }
        rows.add(typingAll.row(notes, "**typing, all runs**"));
        rows.add(idleAll.row(notes, "**idle, all runs**"));
        queue.pop();
        queue.slowFrames.entrySet().stream().sorted(Map.Entry.<String, Integer>comparingByValue().reversed()).limit(70)
                .forEach(en -> System.out.println("  slow " + en.getValue() + " " + en.getKey()));
        onEdt(window::dispose);
        return rows;
    }

    /** Dispatch times and key lags of one stretch. */
    static final class Stats {
        final List<Double> dispatchMs = new ArrayList<>();
        final List<Double> keyLagMs = new ArrayList<>();
        final List<Double> cpuMs = new ArrayList<>();
        final Map<String, Integer> kinds = new TreeMap<>();
        double longestMs = -1;
        String longest = "";
        long durationMs;

        void add(Stats other) {
            dispatchMs.addAll(other.dispatchMs);
            cpuMs.addAll(other.cpuMs);
            keyLagMs.addAll(other.keyLagMs);
            if (other.longestMs > longestMs) {
                longestMs = other.longestMs;
                longest = other.longest;
            }
        }

        String row(String notes, String phase) {
            List<Double> sorted = new ArrayList<>(dispatchMs);
            Collections.sort(sorted);
            double p99 = sorted.isEmpty() ? 0 : sorted.get(Math.min(sorted.size() - 1, (int) Math.ceil(0.99 * sorted.size()) - 1));
            double lag = keyLagMs.isEmpty() ? 0 : Collections.max(keyLagMs);
            double cpu = cpuMs.isEmpty() ? 0 : Collections.max(cpuMs);
            return String.format(Locale.ROOT, "| %s | %s | %d | %.1f | %.1f | %.1f | %s | %s |", notes, phase, sorted.size(),
                    sorted.isEmpty() ? 0 : sorted.get(sorted.size() - 1), p99, cpu, longest,
                    keyLagMs.isEmpty() ? "–" : String.format(Locale.ROOT, "%.1f", lag));
        }
    }

    /** Times each dispatch on the event thread and each key event's wait in the queue. */
    static final class TimingQueue extends EventQueue {
        private final ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        private Stats current;
        volatile long dispatchStart;
        final Map<String, Integer> perEvent = new ConcurrentHashMap<>();
        final Map<Long, StackTraceElement[]> lastSample = new ConcurrentHashMap<>();
        volatile Thread edt;
        final Map<String, Integer> slowFrames = new ConcurrentHashMap<>();

        /** While an event has run over 20 ms, samples the event thread's stack every 5 ms (diagnosis). */
        void sampleSlowDispatches() {
            Thread t = new Thread(() -> {
                while (true) {
                    try {
                        Thread.sleep(5);
                    } catch (InterruptedException x) {
                        return;
                    }
                    long st = dispatchStart;
                    Thread et = edt;
                    if (st == 0 || et == null || System.nanoTime() - st < 20_000_000L) continue;
                    Set<String> seen = new HashSet<>();
                    StackTraceElement[] stack = et.getStackTrace();
                    if (st == dispatchStart) {
                        lastSample.put(st, stack);
                        for (StackTraceElement f : stack) {
                            if (f.getClassName().startsWith("org.arcwright.app") || f.getClassName().contains("UI")
                                    && f.getMethodName().startsWith("paint") || f.getMethodName().equals("validateTree")) {
                                perEvent.merge(f.getClassName() + "." + f.getMethodName(), 1, Integer::sum);
                            }
                        }
                    }
                    for (int i = 0; i < stack.length; i++) {
                        StackTraceElement f = stack[i];
                        String k = f.getClassName() + "." + f.getMethodName();
                        if (i == 0) slowFrames.merge("LEAF " + k, 1, Integer::sum);
                        if (seen.add(k)) slowFrames.merge(k, 1, Integer::sum);
                    }
                }
            }, "slow-dispatch-sampler");
            t.setDaemon(true);
            t.start();
        }
        private long started;

        @Override
        protected void dispatchEvent(AWTEvent e) {
            long t0 = System.nanoTime();
            long cpu0 = threads.getCurrentThreadCpuTime();
            dispatchStart = t0;
            edt = Thread.currentThread();
            long wallMs = System.currentTimeMillis();
            super.dispatchEvent(e);
            dispatchStart = 0;
            StackTraceElement[] sample = lastSample.remove(t0);
            if (sample != null && current != null && (System.nanoTime() - t0) > 50_000_000L) {
                StringBuilder b = new StringBuilder("  slow event " + (System.nanoTime() - t0) / 1_000_000 + " ms " + describe(e) + ":");
                for (int i = 0, n = 0; i < sample.length && n < 14; i++) {
                    String c = sample[i].getClassName();
                    if (i < 6 || c.startsWith("org.arcwright")) {
                        b.append("\n      ").append(c).append('.').append(sample[i].getMethodName()).append(':').append(sample[i].getLineNumber());
                        n++;
                    }
                }
                System.out.println(b);
                System.out.println("      in samples: " + new TreeMap<>(perEvent));
            }
            perEvent.clear();
            Stats s = current;
            if (s == null) return;
            double ms = (System.nanoTime() - t0) / 1e6;
            s.dispatchMs.add(ms);
            s.cpuMs.add((threads.getCurrentThreadCpuTime() - cpu0) / 1e6);
            if (e instanceof KeyEvent) s.keyLagMs.add((double) (wallMs - ((KeyEvent) e).getWhen()));
            if (Boolean.getBoolean("typing.kinds")) s.kinds.merge(describe(e) + timerOf(e), 1, Integer::sum);
            if (ms > s.longestMs) {
                s.longestMs = ms;
                s.longest = describe(e);
            }
        }

        void start() {
            onEdt(() -> {
                current = new Stats();
                started = System.nanoTime();
            });
        }

        Stats stop() {
            return onEdt(() -> {
                Stats s = current;
                current = null;
                s.durationMs = (System.nanoTime() - started) / 1_000_000;
                return s;
            });
        }

        @Override
        public void pop() { super.pop(); }

        private static String timerOf(AWTEvent e) {
            try {
                Field f = InvocationEvent.class.getDeclaredField("runnable");
                f.setAccessible(true);
                Object r = f.get(e);
                Field outer = r.getClass().getDeclaredField("this$0");
                outer.setAccessible(true);
                Timer t = (Timer) outer.get(r);
                return " " + t.getDelay() + " " + Arrays.toString(t.getActionListeners());
            } catch (ReflectiveOperationException | RuntimeException x) {
                return "";
            }
        }

        private static String describe(AWTEvent e) {
            if (e instanceof InvocationEvent) {
                String p = e.paramString();
                int i = p.indexOf("runnable=");
                String r = i < 0 ? p : p.substring(i + 9);
                int comma = r.indexOf(',');
                String name = comma < 0 ? r : r.substring(0, comma);
                int lambda = name.indexOf("$$Lambda$");
                int at = name.indexOf('@');
                return "invocation " + (lambda >= 0 ? name.substring(0, lambda) + " (lambda)" : at >= 0 ? name.substring(0, at) : name);
            }
            return e.getClass().getSimpleName() + " " + e.getID();
        }
    }

    private static <T> T onEdt(Callable<T> c) {
        AtomicReference<T> out = new AtomicReference<>();
        AtomicReference<Exception> err = new AtomicReference<>();
        try {
            SwingUtilities.invokeAndWait(() -> {
                try {
                    out.set(c.call());
                } catch (Exception e) {
                    err.set(e);
                }
            });
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        } catch (InvocationTargetException e) {
            throw new IllegalStateException(e.getCause());
        }
        if (err.get() != null) throw new IllegalStateException(err.get());
        return out.get();
    }

    private static void onEdt(Runnable r) {
        onEdt(() -> {
            r.run();
            return null;
        });
    }

    private static void waitFor(BooleanSupplier condition, int seconds) throws InterruptedException {
        long end = System.nanoTime() + seconds * 1_000_000_000L;
        while (System.nanoTime() < end) {
            if (condition.getAsBoolean()) return;
            Thread.sleep(200);
        }
        throw new IllegalStateException("not ready within " + seconds + " s");
    }
}
