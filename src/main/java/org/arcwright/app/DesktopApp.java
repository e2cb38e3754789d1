package org.arcwright.app;

import javax.swing.SwingUtilities;
import org.arcwright.app.model.ConfigLocation;
import org.arcwright.app.model.Settings;
import org.arcwright.app.shell.MainWindow;
import org.arcwright.app.shell.Themes;

/**
 * Starts the desktop window: reads settings, applies the look, and builds and shows the window on
 * the event thread. Packs and indexes load after the window shows, so it opens fast.
 */
public final class DesktopApp {
    private DesktopApp() {}

    public static void launch(String[] args) {
        AppServices services = AppServices.over(ConfigLocation.current());
        Settings settings = services.settings().load();
        SwingUtilities.invokeLater(() -> start(services, settings));
    }

    /** Builds and shows the window; for tests, over their own services. */
    public static MainWindow start(AppServices services, Settings settings) {
        Themes themes = new Themes();
        themes.install(settings.theme());
        MainWindow window = new MainWindow(services, themes, settings);
        window.show();
        return window;
    }
}
