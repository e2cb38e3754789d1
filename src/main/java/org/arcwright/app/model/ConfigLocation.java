package org.arcwright.app.model;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;

/** Where the user's settings and autosaves live on each operating system. */
public final class ConfigLocation {
    /** System property that overrides the directory (tests, portable installs). */
    public static final String OVERRIDE_PROPERTY = "arcwright.config";

    private ConfigLocation() {}

    /**
     * The config directory: the override when set; {@code %APPDATA%\Arcwright} on Windows;
     * {@code ~/Library/Application Support/Arcwright} on macOS; else {@code $XDG_CONFIG_HOME/arcwright}
     * or {@code ~/.config/arcwright}.
     */
    public static Path directory(String override, String osName, String home, Map<String, String> env) {
        if (override != null && !override.isBlank()) return Path.of(override);
        String os = osName == null ? "" : osName.toLowerCase(Locale.ROOT);
        if (os.contains("win") && env.get("APPDATA") != null) return Path.of(env.get("APPDATA"), "Arcwright");
        if (os.contains("mac")) return Path.of(home, "Library", "Application Support", "Arcwright");
        String xdg = env.get("XDG_CONFIG_HOME");
        if (xdg != null && !xdg.isBlank()) return Path.of(xdg, "arcwright");
        return Path.of(home, ".config", "arcwright");
    }

    /** The directory for this process, from system properties and environment. */
    public static Path current() {
        return directory(System.getProperty(OVERRIDE_PROPERTY), System.getProperty("os.name"),
                System.getProperty("user.home"), System.getenv());
    }
}
