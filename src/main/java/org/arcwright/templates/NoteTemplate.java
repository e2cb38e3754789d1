package org.arcwright.templates;

import com.samskivert.mustache.Mustache;
import com.samskivert.mustache.MustacheException;
import com.samskivert.mustache.Template;
import java.io.StringWriter;
import java.io.Writer;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.arcwright.io.InputProblem;

/**
 * One checked drawing-note template. A template that names {@code feature} is filled once per
 * feature; any other is filled once for the part.
 */
public final class NoteTemplate {
    private static final Mustache.Compiler COMPILER = Mustache.compiler()
            .escapeHTML(false)
            .emptyStringIsFalse(true)
            .defaultValue("")
            .strictSections(false);

    /** Longest note a template may produce, in characters: a drawing note is a few pages at most. */
    static final int MAX_OUTPUT = 1 << 20;

    private final String name;
    private final String source;
    private final String pack;
    private final Set<String> fields;
    private final boolean perFeature;
    private final Template compiled;

    private NoteTemplate(String name, String source, String pack, Set<String> fields, boolean perFeature,
                         Template compiled) {
        this.name = name;
        this.source = source;
        this.pack = pack;
        this.fields = Set.copyOf(fields);
        this.perFeature = perFeature;
        this.compiled = compiled;
    }

    /**
     * Checks and compiles a template's text.
     *
     * @param name the template's name (its file name without {@code .mustache})
     * @param source where it came from, for error messages
     * @param pack the name of the pack that holds it
     * @throws InputProblem naming source, line, column and field for anything a note may not do
     */
    public static NoteTemplate compile(String name, String text, String source, String pack) {
        Objects.requireNonNull(name, "name");
        TemplateChecker.Result r = TemplateChecker.check(text, source, NoteFields.ROOT);
        Template t;
        try {
            t = COMPILER.compile(text);
        } catch (MustacheException e) {
            throw new InputProblem(source, 0, 0, null, "not a valid template: " + e.getMessage(), e);
        }
        return new NoteTemplate(name, source, pack, r.fields(), r.perFeature(), t);
    }

    /** Fills the template from a context made by {@link NoteContext}. */
    public String fill(Map<String, Object> context) {
        StringWriter out = new StringWriter();
        try {
            compiled.execute(context, new BoundedWriter(out));
            return out.toString();
        } catch (BoundedWriter.TooLong e) {
            throw new InputProblem(source, 0, 0, null, "the filled note would be longer than " + MAX_OUTPUT
                    + " characters; a drawing note is far shorter (a list repeated inside another?)");
        } catch (MustacheException e) {
            if (e.getCause() instanceof BoundedWriter.TooLong) {
                throw new InputProblem(source, 0, 0, null, "the filled note would be longer than " + MAX_OUTPUT
                        + " characters; a drawing note is far shorter (a list repeated inside another?)");
            }
            throw new InputProblem(source, 0, 0, null, "could not fill the template: " + e.getMessage(), e);
        }
    }

    /** A writer that stops a note growing past {@link #MAX_OUTPUT}. */
    private static final class BoundedWriter extends Writer {
        private final StringWriter out;
        private long written;

        BoundedWriter(StringWriter out) { this.out = out; }

        @Override
        public void write(char[] buf, int off, int len) {
            written += len;
            if (written > MAX_OUTPUT) throw new TooLong();
            out.write(buf, off, len);
        }

        @Override
        public void flush() {}

        @Override
        public void close() {}

        private static final class TooLong extends RuntimeException {
            private static final long serialVersionUID = 1L;

            TooLong() { super(null, null, false, false); }
        }
    }

    public String name() { return name; }

    /** The file it was read from. */
    public String source() { return source; }

    /** The pack that supplied it (after overrides). */
    public String pack() { return pack; }

    /** The field names it uses, as written. */
    public Set<String> fields() { return fields; }

    /** True when it names {@code feature} and is filled once per feature. */
    public boolean perFeature() { return perFeature; }
}
