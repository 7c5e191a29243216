package barwright.sizing;

import barwright.model.AxlePosition;
import barwright.model.MaterialLibrary;
import barwright.model.SolidSection;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.sizing.map.AdjustmentMap;
import barwright.sizing.map.AdjustmentMap.LabelledBar;
import barwright.sizing.map.MapCell;
import barwright.solver.Progress;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The adjustment map against the full analysis of each hole pair (VehicleAnalysis, model.md 1-8). */
class AdjustmentMapTest {
    @Test
    void everyCellIsTheAnalysisOfItsHolePairAndTheCurrentOneIsMarkedOnce() throws Exception {
        Vehicle vehicle = SizingFixtures.hatchback().vehicle();
        AdjustmentMap map = AdjustmentMap.of(vehicle);
        assertThat(map.rows()).hasSize(3);
        assertThat(map.columns()).hasSize(4);
        assertThat(map.cells()).filteredOn(MapCell::current).hasSize(1);
        MapCell current = map.cells().stream().filter(MapCell::current).findFirst().orElseThrow();
        assertThat(current.front().hole()).isEqualTo(vehicle.front().bar().selectedArm());
        assertThat(current.rear().hole()).isEqualTo(vehicle.rear().bar().selectedArm());
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 4; c++) {
                Vehicle holes = vehicle.withFront(vehicle.front().withBar(vehicle.front().bar().withSelectedArm(r)))
                        .withRear(vehicle.rear().withBar(vehicle.rear().bar().withSelectedArm(c)));
                AnalysisResult analysed = VehicleAnalysis.analyse(holes);
                SetupFigures figures = map.cell(r, c).figures();
                assertThat(figures.frontLoadTransferShare()).isCloseTo(analysed.frontLoadTransferShare(), within(1e-12));
                assertThat(figures.rollGradient()).isCloseTo(analysed.rollGradient(), within(1e-15));
                assertThat(figures.balance()).isEqualTo(analysed.leftTurn().balance());
                assertThat(figures.rearLiftsBeforeLimit())
                        .isEqualTo(analysed.leftTurn().rearInsideLift() < analysed.leftTurn().limit());
            }
        }
    }

    @Test
    void candidateBarsAreMappedInEachOfTheirHoles() throws Exception {
        Vehicle vehicle = SizingFixtures.hatchback().vehicle();
        var candidate = vehicle.front().bar().withMaterial(MaterialLibrary.CHROMOLY_4130)
                .withSection(new SolidSection(24e-3));
        AdjustmentMap map = AdjustmentMap.of(vehicle, List.of(new LabelledBar("current", vehicle.front().bar()),
                new LabelledBar("24 mm", candidate)), List.of(new LabelledBar("current", vehicle.rear().bar()),
                new LabelledBar("none", null)), Progress.NONE);
        assertThat(map.rows()).hasSize(6);
        assertThat(map.columns()).hasSize(5);
        assertThat(map.columns().get(4).label()).isEqualTo("no bar");
        assertThat(map.cell(3, 0).front().barLabel()).isEqualTo("24 mm");
        assertThat(map.cells()).filteredOn(MapCell::current).hasSize(1);
        // more front bar (24 mm vs 22 mm, same hole) moves load transfer forward (model.md 5: K_f phi / t_f grows)
        assertThat(map.cell(4, 1).figures().frontLoadTransferShare())
                .isGreaterThan(map.cell(1, 1).figures().frontLoadTransferShare());
        assertThat(map.cell(0, 0).figures().bar(AxlePosition.REAR)).isNotNull();
        assertThat(map.cell(0, 4).figures().rearBar()).isNull();
    }
}
