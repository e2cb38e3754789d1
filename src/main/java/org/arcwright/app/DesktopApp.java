package org.arcwright.app;

import java.util.concurrent.CompletableFuture;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.SwingUtilities;
import org.arcwright.pack.ConfigDirectory;
import org.arcwright.app.model.Settings;
import org.arcwright.app.shell.AppServices;
import org.arcwright.app.shell.MainWindow;
import org.arcwright.app.widgets.Themes;

/**
 * Starts the desktop window: reads settings, applies the look, and builds and shows the window on
 * the event thread. The settings and the first worksheet are read on a second thread while this one
 * connects to the display; packs and indexes load after the first frame, so it opens fast.
 *
 * <p>The start-up harness sets the system property {@value #PROBE_PROPERTY}: {@code print} makes the
 * window print {@value #USABLE_MARKER} and the process's CPU time so far on standard output when its
 * first frame has been painted, and {@value #COMPLETE_MARKER} when the Decide form is in place;
 * {@code exit} also ends the process then (used to train the class-data-sharing archive).
 */
public final class DesktopApp {
    /** System property read by the start-up harness. */
    public static final String PROBE_PROPERTY = "arcwright.startupProbe";
    /** The line printed when the window is usable. */
    public static final String USABLE_MARKER = "arcwright-window-usable";
    /** The line printed when the Decide form, built after the first frame, is in place. */
    public static final String COMPLETE_MARKER = "arcwright-window-complete";

    private DesktopApp() {}

    public static void launch(String[] args) {
        // A second thread reads the settings and then the first worksheet (Jackson's first use) while
        // this thread connects to the display; the look needs the settings, the window both.
        java.nio.file.Path config = ConfigDirectory.ofSystem();
        CompletableFuture<AppServices> services = new CompletableFuture<>();
        CompletableFuture<Settings> settings = new CompletableFuture<>();
        CompletableFuture<MainWindow.Opening> opening = new CompletableFuture<>();
        Thread reader = new Thread(() -> readAhead(config, services, settings, opening), "arcwright-start");
        reader.setDaemon(true);
        reader.start();
        java.awt.Toolkit.getDefaultToolkit();
        Settings s = settings.join();
        Themes themes = new Themes();
        themes.install(s.theme());
        String probe = System.getProperty(PROBE_PROPERTY);
        SwingUtilities.invokeLater(() -> {
            MainWindow w = show(services.join(), themes, s, opening.join());
            if (probe != null) whenUsable(w, "exit".equals(probe));
        });
    }

    private static void readAhead(java.nio.file.Path config, CompletableFuture<AppServices> services,
                                  CompletableFuture<Settings> settings, CompletableFuture<MainWindow.Opening> opening) {
        try {
            AppServices sv = AppServices.over(config);
            services.complete(sv);
            Settings st = sv.settings().load();
            settings.complete(st);
            opening.complete(MainWindow.opening(st, sv.files()));
        } catch (RuntimeException | Error e) {
            services.completeExceptionally(e);
            settings.completeExceptionally(e);
            opening.completeExceptionally(e);
        }
    }

    /** The start-up harness's breakdown of CPU time by thread, to see what start-up spends. */
    private static void printThreadCpu() {
        java.lang.management.ThreadMXBean mx = java.lang.management.ManagementFactory.getThreadMXBean();
        for (long id : mx.getAllThreadIds()) {
            java.lang.management.ThreadInfo info = mx.getThreadInfo(id);
            long cpu = mx.getThreadCpuTime(id);
            if (info != null && cpu > 20_000_000L) System.out.println("  thread " + info.getThreadName() + " " + cpu / 1_000_000 + " ms");
        }
    }

    /**
     * Prints the marker when the window's first frame has been painted (a one-pixel probe on the top
     * layer paints last in that pass), then a second one once the Decide form, built by the next
     * event after that paint, is in place.
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
                if (exit) System.exit(0);
            }));
        };
        JComponent probe = new JComponent() {
            private static final long serialVersionUID = 1L;
            private boolean painted;

            @Override
            protected void paintComponent(java.awt.Graphics g) {
                if (painted || !frame.isShowing()) return;
                painted = true;
                report.run();
            }
        };
        probe.setBounds(0, 0, 1, 1);
        frame.getLayeredPane().add(probe, javax.swing.JLayeredPane.DRAG_LAYER);
    }

    private static long cpuMillis() {
        return ProcessHandle.current().info().totalCpuDuration().map(java.time.Duration::toMillis).orElse(-1L);
    }

    /** Builds and shows the window; for tests, over their own services. */
    public static MainWindow start(AppServices services, Settings settings) {
        Themes themes = new Themes();
        themes.install(settings.theme());
        return show(services, themes, settings, MainWindow.opening(settings, services.files()));
    }

    private static MainWindow show(AppServices services, Themes themes, Settings settings, MainWindow.Opening opening) {
        MainWindow window = new MainWindow(services, themes, settings, opening);
        window.show();
        return window;
    }
}
