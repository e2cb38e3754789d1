package org.arcwright.bench;

import java.awt.Graphics;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadInfo;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.stream.Stream;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.JLayeredPane;
import javax.swing.SwingUtilities;
import javax.swing.Timer;
import org.arcwright.app.DesktopApp;
import org.arcwright.app.shell.MainWindow;

/**
 * The Arcwright window as {@code ./arcwright} opens it ({@link DesktopApp#launch}), with the start-up
 * harness's probe added: it prints {@value #USABLE_MARKER} and the process's CPU time so far on
 * standard output when the window's first frame has been painted, and {@value #COMPLETE_MARKER} when
 * the Decide form, built by the next event after that paint, is in place. The system property
 * {@value #PROBE_PROPERTY} set to {@code exit} ends the process then (for timed runs and for the
 * training runs of a class-data archive or ahead-of-time cache; {@value #LINGER_PROPERTY} keeps the
 * window open that many milliseconds longer first); {@code arcwright.startupThreads=true}
 * adds each busy thread's CPU time. The shipped entry point has no probe.
 */
public final class StartupProbe {
    /** System property: {@code exit} ends the process once the Decide form is in place. */
    static final String PROBE_PROPERTY = "arcwright.startupProbe";
    /**
     * System property: milliseconds the window stays open after the Decide form before an
     * {@code exit} probe ends it, so that a training run also sees the packs and the notes index load.
     */
    static final String LINGER_PROPERTY = "arcwright.startupLinger";
    /** The line printed when the window is usable. */
    static final String USABLE_MARKER = "arcwright-window-usable";
    /** The line printed when the Decide form, built after the first frame, is in place. */
    static final String COMPLETE_MARKER = "arcwright-window-complete";

    private StartupProbe() {}

    public static void main(String[] args) {
        boolean exit = "exit".equals(System.getProperty(PROBE_PROPERTY));
        DesktopApp.launch(window -> whenUsable(window, exit));
    }

    /**
     * Prints the marker when the window's first frame has been painted (a one-pixel probe on the top
     * layer paints last in that pass), then the second one once the Decide form is in place.
     */
    private static void whenUsable(MainWindow window, boolean exit) {
        JFrame frame = window.frame();
        Runnable report = () -> {
            System.out.println(USABLE_MARKER + " cpu=" + cpuMillis());
            if (Boolean.getBoolean("arcwright.startupThreads")) printThreadCpu();
            System.out.flush();
            window.whenDecideBuilt(() -> SwingUtilities.invokeLater(() -> {
                System.out.println(COMPLETE_MARKER + " cpu=" + cpuMillis());
                System.out.flush();
                if (exit) exitAfter(Integer.getInteger(LINGER_PROPERTY, 0));
            }));
        };
        JComponent probe = new JComponent() {
            private static final long serialVersionUID = 1L;
            private boolean painted;

            @Override
            protected void paintComponent(Graphics g) {
                if (painted || !frame.isShowing()) return;
                painted = true;
                report.run();
            }
        };
        probe.setBounds(0, 0, 1, 1);
        frame.getLayeredPane().add(probe, JLayeredPane.DRAG_LAYER);
    }

    /**
     * CPU time by thread, to see what start-up spends: every thread of the process on Linux (the
     * JIT compiler, GC and VM threads too, from {@code /proc/self/task}), else the Java threads.
     */
    private static void printThreadCpu() {
        Path tasks = Path.of("/proc/self/task");
        if (Files.isDirectory(tasks)) {
            try (Stream<Path> all = Files.list(tasks)) {
                for (Path t : all.toList()) {
                    String stat = Files.readString(t.resolve("stat"));
                    String[] f = stat.substring(stat.lastIndexOf(')') + 2).split(" ");
                    long ms = (Long.parseLong(f[11]) + Long.parseLong(f[12])) * 10;  // utime + stime, 100 ticks a second
                    if (ms >= 20) System.out.println("  thread " + Files.readString(t.resolve("comm")).strip() + " " + ms + " ms");
                }
                return;
            } catch (IOException | RuntimeException e) {
                System.out.println("  (no per-thread times from /proc: " + e + ")");
            }
        }
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        for (long id : mx.getAllThreadIds()) {
            ThreadInfo info = mx.getThreadInfo(id);
            long cpu = mx.getThreadCpuTime(id);
            if (info != null && cpu > 20_000_000L) System.out.println("  thread " + info.getThreadName() + " " + cpu / 1_000_000 + " ms");
        }
    }

    /** Ends the process after {@code millis} more of the session (packs, notes index), 0 at once. */
    private static void exitAfter(int millis) {
        if (millis <= 0) System.exit(0);
        Timer t = new Timer(millis, e -> System.exit(0));
        t.setRepeats(false);
        t.start();
    }

    private static long cpuMillis() {
        return ProcessHandle.current().info().totalCpuDuration().map(Duration::toMillis).orElse(-1L);
    }
}
