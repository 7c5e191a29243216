package barwright.ui.field;

import barwright.io.KeyPath;
import barwright.ui.document.Samples;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class FieldSpecTest {
    @Test
    void usCustomaryFieldsConvertByTheNistFactors() {
        // docs/validation.md, section "Units" (NIST SP 811 appendix B definitions): 1 in = 25.4 mm, 1 lbf/in = 0.175 126 835 N/mm,
        // 1 lb = 0.453 592 37 kg, 1 ft lbf/deg = 1.355 817 948 N m/deg. The printed rate factors are rounded to
        // 9 and 10 significant digits, so they agree to 1e-8; the inch and the pound are exact.
        assertThat(FieldCatalogue.DIAMETER.toDisplay(25.4, UnitSystem.US)).isCloseTo(1.0, within(1e-12));
        FieldSpec spring = FieldCatalogue.AXLE_SPRINGS.get(0);
        assertThat(spring.toDisplay(0.175126835, UnitSystem.US)).isCloseTo(1.0, within(1e-8));
        assertThat(FieldCatalogue.WEIGHT.get(0).toDisplay(0.45359237, UnitSystem.US)).isCloseTo(1.0, within(1e-12));
        FieldSpec chassis = FieldCatalogue.BODY.get(2);
        assertThat(chassis.toDisplay(1.355817948, UnitSystem.US)).isCloseTo(1.0, within(1e-8));
        assertThat(chassis.toDisplay(7500, UnitSystem.SI)).isCloseTo(7500, within(1e-9));
    }

    @Test
    void aValueTypedInEitherSystemComesBackInTheFilesUnit() {
        assertThat(FieldCatalogue.DIAMETER.toFile(0.875, UnitSystem.US)).isEqualTo(22.225);
        assertThat(FieldCatalogue.DIAMETER.toFile(22.5, UnitSystem.SI)).isEqualTo(22.5);
        assertThat(FieldCatalogue.WEIGHT.get(1).toFile(63, UnitSystem.SI)).isEqualTo(0.63); // percent to fraction
    }

    @Test
    void everyFieldNamesANumberTheSampleFilesHold() {
        JsonNode sample = Samples.load(Samples.CLUB_HATCHBACK).tree();
        JsonNode roadster = Samples.load(Samples.ALL.get(2)).tree();
        check(sample, "vehicle", FieldCatalogue.WEIGHT);
        check(roadster, "vehicle.cornerMassesKg", FieldCatalogue.CORNERS);
        check(roadster, "vehicle", FieldCatalogue.BODY);
        check(sample, "analysis", FieldCatalogue.CHECK);
        for (String axle : List.of("front", "rear")) {
            check(sample, axle, FieldCatalogue.AXLE_GEOMETRY);
            check(sample, axle, FieldCatalogue.AXLE_UNSPRUNG);
            check(sample, axle, FieldCatalogue.AXLE_SPRINGS);
            check(sample, axle + ".tyre", FieldCatalogue.TYRE);
            check(sample, axle + ".bar", FieldCatalogue.BAR_LENGTHS);
            check(sample, axle + ".bar", List.of(FieldCatalogue.LINK_RATIO));
        }
        check(sample, "rear.bar.material", FieldCatalogue.MATERIAL);
        check(sample, "rear.bar.section", List.of(FieldCatalogue.DIAMETER, FieldCatalogue.WALL));
    }

    private static void check(JsonNode tree, String parent, List<FieldSpec> specs) {
        for (FieldSpec spec : specs) {
            JsonNode value = KeyPath.of(parent).child(spec.key()).get(tree);
            assertThat(value).as(parent + "." + spec.key()).isNotNull();
            assertThat(value.isNumber()).as(parent + "." + spec.key()).isTrue();
            assertThat(spec.help()).isNotBlank();
        }
    }
}
