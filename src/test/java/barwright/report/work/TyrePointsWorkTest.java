package barwright.report.work;

import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The working behind the grip limit for a car on tyres given as points (model.md 8.1): it names the points
 * instead of a law, and it closes: the capacity it shows equals the force the axle must give at the limit.
 */
class TyrePointsWorkTest {
    @Test
    void theLimitOfACarOnFittedTyresIsWorkedFromThePointsAndCloses() throws Exception {
        AnalysisResult result = VehicleAnalysis.analyse(VehicleLoader.parse(Files.readAllBytes(
                Path.of("sample-vehicles/club-hatchback-fitted-tyres.json"))).vehicle());
        Derivation limit = Derivations.of(result, KeyFigure.of(KeyFigure.Kind.LIMIT, TurnDirection.LEFT));
        String text = WorkText.of(limit, UnitSystem.SI, Locale.ROOT);
        assertThat(text).contains("from the tyre's peak friction points").doesNotContain("μ0 (1 + s")
                .doesNotContain("NaN");
        // at the limit the axle's capacity meets what it must give: m share a_y (the limit's own definition,
        // found by the root finder to 1e-9 m/s^2, so 1e-6 of the force)
        double mustGive = limit.input("m").value() * limit.input("share").value() * result.leftTurn().limit();
        assertThat(limit.step("capacity").value()).isCloseTo(mustGive, within(1e-6 * mustGive));
        assertThat(result.leftTurn().limit()).isGreaterThan(0.5 * STANDARD_GRAVITY);
        assertThat(result.vehicle().axle(AxlePosition.FRONT).tyre().hasFrictionPoints()).isTrue();
    }
}
