package org.arcwright.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.notes.NotesPaths;
import org.arcwright.pack.ConfigDirectory;
import org.arcwright.pack.PackSettings;
import org.arcwright.pack.PackStack;
import picocli.CommandLine.Option;

/**
 * Which packs a command layers: {@code --pack} folders, else the team packs of the user's settings (the
 * desktop app's); {@code --personal}, else the settings' personal pack, else the notes' default one.
 * Settings never stop a command: a damaged file or a pack from it that will not open is a warning.
 */
final class PackOptions {
    @Option(names = "--pack", paramLabel = "DIR",
            description = "A team practice pack layered over the built-in one (repeatable, lowest first; default: the team packs of your settings).")
    List<Path> packs = new ArrayList<>();

    @Option(names = "--personal", paramLabel = "DIR",
            description = "Your personal pack, layered last (default: the one in your settings, else $XDG_CONFIG_HOME/arcwright/personal-pack or ~/.config/arcwright/personal-pack).")
    Path personal;

    @Option(names = "--no-settings", description = "Ignore the packs chosen in your settings (settings.json in the Arcwright config folder).")
    boolean noSettings;

    @Option(names = "--config-dir", paramLabel = "DIR", hidden = true, description = "The config folder holding settings.json.")
    Path configDir;

    private PackSettings settings;

    /** The settings' packs (read once), or none with --no-settings. */
    PackSettings settings() {
        if (settings == null) {
            Path dir = configDir != null ? configDir : ConfigDirectory.ofSystem();
            settings = noSettings ? new PackSettings(dir.resolve(PackSettings.FILE_NAME), List.of(), null, Optional.empty())
                    : PackSettings.read(dir, new JsonFiles());
        }
        return settings;
    }

    /** True when the team packs come from the settings rather than from --pack. */
    boolean teamFromSettings() {
        return packs.isEmpty() && !settings().teamPacks().isEmpty();
    }

    /** The team packs in force, lowest first. */
    List<Path> teamPacks() {
        return packs.isEmpty() ? settings().teamPacks() : packs;
    }

    /** The personal pack folder to use, whether it exists yet or not. */
    Path personalFolder() {
        if (personal != null) return personal;
        if (settings().personalPack() != null) return settings().personalPack();
        return NotesPaths.ofSystem().personalPack();
    }

    /** The personal pack when it is one (has a pack.json), else null. */
    Path existingPersonalPack() {
        Path p = personalFolder();
        return Files.isRegularFile(p.resolve("pack.json")) ? p : null;
    }

    /** Tells {@code err} why the settings could not be used, if they could not. */
    void warnSettings(String command, PrintWriter err) {
        settings().problem().ifPresent(p -> err.println("arcwright " + command + ": settings not used: " + p.getMessage()));
    }

    /**
     * Built-in, team and personal packs. Packs named on the command line that
     * fail to open stay in {@link PackStack#problems()}; packs from the settings that fail are warned about
     * and dropped, so the command runs on the others.
     */
    PackStack load(String command, PrintWriter err) {
        warnSettings(command, err);
        PackStack stack = PackStack.load(teamPacks(), existingPersonalPack());
        if (!teamFromSettings() || stack.problems().isEmpty()) return stack;
        List<InputProblem> kept = new ArrayList<>();
        for (InputProblem p : stack.problems()) {
            if (fromSettings(p)) {
                err.println("arcwright " + command + ": pack from your settings skipped: " + p.getMessage());
            } else {
                kept.add(p);
            }
        }
        return new PackStack(stack.packs(), kept);
    }

    private boolean fromSettings(InputProblem p) {
        if (p.source() == null) return false;
        for (Path t : settings().teamPacks()) if (p.source().startsWith(t.toString())) return true;
        return false;
    }
}
