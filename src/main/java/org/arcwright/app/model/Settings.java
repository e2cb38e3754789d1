package org.arcwright.app.model;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.ArrayList;
import java.util.List;

/**
 * What the window remembers between sessions, kept in one file under the user's config directory.
 *
 * @param theme the look
 * @param recentFiles worksheets opened or saved, most recent first, at most {@link #RECENT_LIMIT}
 * @param teamPacks team practice pack folders, lowest layer first
 * @param personalPack the personal practice pack folder, or null
 * @param demoShown true once the first-run demo worksheet has been shown
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record Settings(ThemeChoice theme, List<String> recentFiles, List<String> teamPacks, String personalPack,
                       boolean demoShown) {
    /** How many recent files are kept. */
    public static final int RECENT_LIMIT = 10;

    /** Settings of a first run. */
    public static final Settings DEFAULTS = new Settings(ThemeChoice.SYSTEM, List.of(), List.of(), null, false);

    @JsonCreator
    public Settings(@JsonProperty("theme") ThemeChoice theme,
                    @JsonProperty("recentFiles") List<String> recentFiles,
                    @JsonProperty("teamPacks") List<String> teamPacks,
                    @JsonProperty("personalPack") String personalPack,
                    @JsonProperty("demoShown") boolean demoShown) {
        this.theme = theme == null ? ThemeChoice.SYSTEM : theme;
        this.recentFiles = recentFiles == null ? List.of() : List.copyOf(recentFiles);
        this.teamPacks = teamPacks == null ? List.of() : List.copyOf(teamPacks);
        this.personalPack = personalPack == null || personalPack.isBlank() ? null : personalPack;
        this.demoShown = demoShown;
    }

    public Settings withTheme(ThemeChoice t) { return new Settings(t, recentFiles, teamPacks, personalPack, demoShown); }

    public Settings withDemoShown() { return new Settings(theme, recentFiles, teamPacks, personalPack, true); }

    public Settings withPacks(List<String> team, String personal) {
        return new Settings(theme, recentFiles, team, personal, demoShown);
    }

    /** {@code file} moved to the top of the recent list, duplicates removed, the list capped. */
    public Settings withRecent(String file) {
        List<String> list = new ArrayList<>();
        list.add(file);
        for (String f : recentFiles) if (!f.equals(file) && list.size() < RECENT_LIMIT) list.add(f);
        return new Settings(theme, list, teamPacks, personalPack, demoShown);
    }
}
