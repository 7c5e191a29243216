package barwright.ui.tyre;

import barwright.model.AxlePosition;
import barwright.ui.Display;
import barwright.ui.ScriptedDialogs;
import barwright.ui.document.OpenDocument;
import barwright.ui.document.Samples;
import barwright.ui.field.ViewSettings;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * "Fit from data..." on the club hatchback sample (invented): the shipped, invented tyre data set is fitted off the
 * event thread and its residuals shown; applying it is one undoable edit; a cancelled fit and bad files change
 * nothing, and their messages name the line.
 */
@Tag("window")
class TyreFitDialogWindowTest {
    /** NIST SP 811 (2008), appendix B: 1 lbf = 4.448 221 615 260 5 N, exact by definition. */
    private static final double NEWTONS_PER_POUND_FORCE = 4.4482216152605;

    @TempDir
    Path folder;

    private record Opened(OpenDocument document, ViewSettings view, TyreFitDialog dialog) {
    }

    private static Opened open() {
        Display.require();
        return GuiActionRunner.execute(() -> {
            OpenDocument document = Samples.open(Samples.CLUB_HATCHBACK);
            ViewSettings view = new ViewSettings(UnitSystem.SI, Locale.ROOT);
            return new Opened(document, view, new TyreFitDialog(null, document, view, new ScriptedDialogs()));
        });
    }

    private static void fitAndWait(TyreFitDialog dialog, Path file) throws InterruptedException {
        GuiActionRunner.execute(() -> dialog.fit(file));
        waitUntilIdle(dialog);
    }

    private static void waitUntilIdle(TyreFitDialog dialog) throws InterruptedException {
        long deadline = System.currentTimeMillis() + 20_000;
        while (!GuiActionRunner.execute(dialog::isIdle) && System.currentTimeMillis() < deadline) {
            Thread.sleep(20);
        }
        GuiActionRunner.execute(() -> { });
        assertThat(GuiActionRunner.execute(dialog::isIdle)).as("the fit ends within 20 s").isTrue();
    }

    @Test
    void theShippedDataIsFittedWithItsResidualsShownAndApplyingItIsOneUndoStep() throws Exception {
        Opened opened = open();
        TyreFitDialog dialog = opened.dialog();
        fitAndWait(dialog, TyreScreens.SAMPLE_DATA);
        assertThat(GuiActionRunner.execute(dialog::messagesText)).contains("7 curves fitted");
        ResidualTableModel residuals = dialog.residuals();
        assertThat(residuals.getRowCount()).isEqualTo(7);
        assertThat(dialog.chartPanel().chart()).isNotNull();
        // the data's header: Gaussian noise of 0.5 % of each curve's peak. With 31 points and 5 coefficients the
        // RMS residual is about 0.5 % x sqrt(26/31) = 0.46 %, its standard error about 14 % of that (chi-square
        // with 26 degrees of freedom); 0.25-0.75 % is more than 3 standard errors either side
        for (var curve : dialog.outcome().fit().curves()) {
            assertThat(curve.rmsShareOfPeak()).isBetween(0.0025, 0.0075);
        }
        assertThat(residuals.getValueAt(0, 4).toString()).contains("%");
        assertThat(residuals.getValueAt(0, 5).toString()).contains("at line");

        JsonNode before = opened.document().tree().deepCopy();
        GuiActionRunner.execute(() -> dialog.apply(AxlePosition.FRONT));
        JsonNode frontTyre = opened.document().tree().path("front").path("tyre");
        assertThat(frontTyre.path("peakFrictionByLoad").size()).isEqualTo(4);
        assertThat(opened.document().isValid()).isTrue();
        assertThat(opened.document().lastValid().vehicle().front().tyre().hasFrictionPoints()).isTrue();
        // the rear tyre is untouched
        assertThat(opened.document().tree().path("rear")).isEqualTo(before.path("rear"));
        GuiActionRunner.execute(() -> opened.document().undo());
        assertThat(opened.document().tree()).isEqualTo(before);
        assertThat(opened.document().canUndo()).isFalse();
    }

