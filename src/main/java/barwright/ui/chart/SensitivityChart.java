package barwright.ui.chart;

import barwright.insight.Tendency;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.data.category.DefaultCategoryDataset;

import javax.swing.JComponent;
import java.awt.Color;
import java.awt.Paint;
import java.util.ArrayList;
import java.util.List;

/**
 * The sensitivity study's chart: one horizontal bar per small change, its length the change of the figure
 * chosen (in the units the view gives), coloured by the way it moves the balance; the legend names the colours.
 */
public final class SensitivityChart {
    /**
     * One bar of the chart.
     *
     * @param label    the change, in words
     * @param value    the change of the figure shown, already in display units
     * @param tendency where the change moves the balance
     */
    public record Bar(String label, double value, Tendency tendency) {
    }

    private final DefaultCategoryDataset data = new DefaultCategoryDataset();
    private final List<Tendency> tendencies = new ArrayList<>();
    private final JFreeChart chart;

    public SensitivityChart() {
        chart = ChartFactory.createBarChart("What one small change does", "", "", data, PlotOrientation.HORIZONTAL,
                true, true, false);
        chart.getCategoryPlot().setRenderer(new TendencyRenderer());
    }

    /** @return the chart in a panel named {@code name}, ready to place in a view */
    public JComponent panel(String name) {
        return ChartStyle.panel(chart, name);
    }

    /**
     * Draws the bars, largest first as given.
     *
     * @param axisLabel the label of the value axis, with its unit
     * @param title     the chart's title
     */
    public void show(List<Bar> bars, String axisLabel, String title) {
        chart.setNotify(false);
        try {
            data.clear();
            tendencies.clear();
            for (Bar bar : bars) {
                data.addValue(bar.value(), "change", bar.label());
                tendencies.add(bar.tendency());
            }
            CategoryPlot plot = chart.getCategoryPlot();
            plot.getRangeAxis().setLabel(axisLabel);
            chart.setTitle(title);
            plot.getDomainAxis().setMaximumCategoryLabelWidthRatio(0.5f);
            ChartStyle.apply(chart);
            ((BarRenderer) plot.getRenderer()).setBarPainter(new StandardBarPainter());
            ((BarRenderer) plot.getRenderer()).setShadowVisible(false);
        } finally {
            chart.setNotify(true);
        }
    }

    /** Sets the theme's colours again, as after a change of theme. */
    public void style() {
        ChartStyle.apply(chart);
    }

    /** @return the chart itself, for export and for tests */
    public JFreeChart chart() {
        return chart;
    }

    /** Bars coloured by where the change moves the balance; the legend names the colours. */
    private final class TendencyRenderer extends BarRenderer {
        @Override
        public Paint getItemPaint(int row, int column) {
            return column < tendencies.size() ? colour(tendencies.get(column)) : ChartStyle.text();
        }

        @Override
        public LegendItemCollection getLegendItems() {
            LegendItemCollection items = new LegendItemCollection();
            items.add(new LegendItem("towards understeer", colour(Tendency.TOWARDS_UNDERSTEER)));
            items.add(new LegendItem("towards oversteer", colour(Tendency.TOWARDS_OVERSTEER)));
            items.add(new LegendItem("towards understeer below the limit only",
                    colour(Tendency.TOWARDS_UNDERSTEER_BELOW_LIMIT)));
            items.add(new LegendItem("towards oversteer below the limit only",
                    colour(Tendency.TOWARDS_OVERSTEER_BELOW_LIMIT)));
            return items;
        }

        private Color colour(Tendency tendency) {
            return switch (tendency) {
                case TOWARDS_UNDERSTEER -> ChartStyle.series(0);
                case TOWARDS_OVERSTEER -> ChartStyle.series(2);
                case TOWARDS_UNDERSTEER_BELOW_LIMIT -> ChartStyle.series(1);
                case TOWARDS_OVERSTEER_BELOW_LIMIT -> ChartStyle.series(3);
                case NO_CHANGE -> Color.GRAY;
            };
        }
    }
}
