package org.arcwright.render;

import java.util.List;

/**
 * One block of a tolerancing sheet's text, in reading order. {@link SheetContent#blocks()} decides
 * every word and its order once; the Markdown, HTML and PDF writers only lay the blocks out, so
 * the three formats cannot say different things.
 */
public sealed interface SheetBlock {

    /** How a paragraph is set: plain, the feature's case line (quiet), or a warning that must stand out. */
    enum Tone { PLAIN, CASE, WARNING, ALERT }

    /** The sheet's title. */
    record Title(String text) implements SheetBlock {}

    /** Labelled facts about the part. */
    record Facts(List<SheetContent.Fact> facts) implements SheetBlock {
        public Facts { facts = List.copyOf(facts); }
    }

    /**
     * A section heading.
     *
     * @param anchor the feature id a summary row links to, or null
     */
    record Heading(String text, String anchor) implements SheetBlock {}

    /** A heading inside a feature's section. */
    record Subheading(String text) implements SheetBlock {}

    /**
     * A paragraph.
     *
     * @param lead words set in bold before the text (e.g. {@code Callout:}), or empty
     */
    record Paragraph(String lead, String text, Tone tone) implements SheetBlock {}

    /**
     * A table.
     *
     * @param codeColumn index of a column holding callout text (set as code), or -1
     * @param anchorColumn index of a column holding a feature id to link to its section, or -1
     * @param weights relative column widths for fixed-width layouts
     */
    record Table(List<String> header, List<List<String>> rows, int codeColumn, int anchorColumn, List<Integer> weights)
            implements SheetBlock {
        public Table {
            header = List.copyOf(header);
            rows = rows.stream().map(List::copyOf).toList();
            weights = List.copyOf(weights);
        }
    }

    /** A bulleted list. */
    record Bullets(List<String> items) implements SheetBlock {
        public Bullets { items = List.copyOf(items); }
    }

    /** Text kept as it is, line for line (drawing notes). */
    record Preformatted(String text) implements SheetBlock {}

    /**
     * A feature's frame: the drawing where the format can show one, and its one-line text.
     *
     * @param featureId whose frame
     * @param plain the callout in plain characters (for formats whose font lacks the GD&amp;T code points)
     * @param unicode the callout with the GD&amp;T code points
     */
    record Frame(String featureId, String plain, String unicode) implements SheetBlock {}

    /** The cautions and the closing deferral, set apart from the rest. */
    record Cautions(List<String> items, String deferral) implements SheetBlock {
        public Cautions { items = List.copyOf(items); }
    }

    /** Who made the sheet. */
    record Colophon(String generatedBy) implements SheetBlock {}
}
