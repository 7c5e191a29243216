package barwright.ui.chart;

import barwright.io.AtomicFileWriter;
import barwright.io.FileWriteException;
import org.jfree.svg.SVGGraphics2D;

import javax.imageio.ImageIO;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.Locale;
import java.util.function.Consumer;

/**
 * Writes a picture the window draws itself with Java2D (not a JFreeChart chart) to a PNG or SVG file, at the
 * charts' export size and atomically, as {@link ChartExport} does for the charts. The SVG goes through the same
 * JFreeSVG as the charts' SVG, which is why this lives here.
 */
public final class DrawingExport {
    private DrawingExport() {
    }

    /**
     * @param painter draws the picture on a graphics of {@link ChartExport#WIDTH} by {@link ChartExport#HEIGHT}
     * @param target  the file: .svg writes SVG, anything else PNG
     */
    public static void write(Consumer<Graphics2D> painter, Path target) throws FileWriteException {
        if (target.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".svg")) {
            SVGGraphics2D graphics = new SVGGraphics2D(ChartExport.WIDTH, ChartExport.HEIGHT);
            painter.accept(graphics);
            AtomicFileWriter.writeText(target, graphics.getSVGDocument());
            return;
        }
        BufferedImage image = new BufferedImage(ChartExport.WIDTH, ChartExport.HEIGHT, BufferedImage.TYPE_INT_RGB);
        Graphics2D graphics = image.createGraphics();
        try {
            painter.accept(graphics);
        } finally {
            graphics.dispose();
        }
        AtomicFileWriter.write(target, out -> ImageIO.write(image, "png", out));
    }
}
