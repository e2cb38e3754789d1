package org.arcwright.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Component;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.swing.JButton;
import javax.swing.JDialog;
import javax.swing.JList;
import javax.swing.JTextField;
import javax.swing.JViewport;
import javax.swing.SwingUtilities;
import javax.swing.text.Document;
import org.arcwright.app.model.ThemeChoice;
import org.arcwright.app.shell.MainWindow;
import org.arcwright.notes.NoteHit;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;
import org.junit.jupiter.api.extension.RegisterExtension;

/**
 * The Notes panel as a user meets it at 1024x700: a note opened keeps list and reader usable (also
 * after a save), its Markdown rendered; "Write a note…" starts empty with a new id; overriding a
 * built-in note is its own labelled action.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
@Tag("gui")
class NotesPanelGuiTest {
    @RegisterExtension
    static final OpenWindowExtension opened = new OpenWindowExtension()
            .readyWhen(w -> w.notesPanel().queryField().isEnabled()).size(1024, 700);

    // filled by the extension
    private static Path config;
    private static MainWindow window;
    private static FrameFixture fixture;

    private static int visibleHeight(String name) {
        return GuiSupport.onEdt(() -> {
            Component c = fixture.robot().finder().findByName(window.frame(), name, true);
            return SwingUtilities.getAncestorOfClass(JViewport.class, c).getHeight();
        });
    }

    private static void openNoteAbout(String words, String id) {
        if (!GuiSupport.onEdt(() -> window.notesPanel().queryField().getText()).equals(words)) {
            GuiSupport.onEdt(() -> window.notesPanel().queryField().setText(""));
            fixture.textBox("notesQuery").click().enterText(words);
        }
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.notesPanel().listedTitles().size() > 0
                && fixture.label("notesCount").target().getText().contains(words)), 20);
        @SuppressWarnings("unchecked")
        JList<NoteHit> list = (JList<NoteHit>) fixture.list("notesHits").target();
        GuiSupport.onEdt(() -> {
            for (int i = 0; i < list.getModel().getSize(); i++) {
                if (list.getModel().getElementAt(i).id().equals(id)) list.setSelectedIndex(i);
            }
        });
        GuiSupport.waitFor(() -> GuiSupport.onEdt(() -> window.notesPanel().reader().getText().contains("Peterson")), 20);
    }

    /** Presses the button as a click would; the modal form it opens is then driven through its fixture. */
    private static void press(String name) {
        JButton b = fixture.button(name).target();
        SwingUtilities.invokeLater(b::doClick);
    }

    @Test
    @Order(1)
    void anOpenedNoteKeepsListAndReaderUsableAndShowsItsMarkdownRendered() {
        openNoteAbout("Peterson notch sensitivity", "notch-sensitivity-neuber-peterson");
        GuiSupport.settle(300);
        assertThat(visibleHeight("notesReader")).as("reader height at 1024x700").isGreaterThanOrEqualTo(100);
        assertThat(visibleHeight("notesHits")).as("list height at 1024x700").isGreaterThanOrEqualTo(90);
        String plain = GuiSupport.onEdt(() -> {
            Document d = window.notesPanel().reader().getDocument();
            return d.getText(0, d.getLength());
        });
        // the note's source says *Peterson's Stress Concentration Factors*: emphasis, not asterisks
        assertThat(plain).contains("Peterson").doesNotContain("*Peterson");
        assertThat(GuiSupport.onEdt(() -> window.notesPanel().reader().getText())).contains("<i>");
        for (ThemeChoice theme : ThemeChoice.values()) {
            if (theme != ThemeChoice.LIGHT && theme != ThemeChoice.DARK) continue;
            String look = theme == ThemeChoice.LIGHT ? "light" : "dark";
            for (int[] size : new int[][] {{1024, 700}, {1600, 1000}}) {
                GuiSupport.onEdt(() -> {
                    window.setTheme(theme);
                    window.frame().setSize(size[0], size[1]);
                    window.frame().validate();
                });
                GuiSupport.settle(400);
                // the display applies the new size after the call; lay out again at the size it gave
                GuiSupport.onEdt(() -> window.frame().validate());
                GuiSupport.settle(200);
                GuiSupport.screenshot(window.frame(), "notes-open-" + size[0] + "x" + size[1] + "-" + look);
            }
        }
        GuiSupport.onEdt(() -> {
            window.setTheme(ThemeChoice.LIGHT);
            window.frame().setSize(1024, 700);
            window.frame().validate();
        });
        GuiSupport.settle(300);
    }

    private static boolean savedOverride() {
        try (var files = Files.walk(config)) {
            return files.filter(p -> p.toString().endsWith(".md") && p.toString().contains("personal"))
                    .anyMatch(p -> {
                        try {
                            return Files.readString(p).contains("Hollowmere Valves");
                        } catch (IOException e) {
                            return false;
                        }
                    });
        } catch (IOException | UncheckedIOException e) {
            return false;
        }
    }

    @Test
    @Order(2)
    void writeANoteStartsEmptyWithANewId() {
        openNoteAbout("Peterson notch sensitivity", "notch-sensitivity-neuber-peterson");
        press("notesWrite");
        var pane = fixture.optionPane();
        JTextField id = (JTextField) fixture.robot().finder().findByName(pane.target(), "noteId", true);
        JTextField title = (JTextField) fixture.robot().finder().findByName(pane.target(), "noteTitle", true);
        JTextField author = (JTextField) fixture.robot().finder().findByName(pane.target(), "noteAuthor", true);
        String idText = GuiSupport.onEdt(() -> id.getText());
        assertThat(idText).isNotEqualTo("notch-sensitivity-neuber-peterson").startsWith("my-note-");
        assertThat(GuiSupport.onEdt(() -> title.getText())).isEmpty();
        assertThat(GuiSupport.onEdt(() -> author.getText())).isEmpty();
        SwingUtilities.invokeLater(pane.cancelButton().target()::doClick);
    }

    @Test
    @Order(3)
    void overridingABuiltInNoteIsItsOwnLabelledActionAndTheListStaysUsableAfterTheSave() throws Exception {
        openNoteAbout("Peterson notch sensitivity", "notch-sensitivity-neuber-peterson");
        assertThat(fixture.button("notesOverride").target().getText()).isEqualTo("Override this note…");
        press("notesOverride");
        var pane = fixture.optionPane();
        JTextField id = (JTextField) fixture.robot().finder().findByName(pane.target(), "noteId", true);
        assertThat(GuiSupport.onEdt(() -> id.getText())).isEqualTo("notch-sensitivity-neuber-peterson");
        assertThat(GuiSupport.onEdt(() -> id.isEditable())).isFalse();
        assertThat(GuiSupport.onEdt(() -> ((JDialog) SwingUtilities.getWindowAncestor(pane.target())).getTitle()))
                .contains("Override");
        fixture.robot().finder().findByName(pane.target(), "noteAuthor", true);
        GuiSupport.onEdt(() -> ((JTextField) fixture.robot().finder().findByName(pane.target(), "noteAuthor", true))
                .setText("Process engineer, Hollowmere Valves (invented)"));
        // pressed like the other buttons here: a real click can land on another window left above the dialog
        SwingUtilities.invokeLater(pane.okButton().target()::doClick);
        // the saved file is the effect to wait for: the status line may already show a later message
        // (the notes index finishing its first build on a fresh checkout)
        GuiSupport.waitFor(() -> savedOverride(), 60);
        GuiSupport.settle(500);
        GuiSupport.onEdt(() -> window.frame().validate());
        GuiSupport.settle(200);
        assertThat(visibleHeight("notesHits")).as("list height after a save").isGreaterThanOrEqualTo(90);
        assertThat(visibleHeight("notesReader")).as("reader height after a save").isGreaterThanOrEqualTo(100);
        String manifest = Files.readString(Files.walk(config).filter(p -> p.endsWith("pack.json")
                && p.toString().contains("personal")).findFirst().orElseThrow());
        assertThat(manifest).contains("notes only");
        GuiSupport.screenshot(window.frame(), "notes-after-save-1024x700-light");
    }
}
