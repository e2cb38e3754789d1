package org.arcwright.app.practice;

import com.formdev.flatlaf.FlatClientProperties;
import java.awt.Component;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.Locale;
import java.util.function.Consumer;
import javax.swing.DefaultListCellRenderer;
import javax.swing.DefaultListModel;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextField;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.TemplateFields;
import org.arcwright.app.widgets.TextEdits;

/**
 * The fields a template may use, from the template model, beside the template: filtered as you type,
 * described in the tooltip, inserted at the caret with Insert or a double click.
 */
final class TemplateFieldsView extends JPanel {
    private static final long serialVersionUID = 1L;
    private final DefaultListModel<TemplateFields.Field> shown = new DefaultListModel<>();
    private final JList<TemplateFields.Field> list = new JList<>(shown);
    private final JTextField filter = new JTextField();
    private final JButton insert = new JButton("Insert");
    private final transient Consumer<TemplateFields.Field> inserter;

    TemplateFieldsView(Consumer<TemplateFields.Field> inserter) {
        super(new MigLayout("insets 0 6 0 0, wrap 1, gap 4", "[grow,fill]", "[][][grow,fill][]"));
        this.inserter = inserter;
        setName("templateFields");
        list.setName("templateFieldList");
        filter.setName("templateFieldFilter");
        insert.setName("templateFieldInsert");
        filter.putClientProperty(FlatClientProperties.PLACEHOLDER_TEXT, "Filter, e.g. datum");
        TextEdits.onEdit(filter.getDocument(), () -> refilter());
        list.setCellRenderer(new DefaultListCellRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public Component getListCellRendererComponent(JList<?> l, Object v, int i, boolean s, boolean f) {
                TemplateFields.Field field = (TemplateFields.Field) v;
                JLabel c = (JLabel) super.getListCellRendererComponent(l, field.path(), i, s, f);
                c.setToolTipText("<html><b>" + field.path() + "</b> (" + field.kind().name().toLowerCase(Locale.ROOT)
                        + "): " + escape(field.doc()) + "<br>Inserts <code>" + escape(field.insert()) + "</code>, "
                        + escape(field.where()) + "</html>");
                return c;
            }
        });
        list.addMouseListener(new MouseAdapter() {
            @Override
            public void mouseClicked(MouseEvent e) {
                if (e.getClickCount() == 2) insertSelected();
            }
        });
        list.addListSelectionListener(e -> insert.setEnabled(list.getSelectedValue() != null));
        insert.setEnabled(false);
        insert.setToolTipText("Insert the selected field at the caret in the template");
        insert.addActionListener(e -> insertSelected());
        add(new JLabel("Fields you can use"));
        add(filter, "wmin 10");
        add(new JScrollPane(list), "wmin 10, hmin 10");
        add(insert, "growx 0");
        refilter();
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    private void refilter() {
        shown.clear();
        for (TemplateFields.Field f : TemplateFields.matching(filter.getText())) shown.addElement(f);
    }

    private void insertSelected() {
        TemplateFields.Field f = list.getSelectedValue();
        if (f != null) inserter.accept(f);
    }
}
