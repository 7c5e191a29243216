package barwright.sizing;

import barwright.io.VehicleDocument;
import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.model.Material;
import barwright.model.MaterialLibrary;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.TurnResult;
import barwright.physics.VehicleAnalysis;
import barwright.sizing.catalogue.StockSize;
import barwright.solver.Progress;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.CancellationException;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * The search against the full analysis (barwright.physics.VehicleAnalysis, the implementation of model.md
 * 1-8) and against a brute force written here: every candidate, put into the vehicle file and analysed
 * again, gives the figures it was listed with and breaks no constraint; none that meets the constraints
 * and ranks higher is missing.
 */
class BarSearchTest {
    /** Same arithmetic in both paths, only summed in another order: 1e-9 relative. */
    private static final double SAME_ARITHMETIC = 1e-9;

    private static final List<Material> MATERIALS = List.of(MaterialLibrary.SPRING_STEEL, MaterialLibrary.CHROMOLY_4130,
            MaterialLibrary.ALUMINIUM_7075_T6);

    private static Constraints liftAndSafety() {
        return new Constraints(1.5, EnumSet.of(AxlePosition.REAR), 6.0, 28.5e-3);
    }

    @Test
    void everyCandidateInTheFileGivesItsListedFiguresAndBreaksNoConstraint() throws Exception {
        VehicleDocument document = SizingFixtures.hatchback();
        SizingRequest request = SizingRequest.of(AxlePosition.FRONT, Targets.share(0.45), liftAndSafety(),
                new SizeChoices(MATERIALS, SizingFixtures.smallCatalogue(), List.of())).withMaxResults(50);
        SizingResult result = BarSearch.run(document.vehicle(), request, Progress.NONE);
        assertThat(result.candidates()).isNotEmpty();
        for (Candidate candidate : result.candidates()) {
            AnalysisResult analysed = VehicleAnalysis.analyse(VehicleLoader.withBars(document, candidate.settings()).vehicle());
            SetupFigures listed = candidate.figures();
            assertThat(listed.frontLoadTransferShare()).isCloseTo(analysed.frontLoadTransferShare(),
                    within(SAME_ARITHMETIC));
            assertThat(listed.rollGradient()).isCloseTo(analysed.rollGradient(),
                    within(SAME_ARITHMETIC * analysed.rollGradient()));
            assertThat(listed.frontBar().mass()).isCloseTo(analysed.front().bar().mass(), within(1e-12));
            assertThat(listed.frontBar().safetyFactor()).isCloseTo(analysed.front().bar().safetyFactor(),
                    within(SAME_ARITHMETIC * analysed.front().bar().safetyFactor()));
            double limit = Math.min(analysed.leftTurn().limit(), analysed.rightTurn().limit());
            assertThat(listed.limit()).isCloseTo(limit, within(1e-7));
            // the constraints, checked on the analysis of the file
            assertThat(analysed.front().bar().safetyFactor()).isGreaterThanOrEqualTo(1.5);
            assertThat(analysed.front().bar().mass()).isLessThanOrEqualTo(6.0);
            assertThat(analysed.vehicle().front().bar().section().outerDiameter()).isLessThanOrEqualTo(28.5e-3);
            for (TurnDirection direction : TurnDirection.values()) {
                TurnResult turn = analysed.turn(direction);
                assertThat(turn.rearInsideLift()).isGreaterThanOrEqualTo(turn.limit());
            }
        }
    }

