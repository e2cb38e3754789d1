package org.arcwright.app;

import javax.swing.SwingUtilities;
import org.arcwright.app.model.ConfigLocation;
import org.arcwright.app.model.Settings;
import org.arcwright.app.shell.MainWindow;
import org.arcwright.app.shell.Themes;

/**
 * Starts the desktop window: reads settings, applies the look, and builds and shows the window on
 * the event thread. Packs and indexes load after the window shows, so it opens fast.
 *
 * <p>The start-up harness sets the system property {@value #PROBE_PROPERTY}: {@code print} makes the
 * window print {@value #USABLE_MARKER} and the process's CPU time so far on standard output once it is
 * shown, painted and idle;
 * {@code exit} also ends the process then (used to train the class-data-sharing archive).
 */
public final class DesktopApp {
    /** System property read by the start-up harness. */
    public static final String PROBE_PROPERTY = "arcwright.startupProbe";
    /** The line printed when the window is usable. */
    public static final String USABLE_MARKER = "arcwright-window-usable";

    private DesktopApp() {}

    public static void launch(String[] args) {
        AppServices services = AppServices.over(ConfigLocation.current());
        Settings settings = services.settings().load();
        String probe = System.getProperty(PROBE_PROPERTY);
        // Read the first worksheet while the event thread sets up the look.
        java.util.concurrent.CompletableFuture<MainWindow.Opening> opening = java.util.concurrent.CompletableFuture
                .supplyAsync(() -> MainWindow.opening(settings, services.files()), services.background());
        SwingUtilities.invokeLater(() -> {
            MainWindow w = start(services, settings, opening::join);
            if (probe != null) whenUsable(w.frame(), "exit".equals(probe));
        });
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

    /** Prints the marker after the window has opened and the event queue has drained once more. */
    private static void whenUsable(java.awt.Window window, boolean exit) {
        Runnable report = () -> SwingUtilities.invokeLater(() -> {
            System.out.println(USABLE_MARKER + " cpu=" + ProcessHandle.current().info().totalCpuDuration()
                    .map(java.time.Duration::toMillis).orElse(-1L));
            if (Boolean.getBoolean("arcwright.startupThreads")) printThreadCpu();
            System.out.flush();
            if (exit) System.exit(0);
        });
        if (window.isShowing()) {
            SwingUtilities.invokeLater(report);
            return;
        }
        window.addWindowListener(new java.awt.event.WindowAdapter() {
            @Override
            public void windowOpened(java.awt.event.WindowEvent e) { report.run(); }
        });
    }

    /** Builds and shows the window; for tests, over their own services. */
    public static MainWindow start(AppServices services, Settings settings) {
        return start(services, settings, () -> MainWindow.opening(settings, services.files()));
    }

    private static MainWindow start(AppServices services, Settings settings,
                                    java.util.function.Supplier<MainWindow.Opening> opening) {
        Themes themes = new Themes();
        themes.install(settings.theme());
        MainWindow window = new MainWindow(services, themes, settings, opening.get());
        window.show();
        return window;
    }
}
