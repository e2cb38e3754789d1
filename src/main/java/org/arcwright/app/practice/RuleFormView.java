package org.arcwright.app.practice;

import com.formdev.flatlaf.FlatClientProperties;
import java.awt.Font;
import java.util.EnumMap;
import java.util.Map;
import java.util.Optional;
import java.util.function.BiConsumer;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.JViewport;
import javax.swing.text.JTextComponent;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.RuleForm;
import org.arcwright.app.widgets.ScrollablePanel;
import org.arcwright.app.widgets.WrapLabel;
import org.arcwright.app.widgets.TextEdits;

/**
 * The rule as a form: one control per field of the rule ({@link RuleForm.Field}), labelled, with
 * what goes in it beside it. The form holds no rule of its own: it shows what {@link RuleForm#read}
 * gives and hands each edit to its listener, which writes it into the JSON.
 */
final class RuleFormView extends JScrollPane {
    private static final long serialVersionUID = 1L;
    private final Map<RuleForm.Field, JTextComponent> controls = new EnumMap<>(RuleForm.Field.class);
    private final WrapLabel state = new WrapLabel(" ", "Label.font", "Arcwright.help.foreground");
    private final transient BiConsumer<RuleForm.Field, String> edited;
    private boolean filling;

    /** @param edited called with the field and its whole text after each edit the user makes */
    RuleFormView(BiConsumer<RuleForm.Field, String> edited) {
        this.edited = edited;
        ScrollablePanel form = new ScrollablePanel(new MigLayout("insets 6 4 6 4, wrap 2, gapy 3", "[right][grow,fill]"));
        form.add(state, "span 2, growx, wmin 10, hidemode 3");
        state.setName("ruleFormState");
        line(form, RuleForm.Field.ID, new JTextField(), null, "lower-case letters, digits, dots and hyphens; unique across the packs");
        line(form, RuleForm.Field.SUMMARY, new JTextField(), null, "one line: what the rule recommends, and for which corners");
        line(form, RuleForm.Field.WEIGHT, new JTextField(6), null, "1 to 1000, higher ranks first (built-in: 95 to 80 for "
                + "function-specific controls, 70 to 55 general practice)");
        line(form, RuleForm.Field.WHEN, area(3), "all must hold; fact: value, one a line",
                "conditions that must all hold, one a line: fact: value, e.g. function: sealing, "
                + "loading: [\"static\",\"fatigue\"], nominalRadiusMm: {\"min\":0.5}; no line: every case");
        line(form, RuleForm.Field.RECOMMEND, area(3), "callout, then size, datums, extent…",
                "callout: general, radius, controlled-radius, profile or composite-profile; then size, datums, extent, tiers… "
                + "one a line");
        line(form, RuleForm.Field.NEEDS, area(4), "needs every card must meet, JSON",
                "needs the rule adds to every case it fires on, as JSON: [{\"id\": \"radius-floor\", \"min\": 0.8, "
                + "\"units\": \"mm\", \"why\": \"…\", \"source\": \"…\"}]; id is radius-floor, radius-ceiling, form or "
                + "location; each card then says whether it meets them");
        line(form, RuleForm.Field.PREFER, new JTextField(), null, "callouts the company prefers, first first, separated by "
                + "commas (general, radius, controlled-radius, profile, composite-profile); orders only cards that meet the "
                + "same needs");
        line(form, RuleForm.Field.BECAUSE, area(3), "one sentence a line", "the reasoning, one sentence a line, in the words "
                + "you would use with a colleague");
        line(form, RuleForm.Field.CAUTIONS, area(2), null, "what to watch, one a line");
        line(form, RuleForm.Field.REFERENCES, area(2), null, "standards and handbooks by clause topic, one a line "
                + "(never copied text)");
        line(form, RuleForm.Field.NOTE_TAGS, new JTextField(), null, "tags of practice notes to link, separated by commas");
        line(form, RuleForm.Field.EXAMPLES, area(6), "self-tests, JSON", "self-tests as JSON: [{\"name\", \"case\", "
                + "\"expect\"}, …]; Run examples checks them");
        setViewportView(form);
        setBorder(null);
        getVerticalScrollBar().setUnitIncrement(16);
        setHorizontalScrollBarPolicy(HORIZONTAL_SCROLLBAR_NEVER);
    }

