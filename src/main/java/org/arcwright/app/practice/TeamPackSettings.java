package org.arcwright.app.practice;

import java.util.List;

/**
 * Where the Practice editor reads and changes the team pack folders of the settings. The window
 * implements it: it writes the settings (atomically) and reloads the packs.
 */
public interface TeamPackSettings {
    /** The team pack folders in the settings, lowest layer first. */
    List<String> teamPacks();

    /** Replaces the team pack folders, then the packs reload. */
    void setTeamPacks(List<String> folders);
}
