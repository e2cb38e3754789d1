package org.arcwright.notes;

import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The answer to a search: the best notes first, how many matched in all, and how the matching
 * notes spread over each facet (most frequent value first).
 *
 * @param query the text searched, as given
 * @param totalHits how many notes matched (may exceed {@code hits.size()})
 * @param hits the best notes, at most the limit asked for
 * @param facets per facet, the values among all matching notes with their counts
 */
public record SearchResult(String query, long totalHits, List<NoteHit> hits, Map<NoteFacet, List<FacetCount>> facets) {
    public SearchResult {
        hits = List.copyOf(hits);
        EnumMap<NoteFacet, List<FacetCount>> f = new EnumMap<>(NoteFacet.class);
        facets.forEach((k, v) -> f.put(k, List.copyOf(v)));
        facets = Collections.unmodifiableMap(f);
    }

    /** Nothing found. */
    public static SearchResult empty(String query) {
        return new SearchResult(query, 0, List.of(), Map.of());
    }
}