    private static JTextArea area(int rows) {
        JTextArea a = new JTextArea(rows, 10);
        a.setLineWrap(true);
        a.setWrapStyleWord(true);
        return a;
    }

    /**
     * Adds field {@code f}: its label, the control, a short hint under it when given (the
     * conditions and recommendation have a syntax to learn), and the full help as its tooltip and
     * placeholder.
     */
    private void line(ScrollablePanel form, RuleForm.Field f, JTextComponent c, String hint, String help) {
        JLabel label = new JLabel(f.label());
        label.setLabelFor(c);
        c.setName("ruleForm." + f.key());
        c.setToolTipText(help);
        if (f == RuleForm.Field.EXAMPLES || f == RuleForm.Field.NEEDS || f == RuleForm.Field.WHEN
                || f == RuleForm.Field.RECOMMEND) {
            c.setFont(new Font(Font.MONOSPACED, Font.PLAIN, c.getFont().getSize()));
        }
        TextEdits.onEdit(c.getDocument(), () -> changed(f));
        controls.put(f, c);
        form.add(label, "top, gaptop 4");
        if (c instanceof JTextArea) {
            JScrollPane s = new JScrollPane(c);
            s.setHorizontalScrollBarPolicy(HORIZONTAL_SCROLLBAR_NEVER);
            form.add(s, "wmin 10");
        } else {
            form.add(c, "wmin 10");
        }
        if (c instanceof JTextField) c.putClientProperty(FlatClientProperties.PLACEHOLDER_TEXT, help);
        if (hint != null) form.add(new WrapLabel(hint, "small.font", "Arcwright.help.foreground"), "skip 1, wmin 10");
    }

    private void changed(RuleForm.Field f) {
        if (!filling) edited.accept(f, controls.get(f).getText());
    }

    /** Shows the rule {@code json}, or keeps the last values and says why the form cannot follow the JSON. */
    void show(String json) {
        Optional<Map<RuleForm.Field, String>> form = RuleForm.read(json);
        if (form.isEmpty()) {
            state.show("The JSON does not read as a rule object, so the form cannot show it: fix it on the JSON tab "
                    + "(the message below says where).", "Arcwright.error.foreground");
            state.setVisible(true);
            controls.values().forEach(c -> c.setEnabled(false));
            return;
        }
        filling = true;
        try {
            for (Map.Entry<RuleForm.Field, String> e : form.get().entrySet()) {
                JTextComponent c = controls.get(e.getKey());
                c.setEnabled(true);
                if (!c.getText().equals(e.getValue())) {
                    c.setText(e.getValue());
                    c.setCaretPosition(0);
                }
            }
        } finally {
            filling = false;
        }
        state.setVisible(false);
    }

    /** Outlines the field {@code problem} is about, clearing the others. */
    void mark(Optional<RuleForm.Field> problem) {
        for (Map.Entry<RuleForm.Field, JTextComponent> e : controls.entrySet()) {
            boolean bad = problem.isPresent() && problem.get() == e.getKey();
            JTextComponent c = e.getValue();
            Object target = c.getParent() instanceof JViewport v && v.getParent() instanceof JScrollPane s ? s : c;
            ((JComponent) target).putClientProperty(FlatClientProperties.OUTLINE,
                    bad ? FlatClientProperties.OUTLINE_ERROR : null);
        }
    }

    /** The control of field {@code f} (tests). */
    JTextComponent control(RuleForm.Field f) { return controls.get(f); }

    /** Whether the form is showing a rule it can edit. */
    boolean editable() { return controls.get(RuleForm.Field.ID).isEnabled(); }
}
