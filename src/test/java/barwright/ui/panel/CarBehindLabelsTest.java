package barwright.ui.panel;

import barwright.loading.VehicleLoader;
import barwright.model.TurnDirection;
import barwright.physics.VehicleAnalysis;
import barwright.ui.field.ViewSettings;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.CorneringProbe;
import barwright.ui.task.ResultsModel;
import barwright.units.UnitSystem;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.awt.Font;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The car picture's words never lie over a tyre or the body: over a sweep of picture sizes, text sizes, both
 * turn directions and the slider from straight to the grip limit, the force's name and the roll centre's name
 * keep clear of both tyres' rectangles and of the rolled body's bounds, and stay inside the picture. The
 * compact picture (presentation mode's) also keeps them clear of each other and of the wheel loads' figures,
 * and draws no word over the car. Drawn into an image, so no display is needed.
 */
class CarBehindLabelsTest {
    @ParameterizedTest
    @ValueSource(strings = {"club-hatchback", "sprint-roadster-lowered", "road-saloon", "estate-dropped-rear-bar"})
    void theLabelsKeepClearOfTheTyresAndTheBodyAtEverySizeAndRoll(String sample) throws Exception {
        sweep(sample, false);
    }

    @ParameterizedTest
    @ValueSource(strings = {"club-hatchback", "sprint-roadster-lowered", "road-saloon", "estate-dropped-rear-bar"})
    void theCompactPicturesWordsKeepClearOfTheCarTheFiguresAndEachOther(String sample) throws Exception {
        sweep(sample, true);
    }

    private static void sweep(String sample, boolean compact) throws Exception {
        var vehicle = VehicleLoader.read(Path.of("sample-vehicles", sample + ".json")).vehicle();
        var result = VehicleAnalysis.analyse(vehicle);
        ResultsModel results = ResultsModel.pinned(new AnalysisOutcome(1, vehicle, result, null, null, null));
        CorneringProbe probe = new CorneringProbe();
        CarBehindView view = new CarBehindView(results, probe,
                new FigureFormat(new ViewSettings(UnitSystem.SI, Locale.ROOT)));
        view.setCompact(compact);
        List<String> faults = new ArrayList<>();
        int checked = 0;
        int named = 0;
        for (int[] size : new int[][]{{400, 350}, {440, 520}, {600, 420}, {620, 700}, {820, 560}, {1000, 420},
                {1400, 900}}) {
            for (int points : new int[]{10, 13, 18, 28}) {
                Font font = new Font(Font.SANS_SERIF, Font.PLAIN, points);
                view.setFont(font);
                view.setSize(size[0], size[1]);
                if (view.getMinimumSize().height > size[1]) {
                    continue; // the window never lays the picture out smaller than its least size at this text
                }
                for (TurnDirection turn : TurnDirection.values()) {
                    probe.setTurn(turn);
                    for (int slider = 0; slider <= 100; slider += 20) {
                        probe.setFractionOfLimit(slider / 100.0);
                        BufferedImage image = new BufferedImage(size[0], size[1], BufferedImage.TYPE_INT_RGB);
                        var graphics = image.createGraphics();
                        view.paintPicture(graphics, size[0], size[1], font);
                        graphics.dispose();
                        CarBehindView.Placement placed = view.placement();
                        String where = size[0] + "x" + size[1] + " at " + points + " pt, " + turn.word() + " turn, "
                                + slider + " %";
                        check(faults, where, "force label", placed.forceLabel(), placed, size[0]);
                        check(faults, where, "roll centre label", placed.rollCentreName(), placed, size[0]);
                        if (compact) {
                            CarPictureChecks.overlaps(placed, size[0], size[1]).forEach(fault -> faults.add(where + ": " + fault));
                            named += placed.labels().isEmpty() ? 0 : 1;
                        } else if (placed.labels().size() != 2) {
                            faults.add(where + ": a name left out of the full picture");
                        }
                        checked++;
                    }
                }
            }
        }
        // guards the test itself: most of the sweep is drawn (the least sizes skip the largest texts)
        assertThat(checked).isGreaterThan(7 * 4 * 2 * 6 / 2);
        if (compact) {
            // and the compact picture's names are checked, not always left out
            assertThat(named).isGreaterThan(checked / 4);
        }
        assertThat(faults).isEmpty();
    }

    private static void check(List<String> faults, String where, String what, Rectangle2D label,
                              CarBehindView.Placement placed, int width) {
        if (label == null) {
            return; // the compact picture leaves out a name it finds no clear place for: its key names it
        }
        for (Rectangle2D tyre : placed.tyres()) {
            if (tyre.intersects(label)) {
                faults.add(where + ": " + what + " " + label + " over a tyre " + tyre);
            }
        }
        if (placed.body().intersects(label)) {
            faults.add(where + ": " + what + " " + label + " over the body " + placed.body());
        }
        if (label.getX() < 0 || label.getMaxX() > width) {
            faults.add(where + ": " + what + " " + label + " runs off the picture");
        }
    }
}
