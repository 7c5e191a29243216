package barwright.sizing;

import barwright.io.VehicleDocument;
import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.VehicleAnalysis;
import barwright.sizing.catalogue.Catalogues;
import barwright.sizing.catalogue.StockSize;
import barwright.solver.Progress;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The front shares a search can reach, against the full analysis ({@code VehicleAnalysis}) of the car edited
 * through {@code VehicleLoader}: its ends are the car with the sized bar taken out and with the stiffest bar the
 * limits allow put in (found here by trying every one), every bar the search may propose lies between them, and
 * the share rises with the front bar's diameter (the limit case the range rests on). On the club hatchback
 * sample (invented data, an input only).
 */
class ReachableShareTest {
    /** The same model computed along two paths (the search's evaluator and the full analysis): 1e-9. */
    private static final double SAME_MODEL = 1e-9;

    private static double share(Vehicle vehicle) {
        return VehicleAnalysis.analyse(vehicle).frontLoadTransferShare();
    }

    private static Map<AxlePosition, SizeChoices> choices(VehicleDocument document, AxlePosition... axles) {
        Map<AxlePosition, SizeChoices> choices = new java.util.EnumMap<>(AxlePosition.class);
        for (AxlePosition axle : axles) {
            choices.put(axle, new SizeChoices(List.of(document.vehicle().axle(axle).bar().material()),
                    SizingFixtures.smallCatalogue(), List.of()));
        }
        return choices;
    }

    /** @return the full-analysis share of every bar of the choices that passes the limits, by brute force */
    private static List<Double> allowedShares(VehicleDocument document, AxlePosition axle, SizeChoices choices,
                                              double minSafetyFactor) throws Exception {
        List<Double> shares = new ArrayList<>();
        for (BarChoice choice : BarSearch.enumerate(axle, document.vehicle().axle(axle).bar(), choices)) {
            var edited = VehicleLoader.withBars(document, List.of(choice.setting())).vehicle();
            var analysed = VehicleAnalysis.analyse(edited);
            var bar = axle == AxlePosition.FRONT ? analysed.front().bar() : analysed.rear().bar();
            if (bar.safetyFactor() >= minSafetyFactor) {
                shares.add(analysed.frontLoadTransferShare());
            }
        }
        return shares;
    }

    /** @return one axle's reach over the small catalogue in its own material, at a least safety factor of 1.5 */
    private static ShareReach reach(VehicleDocument document, AxlePosition axle) {
        return ReachableShare.of(new SetupEvaluator(document.vehicle()), List.of(axle), choices(document, axle),
                Constraints.safetyFactor(1.5)).orElseThrow();
    }

    @Test
    void theFrontBarsReachRunsFromNoBarToTheStiffestBarAllowed() throws Exception {
        VehicleDocument document = SizingFixtures.hatchback();
        ShareReach reach = reach(document, AxlePosition.FRONT);
        double noBar = share(VehicleLoader.withEdits(document, List.of("front.bar=null")).vehicle());
        List<Double> allowed = allowedShares(document, AxlePosition.FRONT,
                choices(document, AxlePosition.FRONT).get(AxlePosition.FRONT), 1.5);
        assertThat(allowed).hasSizeGreaterThan(10); // guards the test: most of the small catalogue passes
        assertThat(reach.lowest()).isCloseTo(noBar, within(SAME_MODEL));
        assertThat(reach.highest()).isCloseTo(allowed.stream().mapToDouble(Double::doubleValue).max().orElseThrow(),
                within(SAME_MODEL));
        assertThat(allowed).allSatisfy(share -> assertThat(share).isBetween(reach.lowest() - SAME_MODEL,
                reach.highest() + SAME_MODEL));
    }

    @Test
    void aRearBarsReachRunsFromTheStiffestRearBarToNone() throws Exception {
        VehicleDocument document = SizingFixtures.hatchback();
        ShareReach reach = reach(document, AxlePosition.REAR);
        double noBar = share(VehicleLoader.withEdits(document, List.of("rear.bar=null")).vehicle());
        List<Double> allowed = allowedShares(document, AxlePosition.REAR,
                choices(document, AxlePosition.REAR).get(AxlePosition.REAR), 1.5);
        assertThat(reach.highest()).isCloseTo(noBar, within(SAME_MODEL));
        assertThat(reach.lowest()).isCloseTo(allowed.stream().mapToDouble(Double::doubleValue).min().orElseThrow(),
                within(SAME_MODEL));
    }

