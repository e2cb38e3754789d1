package org.arcwright.notes;

import java.util.Arrays;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * Restrictions on a search: a note must match one of the values given for each facet named
 * (values within a facet are alternatives; facets combine with AND). Labels (function, process,
 * tag) are compared after {@link Note#label(String)}; standards and packs exactly.
 */
public final class NoteFilters {
    private static final NoteFilters NONE = new NoteFilters(new EnumMap<>(NoteFacet.class));

    private final Map<NoteFacet, Set<String>> values;

    private NoteFilters(Map<NoteFacet, Set<String>> values) {
        this.values = values;
    }

    /** No restriction. */
    public static NoteFilters none() {
        return NONE;
    }

    /** These filters plus: the facet must take one of {@code accepted}. */
    public NoteFilters and(NoteFacet facet, String... accepted) {
        Objects.requireNonNull(facet, "facet");
        EnumMap<NoteFacet, Set<String>> copy = new EnumMap<>(NoteFacet.class);
        values.forEach((k, v) -> copy.put(k, new LinkedHashSet<>(v)));
        Set<String> set = copy.computeIfAbsent(facet, k -> new LinkedHashSet<>());
        Arrays.stream(accepted).filter(Objects::nonNull).map(v -> normalise(facet, v))
                .filter(v -> !v.isEmpty()).forEach(set::add);
        if (set.isEmpty()) copy.remove(facet);
        copy.replaceAll((k, v) -> Collections.unmodifiableSet(v));
        return new NoteFilters(copy);
    }

    /** The accepted values per facet; facets not restricted are absent. */
    public Map<NoteFacet, Set<String>> values() {
        return Collections.unmodifiableMap(values);
    }

    public boolean isEmpty() {
        return values.isEmpty();
    }

    static String normalise(NoteFacet facet, String v) {
        if (facet == NoteFacet.STANDARD || facet == NoteFacet.PACK) return v.strip();
        return Note.label(v);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof NoteFilters f && f.values.equals(values);
    }

    @Override
    public int hashCode() {
        return values.hashCode();
    }

    @Override
    public String toString() {
        return "NoteFilters" + values;
    }
}
