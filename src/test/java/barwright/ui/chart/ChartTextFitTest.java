package barwright.ui.chart;

import barwright.model.AxlePosition;
import barwright.tyrefit.InventedTyreData;
import barwright.tyrefit.TyreFit;
import barwright.tyrefit.TyreFitter;
import barwright.tyrefit.TyreMeasurement;
import barwright.ui.document.Samples;
import barwright.ui.field.ViewSettings;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.AnalysisScheduler;
import barwright.ui.task.CorneringProbe;
import barwright.ui.task.SweepParameter;
import barwright.ui.task.SweepRequest;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.entity.ChartEntity;
import org.jfree.chart.entity.LegendItemEntity;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import javax.swing.JComponent;
import javax.swing.SwingUtilities;
import javax.swing.UIManager;
import javax.swing.plaf.FontUIResource;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The words on a chart stay whole and inside it in the results area of a 1024x768 screen with the largest text
 * (about 590x450 pixels, 28 pt): each legend item, each axis name (made smaller within limits where it is too long,
 * measured along the side it is drawn on) and each marker label (inside its plot, none over another). The charts
 * are painted into an image, so the test runs headless.
 */
class ChartTextFitTest {
    private static final int LARGEST = 28;
    private static final int WIDTH = 590;
    private static final int HEIGHT = 450;
    private static AnalysisOutcome outcome;
    private final ViewSettings view = new ViewSettings(UnitSystem.SI, Locale.UK);
    private Object before;

    @BeforeAll
    static void analyse() throws Exception {
        outcome = AnalysisScheduler.analyse(1, Samples.load(Samples.CLUB_HATCHBACK).vehicle(),
                new SweepRequest(AxlePosition.FRONT, SweepParameter.DIAMETER));
    }

    @BeforeEach
    void largestText() {
        before = UIManager.get("defaultFont");
        UIManager.put("defaultFont", new FontUIResource(Font.SANS_SERIF, Font.PLAIN, LARGEST));
    }

    @AfterEach
    void restore() {
        UIManager.put("defaultFont", before);
    }

    @Test
    void theLoadTransferPartsValueAxisIsMeasuredAlongThePlotsWidth() throws Exception {
        ChartPanel wide = painted(() -> result(new TransferSplitChart(view, new CorneringProbe())), 1400, HEIGHT);
        Axis values = ((CategoryPlot) wide.getChart().getPlot()).getRangeAxis();
        // guards the test itself: the name is long and the plot's height far shorter than it
        double nameLength = wide.getFontMetrics(values.getLabelFont()).stringWidth(values.getLabel());
        assertThat(wide.getChartRenderingInfo().getPlotInfo().getDataArea().getHeight()).isLessThan(nameLength);
        // a horizontal bar chart's value axis lies along the bottom: with the width to hold it, the name keeps the
        // size of the chart's other axis names
        assertThat(values.getLabelFont().getSize2D()).isEqualTo((float) LARGEST);

        ChartPanel narrow = painted(() -> result(new TransferSplitChart(view, new CorneringProbe())), WIDTH, HEIGHT);
        Axis narrowValues = ((CategoryPlot) narrow.getChart().getPlot()).getRangeAxis();
        assertThat(axisNameFaults(narrow)).isEmpty();
        // made smaller to the plot's width, not to its height: at 590 px the 50 characters fit at more than half
        // the size (before, measured against the plot's 230 px height, it fell to the 9 pt floor)
        assertThat(narrowValues.getLabelFont().getSize2D()).isGreaterThan(LARGEST / 2f);
    }

    @Test
    void theHandlingChartsWordsStayInsideIt() throws Exception {
        ChartPanel panel = painted(() -> result(new HandlingChart(view, new CorneringProbe())), WIDTH, HEIGHT);
        assertThat(legendFaults(panel)).isEmpty();
        assertThat(axisNameFaults(panel)).isEmpty();
        assertThat(markerFaults(panel, 2)).isEmpty();
    }

