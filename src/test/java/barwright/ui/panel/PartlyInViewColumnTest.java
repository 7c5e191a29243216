package barwright.ui.panel;

import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Test;

import javax.swing.JLabel;
import javax.swing.JViewport;
import javax.swing.table.DefaultTableModel;
import java.awt.Point;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A column cut by the edge of the table's view shows "…", never the left part of its figure: the compare view at
 * 1024x768 with 28-point text showed "0.987 g (-0.050)" as "0.987 g (-0.0". Built without a window; the column
 * widths are set by hand so that the edges fall at known places.
 */
class PartlyInViewColumnTest {
    private static final String FIGURE = "0.987 g (-0.050)";

    @Test
    void onlyTheColumnCutByTheViewsEdgeShowsAnEllipsisAndScrollingBringsItsFigureBack() {
        GuiActionRunner.execute(() -> {
            DefaultTableModel model = new DefaultTableModel(
                    new Object[][] {{"inside rear lifts", "1.037 g", FIGURE}}, new Object[] {"Figure", "a", "b"});
            FittedColumnsTable table = new FittedColumnsTable(model);
            table.setAutoResizeMode(FittedColumnsTable.AUTO_RESIZE_OFF);
            for (int column = 0; column < 3; column++) {
                table.getColumnModel().getColumn(column).setPreferredWidth(200);
                table.getColumnModel().getColumn(column).setWidth(200);
            }
            JViewport view = new JViewport();
            view.setView(table);
            // 500 px of view over 600 px of columns: column 2 (x 400..600) is cut at x = 500
            view.setSize(500, 100);
            table.setSize(600, table.getRowHeight());

            assertThat(text(table, 0)).isEqualTo("inside rear lifts");
            assertThat(text(table, 1)).isEqualTo("1.037 g");
            assertThat(table.partlyOutOfView(2)).isTrue();
            assertThat(text(table, 2)).isEqualTo("\u2026");

            // scrolled 100 px right: column 2 is whole, column 0 is cut at the left edge instead
            view.setViewPosition(new Point(100, 0));
            assertThat(text(table, 2)).isEqualTo(FIGURE);
            assertThat(text(table, 0)).isEqualTo("\u2026");
            assertThat(text(table, 1)).isEqualTo("1.037 g");
            return null;
        });
    }

    @Test
    void aTableWhollyInViewShowsEveryFigure() {
        GuiActionRunner.execute(() -> {
            DefaultTableModel model = new DefaultTableModel(new Object[][] {{"x", FIGURE}}, new Object[] {"a", "b"});
            FittedColumnsTable table = new FittedColumnsTable(model);
            JViewport view = new JViewport();
            view.setView(table);
            view.setSize(800, 200);
            table.setSize(table.getPreferredSize());
            assertThat(text(table, 0)).isEqualTo("x");
            assertThat(text(table, 1)).isEqualTo(FIGURE);
            return null;
        });
    }

    private static String text(FittedColumnsTable table, int column) {
        return ((JLabel) table.prepareRenderer(table.getCellRenderer(0, column), 0, column)).getText();
    }
}
