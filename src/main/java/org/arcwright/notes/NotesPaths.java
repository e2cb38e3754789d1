package org.arcwright.notes;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackManifest;

/**
 * Where notes live on the user's machine when no option says otherwise.
 *
 * <ul>
 *   <li>Index cache: {@code $XDG_CACHE_HOME/arcwright/notes-index}, else
 *       {@code ~/.cache/arcwright/notes-index}. Each pack stack gets its own sub-folder there (see
 *       {@link NotesStore#indexFolderFor}).</li>
 *   <li>Personal pack: {@code $XDG_CONFIG_HOME/arcwright/personal-pack}, else
 *       {@code ~/.config/arcwright/personal-pack}.</li>
 * </ul>
 * Decision record 0502 explains the choice.
 */
public final class NotesPaths {
    /** What a new personal pack.json says it holds. */
    static final String PERSONAL_DESCRIPTION = "Your own practice notes (Markdown files in notes/, one per note id), "
            + "written in the desktop Notes panel or with 'arcwright notes add'. Holds notes only: no rules and no "
            + "templates. A note here replaces a built-in or team note only when it was saved as an override of that "
            + "note (same id); new notes get ids of their own.";

    private final Map<String, String> env;
    private final Path home;

    /**
     * @param env the environment to read {@code XDG_CACHE_HOME} and {@code XDG_CONFIG_HOME} from
     * @param home the user's home folder
     */
    public NotesPaths(Map<String, String> env, Path home) {
        this.env = Map.copyOf(env);
        this.home = home;
    }

    /** From this process's environment and {@code user.home}. */
    public static NotesPaths ofSystem() {
        return new NotesPaths(System.getenv(), Path.of(System.getProperty("user.home")));
    }

    /** The folder under which note indexes are cached. */
    public Path indexRoot() {
        return base("XDG_CACHE_HOME", ".cache").resolve("arcwright").resolve("notes-index");
    }

    /** The user's personal practice pack. */
    public Path personalPack() {
        return base("XDG_CONFIG_HOME", ".config").resolve("arcwright").resolve("personal-pack");
    }

    private Path base(String variable, String fallback) {
        String v = env.get(variable);
        if (v != null && !v.isBlank() && Path.of(v).isAbsolute()) return Path.of(v);
        return home.resolve(fallback);
    }

    /**
     * Makes {@code dir} a practice pack if it is not one yet: creates the folder, its {@code notes}
     * folder and a {@code pack.json} naming it the personal pack. An existing pack.json is kept.
     */
    public static Path ensurePersonalPack(Path dir) {
        try {
            Files.createDirectories(dir.resolve("notes"));
        } catch (IOException e) {
            throw new UncheckedIOException("could not create the personal pack folder " + dir + ": " + e.getMessage(), e);
        }
        Path manifest = dir.resolve("pack.json");
        if (!Files.exists(manifest)) {
            new JsonFiles().writeAtomically(manifest, new PackManifest("Personal notes", "1", PERSONAL_DESCRIPTION,
                    null, null));
        }
        return dir;
    }
}
