package barwright.ui.sizing;

import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.sizing.Constraints;
import barwright.sizing.ReachableShare;
import barwright.sizing.SetupEvaluator;
import barwright.sizing.ShareReach;
import barwright.sizing.SizeChoices;
import barwright.sizing.catalogue.Catalogues;
import barwright.sizing.catalogue.StockSize;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.DialogFixture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JTable;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static barwright.ui.sizing.SizingWindowFixture.number;
import static barwright.ui.sizing.SizingWindowFixture.sample;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The search form as it opens on the club hatchback sample (invented data): its default target, the static front
 * weight + 5 points, is out of reach for the front bar, so the form aims just inside the reach and says so; a
 * target a person typed stays. The results table shows the columns a choice turns on (mass, safety factor, flags)
 * inside its visible width at the window's usual size and at 1024 x 768, and cuts no header.
 */
@Tag("window")
class SizingReachWindowTest {
    private SizingWindowFixture fixture;

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    private DialogFixture openSettled() {
        DialogFixture sizing = fixture.openTool("Size a bar to a target…");
        SearchForm form = GuiActionRunner.execute(() -> fixture.views().search().form());
        fixture.waitFor("the reach", () -> form.reachSettled() && !form.reachText().isBlank());
        return sizing;
    }

    /** @return the front bar's reach with the form's defaults (own material, built-in sizes, safety factor 1.5) */
    private static ShareReach frontReach() {
        Vehicle car = sample();
        List<StockSize> sizes = new ArrayList<>();
        Catalogues.builtIn().forEach(catalogue -> sizes.addAll(catalogue.sizes()));
        return ReachableShare.of(new SetupEvaluator(car), List.of(AxlePosition.FRONT), Map.of(AxlePosition.FRONT,
                new SizeChoices(List.of(car.front().bar().material()), sizes, List.of())),
                Constraints.safetyFactor(1.5)).orElseThrow();
    }

    @Test
    void aDefaultTargetOutOfReachIsMovedInsideAndSaidSo() {
        fixture = new SizingWindowFixture();
        DialogFixture sizing = openSettled();
        ShareReach reach = frontReach();
        sizing.radioButton("search.shareItself").requireSelected();
        double aimed = number(sizing.textBox("search.share").text()) / 100;
        assertThat(reach.contains(aimed)).isTrue();
        // a point inside the top (the range is wider than ten points), rounded to a tenth of a point
        assertThat(aimed).isCloseTo(reach.highest() - 0.01, within(0.0005));
        String note = GuiActionRunner.execute(() -> fixture.views().search().form().reachText());
        assertThat(note).startsWith("Static front weight 63.0 % + 5.0 points = 68.0 % is out of reach for the front "
                + "bar on this car (reachable ").contains("; aiming at ");
    }

    @Test
    void aTargetAPersonTypedStays() {
        fixture = new SizingWindowFixture();
        DialogFixture sizing = openSettled();
        sizing.radioButton("search.shareItself").click();
        sizing.textBox("search.share").deleteText().enterText("70");
        sizing.comboBox("search.axle").selectItem("rear bar");
        SearchForm form = GuiActionRunner.execute(() -> fixture.views().search().form());
        fixture.waitFor("the rear bar's reach", () -> form.reachSettled()
                && form.reachText().startsWith("Reachable with the rear bar"));
        assertThat(number(sizing.textBox("search.share").text())).isEqualTo(70.0);
        sizing.radioButton("search.shareItself").requireSelected();
    }

    @Test
    void theDecidingColumnsAreInViewAtTheUsualSize() {
        fixture = new SizingWindowFixture();
        fixture.searchRearFor52();
        assertDecidingColumnsInView();
    }

    @Test
    void theDecidingColumnsAreInViewAt1024By768() {
        fixture = new SizingWindowFixture(1024, 768, 0);
        fixture.searchRearFor52();
        GuiActionRunner.execute(() -> {
            SizingWindow views = fixture.views();
            views.setSize(1024, 768);
            views.validate();
            return null;
        });
        fixture.robot.waitForIdle();
        assertDecidingColumnsInView();
    }

    @Test
    void withTheLargestTextAt1024By768TheSettingsAndResultsAreTabsAndTheDecidingColumnsInView() {
        fixture = new SizingWindowFixture(1024, 768, barwright.ui.app.Themes.largestTextSize());
        DialogFixture sizing = fixture.openTool("Size a bar to a target…");
        GuiActionRunner.execute(() -> {
            SizingWindow views = fixture.views();
            views.setSize(1024, 768);
            views.validate();
            return null;
        });
        fixture.robot.waitForIdle();
        // side by side the settings alone wanted most of the width: their labels and the table were cut
        assertThat(GuiActionRunner.execute(() -> fixture.views().search().settingsAndResultsTabbed())).isTrue();
        sizing.comboBox("search.axle").selectItem("rear bar");
        sizing.radioButton("search.shareItself").click();
        sizing.textBox("search.share").deleteText().enterText("52");
        sizing.button("search.run").click();
        fixture.waitFor("the rows", () -> fixture.views().search().table().getRowCount() > 0);
        fixture.robot.waitForIdle();
        // a finished search turns to its results
        assertThat(GuiActionRunner.execute(() -> fixture.views().search().table().isShowing())).isTrue();
        assertDecidingColumnsInView();
    }

    /** Mass, safety factor and flags end inside the scroll pane's visible width; no header is cut. */
    private void assertDecidingColumnsInView() {
        List<String> faults = GuiActionRunner.execute(() -> {
            JTable table = fixture.views().search().table();
            assertThat(table.getRowCount()).isPositive();
            return SizingWindowFixture.cutColumns(table, CandidateTableModel.MASS, CandidateTableModel.SAFETY,
                    CandidateTableModel.FLAGS);
        });
        assertThat(faults).isEmpty();
    }
}
