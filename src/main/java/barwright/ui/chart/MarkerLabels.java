package barwright.ui.chart;

import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.text.TextUtils;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.LengthAdjustmentType;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;

import java.awt.Graphics2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;

/**
 * Keeps the labels of a plot's markers inside the plot and clear of one another. JFreeChart puts a label where its
 * chart asked, and on a short plot with a large text a level line's label near the top ran off it ("static front
 * weight" cut at the top, over "on the car now"). After each drawing each label's box is worked out as JFreeChart
 * draws it; where the present placement leaves a label outside the plot or over another, the labels move to
 * the first of the other sides of their lines (left or right of a vertical line, above or below a horizontal one,
 * at either end) that keeps them all inside and apart. Event thread.
 */
final class MarkerLabels {
    private static final Graphics2D MEASURE = new BufferedImage(1, 1, BufferedImage.TYPE_INT_ARGB).createGraphics();
    /** More combinations than this are not searched: the chart's own placement stays. */
    private static final int MOST_TRIES = 4096;

    private MarkerLabels() {
    }

    /** Where a label stands against its marker's line: the anchor on the line and the text's own anchor. */
    record Placement(RectangleAnchor anchor, TextAnchor text) {
    }

    /** A labelled marker of a plot, drawn over the given data area. */
    private record Labelled(XYPlot plot, ValueMarker marker, boolean domain, Rectangle2D area) {
    }

    /** Moves labels where the chart's own placement leaves one outside its plot or over another. */
    static void place(Plot plot, PlotRenderingInfo info) {
        List<Labelled> labels = new ArrayList<>();
        if (plot instanceof CombinedDomainXYPlot combined) {
            List<XYPlot> parts = combined.getSubplots();
            for (int i = 0; i < parts.size() && i < info.getSubplotCount(); i++) {
                collect(parts.get(i), info.getSubplotInfo(i).getDataArea(), labels);
            }
        } else if (plot instanceof XYPlot xy) {
            collect(xy, info.getDataArea(), labels);
        }
        if (labels.isEmpty()) {
            return;
        }
        List<Placement> chosen = best(labels);
        for (int i = 0; i < labels.size(); i++) {
            ValueMarker marker = labels.get(i).marker();
            Placement placement = chosen.get(i);
            if (marker.getLabelAnchor() != placement.anchor() || marker.getLabelTextAnchor() != placement.text()) {
                marker.setLabelAnchor(placement.anchor()); // redraws; the data area does not depend on it
                marker.setLabelTextAnchor(placement.text());
            }
        }
    }

    private static void collect(XYPlot plot, Rectangle2D area, List<Labelled> into) {
        if (area == null) {
            return;
        }
        for (boolean domain : new boolean[]{true, false}) {
            for (Layer layer : new Layer[]{Layer.FOREGROUND, Layer.BACKGROUND}) {
                Collection<?> markers = domain ? plot.getDomainMarkers(layer) : plot.getRangeMarkers(layer);
                if (markers == null) {
                    continue;
                }
                for (Object each : markers) {
                    if (each instanceof ValueMarker marker && marker.getLabel() != null && !marker.getLabel().isBlank()
                            && axis(plot, domain) != null
                            && axis(plot, domain).getRange().contains(marker.getValue())) {
                        into.add(new Labelled(plot, marker, domain, area));
                    }
                }
            }
        }
    }

    /**
     * @return a placement for each label: where they are now if they are all inside and apart (the chart's own
     *         placement, the charts making their markers anew with their data), else the first combination that
     *         is, each label's present place tried first; else the one with the fewest faults
     */
    private static List<Placement> best(List<Labelled> labels) {
        List<List<Placement>> choices = new ArrayList<>();
        long combinations = 1;
        for (Labelled label : labels) {
            ValueMarker marker = label.marker();
            List<Placement> own = new ArrayList<>(List.of(new Placement(marker.getLabelAnchor(),
                    marker.getLabelTextAnchor())));
            for (Placement other : sides(label.domain(), label.plot().getOrientation())) {
                if (!own.contains(other)) {
                    own.add(other);
                }
            }
            choices.add(own);
            combinations *= own.size();
        }
        int[] pick = new int[labels.size()];
        int[] best = pick.clone();
        int fewest = Integer.MAX_VALUE;
        for (long tried = 0; tried < Math.min(combinations, MOST_TRIES); tried++) {
            int faults = faults(labels, choices, pick);
            if (faults < fewest) {
                fewest = faults;
                best = pick.clone();
            }
            if (faults == 0) {
                break;
            }
            next(pick, choices);
        }
        List<Placement> chosen = new ArrayList<>();
        for (int i = 0; i < labels.size(); i++) {
            chosen.add(choices.get(i).get(best[i]));
        }
        return chosen;
    }

