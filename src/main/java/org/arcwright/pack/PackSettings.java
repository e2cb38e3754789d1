package org.arcwright.pack;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;

/**
 * The packs the user chose in the desktop app's settings ({@code teamPacks}, {@code personalPack} of
 * {@code settings.json}), read so that the command line layers the same packs.
 *
 * <p>Only those two fields are taken; the file belongs to the app and its other fields are none of our
 * business, so they are ignored rather than validated. A missing file means no packs chosen. A damaged
 * file gives no packs and a {@link #problem()} naming it: the caller warns and carries on, because
 * settings must never stop a command that could run on the built-in pack.
 *
 * @param file the settings file read (it may not exist)
 * @param teamPacks team pack folders, lowest layer first
 * @param personalPack the personal pack folder, or null when the settings name none
 * @param problem why the file could not be used, when it could not
 */
public record PackSettings(Path file, List<Path> teamPacks, Path personalPack, Optional<InputProblem> problem) {
    /** The settings file name inside the config directory (the app's name for it). */
    public static final String FILE_NAME = "settings.json";

    public PackSettings {
        teamPacks = List.copyOf(teamPacks);
    }

    /** Reads {@code settings.json} of {@code configDirectory}. */
    public static PackSettings read(Path configDirectory, JsonFiles json) {
        Path file = configDirectory.resolve(FILE_NAME);
        if (!Files.exists(file)) return new PackSettings(file, List.of(), null, Optional.empty());
        try {
            JsonNode root = json.readTree(file);
            if (!root.isObject()) throw new InputProblem(file.toString(), 1, 1, null, "expected a JSON object of settings");
            List<Path> team = new ArrayList<>();
            JsonNode t = root.path("teamPacks");
            if (!t.isMissingNode() && !t.isNull()) {
                if (!t.isArray()) throw InputProblem.inFile(file, 0, "teamPacks", "expected a list of folder paths");
                for (int i = 0; i < t.size(); i++) {
                    team.add(folder(file, "teamPacks[" + i + "]", t.get(i)));
                }
            }
            JsonNode p = root.path("personalPack");
            Path personal = p.isMissingNode() || p.isNull() || (p.isTextual() && p.asText().isBlank())
                    ? null : folder(file, "personalPack", p);
            return new PackSettings(file, team, personal, Optional.empty());
        } catch (InputProblem e) {
            InputProblem located = e.source() == null ? e.in(file.toString()) : e;
            return new PackSettings(file, List.of(), null, Optional.of(located));
        } catch (UncheckedIOException e) {
            return new PackSettings(file, List.of(), null,
                    Optional.of(new InputProblem(file.toString(), 0, 0, null, "could not read: " + e.getMessage(), e)));
        }
    }

    private static Path folder(Path file, String field, JsonNode n) {
        if (!n.isTextual() || n.asText().isBlank()) throw InputProblem.inFile(file, 0, field, "expected a folder path");
        try {
            return Path.of(n.asText());
        } catch (InvalidPathException e) {
            throw InputProblem.inFile(file, 0, field, "not a valid folder path: " + e.getReason());
        }
    }
}
