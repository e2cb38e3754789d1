package org.arcwright.app.part;

import java.util.List;
import javax.swing.table.AbstractTableModel;
import org.arcwright.app.model.FeatureColumn;
import org.arcwright.app.model.WorksheetSession;
import org.arcwright.worksheet.RadiusFeature;

/** The worksheet's features as table rows; columns come from {@link FeatureColumn}. */
final class FeatureTableModel extends AbstractTableModel {
    private static final long serialVersionUID = 1L;
    private static final FeatureColumn[] COLUMNS = FeatureColumn.values();
    private final transient WorksheetSession session;

    FeatureTableModel(WorksheetSession session) {
        this.session = session;
    }

    List<RadiusFeature> rows() { return session.worksheet().features(); }

    @Override
    public int getRowCount() { return rows().size(); }

    @Override
    public int getColumnCount() { return COLUMNS.length; }

    @Override
    public String getColumnName(int column) { return COLUMNS[column].title(); }

    @Override
    public Object getValueAt(int row, int column) { return COLUMNS[column].valueOf(rows().get(row)); }

    FeatureColumn column(int column) { return COLUMNS[column]; }
}
