package org.arcwright.app.part;

import com.formdev.flatlaf.FlatClientProperties;
import java.awt.Component;
import java.awt.Font;
import java.awt.Insets;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.util.List;
import javax.swing.Action;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JToolBar;
import javax.swing.ListSelectionModel;
import javax.swing.SwingConstants;
import javax.swing.table.DefaultTableCellRenderer;
import net.miginfocom.swing.MigLayout;
import org.arcwright.app.model.FeatureColumn;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.app.widgets.Themes;
import org.arcwright.worksheet.PartWorksheet;
import org.arcwright.worksheet.RadiusFeature;

/**
 * The Part panel: what part this is and its radius features, one row each, with the status of each
 * (open, decided, measured). Selecting a row makes it the feature every other panel works on.
 */
public final class PartPanel extends JPanel {
    private static final long serialVersionUID = 1L;
    private final transient WorksheetSession session;
    private final FeatureTableModel model;
    private final JTable table;
    private final JLabel partNumber = new JLabel();
    private final JLabel partName = new JLabel();
    private final JLabel material = new JLabel();
    private boolean syncing;
    private final JToolBar bar = new JToolBar();

    /** @param rowActions add, duplicate and delete, shown above the table */
    public PartPanel(WorksheetSession session, List<Action> rowActions) {
        super(new MigLayout("insets 8, wrap 1, gap 4", "[grow,fill]", "[][][][][grow,fill]"));
        this.session = session;
        this.model = new FeatureTableModel(session);
        this.table = new JTable(model) {
            private static final long serialVersionUID = 1L;

            /**
             * Fills the column's width when every column fits at its readable width; in a narrower
             * column the table keeps those widths and scrolls sideways, rather than cutting every
             * cell to an ellipsis.
             */
            @Override
            public boolean getScrollableTracksViewportWidth() {
                return getParent() == null || getPreferredSize().width <= getParent().getWidth();
            }
        };
        setName("partPanel");
        table.setName("featureTable");
        table.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        table.setFillsViewportHeight(true);
        table.getTableHeader().setReorderingAllowed(false);
        table.setDefaultRenderer(Object.class, new StatusRenderer());
        table.getSelectionModel().addListSelectionListener(e -> rowSelected(e.getValueIsAdjusting()));
        partNumber.setName("partNumber");
        partNumber.putClientProperty(FlatClientProperties.STYLE_CLASS, "h3");
        material.putClientProperty(FlatClientProperties.STYLE_CLASS, "small");
        bar.setFloatable(false);
        for (Action a : rowActions) {
            JButton b = bar.add(a);
            b.setHideActionText(false);
            b.setHorizontalTextPosition(SwingConstants.RIGHT);
            b.setVerticalTextPosition(SwingConstants.CENTER);
            b.setName("part." + a.getValue(Action.NAME));
        }
        add(partNumber, "wmin 10");
        add(partName, "wmin 10");
        add(material, "wmin 10");
        add(bar, "wmin 10");
        addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) { fitBar(); }
        });
        add(new JScrollPane(table));
        session.listeners().add(this::sessionChanged);
        sessionChanged();
    }

    public JTable table() { return table; }

    /**
     * Shows the row buttons with their words when the column is wide enough for them, else as icons
     * (each action's tooltip names it), so no button is cut off in a narrow column.
     */
    private void fitBar() {
        Insets in = getInsets();
        int room = getWidth() - in.left - in.right - 16;
        boolean iconsOnly = fullBarWidth() > room;
        for (Component c : bar.getComponents()) {
            if (c instanceof JButton b && b.getHideActionText() != iconsOnly) {
                b.setHideActionText(iconsOnly);
                bar.revalidate();
            }
        }
    }

    /** The bar's width with every button's words shown. */
    private int fullBarWidth() {
        int w = bar.getInsets().left + bar.getInsets().right;
        for (Component c : bar.getComponents()) {
            if (!(c instanceof JButton b)) {
                w += c.getPreferredSize().width;
                continue;
            }
            String text = (String) b.getAction().getValue(Action.NAME);
            Insets bi = b.getInsets();
            int icon = b.getIcon() == null ? 0 : b.getIcon().getIconWidth() + b.getIconTextGap();
            w += bi.left + bi.right + icon + b.getFontMetrics(b.getFont()).stringWidth(text);
        }
        return w;
    }

    /** Widest a column is sized to by its content; longer cells end in an ellipsis and show their text as a tooltip. */
    private static final int WIDEST_COLUMN = 220;

    /**
     * Sizes each column to its header and its longest cell (up to {@link #WIDEST_COLUMN}), so that at
     * its preferred width every column is readable.
     */
    private void sizeColumns() {
        for (int c = 0; c < table.getColumnCount(); c++) {
            var column = table.getColumnModel().getColumn(c);
            var header = table.getTableHeader().getDefaultRenderer()
                    .getTableCellRendererComponent(table, column.getHeaderValue(), false, false, -1, c);
            int width = header.getPreferredSize().width;
            for (int r = 0; r < table.getRowCount(); r++) {
                width = Math.max(width, table.prepareRenderer(table.getCellRenderer(r, c), r, c).getPreferredSize().width);
            }
            column.setPreferredWidth(Math.min(WIDEST_COLUMN, width + 2 * table.getIntercellSpacing().width + 6));
        }
    }

    private void sessionChanged() {
        syncing = true;
        try {
            PartWorksheet ws = session.worksheet();
            partNumber.setText(ws.part().number() + (ws.part().revision() == null ? "" : "  rev " + ws.part().revision()));
            partName.setText(ws.part().name() == null ? " " : ws.part().name());
            material.setText(ws.part().material() == null ? " " : ws.part().material());
            // a narrow column ends these with an ellipsis; the tooltip keeps the whole line
            partName.setToolTipText(ws.part().name());
            material.setToolTipText(ws.part().material());
            model.fireTableDataChanged();
            sizeColumns();
            session.selected().ifPresent(this::selectRow);
        } finally {
            syncing = false;
        }
    }

    private void selectRow(RadiusFeature f) {
        int i = session.worksheet().features().indexOf(f);
        if (i >= 0) {
            table.getSelectionModel().setSelectionInterval(i, i);
            table.scrollRectToVisible(table.getCellRect(i, 0, true));
        }
    }

    private void rowSelected(boolean adjusting) {
        if (syncing || adjusting) return;
        int row = table.getSelectedRow();
        if (row >= 0 && row < model.getRowCount()) session.select(model.rows().get(row).id());
    }

    /** Colours the status column by outcome; the id column in bold. */
    private final class StatusRenderer extends DefaultTableCellRenderer {
        private static final long serialVersionUID = 1L;

        @Override
        public Component getTableCellRendererComponent(JTable t, Object value, boolean selected, boolean focus,
                                                       int row, int column) {
            Component c = super.getTableCellRendererComponent(t, value, selected, focus, row, column);
            FeatureColumn col = model.column(column);
            RadiusFeature f = model.rows().get(row);
            if (!selected && col == FeatureColumn.STATUS) {
                switch (f.status()) {
                    case MEASURED_PASS: c.setForeground(Themes.color("Arcwright.pass.foreground")); break;
                    case MEASURED_FAIL: c.setForeground(Themes.color("Arcwright.fail.foreground")); break;
                    case MEASURED_INDETERMINATE: c.setForeground(Themes.color("Arcwright.undecided.foreground")); break;
                    case OPEN: c.setForeground(Themes.color("Arcwright.help.foreground")); break;
                    default: c.setForeground(t.getForeground());
                }
            } else if (!selected) {
                c.setForeground(t.getForeground());
            }
            c.setFont(col == FeatureColumn.ID ? t.getFont().deriveFont(Font.BOLD) : t.getFont());
            if (c instanceof JLabel label) {
                // the id's tooltip names the feature; a cell too narrow for its text shows it whole
                String tip = col == FeatureColumn.ID ? f.designCase().feature() : null;
                if (tip == null && value != null
                        && label.getPreferredSize().width > t.getColumnModel().getColumn(column).getWidth()) {
                    tip = value.toString();
                }
                label.setToolTipText(tip);
            }
            return c;
        }
    }
}
