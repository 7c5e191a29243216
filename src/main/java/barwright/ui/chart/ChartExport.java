package barwright.ui.chart;

import barwright.io.AtomicFileWriter;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;

import java.awt.Rectangle;
import barwright.io.FileWriteException;
import java.nio.file.Path;
import java.util.Locale;

/** Writes a chart to a PNG or SVG file, atomically (a failed export leaves any old file whole). */
public final class ChartExport {
    /** The size charts are exported at (pixels, or SVG user units). */
    public static final int WIDTH = 1200;
    public static final int HEIGHT = 800;

    private ChartExport() {
    }

    public static void png(JFreeChart chart, Path target) throws FileWriteException {
        AtomicFileWriter.write(target, out -> ChartUtils.writeChartAsPNG(out, chart, WIDTH, HEIGHT));
    }

    public static void svg(JFreeChart chart, Path target) throws FileWriteException {
        SVGGraphics2D graphics = new SVGGraphics2D(WIDTH, HEIGHT);
        chart.draw(graphics, new Rectangle(0, 0, WIDTH, HEIGHT));
        AtomicFileWriter.writeText(target, graphics.getSVGDocument());
    }

    /** Writes PNG or SVG by the file name's ending (.svg: SVG; anything else: PNG). */
    public static void write(JFreeChart chart, Path target) throws FileWriteException {
        if (target.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".svg")) {
            svg(chart, target);
        } else {
            png(chart, target);
        }
    }

    /** Writes one of the window's charts as PNG or SVG by the file name's ending, as {@link #write(JFreeChart, Path)}. */
    public static void write(ResultChart chart, Path target) throws FileWriteException {
        write(chart.chart(), target);
    }
}
