package org.arcwright.app.shell;

import com.formdev.flatlaf.FlatClientProperties;
import java.awt.Color;
import java.awt.Component;
import java.awt.Frame;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.List;
import javax.swing.AbstractAction;
import javax.swing.DefaultListModel;
import javax.swing.JComponent;
import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextField;
import javax.swing.KeyStroke;
import javax.swing.ListCellRenderer;
import javax.swing.UIManager;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.Command;
import org.arcwright.app.widgets.Icons;
import org.arcwright.app.widgets.TextEdits;

/**
 * The command finder: type a few letters of any command, see its shortcut, press Enter to run it.
 * Lists every command of the catalog; one that cannot run now says why.
 */
public final class CommandFinder extends JDialog {
    private static final long serialVersionUID = 1L;
    private final transient CommandActions actions;
    private final JTextField query = new JTextField();
    private final DefaultListModel<Command> model = new DefaultListModel<>();
    private final JList<Command> list = new JList<>(model);

    public CommandFinder(Frame owner, CommandActions actions) {
        super(owner, "Find a command", true);
        this.actions = actions;
        setName("commandFinder");
        query.setName("finderQuery");
        list.setName("finderList");
        query.putClientProperty(FlatClientProperties.PLACEHOLDER_TEXT, "Type to find a command…");
        query.putClientProperty(FlatClientProperties.TEXT_FIELD_LEADING_ICON, Icons.get("finder"));
        list.setCellRenderer(new Row());
        list.setVisibleRowCount(12);
        JPanel p = new JPanel(new MigLayout("insets dialog, wrap 1", "[grow,fill]", "[][grow,fill][]"));
        p.add(query, "w 36sp");
        p.add(new JScrollPane(list), "h 18sp");
        JLabel hint = new JLabel("Enter runs the command · Esc closes");
        hint.putClientProperty(FlatClientProperties.STYLE_CLASS, "small");
        p.add(hint);
        setContentPane(p);
        TextEdits.onEdit(query.getDocument(), () -> filter());
        bind(KeyStroke.getKeyStroke(KeyEvent.VK_ESCAPE, 0), "close", this::close);
        bind(KeyStroke.getKeyStroke(KeyEvent.VK_ENTER, 0), "run", this::runSelected);
        bind(KeyStroke.getKeyStroke(KeyEvent.VK_DOWN, 0), "down", () -> move(1));
        bind(KeyStroke.getKeyStroke(KeyEvent.VK_UP, 0), "up", () -> move(-1));
        list.addMouseListener(new MouseAdapter() {
            @Override
            public void mouseClicked(MouseEvent e) { if (e.getClickCount() == 2) runSelected(); }
        });
        pack();
    }

    /** Opens the finder centred on the owner with an empty query. */
    public void open() {
        actions.refresh();
        query.setText("");
        filter();
        setLocationRelativeTo(getOwner());
        setVisible(true);
    }

    private void bind(KeyStroke key, String name, Runnable r) {
        getRootPane().getInputMap(JComponent.WHEN_IN_FOCUSED_WINDOW).put(key, name);
        getRootPane().getActionMap().put(name, new AbstractAction() {
            private static final long serialVersionUID = 1L;
            public void actionPerformed(ActionEvent e) { r.run(); }
        });
    }

    private void filter() {
        List<Command> hits = actions.catalog().search(query.getText());
        model.clear();
        for (Command c : hits) model.addElement(c);
        if (!hits.isEmpty()) list.setSelectedIndex(0);
    }

    private void move(int delta) {
        int n = model.getSize();
        if (n == 0) return;
        int i = Math.max(0, Math.min(n - 1, list.getSelectedIndex() + delta));
        list.setSelectedIndex(i);
        list.ensureIndexIsVisible(i);
    }

    private void runSelected() {
        Command c = list.getSelectedValue();
        if (c == null || !c.isEnabled()) return;
        close();
        actions.get(c.id()).actionPerformed(new ActionEvent(this, 0, c.id()));
    }

    private void close() { setVisible(false); }

    /** One row: title and group on the left, shortcut on the right, reason when unavailable. */
    private static final class Row implements ListCellRenderer<Command> {
        private final JPanel panel = new JPanel(new MigLayout("insets 3 6 3 6, gap 8", "[][grow][]", "[]"));
        private final JLabel title = new JLabel();
        private final JLabel group = new JLabel();
        private final JLabel key = new JLabel();

        Row() {
            group.putClientProperty(FlatClientProperties.STYLE_CLASS, "small");
            panel.add(title);
            panel.add(group);
            panel.add(key);
        }

        @Override
        public Component getListCellRendererComponent(JList<? extends Command> l, Command c, int index,
                                                      boolean selected, boolean focus) {
            boolean enabled = c.isEnabled();
            title.setText(c.title());
            group.setText(enabled ? c.group() : c.group() + " · " + c.whyDisabled().get().orElse(""));
            key.setText(c.shortcutLabel());
            panel.setBackground(selected ? l.getSelectionBackground() : l.getBackground());
            Color fg = selected ? l.getSelectionForeground() : l.getForeground();
            Color dim = UIManager.getColor("Label.disabledForeground");
            title.setForeground(enabled ? fg : dim);
            group.setForeground(selected ? fg : dim);
            key.setForeground(selected ? fg : dim);
            return panel;
        }
    }
}
