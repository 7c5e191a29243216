package barwright.report.sheet;

import barwright.physics.curve.Chart;
import barwright.physics.curve.Series;
import barwright.units.DisplayUnit;
import barwright.units.UnitSystem;

import java.io.IOException;
import java.util.Locale;

/** A line chart drawn as vector lines: axes with round-number ticks, one coloured line per series, a legend. */
final class ChartDrawing {
    /** Line colours (red, green, blue), told apart also by their dash patterns. */
    private static final float[][] COLOURS = {
            {0.10f, 0.30f, 0.65f}, {0.80f, 0.40f, 0.05f}, {0.15f, 0.55f, 0.30f}, {0.55f, 0.15f, 0.55f},
            {0.45f, 0.45f, 0.45f}, {0.70f, 0.10f, 0.15f}, {0.05f, 0.55f, 0.60f}, {0.50f, 0.40f, 0.10f}};
    private static final float[][] DASHES = {{0, 0}, {5, 2}, {1.5f, 1.5f}, {6, 2}};

    private ChartDrawing() {
    }

    static void draw(PdfCanvas canvas, Chart chart, UnitSystem units, float x, float y, float width, float height)
            throws IOException {
        DisplayUnit xUnit = chart.x().unit(units);
        DisplayUnit yUnit = chart.y().unit(units);
        double xMin = 0;
        double xMax = Double.NEGATIVE_INFINITY;
        double yMin = Double.POSITIVE_INFINITY;
        double yMax = Double.NEGATIVE_INFINITY;
        for (Series series : chart.series()) {
            for (double value : series.x()) {
                xMax = Math.max(xMax, xUnit.fromSi(value));
            }
            for (double value : series.y()) {
                yMin = Math.min(yMin, yUnit.fromSi(value));
                yMax = Math.max(yMax, yUnit.fromSi(value));
            }
        }
        if (!(xMax > xMin)) {
            xMax = xMin + 1;
        }
        yMin = Math.min(yMin, 0);
        if (!(yMax > yMin)) {
            yMax = yMin + 1;
        }
        double xStep = niceStep(xMax - xMin);
        double yStep = niceStep(yMax - yMin);
        xMax = Math.ceil(xMax / xStep) * xStep;
        yMin = Math.floor(yMin / yStep) * yStep;
        yMax = Math.ceil(yMax / yStep) * yStep;

        float left = x + 38;
        float bottom = y + 24;
        float plotWidth = width - 46;
        float legendHeight = 8 * chart.series().size();
        float plotHeight = height - 44 - legendHeight;
        canvas.black();
        canvas.text(chart.title(), x, y + height - 9, PdfCanvas.BOLD, 8.5f);
        canvas.lineWidth(0.5f);
        canvas.dash(0, 0);
        canvas.rectangle(left, bottom, plotWidth, plotHeight);
        for (double tick = xMin; tick <= xMax + xStep / 2; tick += xStep) {
            float px = left + (float) ((tick - xMin) / (xMax - xMin)) * plotWidth;
            canvas.line(px, bottom, px, bottom - 2);
            canvas.textCentred(tickText(tick, xStep), px, bottom - 9, PdfCanvas.REGULAR, 6.5f);
        }
        for (double tick = yMin; tick <= yMax + yStep / 2; tick += yStep) {
            float py = bottom + (float) ((tick - yMin) / (yMax - yMin)) * plotHeight;
            canvas.line(left, py, left - 2, py);
            canvas.textRight(tickText(tick, yStep), left - 3, py - 2, PdfCanvas.REGULAR, 6.5f);
        }
        canvas.textCentred(chart.xLabel() + " (" + xUnit.symbol() + ")", left + plotWidth / 2, y + 2,
                PdfCanvas.REGULAR, 7);
        canvas.text(chart.yLabel() + " (" + yUnit.symbol() + ")", left + 4, bottom + plotHeight - 9,
                PdfCanvas.REGULAR, 7);
        // the legend sits between the title and the plot, where no line can run under it
        float legendY = bottom + plotHeight + legendHeight - 6;
        for (int s = 0; s < chart.series().size(); s++) {
            Series series = chart.series().get(s);
            float[] colour = COLOURS[s % COLOURS.length];
            float[] dash = DASHES[(s / 2) % DASHES.length];
            double[] xs = series.x();
            double[] ys = series.y();
            float[] px = new float[xs.length];
            float[] py = new float[ys.length];
            for (int i = 0; i < xs.length; i++) {
                px[i] = left + (float) ((xUnit.fromSi(xs[i]) - xMin) / (xMax - xMin)) * plotWidth;
                py[i] = bottom + (float) ((yUnit.fromSi(ys[i]) - yMin) / (yMax - yMin)) * plotHeight;
            }
            canvas.colour(colour[0], colour[1], colour[2]);
            canvas.lineWidth(1.1f);
            canvas.dash(dash[0], dash[1]);
            canvas.polyline(px, py);
            canvas.line(left + 6, legendY + 2, left + 20, legendY + 2);
            canvas.dash(0, 0);
            canvas.text(series.name(), left + 23, legendY, PdfCanvas.REGULAR, 6.5f);
            legendY -= 8;
        }
        canvas.black();
        canvas.lineWidth(0.5f);
    }

    /** @return 1, 2 or 5 times a power of ten, giving about five intervals over the range */
    static double niceStep(double range) {
        double rough = range / 5;
        double power = Math.pow(10, Math.floor(Math.log10(rough)));
        double fraction = rough / power;
        return (fraction < 1.5 ? 1 : fraction < 3.5 ? 2 : fraction < 7.5 ? 5 : 10) * power;
    }

    private static String tickText(double value, double step) {
        int decimals = Math.max(0, (int) Math.ceil(-Math.log10(step) + 1e-9));
        return String.format(Locale.ROOT, "%." + decimals + "f", Math.abs(value) < step / 1e6 ? 0 : value);
    }
}
