package barwright.ui.chart;

import barwright.model.AxlePosition;
import barwright.ui.document.Samples;
import barwright.ui.field.ViewSettings;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.AnalysisScheduler;
import barwright.ui.task.CorneringProbe;
import barwright.ui.task.SweepParameter;
import barwright.ui.task.SweepRequest;
import barwright.units.UnitSystem;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.plot.Marker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.ui.Layer;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import javax.swing.SwingUtilities;
import javax.swing.UIManager;
import javax.swing.plaf.FontUIResource;
import java.awt.Font;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Words drawn on a chart (marker labels, text and pointer annotations such as "inside rear lifts at ...") follow
 * the window's text size as the axes' tick labels do: with the largest text (28 pt) they are as large as the tick
 * labels, not JFreeChart's fixed 9 pt. Builds the charts without a window (headless is fine).
 */
class ChartLabelSizeTest {
    private static final int LARGEST = 28;
    private Object before;

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
    void theLiftPointersAreAsLargeAsTheTickLabels() throws Exception {
        ViewSettings view = new ViewSettings(UnitSystem.SI, Locale.UK);
        CorneringProbe probe = new CorneringProbe();
        int pointers = 0;
        for (Samples.Sample sample : Samples.ALL) {
            AnalysisOutcome outcome = AnalysisScheduler.analyse(1, Samples.load(sample).vehicle(),
                    new SweepRequest(AxlePosition.FRONT, SweepParameter.DIAMETER));
            WheelLoadChart[] chart = new WheelLoadChart[1];
            SwingUtilities.invokeAndWait(() -> {
                chart[0] = new WheelLoadChart(view, probe);
                chart[0].show(outcome, false);
            });
            JFreeChart drawn = chart[0].chart();
            float ticks = drawn.getXYPlot().getDomainAxis().getTickLabelFont().getSize2D();
            assertThat(ticks).isGreaterThan(LARGEST * 0.8f);
            for (Object annotation : drawn.getXYPlot().getAnnotations()) {
                XYTextAnnotation words = (XYTextAnnotation) annotation;
                assertThat(words.getText()).contains("lifts at");
                assertThat(words.getFont().getSize2D()).as(words.getText()).isEqualTo(ticks);
                pointers++;
            }
        }
        // at least one sample lifts an inside wheel before the limit, so the check above ran
        assertThat(pointers).isPositive();
    }

    @Test
    void theHandlingLimitMarkersAreAsLargeAsTheTickLabels() throws Exception {
        ViewSettings view = new ViewSettings(UnitSystem.SI, Locale.UK);
        AnalysisOutcome outcome = AnalysisScheduler.analyse(1, Samples.load(Samples.CLUB_HATCHBACK).vehicle(),
                new SweepRequest(AxlePosition.FRONT, SweepParameter.DIAMETER));
        HandlingChart[] chart = new HandlingChart[1];
        SwingUtilities.invokeAndWait(() -> {
            chart[0] = new HandlingChart(view, new CorneringProbe());
            chart[0].show(outcome, false);
        });
        JFreeChart drawn = chart[0].chart();
        float ticks = drawn.getXYPlot().getRangeAxis().getTickLabelFont().getSize2D();
        List<String> labelled = new ArrayList<>();
        for (Object each : drawn.getXYPlot().getDomainMarkers(Layer.FOREGROUND)) {
            Marker marker = (Marker) each;
            if (marker.getLabel() != null) {
                assertThat(marker.getLabelFont().getSize2D()).as(marker.getLabel()).isEqualTo(ticks);
                labelled.add(marker.getLabel());
            }
        }
        assertThat(labelled).anyMatch(label -> label.startsWith("front axle limit"))
                .anyMatch(label -> label.startsWith("rear axle limit"));
    }

    @Test
    void wordsAlreadyOnAChartTakeTheTextSizeWhenItIsDressed() throws Exception {
        EnvelopeChart[] envelope = new EnvelopeChart[1];
        SwingUtilities.invokeAndWait(() -> envelope[0] = new EnvelopeChart());
        JFreeChart drawn = envelope[0].chart();
        ValueMarker added = new ValueMarker(0.5);
        added.setLabel("added before the chart was dressed");
        drawn.getXYPlot().addDomainMarker(added);
        XYTextAnnotation words = new XYTextAnnotation("turning left", 0, 0);
        words.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 11));
        drawn.getXYPlot().addAnnotation(words);
        assertThat(added.getLabelFont().getSize2D()).isLessThan(LARGEST * 0.5f); // JFreeChart's own 9 pt
        SwingUtilities.invokeAndWait(() -> ChartStyle.apply(drawn));
        float ticks = drawn.getXYPlot().getDomainAxis().getTickLabelFont().getSize2D();
        assertThat(added.getLabelFont().getSize2D()).isEqualTo(ticks);
        assertThat(words.getFont().getSize2D()).isEqualTo(ticks);
        assertThat(words.getFont().isBold()).as("a bold label stays bold").isTrue();
    }
}
