package barwright.ui.chart;

import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.LegendItemSource;
import org.jfree.chart.title.LegendTitle;

import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;

/**
 * Breaks a legend item's words over lines where one line would be wider than the chart: JFreeChart draws a legend
 * item on one line and cuts it at the chart's edge ("Front minus rear slip angle (above zero: u"). The legend's
 * sources are wrapped once; after each drawing the room is set from the chart's width, and the legend redrawn only
 * where that changes a line break. Event thread.
 */
final class LegendLines implements LegendItemSource {
    /** Width kept for the item's line or shape and the gaps around it, in multiples of the font's size. */
    private static final double GRAPHIC_IN_EMS = 1.6;
    /** Room kept free beside the legend (pixels): its padding and margins. */
    private static final int MARGINS = 12;
    private static final FontMetricsSource METRICS = new FontMetricsSource();

    private final LegendItemSource[] sources;
    private final LegendTitle legend;
    private double room = Double.MAX_VALUE;

    private LegendLines(LegendTitle legend) {
        this.legend = legend;
        this.sources = legend.getSources();
    }

    /** Fits each legend of the chart to the width of the chart as it was last drawn. */
    static void fit(JFreeChart chart, ChartRenderingInfo info) {
        double width = info.getChartArea().getWidth();
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            if (chart.getSubtitle(i) instanceof LegendTitle legend) {
                LegendLines lines = legend.getSources().length == 1 && legend.getSources()[0] instanceof LegendLines
                        known ? known : install(legend);
                lines.setRoom(width - MARGINS);
            }
        }
    }

    private static LegendLines install(LegendTitle legend) {
        LegendLines lines = new LegendLines(legend);
        legend.setSources(new LegendItemSource[]{lines});
        return lines;
    }

    private void setRoom(double width) {
        List<String> before = labels();
        room = width;
        if (!labels().equals(before)) {
            legend.setSources(legend.getSources()); // the same source: lays the legend out and redraws it
        }
    }

    private List<String> labels() {
        List<String> labels = new ArrayList<>();
        LegendItemCollection items = getLegendItems();
        for (int i = 0; i < items.getItemCount(); i++) {
            labels.add(items.get(i).getLabel());
        }
        return labels;
    }

    @Override
    public LegendItemCollection getLegendItems() {
        LegendItemCollection items = new LegendItemCollection();
        for (LegendItemSource source : sources) {
            LegendItemCollection from = source.getLegendItems();
            for (int i = 0; i < from.getItemCount(); i++) {
                items.add(fitted(from.get(i)));
            }
        }
        return items;
    }

    private LegendItem fitted(LegendItem item) {
        Font font = item.getLabelFont() != null ? item.getLabelFont() : legend.getItemFont();
        double lineWidth = room - GRAPHIC_IN_EMS * font.getSize2D();
        String broken = broken(item.getLabel(), METRICS.of(font), lineWidth);
        return broken.equals(item.getLabel()) ? item : relabelled(item, broken);
    }

    /** @return the words in lines no wider than the width (a single word wider than it stands alone) */
    static String broken(String words, FontMetrics metrics, double width) {
        if (words == null || metrics.stringWidth(words) <= width) {
            return words;
        }
        StringBuilder lines = new StringBuilder();
        StringBuilder line = new StringBuilder();
        for (String word : words.split(" ")) {
            String longer = line.length() == 0 ? word : line + " " + word;
            if (line.length() > 0 && metrics.stringWidth(longer) > width) {
                lines.append(line).append('\n');
                line.setLength(0);
                line.append(word);
            } else {
                line.setLength(0);
                line.append(longer);
            }
        }
        return lines.append(line).toString();
    }

    /** @return a copy of the item with another label: the same colour, shape, line and series */
    private static LegendItem relabelled(LegendItem item, String label) {
        LegendItem copy = new LegendItem(label, item.getDescription(), item.getToolTipText(), item.getURLText(),
                item.isShapeVisible(), item.getShape(), item.isShapeFilled(), item.getFillPaint(),
                item.isShapeOutlineVisible(), item.getOutlinePaint(), item.getOutlineStroke(), item.isLineVisible(),
                item.getLine(), item.getLineStroke(), item.getLinePaint());
        copy.setLabelFont(item.getLabelFont());
        copy.setLabelPaint(item.getLabelPaint());
        copy.setDataset(item.getDataset());
        copy.setDatasetIndex(item.getDatasetIndex());
        copy.setSeriesKey(item.getSeriesKey());
        copy.setSeriesIndex(item.getSeriesIndex());
        copy.setFillPaintTransformer(item.getFillPaintTransformer());
        return copy;
    }

    /** Font metrics without a window: the legend is laid out while the chart draws, on screen or into a file. */
    private static final class FontMetricsSource {
        private final java.awt.Graphics2D graphics = new BufferedImage(1, 1, BufferedImage.TYPE_INT_ARGB)
                .createGraphics();

        FontMetrics of(Font font) {
            return graphics.getFontMetrics(font);
        }
    }
}
