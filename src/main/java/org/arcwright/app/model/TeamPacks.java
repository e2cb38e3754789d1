package org.arcwright.app.model;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;
import org.arcwright.pack.PackLayer;
import org.arcwright.pack.PackStack;
import org.arcwright.pack.PracticePack;

/**
 * The team pack folders of the settings, as the Practice editor's Packs page changes them: added
 * only when the folder opens as a practice pack, listed once, never the personal pack; lowest layer
 * first, so moving a pack down the list lets it win over the ones above it. Every change gives a new
 * list for {@link Settings#withPacks}; nothing here writes.
 */
public final class TeamPacks {
    private final JsonFiles json;

    public TeamPacks(JsonFiles json) { this.json = Objects.requireNonNull(json, "json"); }

    /**
     * {@code current} with {@code folder} added as the top team layer.
     *
     * @param personal the personal pack folder, which cannot also be a team pack
     * @throws InputProblem naming the folder or its pack.json when it is not a pack, or already in use
     */
    public List<String> add(List<String> current, Path folder, Path personal) {
        Path abs = folder.toAbsolutePath().normalize();
        for (String t : current) {
            if (Path.of(t).toAbsolutePath().normalize().equals(abs)) {
                throw new InputProblem(abs.toString(), 0, 0, null, "this team pack is in the list already");
            }
        }
        if (personal != null && personal.toAbsolutePath().normalize().equals(abs)) {
            throw new InputProblem(abs.toString(), 0, 0, null, "this is your personal pack, which is always in force "
                    + "above the team packs; choose a team pack's folder");
        }
        PracticePack.open(abs, PackLayer.TEAM, json);
        List<String> next = new ArrayList<>(current);
        next.add(abs.toString());
        return List.copyOf(next);
    }

    /** {@code current} without the entry at {@code index}. */
    public static List<String> remove(List<String> current, int index) {
        List<String> next = new ArrayList<>(current);
        next.remove(index);
        return List.copyOf(next);
    }

    /** {@code current} with the entry at {@code index} moved one place ({@code -1} lower layer, {@code +1} higher). */
    public static List<String> move(List<String> current, int index, int by) {
        int to = index + by;
        if (to < 0 || to >= current.size()) return current;
        List<String> next = new ArrayList<>(current);
        next.add(to, next.remove(index));
        return List.copyOf(next);
    }

    /**
     * The packs in force in a few words for the status line, e.g. {@code Packs: built-in + 2 team + personal},
     * and one line per pack, lowest first, for its tooltip and the Packs page.
     */
    public static Summary summary(PackStack stack) {
        long team = stack.packs().stream().filter(p -> p.layer() == PackLayer.TEAM).count();
        boolean personal = stack.packs().stream().anyMatch(p -> p.layer() == PackLayer.PERSONAL);
        String text = "Packs: built-in" + (team > 0 ? " + " + team + " team" : "") + (personal ? " + personal" : "")
                + (stack.problems().isEmpty() ? "" : " (" + stack.problems().size() + " not opened)");
        List<String> lines = new ArrayList<>();
        for (PracticePack p : stack.packs()) lines.add(layerWord(p.layer()) + ": " + p.name() + " (" + p.root() + ")");
        for (InputProblem p : stack.problems()) lines.add("Not opened: " + p.getMessage());
        return new Summary(text, List.copyOf(lines));
    }

    /** What the status line and the Packs page say about the packs in force. */
    public record Summary(String text, List<String> lines) {}

    private static String layerWord(PackLayer layer) {
        switch (layer) {
            case BUILT_IN: return "Built-in";
            case TEAM: return "Team";
            default: return "Personal";
        }
    }
}