    @Test
    void noCloserOrEquallyCloseAndLighterSizeIsMissingByBruteForce() throws Exception {
        VehicleDocument document = SizingFixtures.hatchback();
        Vehicle vehicle = document.vehicle();
        Targets targets = Targets.share(0.45);
        Constraints constraints = liftAndSafety();
        List<StockSize> sizes = SizingFixtures.smallCatalogue();
        SizingRequest request = SizingRequest.of(AxlePosition.FRONT, targets, constraints,
                new SizeChoices(MATERIALS, sizes, List.of())).withMaxResults(8);
        SizingResult result = BarSearch.run(vehicle, request, Progress.NONE);

        // brute force: every material x size x hole through the full analysis, constraints checked on it
        List<double[]> accepted = new ArrayList<>(); // {rank key, mass, material, size, hole}
        for (int m = 0; m < MATERIALS.size(); m++) {
            for (int s = 0; s < sizes.size(); s++) {
                for (int hole = 0; hole < vehicle.front().bar().holeCount(); hole++) {
                    BarChoice choice = new BarChoice(AxlePosition.FRONT, MATERIALS.get(m), sizes.get(s), hole);
                    AnalysisResult analysed;
                    try {
                        analysed = VehicleAnalysis.analyse(VehicleLoader.withBars(document, List.of(choice.setting())).vehicle());
                    } catch (ImpossibleVehicleException unstable) {
                        continue;
                    }
                    var bar = analysed.front().bar();
                    boolean rearLifts = analysed.leftTurn().rearInsideLift() < analysed.leftTurn().limit()
                            || analysed.rightTurn().rearInsideLift() < analysed.rightTurn().limit();
                    if (bar.safetyFactor() < 1.5 || bar.mass() > 6.0
                            || sizes.get(s).section().outerDiameter() > 28.5e-3 || rearLifts) {
                        continue;
                    }
                    // the miss in steps of one percentage point, rounded to the 0.1-step tie band
                    double steps = Math.abs(analysed.frontLoadTransferShare() - 0.45) / 0.01;
                    accepted.add(new double[]{Math.round(steps / 0.1), bar.mass(), m, s, hole});
                }
            }
        }
        accepted.sort(Comparator.<double[]>comparingDouble(a -> a[0]).thenComparingDouble(a -> a[1]));
        assertThat(result.accepted()).isEqualTo(accepted.size());
        assertThat(result.candidates()).hasSize(Math.min(8, accepted.size()));
        for (int i = 0; i < result.candidates().size(); i++) {
            BarChoice found = result.candidates().get(i).bars().get(0);
            double[] expected = accepted.get(i);
            assertThat(found.material()).as("rank %d material", i + 1).isEqualTo(MATERIALS.get((int) expected[2]));
            assertThat(found.size()).as("rank %d size", i + 1).isEqualTo(sizes.get((int) expected[3]));
            assertThat(found.selectedArm()).as("rank %d hole", i + 1).isEqualTo((int) expected[4]);
        }
    }

    @Test
    void bothAxlesAtOnceMatchABruteForceOverPairs() throws Exception {
        VehicleDocument document = SizingFixtures.hatchback();
        List<StockSize> sizes = SizingFixtures.smallCatalogue().subList(0, 5);
        SizeChoices choices = new SizeChoices(List.of(MaterialLibrary.SPRING_STEEL), sizes, List.of(0, 2));
        double gradient = 1.3 * barwright.units.Constants.RADIANS_PER_DEGREE / barwright.units.Constants.STANDARD_GRAVITY;
        Targets targets = new Targets(0.48, null, gradient);
        SizingRequest request = new SizingRequest(List.of(AxlePosition.REAR, AxlePosition.FRONT), targets,
                Constraints.safetyFactor(1.5), Map.of(AxlePosition.FRONT, choices, AxlePosition.REAR, choices), 5, 0);
        SizingResult result = BarSearch.run(document.vehicle(), request, Progress.NONE);

        double bestMiss = Double.POSITIVE_INFINITY;
        for (StockSize front : sizes) {
            for (StockSize rear : sizes) {
                for (int frontHole : List.of(0, 2)) {
                    for (int rearHole : List.of(0, 2)) {
                        Candidate pair = new Candidate(List.of(
                                new BarChoice(AxlePosition.FRONT, MaterialLibrary.SPRING_STEEL, front, frontHole),
                                new BarChoice(AxlePosition.REAR, MaterialLibrary.SPRING_STEEL, rear, rearHole)),
                                new SetupEvaluator(document.vehicle()).figures(), 0);
                        AnalysisResult analysed = VehicleAnalysis.analyse(
                                VehicleLoader.withBars(document, pair.settings()).vehicle());
                        if (analysed.front().bar().safetyFactor() < 1.5 || analysed.rear().bar().safetyFactor() < 1.5) {
                            continue;
                        }
                        // the miss of Targets, written out: share steps of 0.01, gradient steps of 0.1 deg/g
                        double shareSteps = (analysed.frontLoadTransferShare() - 0.48) / 0.01;
                        double gradientSteps = (analysed.rollGradient() - gradient) / Targets.GRADIENT_STEP;
                        bestMiss = Math.min(bestMiss, Math.hypot(shareSteps, gradientSteps));
                    }
                }
            }
        }
        assertThat(result.evaluated()).isEqualTo(100);
        assertThat(result.candidates().get(0).miss()).isCloseTo(bestMiss, within(1e-9));
        for (int i = 1; i < result.candidates().size(); i++) {
            assertThat(result.candidates().get(i).miss()).isGreaterThanOrEqualTo(result.candidates().get(i - 1).miss());
        }
        assertThat(result.candidates().get(0).bars()).extracting(BarChoice::axle)
                .containsExactly(AxlePosition.FRONT, AxlePosition.REAR);
    }

