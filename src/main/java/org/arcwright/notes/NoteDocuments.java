package org.arcwright.notes;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import org.apache.lucene.document.BinaryDocValuesField;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.FieldType;
import org.apache.lucene.document.SortedSetDocValuesField;
import org.apache.lucene.document.StoredField;
import org.apache.lucene.document.StringField;
import org.apache.lucene.document.TextField;
import org.apache.lucene.facet.FacetField;
import org.apache.lucene.facet.FacetsConfig;
import org.apache.lucene.util.BytesRef;
import org.arcwright.pack.PackLayer;

/** How a note becomes a Lucene document, and the field names of the index. */
final class NoteDocuments {
    /** Bump when fields or analysis change: an index with another schema is rebuilt. */
    static final String SCHEMA = "arcwright-notes-10";

    static final String ID = "id";
    static final String TITLE = "title";
    static final String TAGS = "tags";
    static final String BODY = "body";
    static final String SOURCE = "source";
    static final String PACK = "pack_name";
    static final String LAYER = "layer";
    static final String LOCATION = "location";
    static final String HASH = "hash";

    static final String COMMIT_SCHEMA = "schema";
    static final String COMMIT_STAMP = "sources";

    /**
     * Indexed with positions (for proximity) but without offsets, not stored: the text is kept once,
     * in {@link #SOURCE}. Offsets add build time and index size (written for every word of every note) for the
     * sake of 10 snippets per search; {@link Snippets} re-analyses those few bodies instead.
     */
    private static final FieldType BODY_TYPE = TextField.TYPE_NOT_STORED;

    private NoteDocuments() {}

    static FacetsConfig facetsConfig() {
        FacetsConfig c = new FacetsConfig();
        for (NoteFacet f : NoteFacet.values()) {
            c.setMultiValued(f.key(), f != NoteFacet.PACK);
        }
        return c;
    }

    /** The index field used to filter on a facet (exact values). */
    static String filterField(NoteFacet f) {
        return "f_" + f.key();
    }

    /**
     * The note's document. Facet values go straight into the sorted-set doc values that facet
     * counting reads, as {@link FacetsConfig#build} would write them, without its drill-down terms:
     * filters use the exact-value fields ({@link #filterField}), so those terms were written for
     * every value of every note and never read, and {@code build} copied the document to do it.
     */
    static Document toDocument(FacetsConfig config, Note note, String source, String pack, PackLayer layer,
                               String location, String hash) {
        Document d = new Document();
        d.add(new StringField(ID, note.id(), Field.Store.YES));
        d.add(new BinaryDocValuesField(ID, new BytesRef(note.id())));
        d.add(new TextField(TITLE, note.title(), Field.Store.YES));
        d.add(new TextField(TAGS, String.join(" , ", note.tags()), Field.Store.NO));
        d.add(new Field(BODY, NoteFormat.plainText(note.body()), BODY_TYPE));
        d.add(new StoredField(SOURCE, source));
        d.add(new StoredField(PACK, pack));
        d.add(new StoredField(LAYER, layer.name()));
        d.add(new StoredField(LOCATION, location));
        d.add(new BinaryDocValuesField(LOCATION, new BytesRef(location)));
        d.add(new BinaryDocValuesField(HASH, new BytesRef(hash)));
        for (NoteFacet f : NoteFacet.values()) {
            String facetField = config.getDimConfig(f.key()).indexFieldName;
            for (String v : f.valuesOf(note, pack)) {
                FacetField.verifyLabel(v);
                d.add(new StringField(filterField(f), v, Field.Store.NO));
                d.add(new SortedSetDocValuesField(facetField, new BytesRef(FacetsConfig.pathToString(f.key(), new String[] {v}))));
            }
        }
        return d;
    }

    /** The content hash of a note file as supplied by a pack: pack, layer and bytes. */
    static String hash(byte[] bytes, String pack, PackLayer layer) {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            md.update(pack.getBytes(StandardCharsets.UTF_8));
            md.update((byte) 0);
            md.update(layer.name().getBytes(StandardCharsets.UTF_8));
            md.update((byte) 0);
            md.update(bytes);
            return HexFormat.of().formatHex(md.digest(), 0, 16);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java 17 runtime", e);
        }
    }
}
