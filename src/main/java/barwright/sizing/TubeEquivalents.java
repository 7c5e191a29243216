package barwright.sizing;

import barwright.model.AntiRollBar;
import barwright.model.Material;
import barwright.model.SolidSection;
import barwright.physics.BarAnalysis;
import barwright.physics.bar.BarResult;
import barwright.sizing.catalogue.StockSize;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * For a solid bar, the catalogue tubes of equal rate: each tube in the bar's place (same torsion length,
 * arms, bushings and hole), kept where its link rate is within the tolerance of the solid bar's, with the
 * mass saved and both bars' stresses at the check travel. Lightest first.
 */
public final class TubeEquivalents {
    /** Equal rate means within 2 % (the figure). */
    public static final double DEFAULT_TOLERANCE = 0.02;

    private TubeEquivalents() {
    }

    /**
     * The solid bar's own figures and the tubes that match it.
     *
     * @param solidBar                a bar with a solid section
     * @param differentialWheelTravel the check travel (m)
     * @param tubes                   tube sizes to try (solid sizes in the list are skipped)
     * @param materials               materials to try the tubes in
     * @param tolerance               largest |rate / solid rate - 1| kept
     */
    public static Comparison compare(AntiRollBar solidBar, double differentialWheelTravel, List<StockSize> tubes,
                                     List<Material> materials, double tolerance) {
        if (!(solidBar.section() instanceof SolidSection)) {
            throw new IllegalArgumentException("the bar to match is not solid: give a solid bar's diameter");
        }
        BarResult solid = BarAnalysis.analyse(solidBar, differentialWheelTravel);
        List<TubeMatch> matches = new ArrayList<>();
        for (Material material : materials) {
            for (StockSize size : tubes) {
                if (size.section() instanceof SolidSection) {
                    continue;
                }
                BarResult tube = BarAnalysis.analyse(solidBar.withMaterial(material).withSection(size.section()),
                        differentialWheelTravel);
                double difference = tube.linkRate() / solid.linkRate() - 1;
                if (Math.abs(difference) <= tolerance) {
                    matches.add(new TubeMatch(size, material, tube.linkRate(), difference, tube.mass(),
                            solid.mass() - tube.mass(), tube.maxVonMisesStress(), tube.safetyFactor()));
                }
            }
        }
        matches.sort(Comparator.comparingDouble(TubeMatch::mass).thenComparingDouble(m -> Math.abs(m.rateDifference())));
        return new Comparison(solidBar, solid, matches);
    }

    /**
     * @param solidBar the solid bar matched
     * @param solid    its rate, mass and stresses
     * @param matches  the tubes of equal rate, lightest first
     */
    public record Comparison(AntiRollBar solidBar, BarResult solid, List<TubeMatch> matches) {
        public Comparison {
            matches = List.copyOf(matches);
        }
    }
}
