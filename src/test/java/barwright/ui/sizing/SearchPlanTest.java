package barwright.ui.sizing;

import barwright.io.VehicleDocument;
import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.model.Material;
import barwright.model.MaterialLibrary;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.model.Vehicle;
import barwright.physics.VehicleAnalysis;
import barwright.sizing.SizingRequest;
import barwright.solver.Progress;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

import java.io.InputStream;
import java.nio.file.Path;
import java.util.List;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * The search form's settings turned into the core's search, without a window. Inputs are the shipped demo cars
 * (invented data); expected values come from the vehicle file itself, the catalogue files counted here, and the
 * full analysis (barwright.physics.VehicleAnalysis, model.md 1-8) of the car with the answer put in.
 */
class SearchPlanTest {
    private static VehicleDocument car(String file) throws Exception {
        return VehicleLoader.read(Path.of("sample-vehicles", file));
    }

    private static SearchSettings settings(List<AxlePosition> axles, SearchSettings.ShareAim aim, Double value,
                                           Double gradient, List<Material> materials, List<String> catalogues,
                                           Double tube) {
        return new SearchSettings(axles, aim, value, gradient, 1.5, false, false, null, null, true, materials,
                catalogues, tube, 10);
    }

    @Test
    void an_offset_aims_at_the_files_static_front_weight_plus_the_offset() throws Exception {
        Vehicle hatchback = car("club-hatchback.json").vehicle();
        SizingRequest request = SearchPlan.request(hatchback, settings(List.of(AxlePosition.REAR),
                SearchSettings.ShareAim.OFFSET_FROM_STATIC, 0.05, null, List.of(), List.of("solid-metric"), null));
        // the file says frontMassFraction 0.63 with no corner masses: 0.63 + 0.05, to rounding
        assertThat(request.targets().shareFor(0.63)).isCloseTo(0.68, within(1e-12));
        assertThat(request.targets().rollGradient()).isNull();
        assertThat(request.constraints().minSafetyFactor()).isEqualTo(1.5);
        assertThat(request.constraints().mustNotLiftBeforeLimit()).isEmpty();
        assertThat(request.axles()).containsExactly(AxlePosition.REAR);
    }

    @Test
    void each_bar_keeps_its_own_material_first_and_a_material_ticked_twice_is_tried_once() throws Exception {
        Vehicle hatchback = car("club-hatchback.json").vehicle();
        SizingRequest request = SearchPlan.request(hatchback, settings(List.of(AxlePosition.FRONT, AxlePosition.REAR),
                SearchSettings.ShareAim.SHARE, 0.5, null,
                List.of(MaterialLibrary.SPRING_STEEL, MaterialLibrary.CHROMOLY_4130), List.of("tube-inch"), null));
        // the file's front bar is of "spring steel" by name (the library's), the rear of a certified 4130 tube
        assertThat(request.choices().get(AxlePosition.FRONT).materials())
                .containsExactly(MaterialLibrary.SPRING_STEEL, MaterialLibrary.CHROMOLY_4130);
        assertThat(request.choices().get(AxlePosition.REAR).materials()).hasSize(3);
        assertThat(request.choices().get(AxlePosition.REAR).materials().get(0).name())
                .isEqualTo("4130 tube, hardened (invented certificate)");
    }

    @Test
    void the_sizes_are_every_entry_of_the_catalogues_ticked() throws Exception {
        int expected = 0;
        for (String name : List.of("solid-metric", "tube-metric")) {
            try (InputStream in = getClass().getResourceAsStream("/barwright/catalogues/" + name + ".json")) {
                JsonNode tree = new ObjectMapper().readTree(in);
                expected += tree.path("sizes").size(); // counted from the files themselves
            }
        }
        SizingRequest request = SearchPlan.request(car("club-hatchback.json").vehicle(), settings(
                List.of(AxlePosition.FRONT), SearchSettings.ShareAim.SHARE, 0.5, null, List.of(),
                List.of("solid-metric", "tube-metric"), null));
        assertThat(request.choices().get(AxlePosition.FRONT).sizes()).hasSize(expected);
    }

