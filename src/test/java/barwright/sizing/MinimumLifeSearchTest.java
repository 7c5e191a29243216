package barwright.sizing;

import barwright.loading.VehicleLoader;
import barwright.io.VehicleDocument;
import barwright.io.VehicleEdits;
import barwright.model.AxlePosition;
import barwright.model.BarFatigueInputs;
import barwright.model.BarFatigueSettings;
import barwright.model.Material;
import barwright.model.MaterialLibrary;
import barwright.model.SurfaceFinish;
import barwright.physics.AnalysisPipeline;
import barwright.physics.fatigue.BarStressHistory;
import barwright.physics.fatigue.DefaultSpectrum;
import barwright.physics.fatigue.FatigueAnalysis;
import barwright.physics.fatigue.MeanStressCorrection;
import barwright.physics.fatigue.Rainflow;
import barwright.solver.Progress;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The search's least fatigue life (model.md 13) against the fatigue analysis of each candidate put into the
 * vehicle file and analysed again (the steady pipeline, the lap's stress history counted on its own): a search with
 * the limit keeps exactly those whose life is at least the limit, and counts the others with their reason.
 */
class MinimumLifeSearchTest {
    /** As forged, K_f 2.0: the default lap's 1.2 g corners reach past the endurance limit of the thinner bars. */
    private static final BarFatigueSettings SETTINGS = new BarFatigueSettings(SurfaceFinish.AS_FORGED, 2.0);
    private static final List<Material> MATERIALS = List.of(MaterialLibrary.SPRING_STEEL,
            MaterialLibrary.CHROMOLY_4130);

    private static FatigueLimit limit(double laps) {
        return new FatigueLimit(laps, new FatigueLap(Rainflow.count(BarStressHistory.fromSpectrum(
                DefaultSpectrum.CORNERS, 1)), Map.of(AxlePosition.FRONT, SETTINGS), MeanStressCorrection.GOODMAN,
                Map.of(), DefaultSpectrum.DESCRIPTION));
    }

    private static SizingRequest request(Constraints constraints, List<Material> materials) {
        return SizingRequest.of(AxlePosition.FRONT, Targets.share(0.45), constraints,
                new SizeChoices(materials, SizingFixtures.smallCatalogue(), List.of())).withMaxResults(1000);
    }

    /** @return the candidate's laps to failure from the full fatigue analysis of the edited car */
    private static double life(VehicleDocument document, Candidate candidate) throws Exception {
        var car = VehicleLoader.withBars(document, candidate.settings()).vehicle();
        var strength = MaterialLibrary.fatigueStrength(car.front().bar().material().name()).orElseThrow();
        return FatigueAnalysis.ofSpectrum(new AnalysisPipeline(car), AxlePosition.FRONT,
                new BarFatigueInputs(strength, SETTINGS), MeanStressCorrection.GOODMAN, DefaultSpectrum.CORNERS,
                DefaultSpectrum.LAP_SECONDS).lapsToFailure();
    }

    @Test
    void exactlyTheBarsThatLastTheLeastLapsAreKept() throws Exception {
        VehicleDocument document = SizingFixtures.hatchback();
        Constraints none = new Constraints(0, Set.of(), null, null);
        SizingResult all = BarSearch.run(document.vehicle(), request(none, MATERIALS), Progress.NONE);
        List<Double> lives = new ArrayList<>();
        for (Candidate candidate : all.candidates()) {
            lives.add(life(document, candidate));
        }
        List<Double> finite = lives.stream().filter(Double::isFinite).sorted().toList();
        assertThat(finite).as("some bars must wear out on the default lap").hasSizeGreaterThan(2);
        // a limit between two lives (their geometric mean), well away from either so that rounding cannot tip it
        int middle = finite.size() / 2;
        double laps = Math.rint(Math.sqrt(finite.get(middle - 1) * finite.get(middle)));
        assertThat(finite.get(middle) / finite.get(middle - 1)).as("two distinct lives").isGreaterThan(1.01);

        SizingResult limited = BarSearch.run(document.vehicle(), request(none.withMinimumLife(limit(laps)),
                MATERIALS), Progress.NONE);
        List<String> expected = new ArrayList<>();
        long refused = 0;
        for (int i = 0; i < lives.size(); i++) {
            if (lives.get(i) >= laps) {
                expected.add(all.candidates().get(i).bars().toString());
            } else {
                refused++;
            }
        }
        assertThat(limited.candidates().stream().map(c -> c.bars().toString()).toList())
                .containsExactlyInAnyOrderElementsOf(expected);
        assertThat(limited.rejections().get(Rejection.FATIGUE_LIFE)).isEqualTo(refused);
    }

    @Test
    void aMaterialWithNoFatigueDataIsRefusedWithThatReason() throws Exception {
        VehicleDocument document = SizingFixtures.hatchback();
        Material mine = new Material("my spring steel", 207e9, 79.3e9, 7850, 1100e6);
        SizingResult result = BarSearch.run(document.vehicle(), request(new Constraints(0, Set.of(), null, null)
                .withMinimumLife(limit(1)), List.of(mine)), Progress.NONE);
        assertThat(result.candidates()).isEmpty();
        assertThat(result.rejections().get(Rejection.NO_FATIGUE_DATA)).isEqualTo(result.evaluated());
    }
}