    @Test
    void theBarSweepsWordsStayInsideItAndItsMarkerLabelsApart() throws Exception {
        ChartPanel panel = painted(() -> result(new SweepChart(view, new CorneringProbe())), WIDTH, HEIGHT);
        assertThat(legendFaults(panel)).isEmpty();
        assertThat(axisNameFaults(panel)).isEmpty();
        assertThat(markerFaults(panel, 2)).isEmpty();
    }

    @Test
    void theTyreFitsWordsStayInsideItAlsoOnTheDialogsShortPlot() throws Exception {
        List<TyreMeasurement> data = InventedTyreData.generate(InventedTyreData.SEED);
        TyreFit fit = TyreFitter.fit(data);
        // the results area's size, and the tyre fit dialog's wide chart (legend included) at 1024x768
        for (int[] size : new int[][]{{WIDTH, HEIGHT}, {960, 420}}) {
            ChartPanel panel = painted(() -> {
                TyreFitPanel tyre = new TyreFitPanel("test.tyre");
                tyre.show(fit, data, Quantity.FORCE.unit(UnitSystem.SI));
                return tyre.component();
            }, size[0], size[1]);
            assertThat(legendFaults(panel)).as(size[0] + "x" + size[1]).isEmpty();
            assertThat(axisNameFaults(panel)).as(size[0] + "x" + size[1]).isEmpty();
        }
    }

    private static JComponent result(ResultChart chart) {
        chart.show(outcome, false);
        return chart.component();
    }

    /**
     * Paints the chart's panel at the size a few times over: each drawing lets the panel fit the words to it, and
     * the next drawing shows them fitted.
     */
    private static ChartPanel painted(Supplier<JComponent> make, int width, int height) throws Exception {
        ChartPanel[] panel = new ChartPanel[1];
        SwingUtilities.invokeAndWait(() -> {
            panel[0] = (ChartPanel) make.get();
            panel[0].setSize(width, height);
            panel[0].doLayout();
            BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
            for (int i = 0; i < 4; i++) {
                Graphics2D g = image.createGraphics();
                panel[0].paint(g);
                g.dispose();
            }
        });
        return panel[0];
    }

    /** @return each legend item drawn past the chart's edges (the legend's own entities give where it drew them) */
    private static List<String> legendFaults(ChartPanel panel) {
        ChartRenderingInfo info = panel.getChartRenderingInfo();
        Rectangle2D chart = grown(info.getChartArea());
        List<String> faults = new ArrayList<>();
        int items = 0;
        for (Object each : info.getEntityCollection().getEntities()) {
            if (each instanceof LegendItemEntity item) {
                items++;
                if (!chart.contains(((ChartEntity) item).getArea().getBounds2D())) {
                    faults.add(item.getSeriesKey() + " at " + item.getArea().getBounds2D() + " of " + chart);
                }
            }
        }
        if (items == 0) {
            faults.add("no legend item drawn"); // guards the test itself
        }
        return faults;
    }