    @Test
    void the_exact_solid_diameter_and_wall_meet_the_target_in_the_full_analysis() throws Exception {
        Vehicle hatchback = car("club-hatchback.json").vehicle();
        SearchOutcome outcome = SearchPlan.run(hatchback, settings(List.of(AxlePosition.FRONT),
                SearchSettings.ShareAim.SHARE, 0.5, null, List.of(), List.of("solid-metric"), 30e-3), Progress.NONE);
        assertThat(outcome.exactSolid().found()).isTrue();
        assertThat(outcome.exactWall().found()).isTrue();
        var bar = hatchback.front().bar();
        double withSolid = VehicleAnalysis.analyse(hatchback.withAxle(AxlePosition.FRONT, hatchback.front().withBar(
                bar.withSection(new SolidSection(outcome.exactSolid().dimension()))))).frontLoadTransferShare();
        double withTube = VehicleAnalysis.analyse(hatchback.withAxle(AxlePosition.FRONT, hatchback.front().withBar(
                bar.withSection(new TubeSection(30e-3, outcome.exactWall().dimension()))))).frontLoadTransferShare();
        // the solver's accuracy (1e-12 m in the dimension) is far inside 1e-6 of share
        assertThat(withSolid).isCloseTo(0.5, within(1e-6));
        assertThat(withTube).isCloseTo(0.5, within(1e-6));
        assertThat(outcome.result().candidates()).isNotEmpty();
        assertThat(outcome.result().targetShare()).isEqualTo(0.5);
    }

    @Test
    void a_roll_gradient_target_is_kept_in_si() throws Exception {
        double degPerG = RADIANS_PER_DEGREE / STANDARD_GRAVITY;
        SizingRequest request = SearchPlan.request(car("club-hatchback.json").vehicle(), settings(
                List.of(AxlePosition.FRONT), SearchSettings.ShareAim.NONE, null, 1.1 * degPerG, List.of(),
                List.of("solid-metric"), null));
        assertThat(request.targets().hasShare()).isFalse();
        assertThat(request.targets().rollGradient()).isCloseTo(1.1 * degPerG, within(1e-15));
    }

    @Test
    void settings_that_make_no_search_are_refused_in_words() throws Exception {
        Vehicle hatchback = car("club-hatchback.json").vehicle();
        Vehicle saloon = car("road-saloon.json").vehicle(); // its file has "bar": null at the rear
        assertThatThrownBy(() -> SearchPlan.request(hatchback, settings(List.of(AxlePosition.FRONT),
                SearchSettings.ShareAim.NONE, null, null, List.of(), List.of("solid-metric"), null)))
                .hasMessageContaining("Give a target");
        assertThatThrownBy(() -> SearchPlan.request(hatchback, settings(List.of(AxlePosition.FRONT),
                SearchSettings.ShareAim.SHARE, 0.5, null, List.of(), List.of(), null)))
                .hasMessageContaining("tick at least one catalogue");
        assertThatThrownBy(() -> SearchPlan.request(hatchback, new SearchSettings(List.of(AxlePosition.FRONT),
                SearchSettings.ShareAim.SHARE, 0.5, null, 1.5, false, false, null, null, false, List.of(),
                List.of("solid-metric"), null, 10))).hasMessageContaining("tick at least one material");
        assertThatThrownBy(() -> SearchPlan.request(saloon, settings(List.of(AxlePosition.REAR),
                SearchSettings.ShareAim.SHARE, 0.5, null, List.of(), List.of("solid-metric"), null)))
                .hasMessageContaining("The rear axle has no bar");
        assertThatThrownBy(() -> SearchPlan.request(hatchback, settings(List.of(AxlePosition.FRONT),
                SearchSettings.ShareAim.SHARE, 0.5, null, List.of(), List.of("no-such-catalogue"), null)))
                .hasMessageContaining("no-such-catalogue");
    }
}
