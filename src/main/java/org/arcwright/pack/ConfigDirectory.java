package org.arcwright.pack;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;

/**
 * Where the user's Arcwright settings live, the same folder the desktop app writes its {@code settings.json}
 * to, so that the command line and the window use the same packs.
 *
 * <p>The override when given (system property {@value #OVERRIDE_PROPERTY}: tests, portable installs);
 * {@code %APPDATA%\Arcwright} on Windows; {@code ~/Library/Application Support/Arcwright} on macOS;
 * else {@code $XDG_CONFIG_HOME/arcwright} or {@code ~/.config/arcwright}.
 */
public final class ConfigDirectory {
    /** System property that overrides the directory. */
    public static final String OVERRIDE_PROPERTY = "arcwright.config";

    private ConfigDirectory() {}

    /**
     * @param override the override folder, or null/blank
     * @param osName the {@code os.name} property
     * @param home the user's home folder
     * @param env the environment ({@code APPDATA}, {@code XDG_CONFIG_HOME})
     */
    public static Path resolve(String override, String osName, String home, Map<String, String> env) {
        if (override != null && !override.isBlank()) return Path.of(override);
        String os = osName == null ? "" : osName.toLowerCase(Locale.ROOT);
        String appData = env.get("APPDATA");
        if (os.contains("win") && appData != null && !appData.isBlank()) return Path.of(appData, "Arcwright");
        if (os.contains("mac")) return Path.of(home, "Library", "Application Support", "Arcwright");
        String xdg = env.get("XDG_CONFIG_HOME");
        if (xdg != null && !xdg.isBlank()) return Path.of(xdg, "arcwright");
        return Path.of(home, ".config", "arcwright");
    }

    /** The directory for this process, from its system properties and environment. */
    public static Path ofSystem() {
        return resolve(System.getProperty(OVERRIDE_PROPERTY), System.getProperty("os.name"),
                System.getProperty("user.home"), System.getenv());
    }
}
