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
        fitWords(chart);
        AtomicFileWriter.write(target, out -> ChartUtils.writeChartAsPNG(out, chart, WIDTH, HEIGHT));
    }

    public static void svg(JFreeChart chart, Path target) throws FileWriteException {
        fitWords(chart);
        SVGGraphics2D graphics = new SVGGraphics2D(WIDTH, HEIGHT);
        chart.draw(graphics, new Rectangle(0, 0, WIDTH, HEIGHT));
        AtomicFileWriter.writeText(target, graphics.getSVGDocument());
    }

    /**
     * Draws the chart once at the file's size and fits its words to that drawing, as a panel on screen does
     * ({@link FittingChartPanel}): names shrunk for a small window are drawn at their own size in the file. The
     * window's panel fits them to the screen again at its next drawing.
     */
    private static void fitWords(JFreeChart chart) {
        java.awt.image.BufferedImage scratch = new java.awt.image.BufferedImage(WIDTH, HEIGHT,
                java.awt.image.BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D graphics = scratch.createGraphics();
        try {
            org.jfree.chart.ChartRenderingInfo info = new org.jfree.chart.ChartRenderingInfo();
            chart.draw(graphics, new Rectangle(0, 0, WIDTH, HEIGHT), info);
            FittingChartPanel.fitWords(chart, info, new javax.swing.JPanel());
        } finally {
            graphics.dispose();
        }
    }

    /** Writes PNG or SVG by the file name's ending (.svg: SVG; anything else: PNG). */
    public static void write(JFreeChart chart, Path target) throws FileWriteException {
        if (target.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".svg")) {
            svg(chart, target);
        } else {
            png(chart, target);
        }
    }

    /** A picture drawn by the program itself (not a chart) that can be written at any size. */
    @FunctionalInterface
    public interface Picture {
        /** Draws the picture into the graphics, filling width x height (pixels, or SVG user units). */
        void paint(java.awt.Graphics2D graphics, int width, int height);
    }

    /**
     * Writes a picture as PNG or SVG by the file name's ending (.svg: SVG; anything else: PNG), at the size
     * charts are exported at, atomically.
     */
    public static void write(Picture picture, Path target) throws FileWriteException {
        if (target.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".svg")) {
            SVGGraphics2D graphics = new SVGGraphics2D(WIDTH, HEIGHT);
            picture.paint(graphics, WIDTH, HEIGHT);
            AtomicFileWriter.writeText(target, graphics.getSVGDocument());
        } else {
            java.awt.image.BufferedImage image = new java.awt.image.BufferedImage(WIDTH, HEIGHT,
                    java.awt.image.BufferedImage.TYPE_INT_RGB);
            java.awt.Graphics2D graphics = image.createGraphics();
            try {
                picture.paint(graphics, WIDTH, HEIGHT);
            } finally {
                graphics.dispose();
            }
            AtomicFileWriter.write(target, out -> javax.imageio.ImageIO.write(image, "png", out));
        }
    }

    /** Writes one of the window's charts as PNG or SVG by the file name's ending, as {@link #write(JFreeChart, Path)}. */
    public static void write(ResultChart chart, Path target) throws FileWriteException {
        write(chart.chart(), target);
    }
}