    /** Counts on to the next combination, the last label's choice changing first. */
    private static void next(int[] pick, List<List<Placement>> choices) {
        for (int i = pick.length - 1; i >= 0; i--) {
            pick[i]++;
            if (pick[i] < choices.get(i).size()) {
                return;
            }
            pick[i] = 0;
        }
    }

    /** @return the labels outside their plot plus the pairs that overlap, for one combination */
    private static int faults(List<Labelled> labels, List<List<Placement>> choices, int[] pick) {
        List<Rectangle2D> boxes = new ArrayList<>();
        int faults = 0;
        for (int i = 0; i < labels.size(); i++) {
            Rectangle2D box = box(labels.get(i), choices.get(i).get(pick[i]));
            Rectangle2D area = labels.get(i).area();
            // a pixel's leeway for rounding
            if (box.getMinX() < area.getMinX() - 1 || box.getMaxX() > area.getMaxX() + 1
                    || box.getMinY() < area.getMinY() - 1 || box.getMaxY() > area.getMaxY() + 1) {
                faults++;
            }
            for (Rectangle2D other : boxes) {
                if (other.intersects(box)) {
                    faults++;
                }
            }
            boxes.add(box);
        }
        return faults;
    }

    /**
     * @return the places a label may take against its line: for a line across the plot's width (a value marker on
     *         the vertical axis) above or below it at either end; for a line up the plot, left or right of it at
     *         the top or the bottom
     */
    private static List<Placement> sides(boolean domain, PlotOrientation orientation) {
        boolean upright = domain == (orientation == PlotOrientation.VERTICAL);
        if (upright) {
            return List.of(new Placement(RectangleAnchor.TOP_RIGHT, TextAnchor.TOP_LEFT),
                    new Placement(RectangleAnchor.TOP_LEFT, TextAnchor.TOP_RIGHT),
                    new Placement(RectangleAnchor.BOTTOM_RIGHT, TextAnchor.BOTTOM_LEFT),
                    new Placement(RectangleAnchor.BOTTOM_LEFT, TextAnchor.BOTTOM_RIGHT));
        }
        return List.of(new Placement(RectangleAnchor.TOP_LEFT, TextAnchor.BOTTOM_LEFT),
                new Placement(RectangleAnchor.BOTTOM_LEFT, TextAnchor.TOP_LEFT),
                new Placement(RectangleAnchor.TOP_RIGHT, TextAnchor.BOTTOM_RIGHT),
                new Placement(RectangleAnchor.BOTTOM_RIGHT, TextAnchor.TOP_RIGHT));
    }

    /**
     * @return the label's box as JFreeChart's XY renderers draw it (AbstractXYItemRenderer.drawDomainMarker and
     *         drawRangeMarker in JFreeChart 1.5): the line's bounds widened across the line by the label offset
     *         and narrowed along it, the anchor's point on that, and the text aligned there
     */
    static Rectangle2D box(XYPlot plot, ValueMarker marker, boolean domain, Rectangle2D area, Placement placement) {
        boolean vertical = plot.getOrientation() == PlotOrientation.VERTICAL;
        ValueAxis axis = axis(plot, domain);
        double at = axis.valueToJava2D(marker.getValue(), area,
                domain ? plot.getDomainAxisEdge() : plot.getRangeAxisEdge());
        boolean upright = domain == vertical; // the line runs up the plot
        Rectangle2D line = upright ? new Rectangle2D.Double(at, area.getMinY(), 0, area.getHeight())
                : new Rectangle2D.Double(area.getMinX(), at, area.getWidth(), 0);
        Rectangle2D anchorArea = upright
                ? marker.getLabelOffset().createAdjustedRectangle(line, LengthAdjustmentType.EXPAND,
                        LengthAdjustmentType.CONTRACT)
                : marker.getLabelOffset().createAdjustedRectangle(line, LengthAdjustmentType.CONTRACT,
                        LengthAdjustmentType.EXPAND);
        Point2D point = placement.anchor().getAnchorPoint(anchorArea);
        MEASURE.setFont(marker.getLabelFont());
        return TextUtils.calcAlignedStringBounds(marker.getLabel(), MEASURE, (float) point.getX(),
                (float) point.getY(), placement.text());
    }

    private static Rectangle2D box(Labelled label, Placement placement) {
        return box(label.plot(), label.marker(), label.domain(), label.area(), placement);
    }

    private static ValueAxis axis(XYPlot plot, boolean domain) {
        return domain ? plot.getDomainAxis() : plot.getRangeAxis();
    }
}
