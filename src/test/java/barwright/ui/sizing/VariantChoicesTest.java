package barwright.ui.sizing;

import barwright.io.VehicleFileException;
import barwright.io.VehicleDocument;
import barwright.loading.VehicleLoader;
import barwright.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * What a variant may change, read from the sample files (invented cars): only what each car has, under the
 * editor's labels, holes counted from 1 in the window and from 0 in the file, values typed in the display unit.
 */
class VariantChoicesTest {

    private static VehicleDocument sample(String name) throws VehicleFileException {
        return VehicleLoader.read(Path.of("sample-vehicles", name));
    }

    private static List<String> titles(VehicleDocument car) {
        return VariantChoices.of(car.tree()).stream().map(VariantChoices.Choice::title).toList();
    }

    private static VariantChoices.Choice choice(VehicleDocument car, String title) {
        return VariantChoices.of(car.tree()).stream().filter(choice -> choice.title().equals(title)).findFirst()
                .orElseThrow();
    }

    @Test
    void the_club_hatchback_offers_what_it_has_under_the_editors_labels() throws Exception {
        List<String> titles = titles(sample("club-hatchback.json"));
        assertThat(titles).contains("Car — Car mass", "Car — Body twist stiffness", "Car — Bar check travel",
                "Front axle — Spring rate", "Front axle — Peak grip at reference", "Front bar — Outside diameter",
                "Front bar — Hole 3 arm length", "Front bar — " + VariantChoices.ARM_HOLE,
                "Rear axle — Roll centre height", "Rear bar — Tube wall", "Rear bar — Yield strength",
                "Rear bar — Hole 4 arm length", "Rear bar — " + VariantChoices.ARM_HOLE);
        // the front strut sets the front roll centre; the front bar's material is a named one; no four scales
        assertThat(titles).doesNotContain("Front axle — Roll centre height", "Front bar — Yield strength",
                "Front bar — Tube wall", "Front bar — Hole 4 arm length", "Car — Left front");
        assertThat(titles).doesNotHaveDuplicates();
    }

    @Test
    void a_car_without_a_rear_bar_offers_no_rear_bar_fields() throws Exception {
        List<String> titles = titles(sample("road-saloon.json"));
        assertThat(titles).noneMatch(title -> title.startsWith("Rear bar"));
        assertThat(titles).contains("Rear axle — Spring rate", "Front bar — Outside diameter");
    }

    @Test
    void a_shaped_bar_offers_its_holes_by_set_back_and_no_lengths() throws Exception {
        VehicleDocument car = sample("hillclimb-special-swept-bar.json");
        List<String> titles = titles(car);
        assertThat(titles).contains("Front bar — Outside diameter", "Front bar — Link motion ratio");
        assertThat(titles).noneMatch(title -> title.startsWith("Front bar —") && title.contains("length"));
        VariantChoices.Choice holes = choice(car, "Front bar — " + VariantChoices.ARM_HOLE);
        assertThat(holes.holeText(1, UnitSystem.SI, Locale.ROOT)).isEqualTo("Hole 2 (set back 20 mm)");
    }

    @Test
    void a_hole_counted_from_1_goes_into_the_file_counted_from_0_and_reads_in_words() throws Exception {
        VehicleDocument car = sample("club-hatchback.json");
        VariantChoices.Choice holes = choice(car, "Rear bar — " + VariantChoices.ARM_HOLE);
        assertThat(holes.holeText(2, UnitSystem.SI, Locale.ROOT)).isEqualTo("Hole 3 (arm 200 mm)");
        VariantChange third = VariantChange.hole(holes, 3);
        assertThat(third.edit()).isEqualTo("rear.bar.selectedArm=2");
        assertThat(third.words(car.tree(), UnitSystem.SI, Locale.ROOT))
                .isEqualTo("Rear bar — Arm hole in use: 2 → 3");
        assertThat(VariantChange.hole(holes, 2).changesNothing(car.tree())).isTrue();
    }

    @Test
    void a_spring_rate_typed_in_lbf_per_inch_reaches_the_file_in_newtons_per_millimetre() throws Exception {
        VehicleDocument car = sample("club-hatchback.json");
        VariantChoices.Choice spring = choice(car, "Front axle — Spring rate");
        VariantChange change = VariantChange.number(spring, "450", UnitSystem.US, Locale.ROOT);
        // 1 lbf/in = 0.175126835 N/mm (NIST SP 811 definitions, docs/validation.md "Units"), given to 9 figures:
        // half a unit in its last place is 2.9e-9 relative, so 3e-9 (the file keeps 12 figures)
        assertThat(change.value().doubleValue()).isCloseTo(450 * 0.175126835, within(450 * 0.175126835 * 3e-9));
        assertThat(change.words(car.tree(), UnitSystem.SI, Locale.ROOT))
                .isEqualTo("Front axle — Spring rate: 70 → 78.81 N/mm");
        assertThat(change.words(car.tree(), UnitSystem.US, Locale.ROOT))
                .isEqualTo("Front axle — Spring rate: 399.71 → 450 lbf/in");
        assertThat(VehicleLoader.withEdits(car, List.of(change.edit())).vehicle().front().springRate())
                .isCloseTo(450 * 175.126835, within(450 * 175.126835 * 3e-9));
    }

    @Test
    void text_that_is_not_a_number_is_refused_naming_the_field() throws Exception {
        VehicleDocument car = sample("club-hatchback.json");
        VariantChoices.Choice spring = choice(car, "Front axle — Spring rate");
        assertThatThrownBy(() -> VariantChange.number(spring, "stiff", UnitSystem.SI, Locale.ROOT))
                .hasMessage("Front axle — Spring rate: 'stiff' is not a number");
        assertThatThrownBy(() -> VariantChange.number(spring, " ", UnitSystem.SI, Locale.ROOT))
                .hasMessageContaining("Front axle — Spring rate is empty");
        // an optional number left empty is left out of the file (a rigid body)
        VariantChoices.Choice body = choice(car, "Car — Body twist stiffness");
        assertThat(VariantChange.number(body, "", UnitSystem.SI, Locale.ROOT).edit())
                .isEqualTo("vehicle.chassisTorsionalStiffnessNmPerDeg=null");
    }
}
