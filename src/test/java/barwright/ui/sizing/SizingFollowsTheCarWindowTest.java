package barwright.ui.sizing;

import barwright.sizing.catalogue.Catalogues;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.DialogFixture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The sizing window follows the open car (samples: invented data): after another file is opened its results are
 * cleared with Apply disabled; while it is hidden a mass typed key by key costs it no work and throws nothing; a
 * "both bars" search over too many pairs is refused in words that say what to narrow, and clears the old results.
 * Any exception that reaches the event thread fails the test.
 */
@Tag("window")
class SizingFollowsTheCarWindowTest {
    private SizingWindowFixture fixture;
    private final List<Throwable> uncaught = new CopyOnWriteArrayList<>();
    private Thread.UncaughtExceptionHandler previous;

    @BeforeEach
    void open() {
        previous = Thread.getDefaultUncaughtExceptionHandler();
        Thread.setDefaultUncaughtExceptionHandler((thread, thrown) -> uncaught.add(thrown));
        fixture = new SizingWindowFixture();
    }

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
        Thread.setDefaultUncaughtExceptionHandler(previous);
    }

    /** Sizes the rear bar for a front share of 52 %; the sample's rear bar is in hole 2 of 4. */
    private DialogFixture searchRearFor52() {
        DialogFixture sizing = fixture.searchRearFor52();
        sizing.button("search.apply").requireEnabled();
        return sizing;
    }

    @Test
    void opening_another_car_clears_the_results_and_disables_apply() {
        DialogFixture sizing = searchRearFor52();
        // the estate's rear bar has one hole: the results for hole 2 of the hatchback's cannot apply to it
        fixture.dialogs.filesToOpen.add(Path.of("sample-vehicles", "estate-dropped-rear-bar.json").toAbsolutePath());
        fixture.frame.menuItemWithPath("File", "Open…").click();
        fixture.waitFor("the estate", () -> fixture.window.document().displayName().contains("estate"));
        assertThat(sizing.table("search.results").rowCount()).isZero();
        sizing.button("search.apply").requireDisabled();
        assertThat(GuiActionRunner.execute(() -> fixture.views().search().summaryText()))
                .contains("Another car was opened").contains("cleared");
        sizing.button("search.apply").click(); // a disabled button: nothing happens, nothing is thrown
        fixture.robot.waitForIdle();
        assertThat(fixture.dialogs.errors).isEmpty();
        assertThat(uncaught).isEmpty();
    }

    @Test
    void a_mass_typed_while_the_window_is_hidden_costs_it_no_work_and_throws_nothing() {
        DialogFixture sizing = searchRearFor52();
        sizing.close();
        fixture.robot.waitForIdle();
        fixture.frame.tabbedPane("editor.tabs").selectTab("Car");
        // typed key by key: 9 kg and 95 kg pass by, lighter than the unsprung masses, on the way to 950 kg
        fixture.frame.textBox("vehicle.massKg").deleteText().enterText("950");
        fixture.waitFor("the analysis", () -> fixture.window.analysis().isIdle());
        assertThat(uncaught).isEmpty();
        SizingWindow views = fixture.views();
        assertThat(GuiActionRunner.execute(() -> views.map().shown())).as("the map was never worked out").isNull();
        assertThat(GuiActionRunner.execute(() -> views.preload().shown())).as("nor the preload").isNull();
        assertThat(GuiActionRunner.execute(() -> views.search().work().isIdle())).isTrue();
        // shown again, the results say they belong to the car before the change, and cannot be applied
        GuiActionRunner.execute(() -> views.open(SizingWindow.Tab.SEARCH));
        fixture.robot.waitForIdle();
        assertThat(GuiActionRunner.execute(() -> views.search().summaryText()))
                .contains("The car has changed since this search");
        sizing.button("search.apply").requireDisabled();
        assertThat(uncaught).isEmpty();
    }

    @Test
    void a_both_bars_search_over_too_many_pairs_says_what_to_narrow_and_clears_the_old_results() {
        DialogFixture sizing = searchRearFor52();
        sizing.comboBox("search.axle").selectItem("both bars");
        for (String material : List.of("spring steel", "4130 chromoly", "Ti-6Al-4V titanium", "7075-T6 aluminium")) {
            sizing.checkBox("search.material." + material).check();
        }
        for (String name : Catalogues.BUILT_IN) {
            sizing.checkBox("search.catalogue." + name).check();
        }
        sizing.button("search.run").click();
        fixture.robot.waitForIdle();
        SearchView view = fixture.views().search();
        String message = GuiActionRunner.execute(() -> view.work().message());
        // at least 4 materials x 189 built-in sizes x 3 front holes against the same x 4 rear holes: millions
        assertThat(message).startsWith("Too many pairs to try").contains("Narrow it")
                .contains("size one bar at a time").contains("results were cleared");
        assertThat(message).doesNotContainPattern("\\d{7}"); // counts written with separators, never bare
        assertThat(sizing.table("search.results").rowCount()).isZero();
        sizing.button("search.apply").requireDisabled();
        assertThat(GuiActionRunner.execute(() -> view.work().isIdle())).as("no search started").isTrue();
        assertThat(uncaught).isEmpty();
    }
}
