package barwright.ui.chart;

import barwright.io.VehicleFileWriter;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;

import java.awt.Rectangle;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Writes a chart to a PNG or SVG file, atomically (a failed export leaves any old file whole). */
public final class ChartExport {
    /** The size charts are exported at (pixels, or SVG user units). */
    public static final int WIDTH = 1200;
    public static final int HEIGHT = 800;

    private ChartExport() {
    }

    public static void png(JFreeChart chart, Path target) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path temporary = Files.createTempFile(absolute.getParent(), "." + absolute.getFileName(), ".tmp");
        try {
            try (OutputStream out = Files.newOutputStream(temporary)) {
                ChartUtils.writeChartAsPNG(out, chart, WIDTH, HEIGHT);
            }
            Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(temporary);
        }
    }

    public static void svg(JFreeChart chart, Path target) throws IOException {
        SVGGraphics2D graphics = new SVGGraphics2D(WIDTH, HEIGHT);
        chart.draw(graphics, new Rectangle(0, 0, WIDTH, HEIGHT));
        VehicleFileWriter.writeAtomically(target, graphics.getSVGDocument());
    }

    /** Writes PNG or SVG by the file name's ending (.svg: SVG; anything else: PNG). */
    public static void write(JFreeChart chart, Path target) throws IOException {
        if (target.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith(".svg")) {
            svg(chart, target);
        } else {
            png(chart, target);
        }
    }
}
