package barwright.physics;

import barwright.loading.VehicleLoader;
import barwright.io.VehicleFileReader;
import barwright.model.DoubleWishbone;
import barwright.model.FrontViewPoint;
import barwright.model.SuspensionGeometry;
import barwright.model.Vehicle;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * A linkage that cannot follow the body's roll to the grip limit (model.md, "When the answer leaves the model"):
 * the analysis goes on with the geometry held and says so with a coded warning naming the roll and the a_y.
 */
class LinkageWarningsTest {
    private static Vehicle saloon() throws Exception {
        return VehicleLoader.read(Path.of("sample-vehicles", "road-saloon.json")).vehicle();
    }

    @Test
    void aDoubleWishboneThatLocksInDroopBeforeTheLimitIsWarnedOfWithItsRollAndAcceleration() throws Exception {
        // a short upper arm (150 mm) whose line meets the upright's after some 67 mm of droop: with the body
        // rolling about 5 deg the inside wheel gets there (the independent check: AxleKinematics' own lock)
        Vehicle saloon = saloon();
        DoubleWishbone shortUpperArm = new DoubleWishbone(new FrontViewPoint(0.45, 0.36),
                new FrontViewPoint(0.60, 0.35), new FrontViewPoint(0.25, 0.12), new FrontViewPoint(0.64, 0.12));
        Vehicle car = saloon.withFront(saloon.front().withSuspension(new SuspensionGeometry(shortUpperArm, 0, 0))
                .withBar(null)).withRear(saloon.rear().withBar(null));
        AnalysisResult result = VehicleAnalysis.analyse(car);
        AxleRollGeometry front = result.migration().geometry(barwright.model.AxlePosition.FRONT);
        assertThat(front.linkageStops()).isTrue();
        double rollAtLimit = result.leftTurn().cornering().geometryRoll(result.leftTurn().limit());
        assertThat(rollAtLimit).isGreaterThan(front.endRoll());
        Warning warning = result.warnings().stream().filter(w -> w.code().equals("FRONT_LINKAGE_LOCKS_BEFORE_LIMIT"))
                .findFirst().orElseThrow();
        assertThat(warning.message()).contains("the upper arm and the upright come into line")
                .contains(String.format(java.util.Locale.ROOT, "%.1f deg of body roll", Math.toDegrees(front.endRoll())))
                .contains(String.format(java.util.Locale.ROOT, "reached at %.2f g",
                        result.migration().accelForRoll(front.endRoll()) / STANDARD_GRAVITY))
                .doesNotContain("NaN").doesNotContain("Infinity");
        // past the lock the geometry is held: the limit is still a number
        assertThat(result.leftTurn().limit()).isFinite().isPositive();
        assertThat(result.warnings()).noneMatch(w -> w.code().equals("REAR_LINKAGE_LOCKS_BEFORE_LIMIT"));
    }

    @Test
    void aRollPastWhatIsFollowedIsWarnedOfAsHeld() throws Exception {
        // springs at 0.3 of the saloon's and no bars: some 27 deg of roll at the limit, past the 12 deg followed
        Vehicle saloon = saloon();
        Vehicle soft = saloon.withFront(saloon.front().withSpringRate(0.3 * saloon.front().springRate()).withBar(null))
                .withRear(saloon.rear().withSpringRate(0.3 * saloon.rear().springRate()).withBar(null));
        AnalysisResult result = VehicleAnalysis.analyse(soft);
        assertThat(result.warnings()).anyMatch(w -> w.code().equals("FRONT_ROLL_CENTRE_HELD_BEFORE_LIMIT"))
                .anyMatch(w -> w.code().equals("REAR_ROLL_CENTRE_HELD_BEFORE_LIMIT"));
        // the sample itself reaches its limit with its linkages followed: no such warning
        assertThat(VehicleAnalysis.analyse(saloon).warnings()).noneMatch(w -> w.code().contains("LINKAGE")
                || w.code().contains("HELD") || w.code().contains("RUNS_AWAY"));
    }
}
