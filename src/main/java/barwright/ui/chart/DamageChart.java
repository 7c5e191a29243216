package barwright.ui.chart;

import barwright.physics.fatigue.DamageByRange;
import barwright.units.DisplayUnit;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import javax.swing.JComponent;
import java.awt.Dimension;

/**
 * A bar's fatigue damage of one lap by cycle range (docs/model.md 13): each bin's share of the lap's damage, so
 * the corners that wear the bar stand out. Event thread.
 */
public final class DamageChart {
    private final XYSeriesCollection data = new XYSeriesCollection();
    private final JFreeChart chart;
    private final ChartPanel panel;

    /** @param name the component name (for tests and screenshots) */
    public DamageChart(String name) {
        chart = ChartFactory.createXYBarChart("Damage of one lap by cycle range", "Stress range", false,
                "Share of the lap's damage (%)", data, PlotOrientation.VERTICAL, true, true, false);
        ChartStyle.apply(chart);
        panel = ChartStyle.panel(chart, name);
        panel.setPreferredSize(new Dimension(420, 240));
        panel.setMinimumSize(new Dimension(240, 220)); // a form short of room must not squash it to a line
    }

    public JComponent component() {
        return panel;
    }

    /** Draws the bins in the chosen units; with no damage the bars are all zero and the title says so. */
    public void show(DamageByRange byRange, UnitSystem units) {
        DisplayUnit stress = Quantity.STRESS.unit(units);
        double total = 0;
        for (double damage : byRange.damage()) {
            total += damage;
        }
        XYSeries shares = new XYSeries("damage (Miner sum) in the bin", false);
        for (int i = 0; i < byRange.damage().length; i++) {
            double middle = (i + 0.5) * byRange.binWidth();
            shares.add(stress.fromSi(middle), total > 0 ? 100 * byRange.damage()[i] / total : 0);
        }
        data.removeAllSeries();
        data.addSeries(shares);
        data.setIntervalWidth(stress.fromSi(byRange.binWidth()) * 0.9);
        XYPlot plot = chart.getXYPlot();
        XYBarRenderer renderer = new XYBarRenderer();
        renderer.setShadowVisible(false);
        renderer.setSeriesPaint(0, ChartStyle.series(0));
        plot.setRenderer(renderer);
        plot.getDomainAxis().setLabel("Stress range of the cycle, nominal (" + stress.symbol() + ")");
        plot.getRangeAxis().setLabel("Share of the lap's damage (%)");
        if (total > 0) {
            plot.getRangeAxis().setAutoRange(true);
        } else {
            plot.getRangeAxis().setRange(0, 100); // nothing to share out: an empty 0-100 % scale, not a noise scale
        }
        chart.setTitle(total > 0 ? "Damage of one lap by cycle range"
                : "No cycle reaches the endurance limit: no damage");
    }

    public void clear() {
        data.removeAllSeries();
    }
}
