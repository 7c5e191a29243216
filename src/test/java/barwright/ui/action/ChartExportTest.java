package barwright.ui.action;

import barwright.model.AxlePosition;
import barwright.ui.ScriptedDialogs;
import barwright.ui.chart.WheelLoadChart;
import barwright.ui.document.Samples;
import barwright.ui.field.ViewSettings;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.AnalysisScheduler;
import barwright.ui.task.CorneringProbe;
import barwright.ui.task.SweepParameter;
import barwright.ui.task.SweepRequest;
import barwright.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.imageio.ImageIO;
import javax.swing.SwingUtilities;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Chart export, without a window: PNG and SVG files, with the axis units of the chosen system. Needs no display
 * (the chart is drawn into an image), so it runs headless too.
 */
class ChartExportTest {
    @Test
    void aChartIsWrittenAsPngAndAsSvgInTheUnitsShown(@TempDir Path folder) throws Exception {
        ScriptedDialogs dialogs = new ScriptedDialogs();
        FileCommands files = new FileCommands(Samples.open(Samples.CLUB_HATCHBACK), dialogs,
                new RecentFiles(Settings.inMemory()));
        AnalysisOutcome outcome = AnalysisScheduler.analyse(1, Samples.load(Samples.CLUB_HATCHBACK).vehicle(),
                new SweepRequest(AxlePosition.FRONT, SweepParameter.DIAMETER));
        ViewSettings view = new ViewSettings(UnitSystem.US, Locale.US);
        WheelLoadChart[] chart = new WheelLoadChart[1];
        SwingUtilities.invokeAndWait(() -> {
            chart[0] = new WheelLoadChart(view, new CorneringProbe());
            chart[0].show(outcome, false);
        });
        dialogs.filesToSave.add(folder.resolve("loads.png"));
        dialogs.filesToSave.add(folder.resolve("loads"));
        SwingUtilities.invokeAndWait(() -> {
            files.exportChart(chart[0], "png");
            files.exportChart(chart[0], "svg");
        });
        assertThat(dialogs.errors).isEmpty();
        BufferedImage png = ImageIO.read(folder.resolve("loads.png").toFile());
        assertThat(png.getWidth()).isEqualTo(1200);
        assertThat(png.getHeight()).isEqualTo(800);
        String svg = Files.readString(folder.resolve("loads.svg"));
        assertThat(svg).contains("<svg").contains("Lateral acceleration a_y (g)").contains("Front outside (right)");
        // the upright axis label is written as glyph outlines by JFreeSVG, so read it from the chart drawn
        assertThat(chart[0].chart().getXYPlot().getRangeAxis().getLabel())
                .isEqualTo("Vertical load on the wheel (lbf)");
    }
}
