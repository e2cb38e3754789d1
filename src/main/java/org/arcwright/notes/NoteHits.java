package org.arcwright.notes;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.WeakHashMap;
import org.apache.lucene.document.Document;
import org.apache.lucene.facet.FacetResult;
import org.apache.lucene.facet.Facets;
import org.apache.lucene.facet.FacetsCollectorManager;
import org.apache.lucene.facet.FacetsConfig;
import org.apache.lucene.facet.LabelAndValue;
import org.apache.lucene.facet.sortedset.DefaultSortedSetDocValuesReaderState;
import org.apache.lucene.facet.sortedset.SortedSetDocValuesFacetCounts;
import org.apache.lucene.facet.sortedset.SortedSetDocValuesReaderState;
import org.apache.lucene.index.IndexReader;
import org.arcwright.pack.PackLayer;

/**
 * What a search shows: each hit with its snippet (the query's words marked) or its summary, and the
 * facet counts. Package-private and not final so that a test can stand in a faulty one and check
 * that a bug here surfaces instead of being taken for a damaged index.
 */
class NoteHits {
    static final int FACET_VALUES = 20;
    static final int SUMMARY_CHARS = 220;
    static final int SNIPPET_CHARS = 320;

    private final FacetsConfig facetsConfig;
    private final Map<IndexReader, SortedSetDocValuesReaderState> facetStates =
            Collections.synchronizedMap(new WeakHashMap<>());

    NoteHits(FacetsConfig facetsConfig) {
        this.facetsConfig = facetsConfig;
    }

    /** The hit for note {@code f}: with a snippet of the body marking {@code marks}, else its summary. */
    NoteHit hit(FiledNote f, float score, Set<String> marks) {
        Note n = f.note();
        String snippet = snippet(f, marks);
        String sn = snippet == null || snippet.isBlank() ? n.summary(SUMMARY_CHARS) : snippet;
        return new NoteHit(n.id(), n.title(), score, sn, f.pack(), f.layer(), n.tags(), n.functions(), n.standards(),
                n.processes());
    }

    /**
     * The shown passage of a hit: its best two sentences with the query's words marked, cut to
     * about two lines; null (the caller shows the summary) when none of the words is in the body.
     */
    static String snippet(FiledNote f, Set<String> marks) {
        if (marks.isEmpty()) return null;
        String passages = Snippets.pick(NoteFormat.plainText(f.note().body()), marks, 2);
        return passages == null ? null : trimSnippet(passages.replaceAll("\\s+", " ").strip());
    }

    /** Keeps a snippet to about two lines, starting shortly before the first marked word, cut at words. */
    static String trimSnippet(String s) {
        int max = SNIPPET_CHARS;
        if (s.length() <= max) return s;
        int first = s.indexOf("**");
        String head = "";
        if (first > max - 100) {
            int from = s.lastIndexOf(' ', first - 60);
            s = s.substring(from < 0 ? first : from + 1);
            head = "… ";
        }
        if (s.length() <= max) return head + s;
        int cut = s.lastIndexOf(' ', max);
        if (cut < max / 2) cut = max;
        String body = s.substring(0, cut);
        int marks = body.split("\\*\\*", -1).length - 1;
        if (marks % 2 == 1) body = body + "**";
        return head + body + " …";
    }

    /** The counts of the best {@link #FACET_VALUES} values of every facet among the matches. */
    Map<NoteFacet, List<FacetCount>> facetCounts(IndexReader reader, FacetsCollectorManager.FacetsResult r)
            throws IOException {
        Map<NoteFacet, List<FacetCount>> out = new EnumMap<>(NoteFacet.class);
        if (reader.numDocs() == 0) return out;
        SortedSetDocValuesReaderState state;
        try {
            state = facetStates.computeIfAbsent(reader, rd -> {
                try {
                    return new DefaultSortedSetDocValuesReaderState(rd, facetsConfig);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        } catch (IllegalArgumentException noFacets) {
            return out;
        }
        Facets facets = new SortedSetDocValuesFacetCounts(state, r.facetsCollector());
        for (NoteFacet f : NoteFacet.values()) {
            FacetResult fr;
            try {
                fr = facets.getTopChildren(FACET_VALUES, f.key());
            } catch (IllegalArgumentException dimensionNeverIndexed) {
                fr = null;
            }
            List<FacetCount> counts = new ArrayList<>();
            if (fr != null) {
                for (LabelAndValue lv : fr.labelValues) counts.add(new FacetCount(lv.label, lv.value.intValue()));
            }
            out.put(f, counts);
        }
        return out;
    }

    /** The note stored in an index document, with the pack and file it came from. */
    static FiledNote filed(Document d) {
        String location = d.get(NoteDocuments.LOCATION);
        Note n = NoteFormat.parse(d.get(NoteDocuments.SOURCE), location);
        return new FiledNote(n, d.get(NoteDocuments.PACK), PackLayer.valueOf(d.get(NoteDocuments.LAYER)), location);
    }
}
