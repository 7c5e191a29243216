package barwright.ui.tyre;

import barwright.loading.VehicleLoader;
import barwright.io.VehicleFileReader;
import barwright.ui.window.WindowFixture;
import barwright.units.UnitSystem;
import org.assertj.swing.edt.GuiActionRunner;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The tyre page in the main window, on the invented samples: drawn for a tyre given by the law and for one given
 * as points, the loads at the limit marked, the tyre warning shown where it applies, and the unit switch followed
 * at once.
 */
@Tag("window")
class TyrePageWindowTest {
    /** NIST SP 811 (2008), appendix B: 1 lbf = 4.448 221 615 260 5 N, exact by definition. */
    private static final double NEWTONS_PER_POUND_FORCE = 4.4482216152605;
    private static final Path FITTED_TYRES = Path.of("sample-vehicles", "club-hatchback-fitted-tyres.json");

    @Test
    void aLawTyreIsDrawnAsOneLineThroughItsReferencePointWithTheThreeLoadsMarked() throws Exception {
        try (WindowFixture fixture = new WindowFixture()) {
            TyrePage page = TyreScreens.select(fixture.window);
            AxleTyreView front = page.front();
            XYPlot load = GuiActionRunner.execute(() -> front.loadChart().chart().getXYPlot());
            XYDataset lines = load.getDataset();
            assertThat(lines.getSeriesCount()).isEqualTo(1);
            assertThat(lines.getSeriesKey(0).toString()).contains("law");
            // the law mu = mu_0 (1 + s (F/F_0 - 1)) gives mu_0 at F_0: 1.25 at 3200 N in club-hatchback.json
            assertThat(valueAt(lines, 0, 3200)).isCloseTo(1.25, within(1e-3));
            // static, inside and outside loads; static is the front axle's weight shared by two wheels
            assertThat(load.getDomainMarkers(org.jfree.chart.ui.Layer.FOREGROUND)).hasSize(3);
            assertThat(GuiActionRunner.execute(front::summaryText)).contains("static").contains("inside")
                    .contains("outside").contains("grip");
            assertThat(front.slipChart().chart().getXYPlot().getDataset().getSeriesCount()).isEqualTo(3);
            // the sample's tyre has no camber keys: no camber chart, a sentence instead
            assertThat(GuiActionRunner.execute(front::showsCamberChart)).isFalse();
            // its loads stay inside what the law was made for: no tyre warning on the page
            assertThat(GuiActionRunner.execute(front::warningText)).isEmpty();
        }
    }

    @Test
    void aPointsTyreShowsItsPointsTheStretchBeyondThemTheCamberEffectAndTheOutsideDataWarning() throws Exception {
        try (WindowFixture fixture = new WindowFixture()) {
            GuiActionRunner.execute(() -> {
                fixture.window.document().replace(VehicleLoader.read(FITTED_TYRES), FITTED_TYRES, "test");
                return null;
            });
            fixture.settle();
            TyrePage page = TyreScreens.select(fixture.window);
            AxleTyreView front = page.front();
            XYDataset lines = front.loadChart().chart().getXYPlot().getDataset();
            // between the points, below them, past them (dashed), and the points themselves
            assertThat(lines.getSeriesCount()).isEqualTo(4);
            assertThat(lines.getSeriesKey(2).toString()).contains("estimate");
            // the file's four points (club-hatchback-fitted-tyres.json), drawn where the file puts them
            double[][] file = {{2000, 1.4213}, {3500, 1.3727}, {5000, 1.3126}, {6500, 1.2494}};
            assertThat(lines.getItemCount(3)).isEqualTo(4);
            for (int i = 0; i < file.length; i++) {
                assertThat(lines.getXValue(3, i)).isEqualTo(file[i][0]);
                assertThat(lines.getYValue(3, i)).isEqualTo(file[i][1]);
            }
            // the interpolation passes through the inner points (model.md 8.1: it may not overshoot them)
            assertThat(valueAt(lines, 0, 3500)).isCloseTo(1.3727, within(2e-3));
            assertThat(valueAt(lines, 0, 5000)).isCloseTo(1.3126, within(2e-3));
            // the light inside tyre at the limit lies below 0.9 x 2000 N: the analysis warns, and the page shows it
            assertThat(GuiActionRunner.execute(front::warningText)).contains("outside their measured points");
            // camber terms in the file: the chart is there, its best camber at the file's -1.4797 deg
            assertThat(GuiActionRunner.execute(front::showsCamberChart)).isTrue();
            ValueMarker best = (ValueMarker) front.camberChart().chart().getXYPlot()
                    .getDomainMarkers(org.jfree.chart.ui.Layer.FOREGROUND).iterator().next();
            assertThat(best.getValue()).isCloseTo(-1.4797, within(1e-4));
        }
    }

    @Test
    void theUnitSwitchChangesTheLoadAxisAtOnce() throws Exception {
        try (WindowFixture fixture = new WindowFixture()) {
            TyrePage page = TyreScreens.select(fixture.window);
            XYPlot load = page.front().loadChart().chart().getXYPlot();
            double widestInNewtons = GuiActionRunner.execute(() -> load.getDataset().getXValue(0,
                    load.getDataset().getItemCount(0) - 1));
            String[] after = GuiActionRunner.execute(() -> {
                fixture.window.setUnits(UnitSystem.US);
                // read in the same event-thread task: no analysis or repaint has run in between
                return new String[]{load.getDomainAxis().getLabel(),
                        Double.toString(load.getDataset().getXValue(0, load.getDataset().getItemCount(0) - 1)),
                        page.front().slipChart().chart().getXYPlot().getRangeAxis().getLabel()};
            });
            assertThat(after[0]).contains("(lbf)");
            assertThat(after[2]).contains("(lbf)");
            assertThat(Double.parseDouble(after[1])).isCloseTo(widestInNewtons / NEWTONS_PER_POUND_FORCE,
                    within(1e-9 * widestInNewtons));
        }
    }

    /** @return the series' y at x, by straight lines between its samples (121 samples: fine enough for 2e-3) */
    static double valueAt(XYDataset data, int series, double x) {
        for (int i = 1; i < data.getItemCount(series); i++) {
            double x0 = data.getXValue(series, i - 1);
            double x1 = data.getXValue(series, i);
            if (x >= x0 && x <= x1) {
                double y0 = data.getYValue(series, i - 1);
                return y0 + (data.getYValue(series, i) - y0) * (x - x0) / (x1 - x0);
            }
        }
        throw new AssertionError("x = " + x + " is outside the series");
    }
}
