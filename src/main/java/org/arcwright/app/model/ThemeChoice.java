package org.arcwright.app.model;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;

/** Which look the window wears: follow the operating system, or always light or dark. */
public enum ThemeChoice {
    SYSTEM("system"),
    LIGHT("light"),
    DARK("dark");

    private final String key;

    ThemeChoice(String key) { this.key = key; }

    @JsonValue
    public String key() { return key; }

    @JsonCreator
    public static ThemeChoice fromKey(String key) {
        for (ThemeChoice t : values()) if (t.key.equals(key)) return t;
        return SYSTEM;
    }

    /** Whether this choice means dark, given whether the system prefers dark. */
    public boolean isDark(boolean systemPrefersDark) {
        return this == DARK || this == SYSTEM && systemPrefersDark;
    }

    /**
     * Whether the desktop asks for a dark look, judged from what Linux desktops expose: the
     * {@code GTK_THEME} variable or the GTK theme name (e.g. {@code Adwaita-dark}).
     */
    public static boolean systemPrefersDark(String gtkThemeVariable, Object gtkThemeName) {
        String a = gtkThemeVariable == null ? "" : gtkThemeVariable;
        String b = gtkThemeName == null ? "" : gtkThemeName.toString();
        return (a + " " + b).toLowerCase(Locale.ROOT).contains("dark");
    }
}
