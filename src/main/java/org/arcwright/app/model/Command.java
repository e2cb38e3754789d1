package org.arcwright.app.model;

import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * One thing the user can do, reachable from the menus, a shortcut and the command finder alike.
 *
 * @param id stable id, e.g. {@code part.save}
 * @param title what the command does, in the trade's words
 * @param group the menu it belongs to (File, Edit, Part, View...)
 * @param shortcut keystroke in {@code javax.swing.KeyStroke} text form (e.g. {@code ctrl S}), or null
 * @param whyDisabled empty when the command can run now, else the reason it cannot (shown as tooltip)
 * @param action what it does; runs on the UI thread
 */
public record Command(String id, String title, String group, String shortcut, Supplier<Optional<String>> whyDisabled,
                      Runnable action) {
    public Command {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(group, "group");
        Objects.requireNonNull(whyDisabled, "whyDisabled");
        Objects.requireNonNull(action, "action");
    }

    /** A command that can always run. */
    public static Command always(String id, String title, String group, String shortcut, Runnable action) {
        return new Command(id, title, group, shortcut, Optional::empty, action);
    }

    public boolean isEnabled() { return whyDisabled.get().isEmpty(); }

    /** The shortcut as a reader sees it: {@code ctrl shift S} → {@code Ctrl+Shift+S}. */
    public String shortcutLabel() {
        if (shortcut == null) return "";
        StringBuilder sb = new StringBuilder();
        for (String part : shortcut.trim().split("\\s+")) {
            if (part.equals("pressed") || part.equals("typed")) continue;
            if (sb.length() > 0) sb.append('+');
            String p = part.length() <= 1 ? part.toUpperCase(Locale.ROOT)
                    : part.substring(0, 1).toUpperCase(Locale.ROOT) + part.substring(1).toLowerCase(Locale.ROOT);
            sb.append(p.replace("_", " "));
        }
        return sb.toString();
    }
}