    @Test
    void aCancelledFitChangesNothing() throws Exception {
        Opened opened = open();
        TyreFitDialog dialog = opened.dialog();
        JsonNode before = opened.document().tree().deepCopy();
        GuiActionRunner.execute(() -> {
            dialog.fit(TyreScreens.SAMPLE_DATA);
            dialog.cancelFit();
        });
        waitUntilIdle(dialog);
        assertThat(GuiActionRunner.execute(dialog::messagesText)).contains("cancelled").contains("Nothing");
        assertThat(GuiActionRunner.execute(() -> dialog.applyButton(AxlePosition.FRONT).isEnabled())).isFalse();
        assertThat(opened.document().tree()).isEqualTo(before);
        assertThat(opened.document().canUndo()).isFalse();
    }

    @Test
    void aSecondFileStartedWhileTheFirstRunsReplacesItWithoutItsNews() throws Exception {
        Opened opened = open();
        TyreFitDialog dialog = opened.dialog();
        GuiActionRunner.execute(() -> {
            dialog.fit(TyreScreens.SAMPLE_DATA);
            dialog.fit(TyreScreens.SAMPLE_DATA);
        });
        waitUntilIdle(dialog);
        // the first fit is cancelled by the second; its "cancelled" must not land on the second's result
        assertThat(GuiActionRunner.execute(dialog::messagesText)).contains("7 curves fitted")
                .doesNotContain("cancelled");
        assertThat(GuiActionRunner.execute(() -> dialog.applyButton(AxlePosition.FRONT).isEnabled())).isTrue();
    }

    @Test
    void aNotANumberRowIsRefusedWithItsLineAndChangesNothing() throws Exception {
        Opened opened = open();
        TyreFitDialog dialog = opened.dialog();
        Path bad = folder.resolve("bad.csv");
        Files.writeString(bad, "loadN,slipAngleDeg,lateralForceN\n2000,1,900\n2000,2,NaN\n");
        JsonNode before = opened.document().tree().deepCopy();
        fitAndWait(dialog, bad);
        assertThat(GuiActionRunner.execute(dialog::messagesText)).contains("line 3").contains("Nothing in the car");
        assertThat(GuiActionRunner.execute(() -> dialog.applyButton(AxlePosition.FRONT).isEnabled())).isFalse();
        assertThat(dialog.residuals().getRowCount()).isZero();
        assertThat(opened.document().tree()).isEqualTo(before);
        assertThat(opened.document().canUndo()).isFalse();
    }

    @Test
    void dataAtOneLoadOnlyIsRefusedWithItsLinesAndChangesNothing() throws Exception {
        Opened opened = open();
        TyreFitDialog dialog = opened.dialog();
        StringBuilder csv = new StringBuilder("loadN,slipAngleDeg,lateralForceN\n");
        for (int slip = -10; slip <= 10; slip++) {
            csv.append("3000,").append(slip).append(',').append(300 * slip).append('\n');
        }
        Path oneLoad = folder.resolve("one-load.csv");
        Files.writeString(oneLoad, csv);
        JsonNode before = opened.document().tree().deepCopy();
        fitAndWait(dialog, oneLoad);
        // the header is line 1; the 21 rows are lines 2 to 22
        assertThat(GuiActionRunner.execute(dialog::messagesText)).contains("lines 2 to 22").contains("one load");
        assertThat(GuiActionRunner.execute(() -> dialog.applyButton(AxlePosition.REAR).isEnabled())).isFalse();
        assertThat(opened.document().tree()).isEqualTo(before);
    }

    @Test
    void theUnitSwitchRelabelsTheResidualsAndTheChartAtOnce() throws Exception {
        Opened opened = open();
        TyreFitDialog dialog = opened.dialog();
        fitAndWait(dialog, TyreScreens.SAMPLE_DATA);
        String[] after = GuiActionRunner.execute(() -> {
            opened.view().setUnits(UnitSystem.US);
            return new String[]{dialog.residuals().getColumnName(0), dialog.residuals().getValueAt(0, 0).toString(),
                    dialog.chartPanel().chart().getXYPlot().getRangeAxis().getLabel()};
        });
        assertThat(after[0]).isEqualTo("Load (lbf)");
        // 2000 N / 4.4482216152605 N per lbf = 449.6 lbf, shown to the nearest lbf
        assertThat(after[1]).isEqualTo(String.format(Locale.ROOT, "%.0f", 2000 / NEWTONS_PER_POUND_FORCE));
        assertThat(after[2]).contains("(lbf)");
    }
}