    @Test
    void theResultDoesNotDependOnTheOrderThreadsFinishIn() throws Exception {
        Vehicle vehicle = SizingFixtures.hatchback().vehicle();
        SizingRequest request = SizingRequest.of(AxlePosition.REAR, Targets.share(0.5), Constraints.safetyFactor(1.2),
                new SizeChoices(MATERIALS, barwright.sizing.catalogue.Catalogues.builtIn("tube-metric").orElseThrow()
                        .sizes(), List.of())).withMaxResults(20);
        List<Candidate> first = BarSearch.run(vehicle, request, Progress.NONE).candidates();
        for (int run = 0; run < 3; run++) {
            assertThat(BarSearch.run(vehicle, request, Progress.NONE).candidates()).isEqualTo(first);
        }
    }

    @Test
    void aCancelledSearchStopsWithACancellation() throws Exception {
        Vehicle vehicle = SizingFixtures.hatchback().vehicle();
        SizingRequest request = SizingRequest.of(AxlePosition.FRONT, Targets.share(0.5), Constraints.safetyFactor(1.5),
                new SizeChoices(MATERIALS, SizingFixtures.smallCatalogue(), List.of()));
        Progress cancelled = new Progress() {
            @Override
            public void update(long done, long total) {
            }

            @Override
            public boolean isCancelled() {
                return true;
            }
        };
        assertThatThrownBy(() -> BarSearch.run(vehicle, request, cancelled)).isInstanceOf(CancellationException.class);
    }

    @Test
    void progressReachesTheTotal() throws Exception {
        Vehicle vehicle = SizingFixtures.hatchback().vehicle();
        SizingRequest request = SizingRequest.of(AxlePosition.FRONT, Targets.share(0.5), Constraints.safetyFactor(1.5),
                new SizeChoices(MATERIALS, SizingFixtures.smallCatalogue(), List.of()));
        long[] last = new long[2];
        BarSearch.run(vehicle, request, new Progress() {
            @Override
            public synchronized void update(long done, long total) {
                last[0] = Math.max(last[0], done);
                last[1] = total;
            }

            @Override
            public boolean isCancelled() {
                return false;
            }
        });
        assertThat(last[1]).isEqualTo(3L * 9 * 3); // materials x sizes x holes
        assertThat(last[0]).isEqualTo(last[1]);
    }

    @Test
    void anAxleWithNoBarIsRefusedInWords() throws Exception {
        Vehicle vehicle = SizingFixtures.hatchback().vehicle();
        Vehicle noRearBar = vehicle.withRear(vehicle.rear().withBar(null));
        SizingRequest request = SizingRequest.of(AxlePosition.REAR, Targets.share(0.5), Constraints.safetyFactor(1.5),
                new SizeChoices(MATERIALS, SizingFixtures.smallCatalogue(), List.of()));
        assertThatThrownBy(() -> BarSearch.run(noRearBar, request, Progress.NONE))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("rear axle has no bar");
    }

    @Test
    void rejectionsAreCountedByReason() throws Exception {
        Vehicle vehicle = SizingFixtures.hatchback().vehicle();
        SizingRequest request = SizingRequest.of(AxlePosition.FRONT, Targets.share(0.5),
                new Constraints(1.5, Set.of(), null, 21e-3),
                new SizeChoices(List.of(MaterialLibrary.SPRING_STEEL), SizingFixtures.smallCatalogue(), List.of()));
        SizingResult result = BarSearch.run(vehicle, request, Progress.NONE);
        // sizes over 21 mm outside diameter: 22, 24, 26 solid and the four tubes, each in 3 holes
        assertThat(result.rejections().get(Rejection.OUTER_DIAMETER)).isEqualTo(7L * 3);
        assertThat(result.evaluated()).isEqualTo(27);
    }
}