    @Test
    void bothBarsReachFromSoftFrontStiffRearToStiffFrontNoRear() throws Exception {
        VehicleDocument document = SizingFixtures.hatchback();
        Map<AxlePosition, SizeChoices> choices = choices(document, AxlePosition.FRONT, AxlePosition.REAR);
        ShareReach both = ReachableShare.of(new SetupEvaluator(document.vehicle()),
                List.of(AxlePosition.FRONT, AxlePosition.REAR), choices, Constraints.safetyFactor(0)).orElseThrow();
        // the stiffest of the small catalogue on each axle: the 26 mm solid in the shortest arm (hole 1); a
        // larger section moment than any of its tubes (pi d^4 / 32, checked by the search's own ranking elsewhere)
        String stiffFront = "front.bar.section={\"shape\":\"solid\",\"outerDiameterMm\":26}";
        String stiffRear = "rear.bar.section={\"shape\":\"solid\",\"outerDiameterMm\":26}";
        double high = share(VehicleLoader.withEdits(document, List.of(stiffFront, "front.bar.selectedArm=0",
                "rear.bar=null")).vehicle());
        double low = share(VehicleLoader.withEdits(document, List.of("front.bar=null", stiffRear,
                "rear.bar.selectedArm=0")).vehicle());
        assertThat(both.highest()).isCloseTo(high, within(SAME_MODEL));
        assertThat(both.lowest()).isCloseTo(low, within(SAME_MODEL));
    }

    @Test
    void theFrontShareRisesWithTheFrontBarsDiameter() throws Exception {
        // the limit case the range rests on (model.md 6: the front share grows with the front roll stiffness)
        VehicleDocument document = SizingFixtures.hatchback();
        double previous = share(VehicleLoader.withEdits(document, List.of("front.bar=null")).vehicle());
        for (int diameter = 10; diameter <= 60; diameter += 5) {
            double now = share(VehicleLoader.withEdits(document, List.of(String.format(Locale.ROOT,
                    "front.bar.section={\"shape\":\"solid\",\"outerDiameterMm\":%d}", diameter))).vehicle());
            assertThat(now).as("%d mm", diameter).isGreaterThan(previous);
            previous = now;
        }
    }

    @Test
    void theSafetyFactorLimitLowersTheTopOfTheReach() throws Exception {
        VehicleDocument document = SizingFixtures.hatchback();
        Map<AxlePosition, SizeChoices> choices = choices(document, AxlePosition.FRONT);
        SetupEvaluator evaluator = new SetupEvaluator(document.vehicle());
        ShareReach loose = ReachableShare.of(evaluator, List.of(AxlePosition.FRONT), choices,
                Constraints.safetyFactor(0)).orElseThrow();
        ShareReach strict = ReachableShare.of(evaluator, List.of(AxlePosition.FRONT), choices,
                Constraints.safetyFactor(2.6)).orElseThrow();
        List<Double> allowed = allowedShares(document, AxlePosition.FRONT, choices.get(AxlePosition.FRONT), 2.6);
        assertThat(allowed).isNotEmpty();
        assertThat(strict.highest()).isLessThan(loose.highest())
                .isCloseTo(allowed.stream().mapToDouble(Double::doubleValue).max().orElseThrow(), within(SAME_MODEL));
        assertThat(ReachableShare.of(evaluator, List.of(AxlePosition.FRONT), choices, Constraints.safetyFactor(50)))
                .as("no bar passes: no reach").isEmpty();
    }

    @Test
    void theSamplesDefaultTargetIsOutOfReachForTheFrontBarAndTheSearchSaysSo() throws Exception {
        // the case: static front weight + 5 points on the club hatchback, front bar, built-in sizes
        VehicleDocument document = SizingFixtures.hatchback();
        Vehicle car = document.vehicle();
        List<StockSize> sizes = new ArrayList<>();
        Catalogues.builtIn().forEach(catalogue -> sizes.addAll(catalogue.sizes()));
        SizingRequest request = SizingRequest.of(AxlePosition.FRONT, new Targets(null, 0.05, null),
                Constraints.safetyFactor(1.5), new SizeChoices(List.of(car.front().bar().material()), sizes,
                        List.of()));
        SizingResult result = BarSearch.run(car, request, Progress.NONE);
        assertThat(result.targetOutOfReach()).isTrue();
        assertThat(result.targetShare()).isGreaterThan(result.reach().highest());
        // the best proposal is the stiffest bar allowed: the top of the reach, in the full analysis too
        Candidate best = result.candidates().get(0);
        double bestShare = share(VehicleLoader.withBars(document, best.settings()).vehicle());
        assertThat(bestShare).isCloseTo(result.reach().highest(), within(SAME_MODEL));
        double aim = result.reach().aimFor(result.targetShare());
        assertThat(result.reach().contains(aim)).isTrue();
        assertThat(aim).isLessThan(result.reach().highest());
    }

    @Test
    void anAimOutOfReachMovesInsideByAPointOrATenthOfANarrowRange() {
        ShareReach wide = new ShareReach(0.482, 0.589);
        assertThat(wide.aimFor(0.61)).isCloseTo(0.579, within(1e-12));
        assertThat(wide.aimFor(0.40)).isCloseTo(0.492, within(1e-12));
        assertThat(wide.aimFor(0.55)).isEqualTo(0.55);
        ShareReach narrow = new ShareReach(0.60, 0.62);
        assertThat(narrow.aimFor(0.70)).isCloseTo(0.618, within(1e-12));
    }
}
