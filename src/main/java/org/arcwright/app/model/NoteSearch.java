package org.arcwright.app.model;

import java.util.EnumMap;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import java.util.function.Function;
import org.arcwright.notes.NoteFacet;
import org.arcwright.notes.NoteFilters;
import org.arcwright.notes.SearchResult;

/**
 * The Notes panel's search: the query and the ticked facet values, a search run off the UI thread for
 * each change, and only the latest answer delivered (an older one arriving late is dropped). The
 * view debounces typing before calling {@link #setQuery}.
 */
public final class NoteSearch {
    /** How many notes a search lists. */
    public static final int LIMIT = 30;

    private final Function<Query, SearchResult> searcher;
    private final Executor executor;
    private final Consumer<SearchResult> deliver;
    private final AtomicLong generation = new AtomicLong();
    private final Map<NoteFacet, Set<String>> ticked = new EnumMap<>(NoteFacet.class);
    private String query = "";

    /** What to search for. */
    public record Query(String text, NoteFilters filters, int limit) {}

    /**
     * @param searcher runs a query (the notes store), on {@code executor}
     * @param deliver receives the latest result; called on the executor's thread
     */
    public NoteSearch(Function<Query, SearchResult> searcher, Executor executor, Consumer<SearchResult> deliver) {
        this.searcher = Objects.requireNonNull(searcher, "searcher");
        this.executor = Objects.requireNonNull(executor, "executor");
        this.deliver = Objects.requireNonNull(deliver, "deliver");
    }

    public String query() { return query; }

    public void setQuery(String text) {
        query = text == null ? "" : text;
        run();
    }

    public boolean isTicked(NoteFacet facet, String value) {
        return ticked.getOrDefault(facet, Set.of()).contains(value);
    }

    /** Ticks or unticks one facet value and searches again. */
    public void tick(NoteFacet facet, String value, boolean on) {
        Set<String> values = ticked.computeIfAbsent(facet, f -> new LinkedHashSet<>());
        if (on) values.add(value); else values.remove(value);
        run();
    }

    /** The filters the ticked values make. */
    public NoteFilters filters() {
        NoteFilters f = NoteFilters.none();
        for (Map.Entry<NoteFacet, Set<String>> e : ticked.entrySet()) {
            if (!e.getValue().isEmpty()) f = f.and(e.getKey(), e.getValue().toArray(new String[0]));
        }
        return f;
    }

    /** Searches for the current query and filters; only the newest search delivers. */
    public void run() {
        long g = generation.incrementAndGet();
        Query q = new Query(query, filters(), LIMIT);
        executor.execute(() -> {
            if (g != generation.get()) return;
            SearchResult r = searcher.apply(q);
            if (g == generation.get()) deliver.accept(r);
        });
    }

    /** Turns the store's {@code **bold**} snippet marks into HTML bold, escaping everything else. */
    public static String snippetHtml(String snippet) {
        if (snippet == null) return "";
        String esc = snippet.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
        StringBuilder sb = new StringBuilder();
        boolean open = false;
        int i = 0;
        while (i < esc.length()) {
            if (esc.startsWith("**", i)) {
                sb.append(open ? "</b>" : "<b>");
                open = !open;
                i += 2;
            } else {
                sb.append(esc.charAt(i++));
            }
        }
        if (open) sb.append("</b>");
        return sb.toString();
    }
}
