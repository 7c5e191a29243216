package barwright.ui.chart;

import barwright.model.AxlePosition;
import barwright.physics.LoadTransferParts;
import barwright.ui.field.ViewSettings;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.CorneringProbe;
import barwright.units.Quantity;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.labels.StandardCategoryItemLabelGenerator;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.renderer.category.StackedBarRenderer;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.data.category.DefaultCategoryDataset;

import java.text.NumberFormat;

/** Each axle's lateral load transfer per g, split into its unsprung, geometric and elastic parts. */
public final class TransferSplitChart extends ResultChart {
    private final DefaultCategoryDataset data;

    public TransferSplitChart(ViewSettings view, CorneringProbe probe) {
        this(view, probe, new DefaultCategoryDataset());
    }

    private TransferSplitChart(ViewSettings view, CorneringProbe probe, DefaultCategoryDataset data) {
        super(view, probe, ChartFactory.createStackedBarChart("Load transfer parts", "", "", data,
                PlotOrientation.HORIZONTAL, true, true, false), "chart.transfer");
        this.data = data;
        StackedBarRenderer renderer = (StackedBarRenderer) chart().getCategoryPlot().getRenderer();
        renderer.setBarPainter(new StandardBarPainter());
        renderer.setShadowVisible(false);
        renderer.setMaximumBarWidth(0.3);
        renderer.setSeriesPaint(0, ChartStyle.series(4));
        renderer.setSeriesPaint(1, ChartStyle.series(5));
        renderer.setSeriesPaint(2, ChartStyle.series(0));
        renderer.setDefaultItemLabelsVisible(true);
    }

    @Override
    public String title() {
        return "Load transfer parts";
    }

    @Override
    public String fileStem() {
        return "load-transfer-parts";
    }

    @Override
    protected void fill(AnalysisOutcome outcome) {
        data.clear();
        for (AxlePosition axle : AxlePosition.values()) {
            LoadTransferParts parts = outcome.result().axle(axle).loadTransfer();
            String category = axle == AxlePosition.FRONT ? "Front axle" : "Rear axle";
            data.addValue(Axes.shown(parts.unsprung(), Quantity.FORCE_PER_G, view), "Unsprung (wheels, hubs)", category);
            data.addValue(Axes.shown(parts.geometric(), Quantity.FORCE_PER_G, view),
                    "Geometric (through the roll centre)", category);
            data.addValue(Axes.shown(parts.elastic(), Quantity.FORCE_PER_G, view),
                    "Elastic (through springs, bar, tyres)", category);
        }
        CategoryPlot plot = chart().getCategoryPlot();
        NumberFormat whole = NumberFormat.getIntegerInstance(view.locale());
        whole.setGroupingUsed(false);
        plot.getRenderer().setDefaultItemLabelGenerator(new StandardCategoryItemLabelGenerator("{2}", whole));
        plot.getRenderer().setDefaultItemLabelPaint(java.awt.Color.WHITE);
        chart().getTitle().setText(String.format(view.locale(), "Load moved to the outside wheels per g (front share %.1f %%)",
                outcome.result().frontLoadTransferShare() * 100));
        plot.getRangeAxis().setLabel(Axes.label("Load transfer per g of lateral acceleration", Quantity.FORCE_PER_G,
                view));
    }
}
