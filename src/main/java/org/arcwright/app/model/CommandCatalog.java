package org.arcwright.app.model;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * Every command of the window, in registration order, and the search the command finder runs over
 * them: a title that contains the query ranks first, then titles whose words start with the query's
 * words, then titles that hold the query's letters in order.
 */
public final class CommandCatalog {
    private final Map<String, Command> commands = new LinkedHashMap<>();

    public void add(Command c) {
        if (commands.putIfAbsent(c.id(), c) != null) throw new IllegalArgumentException("duplicate command " + c.id());
    }

    public List<Command> all() { return List.copyOf(commands.values()); }

    public Optional<Command> byId(String id) { return Optional.ofNullable(commands.get(id)); }

    /** Commands of one group, in registration order. */
    public List<Command> group(String group) {
        return commands.values().stream().filter(c -> c.group().equals(group)).toList();
    }

    /** The groups in order of first registration. */
    public List<String> groups() {
        return commands.values().stream().map(Command::group).distinct().toList();
    }

    /** Commands matching {@code query}, best first; all of them for a blank query. */
    public List<Command> search(String query) {
        String q = query == null ? "" : query.trim().toLowerCase(Locale.ROOT);
        if (q.isEmpty()) return all();
        record Hit(Command c, int score, int order) {}
        List<Hit> hits = new ArrayList<>();
        int order = 0;
        for (Command c : commands.values()) {
            int s = score(q, (c.title() + " " + c.group()).toLowerCase(Locale.ROOT));
            if (s > 0) hits.add(new Hit(c, s, order));
            order++;
        }
        hits.sort(Comparator.comparingInt((Hit h) -> -h.score()).thenComparingInt(Hit::order));
        return hits.stream().map(Hit::c).toList();
    }

    static int score(String q, String title) {
        if (title.startsWith(q)) return 4;
        if (title.contains(q)) return 3;
        String[] words = title.split("[^a-z0-9]+");
        boolean all = true;
        for (String qw : q.split("\\s+")) {
            boolean found = false;
            for (String w : words) if (w.startsWith(qw)) { found = true; break; }
            all &= found;
        }
        if (all) return 2;
        int i = 0;
        for (int k = 0; k < title.length() && i < q.length(); k++) if (title.charAt(k) == q.charAt(i)) i++;
        return i == q.length() && q.length() >= 2 ? 1 : 0;
    }
}
