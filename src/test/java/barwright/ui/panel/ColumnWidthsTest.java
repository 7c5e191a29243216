package barwright.ui.panel;

import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Test;

import javax.swing.JTable;
import javax.swing.table.DefaultTableModel;
import java.awt.Font;
import java.awt.FontMetrics;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Fitting a table's columns to their texts, checked against the texts' own widths measured with the font's
 * metrics (not through the renderers the fit uses). Built without a window, so no display is needed.
 */
class ColumnWidthsTest {
    private static final String LONG = "-123456789.123456 N/mm";

    @Test
    void everyColumnIsAtLeastAsWideAsItsHeaderAndItsWidestCellAtTheTablesFont() {
        for (int points : new int[] {13, 28}) {
            int size = points;
            GuiActionRunner.execute(() -> {
                JTable table = table(new String[] {"Force at 0.5 m/s (N)", "v"},
                        new Object[][] {{"-2500", "0.05"}, {"12", LONG}, {"7", "1"}});
                table.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, size));
                table.getTableHeader().setFont(new Font(Font.SANS_SERIF, Font.BOLD, size));
                ColumnWidths.wholeTexts().fit(table);
                FontMetrics cells = table.getFontMetrics(table.getFont());
                FontMetrics header = table.getFontMetrics(table.getTableHeader().getFont());
                for (int column = 0; column < table.getColumnCount(); column++) {
                    int needed = header.stringWidth(table.getColumnName(column));
                    for (int row = 0; row < table.getRowCount(); row++) {
                        needed = Math.max(needed, cells.stringWidth(table.getValueAt(row, column).toString()));
                    }
                    var fitted = table.getColumnModel().getColumn(column);
                    assertThat(fitted.getPreferredWidth()).as("column %d at %d pt", column, size)
                            .isGreaterThanOrEqualTo(needed);
                    // kept as the least width too, so that the table cannot squeeze the column under its texts
                    assertThat(fitted.getMinWidth()).isEqualTo(fitted.getPreferredWidth());
                }
                return null;
            });
        }
    }

    @Test
    void onlyTheRowsUpToTheCapAreMeasured() {
        GuiActionRunner.execute(() -> {
            Object[][] rows = new Object[10][];
            for (int row = 0; row < rows.length; row++) {
                rows[row] = new Object[] {row == 7 ? LONG : "1.0"};
            }
            JTable table = table(new String[] {"k"}, rows);
            int longText = table.getFontMetrics(table.getFont()).stringWidth(LONG);

            ColumnWidths.atLeastGiven(new int[0], 13f, 5).fit(table);
            // the long text stands in row 7, past the five rows measured: the column stays narrower than it
            assertThat(table.getColumnModel().getColumn(0).getPreferredWidth()).isLessThan(longText);

            ColumnWidths.atLeastGiven(new int[0], 13f, 10).fit(table);
            assertThat(table.getColumnModel().getColumn(0).getPreferredWidth()).isGreaterThanOrEqualTo(longText);
            return null;
        });
    }

    /**
     * The given width, 300 px chosen at 13 pt, with texts far narrower than it: held at 13 pt, halved at 6.5 pt
     * (scaled down with the text), and not scaled up at 26 pt, where only the texts could widen the column.
     */
    @Test
    void aGivenWidthIsScaledDownWithASmallerTextButNeverUp() {
        for (float[] pointsAndWidth : new float[][] {{13f, 300}, {6.5f, 150}, {26f, 300}}) {
            GuiActionRunner.execute(() -> {
                JTable table = table(new String[] {"k"}, new Object[][] {{"1"}});
                table.setFont(table.getFont().deriveFont(pointsAndWidth[0]));
                table.getTableHeader().setFont(table.getFont());
                ColumnWidths.atLeastGiven(new int[] {300}, 13f, 200).fit(table);
                assertThat(table.getColumnModel().getColumn(0).getPreferredWidth())
                        .as("at %s pt", pointsAndWidth[0]).isEqualTo((int) pointsAndWidth[1]);
                return null;
            });
        }
    }

    @Test
    void aFittedColumnsTableFitsAgainWhenItsRowsChange() {
        GuiActionRunner.execute(() -> {
            DefaultTableModel model = new DefaultTableModel(new Object[][] {{"1.0"}}, new String[] {"k"});
            FittedColumnsTable table = new FittedColumnsTable(model);
            table.fitColumnsWith(ColumnWidths.wholeTexts());
            int longText = table.getFontMetrics(table.getFont()).stringWidth(LONG);
            assertThat(table.getColumnModel().getColumn(0).getPreferredWidth()).isLessThan(longText);
            model.addRow(new Object[] {LONG});
            assertThat(table.getColumnModel().getColumn(0).getPreferredWidth()).isGreaterThanOrEqualTo(longText);
            return null;
        });
    }

    private static JTable table(String[] headers, Object[][] rows) {
        return new JTable(new DefaultTableModel(rows, headers));
    }
}
