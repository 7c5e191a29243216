package barwright.report;

import barwright.io.VehicleFileWriter;
import barwright.physics.AnalysisResult;
import barwright.physics.AxleResult;
import barwright.physics.TestCars;
import barwright.physics.VehicleAnalysis;
import barwright.physics.bar.BarResult;
import barwright.units.UnitSystem;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * A result with a number that is not defined never reaches a reader: the summary and the JSON report are
 * refused, naming the figure, rather than printing NaN (the guard of both output paths).
 */
class NonFiniteOutputTest {
    @Test
    void aSafetyFactorThatIsNotANumberStopsTheSummaryAndTheReportNamingIt() {
        AnalysisResult good = VehicleAnalysis.analyse(TestCars.clubCar());
        BarResult bar = good.front().bar();
        BarResult broken = new BarResult(bar.model(), bar.linkRate(), bar.mass(), bar.relativeLinkTravel(),
                bar.linkForce(), bar.torsionalShearStress(), bar.maxVonMisesStress(), bar.maxStressAt(), Double.NaN,
                bar.bushingLoads(), bar.deflectedShape());
        AxleResult front = new AxleResult(good.front().stiffness(), broken, good.front().loadTransfer(),
                good.front().corneringStiffness(), good.front().cornerSprungMass());
        AnalysisResult bad = new AnalysisResult(good.vehicle(), good.masses(), front, good.rear(), good.roll(),
                good.suspensionRoll(), good.frontLoadTransferShare(), good.frontRollStiffnessShare(),
                good.understeerGradient(), good.leftTurn(), good.rightTurn(), good.warnings());
        assertThatThrownBy(() -> TextSummary.of(bad, UnitSystem.SI))
                .isInstanceOf(IllegalStateException.class)
                .hasMessageContaining("bar safety factor (static) (front)").hasMessageContaining("NaN");
        assertThatThrownBy(() -> VehicleFileWriter.toJson(ReportJson.of(bad)))
                .isInstanceOf(IllegalStateException.class)
                .hasMessageContaining("front.barSafetyFactor");
    }
}
