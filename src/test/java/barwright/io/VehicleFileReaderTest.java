package barwright.io;

import barwright.loading.VehicleLoader;
import barwright.model.AntiRollBar;
import barwright.model.MaterialLibrary;
import barwright.model.TubeSection;
import barwright.model.Vehicle;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Reading a vehicle file (files.md): units of the key names to SI, defaults, and the open document. */
class VehicleFileReaderTest {
    private static final double DEG = Math.PI / 180;

    private static VehicleDocument read(ObjectNode tree) throws VehicleFileException {
        return VehicleLoader.parse(Fixtures.text(tree).getBytes(StandardCharsets.UTF_8));
    }

    @Test
    void keysInFileUnitsBecomeSi() throws Exception {
        // files.md: units are in the key names (mm, N/mm, GPa, MPa, N·m/deg); the core holds SI (model.md)
        Vehicle car = VehicleLoader.parse(Fixtures.testVehicleText().getBytes(StandardCharsets.UTF_8)).vehicle();
        assertThat(car.mass()).isEqualTo(1050);
        assertThat(car.frontMassFraction()).isEqualTo(0.62);
        assertThat(car.cgHeight()).isCloseTo(0.5, within(1e-15));
        assertThat(car.wheelbase()).isCloseTo(2.45, within(1e-15));
        assertThat(car.chassisTorsionalStiffness()).isNull();
        assertThat(car.cornerMasses()).isNull();
        assertThat(car.front().track()).isCloseTo(1.46, within(1e-15));
        assertThat(car.front().springRate()).isCloseTo(55e3, within(1e-9));
        assertThat(car.front().tyreVerticalRate()).isCloseTo(230e3, within(1e-9));
        assertThat(car.differentialWheelTravel()).isCloseTo(0.06, within(1e-15));
        AntiRollBar bar = car.front().bar();
        assertThat(bar.material().youngsModulus()).isCloseTo(207e9, within(1e-3));
        assertThat(bar.material().yieldStrength()).isCloseTo(1200e6, within(1e-6));
        assertThat(bar.section()).isEqualTo(new TubeSection(0.0254, 0.003));
        assertThat(bar.dimensions().bushingSpan()).isCloseTo(0.76, within(1e-15));
        assertThat(bar.dimensions().armLengths()).hasSize(3);
        assertThat(bar.selectedArmLength()).isCloseTo(0.2, within(1e-15));
        assertThat(bar.linkMotionRatio()).isEqualTo(0.85);
    }

    @Test
    void optionalKeysTakeTheirDefaults() throws Exception {
        // files.md: bushingSpanMm absent means the torsion length; a material {"name"} alone names the library;
        // analysis absent gives a 60 mm check travel; chassis stiffness in N·m/deg becomes N m/rad
        ObjectNode tree = Fixtures.with(Fixtures.testVehicleTree(), "analysis", null);
        tree = Fixtures.with(tree, "vehicle.chassisTorsionalStiffnessNmPerDeg", "7500");
        Vehicle car = read(tree).vehicle();
        AntiRollBar rear = car.rear().bar();
        assertThat(rear.dimensions().bushingSpan()).isEqualTo(rear.dimensions().torsionLength());
        assertThat(rear.material()).isEqualTo(MaterialLibrary.SPRING_STEEL);
        assertThat(car.differentialWheelTravel()).isCloseTo(0.060, within(1e-15));
        assertThat(car.chassisTorsionalStiffness()).isCloseTo(7500 / DEG, within(1e-9));
        assertThat(read(Fixtures.with(tree, "rear.bar", "null")).vehicle().rear().hasBar()).isFalse();
    }

    @Test
    void cornerMassesReplaceMassAndSplit() throws Exception {
        // files.md: with corner masses, massKg and frontMassFraction may be absent or must agree within 0.5 %
        ObjectNode withCorners = Fixtures.with(Fixtures.testVehicleTree(), "vehicle.cornerMassesKg",
                "{\"leftFront\": 320, \"rightFront\": 331, \"leftRear\": 195, \"rightRear\": 204}");
        ObjectNode tree = Fixtures.with(Fixtures.with(withCorners, "vehicle.massKg", null),
                "vehicle.frontMassFraction", null);
        Vehicle car = read(tree).vehicle();
        assertThat(car.mass()).isCloseTo(1050, within(1e-12));
        assertThat(car.frontMassFraction()).isCloseTo(651.0 / 1050, within(1e-15));
        // within 0.5 %: 1050 * 1.004 is accepted, the fraction 0.62 against 0.62 exactly too
        ObjectNode agreeing = Fixtures.with(tree, "vehicle.massKg", "1054");
        assertThat(read(Fixtures.with(agreeing, "vehicle.frontMassFraction", "0.62")).vehicle().mass())
                .isCloseTo(1050, within(1e-12));
        assertThatThrownBy(() -> read(Fixtures.with(tree, "vehicle.massKg", "1060")))
                .isInstanceOf(VehicleFileException.class).hasMessageContaining("vehicle.massKg = 1060");
    }

    @Test
    void theDocumentKeepsTheTreeAndEditsGoThroughACopy() throws Exception {
        VehicleDocument document = read(Fixtures.testVehicleTree());
        ObjectNode edit = document.editableTree();
        ((ObjectNode) edit.get("front")).put("springRateNPerMm", 80);
        VehicleDocument edited = VehicleLoader.fromTree(edit);
        assertThat(edited.vehicle().front().springRate()).isCloseTo(80e3, within(1e-9));
        // the open document is untouched by the edit
        assertThat(document.tree().get("front").get("springRateNPerMm").asDouble()).isEqualTo(55);
        assertThat(document.vehicle().front().springRate()).isCloseTo(55e3, within(1e-9));
        // a failed edit leaves nothing half-loaded: the exception is all there is
        ((ObjectNode) edit.get("front")).put("springRateNPerMm", -1);
        assertThatThrownBy(() -> VehicleLoader.fromTree(edit)).isInstanceOf(VehicleFileException.class)
                .satisfies(e -> assertThat(((VehicleFileException) e).problems())
                        .extracting(Problem::path).containsExactly("front.springRateNPerMm"));
    }

    @Test
    void problemsCarryPathAndMessageApart() {
        Problem problem = new Problem("front.trackMm", "= 100 mm: must be between 300 and 4000 mm");
        assertThat(problem).hasToString("front.trackMm = 100 mm: must be between 300 and 4000 mm");
        assertThat(new Problem("", "the file is empty")).hasToString("the file is empty");
    }

    @Test
    void bytesOverFourMegabytesAreRefused() {
        byte[] big = new byte[(int) VehicleFileReader.MAX_BYTES + 1];
        assertThatThrownBy(() -> VehicleLoader.parse(big)).isInstanceOf(VehicleFileException.class)
                .hasMessageContaining("larger than 4 MB");
    }
}