    /**
     * @return each axis name longer than its side: an upright axis's name is centred on the plot's height and must
     *         not pass it; a horizontal one's is centred on the plot's width and must stay inside the chart
     */
    private static List<String> axisNameFaults(ChartPanel panel) {
        ChartRenderingInfo info = panel.getChartRenderingInfo();
        PlotRenderingInfo plotInfo = info.getPlotInfo();
        List<String> faults = new ArrayList<>();
        List<Object[]> axes = new ArrayList<>(); // axis, upright, its plot's data area
        if (panel.getChart().getPlot() instanceof CombinedDomainXYPlot combined) {
            boolean vertical = combined.getOrientation() == PlotOrientation.VERTICAL;
            axes.add(new Object[]{combined.getDomainAxis(), !vertical, plotInfo.getDataArea()});
            for (int i = 0; i < combined.getSubplots().size(); i++) {
                XYPlot part = combined.getSubplots().get(i);
                axes.add(new Object[]{part.getRangeAxis(), vertical, plotInfo.getSubplotInfo(i).getDataArea()});
            }
        } else if (panel.getChart().getPlot() instanceof XYPlot xy) {
            boolean vertical = xy.getOrientation() == PlotOrientation.VERTICAL;
            axes.add(new Object[]{xy.getDomainAxis(), !vertical, plotInfo.getDataArea()});
            axes.add(new Object[]{xy.getRangeAxis(), vertical, plotInfo.getDataArea()});
        } else if (panel.getChart().getPlot() instanceof CategoryPlot category) {
            boolean vertical = category.getOrientation() == PlotOrientation.VERTICAL;
            axes.add(new Object[]{category.getDomainAxis(), !vertical, plotInfo.getDataArea()});
            axes.add(new Object[]{category.getRangeAxis(), vertical, plotInfo.getDataArea()});
        }
        Rectangle2D chart = info.getChartArea();
        int named = 0;
        for (Object[] each : axes) {
            Axis axis = (Axis) each[0];
            Rectangle2D plot = (Rectangle2D) each[2];
            if (axis.getLabel() == null || axis.getLabel().isBlank()) {
                continue;
            }
            named++;
            double length = panel.getFontMetrics(axis.getLabelFont()).stringWidth(axis.getLabel());
            boolean fits = (boolean) each[1] ? length <= plot.getHeight()
                    : plot.getCenterX() - length / 2 >= chart.getMinX() && plot.getCenterX() + length / 2 <= chart.getMaxX();
            if (!fits) {
                faults.add("\"" + axis.getLabel() + "\" " + length + " px at " + axis.getLabelFont().getSize2D()
                        + " pt beside " + plot);
            }
            if (axis.getLabelFont().getSize() < AxisNames.SMALLEST_POINTS) {
                faults.add("\"" + axis.getLabel() + "\" at " + axis.getLabelFont().getSize2D() + " pt");
            }
        }
        if (named == 0) {
            faults.add("no axis named"); // guards the test itself
        }
        return faults;
    }

    /** @return each marker label outside its plot or over another, as JFreeChart places it (MarkerLabels.box) */
    private static List<String> markerFaults(ChartPanel panel, int expected) {
        PlotRenderingInfo plotInfo = panel.getChartRenderingInfo().getPlotInfo();
        List<XYPlot> plots = new ArrayList<>();
        List<Rectangle2D> areas = new ArrayList<>();
        if (panel.getChart().getPlot() instanceof CombinedDomainXYPlot combined) {
            for (int i = 0; i < combined.getSubplots().size(); i++) {
                plots.add(combined.getSubplots().get(i));
                areas.add(plotInfo.getSubplotInfo(i).getDataArea());
            }
        } else {
            plots.add(panel.getChart().getXYPlot());
            areas.add(plotInfo.getDataArea());
        }
        List<String> faults = new ArrayList<>();
        List<Rectangle2D> boxes = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int p = 0; p < plots.size(); p++) {
            XYPlot plot = plots.get(p);
            Rectangle2D area = grown(areas.get(p));
            for (boolean domain : new boolean[]{true, false}) {
                var markers = domain ? plot.getDomainMarkers(Layer.FOREGROUND) : plot.getRangeMarkers(Layer.FOREGROUND);
                if (markers == null) {
                    continue;
                }
                for (Object each : markers) {
                    ValueMarker marker = (ValueMarker) each;
                    if (marker.getLabel() == null) {
                        continue;
                    }
                    Rectangle2D box = MarkerLabels.box(plot, marker, domain, areas.get(p),
                            new MarkerLabels.Placement(marker.getLabelAnchor(), marker.getLabelTextAnchor()));
                    if (!area.contains(box)) {
                        faults.add("\"" + marker.getLabel() + "\" at " + box + " outside " + area);
                    }
                    for (int i = 0; i < boxes.size(); i++) {
                        if (boxes.get(i).intersects(box)) {
                            faults.add("\"" + marker.getLabel() + "\" over \"" + names.get(i) + "\"");
                        }
                    }
                    boxes.add(box);
                    names.add(marker.getLabel());
                }
            }
        }
        if (boxes.size() != expected) {
            faults.add(boxes.size() + " labels of " + expected + ": " + names); // guards the test itself
        }
        return faults;
    }

    /** @return the area a pixel larger all round: text bounds are measured in fractions of a pixel */
    private static Rectangle2D grown(Rectangle2D area) {
        return new Rectangle2D.Double(area.getX() - 1, area.getY() - 1, area.getWidth() + 2, area.getHeight() + 2);
    }
}
