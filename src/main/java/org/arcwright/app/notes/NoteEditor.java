package org.arcwright.app.notes;

import java.time.LocalDate;
import java.util.Arrays;
import java.util.List;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import net.miginfocom.swing.MigLayout;
import org.arcwright.notes.Note;

/** The form for writing or editing a practice note (saved into the personal pack). */
final class NoteEditor extends JPanel {
    private static final long serialVersionUID = 1L;
    private final JTextField id = new JTextField(30);
    private final JTextField title = new JTextField(30);
    private final JTextField tags = new JTextField(30);
    private final JTextField functions = new JTextField(30);
    private final JTextField standards = new JTextField(30);
    private final JTextField processes = new JTextField(30);
    private final JTextField author = new JTextField(30);
    private final JTextArea body = new JTextArea(12, 50);

    /** An empty form for a new note, with the free id {@code freshId} filled in. */
    static NoteEditor empty(String freshId) {
        NoteEditor e = new NoteEditor(null);
        e.id.setText(freshId);
        return e;
    }

    /** A form over {@code existing} whose id cannot change (an override or an edit of one's own note). */
    static NoteEditor over(Note existing) {
        NoteEditor e = new NoteEditor(existing);
        e.id.setEditable(false);
        return e;
    }

    private NoteEditor(Note existing) {
        super(new MigLayout("insets 0, wrap 2", "[right][grow,fill]", ""));
        setName("noteEditor");
        id.setName("noteId");
        title.setName("noteTitle");
        body.setName("noteBody");
        author.setName("noteAuthor");
        body.setLineWrap(true);
        body.setWrapStyleWord(true);
        if (existing != null) {
            id.setText(existing.id());
            title.setText(existing.title());
            tags.setText(String.join(", ", existing.tags()));
            functions.setText(String.join(", ", existing.functions()));
            standards.setText(String.join(", ", existing.standards()));
            processes.setText(String.join(", ", existing.processes()));
            author.setText(existing.author());
            body.setText(existing.body());
        }
        row("Id (lower-case, hyphens)", id);
        row("Title", title);
        row("Tags", tags);
        row("Functions", functions);
        row("Standards", standards);
        row("Processes", processes);
        row("Author (role or name)", author);
        add(new JLabel("Text (Markdown)"), "top");
        add(new JScrollPane(body), "grow");
    }

    private void row(String label, JTextField f) {
        add(new JLabel(label));
        add(f);
    }

    /** The note the form makes; throws IllegalArgumentException naming what is wrong. */
    Note note(LocalDate today) {
        return new Note(id.getText().trim(), title.getText(), list(tags), list(functions), list(standards), list(processes),
                author.getText(), today, body.getText());
    }

    private static List<String> list(JTextField f) {
        return Arrays.stream(f.getText().split(",")).map(String::trim).filter(s -> !s.isEmpty()).toList();
    }
}
