package org.arcwright.app.widgets;

import com.formdev.flatlaf.FlatDarculaLaf;
import com.formdev.flatlaf.FlatIntelliJLaf;
import com.formdev.flatlaf.FlatLaf;
import java.awt.Color;
import java.awt.Font;
import java.awt.Toolkit;
import javax.swing.UIManager;
import org.arcwright.app.model.ThemeChoice;
import org.arcwright.render.Palette;

/**
 * Applies the light (IntelliJ-style) or dark (Darcula) look with Arcwright's own theme properties
 * from {@code org/arcwright/app/themes}, and reads the colours and fonts the views ask for.
 */
public final class Themes {
    /** Where Arcwright's theme property files live on the class path. */
    public static final String THEME_PACKAGE = "org/arcwright/app/themes";

    private boolean dark;

    /** Applies {@code choice} before any window exists. */
    public void install(ThemeChoice choice) {
        FlatLaf.registerCustomDefaultsSource(THEME_PACKAGE);
        dark = choice.isDark(systemPrefersDark());
        if (dark) FlatDarculaLaf.setup(); else FlatIntelliJLaf.setup();
    }

    /** Switches the look of open windows to {@code choice}. */
    public void switchTo(ThemeChoice choice) {
        boolean next = choice.isDark(systemPrefersDark());
        if (next == dark) return;
        dark = next;
        if (dark) FlatDarculaLaf.setup(); else FlatIntelliJLaf.setup();
        FlatLaf.updateUI();
    }

    public boolean isDark() { return dark; }

    /** Whether the desktop asks for a dark look (GTK theme name on Linux; light where unknown). */
    public static boolean systemPrefersDark() {
        Object gtk = null;
        try {
            gtk = Toolkit.getDefaultToolkit().getDesktopProperty("gnome.Net/ThemeName");
        } catch (RuntimeException e) {
            gtk = null;
        }
        return ThemeChoice.systemPrefersDark(System.getenv("GTK_THEME"), gtk);
    }

    /** A theme colour, with a neutral fallback if a key is missing. */
    public static Color color(String key) {
        Color c = UIManager.getColor(key);
        return c != null ? c : UIManager.getColor("Label.foreground");
    }

    /**
     * The look's colours for a drawing made by the render core (which draws black on white for
     * files), painted on the colour under {@code backgroundKey}. Call on the event thread.
     */
    public static Palette drawingPalette(String backgroundKey) {
        return new Palette(color(backgroundKey), color("Arcwright.zone.nominal"), color("Arcwright.zone.limit"));
    }

    /** A theme font, with the default font as fallback. */
    public static Font font(String key) {
        Font f = UIManager.getFont(key);
        return f != null ? f : UIManager.getFont("Label.font");
    }
}
