package org.arcwright.app;

import java.awt.Toolkit;
import java.nio.file.Path;
import java.util.Objects;
import java.util.concurrent.CompletableFuture;
import java.util.function.Consumer;
import javax.swing.SwingUtilities;
import org.arcwright.app.model.Settings;
import org.arcwright.app.shell.AppServices;
import org.arcwright.app.shell.MainWindow;
import org.arcwright.app.widgets.Themes;
import org.arcwright.pack.ConfigDirectory;

/**
 * Starts the desktop window: reads settings, applies the look, and builds and shows the window on
 * the event thread. The settings and the first worksheet are read on a second thread while this one
 * connects to the display; packs and indexes load after the first frame, so it opens fast.
 */
public final class DesktopApp {
    private DesktopApp() {}

    /** Opens the window ({@code args} are those of a start with none, so unused). */
    public static void launch(String[] args) {
        launch(window -> { });
    }

    /**
     * Starts the window as {@link #launch(String[])} does and hands it, once shown, to
     * {@code whenShown} on the event thread; the start-up harness times the window through it.
     */
    public static void launch(Consumer<MainWindow> whenShown) {
        Objects.requireNonNull(whenShown, "whenShown");
        // A second thread reads the settings and then the first worksheet (Jackson's first use) while
        // this thread connects to the display; the look needs the settings, the window both.
        Path config = ConfigDirectory.ofSystem();
        CompletableFuture<AppServices> services = new CompletableFuture<>();
        CompletableFuture<Settings> settings = new CompletableFuture<>();
        CompletableFuture<MainWindow.Opening> opening = new CompletableFuture<>();
        Thread reader = new Thread(() -> readAhead(config, services, settings, opening), "arcwright-start");
        reader.setDaemon(true);
        reader.start();
        Toolkit.getDefaultToolkit();
        Settings s = settings.join();
        Themes themes = new Themes();
        themes.install(s.theme());
        SwingUtilities.invokeLater(() -> whenShown.accept(show(services.join(), themes, s, opening.join())));
    }

    private static void readAhead(Path config, CompletableFuture<AppServices> services,
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
