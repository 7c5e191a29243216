package barwright.ui.linkage;

import barwright.io.KeyPath;
import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.model.FrontViewPoint;
import barwright.physics.linkage.FrontViewFigure;
import barwright.ui.Display;
import barwright.ui.ScriptedDialogs;
import barwright.ui.action.WindowContext;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;
import barwright.ui.task.AnalysisController;
import barwright.ui.task.CorneringProbe;
import barwright.ui.task.ResultsModel;
import barwright.units.UnitSystem;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JFrame;
import javax.swing.JTable;
import java.awt.event.InputEvent;
import java.awt.event.MouseEvent;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The linkage page on the invented sample cars, in a frame of its own with the live analysis behind it (the
 * window's own pieces: OpenDocument, AnalysisController, ResultsModel, CorneringProbe), under a display.
 */
@Tag("window")
class LinkagePageTest {
    /**
     * Roll-centre heights are compared with the hand construction to 1e-6 m: the core solves the linkage to 1e-12 m
     * of travel, so this leaves room only for rounding, while a wrong point (1 mm) would show as ~0.1 mm or more.
     */
    private static final double HAND_CONSTRUCTION = 1e-6;

    private JFrame frame;
    private OpenDocument document;
    private ViewSettings view;
    private CorneringProbe probe;
    private AnalysisController analysis;
    private LinkagePage page;

    private void open(String sample) throws Exception {
        Display.require();
        var car = VehicleLoader.read(Path.of("sample-vehicles", sample + ".json"));
        GuiActionRunner.execute(() -> {
            document = new OpenDocument(car, null, "sample: " + sample);
            view = new ViewSettings(UnitSystem.SI, Locale.ROOT);
            probe = new CorneringProbe();
            ResultsModel results = new ResultsModel();
            analysis = new AnalysisController(document, results);
            frame = new JFrame("linkage");
            frame.setLocation(100, 100);
            page = new LinkagePage(new WindowContext(frame, document, view, new ScriptedDialogs(), results), probe);
            frame.add(page);
            frame.setSize(1100, 900);
            frame.setVisible(true);
            analysis.refresh();
        });
        settle();
    }

    @AfterEach
    void close() {
        if (frame != null) {
            GuiActionRunner.execute(frame::dispose);
        }
    }

    /** Waits for the analysis and the page's solves, then paints the drawing. */
    private void settle() throws Exception {
        long deadline = System.currentTimeMillis() + 20_000;
        boolean[] idle = new boolean[1];
        do {
            Thread.sleep(30);
            GuiActionRunner.execute(() -> idle[0] = analysis.isIdle() && page.isIdle());
        } while (!idle[0] && System.currentTimeMillis() < deadline);
        Thread.sleep(30);
        do {
            Thread.sleep(30);
            GuiActionRunner.execute(() -> idle[0] = page.isIdle());
        } while (!idle[0] && System.currentTimeMillis() < deadline);
        GuiActionRunner.execute(() -> page.drawing().paintImmediately(0, 0, page.drawing().getWidth(),
                page.drawing().getHeight()));
    }

    private List<String> column(int column) {
        return GuiActionRunner.execute(() -> {
            JTable table = page.table();
            return java.util.stream.IntStream.range(0, table.getRowCount())
                    .mapToObj(row -> String.valueOf(table.getValueAt(row, column))).toList();
        });
    }

    @Test
    void eachSampleShowsItsOwnPointsAndBothSides() throws Exception {
        // the points as sample-vehicles/*.json give them (invented cars)
        open("road-saloon");
        assertThat(column(0)).containsExactly("Strut top mount", "Strut axis, on the upright", "Lower arm, body pivot",
                "Lower ball joint");
        assertThat(column(1)).containsExactly("640", "700", "330", "730");
        assertThat(column(2)).containsExactly("700", "350", "165", "150");
        assertThat(GuiActionRunner.execute(() -> page.drawing().handles())).hasSize(8); // four points a side
        assertThat(GuiActionRunner.execute(() -> page.drawing().drawnText()))
                .anyMatch(text -> text.startsWith("Front axle: struts with lower arms"))
                .anyMatch(text -> text.startsWith("Roll centre "));

        GuiActionRunner.execute(() -> page.showAxle(AxlePosition.REAR));
        settle();
        assertThat(GuiActionRunner.execute(() -> page.table().getColumnName(1))).isEqualTo("x forward (mm)");
        assertThat(column(1)).containsExactly("250", "400");
        assertThat(column(2)).containsExactly("150", "580");
        assertThat(column(3)).containsExactly("220", "240");
        assertThat(GuiActionRunner.execute(() -> page.drawing().drawnText()))
                .anyMatch(text -> text.startsWith("Rear axle: semi-trailing arms"));
        close();

        open("estate-dropped-rear-bar");
        GuiActionRunner.execute(() -> page.showAxle(AxlePosition.REAR));
        settle();
        assertThat(column(0)).containsExactly("Panhard rod, body end", "Panhard rod, axle end");
        assertThat(column(1)).containsExactly("-560", "520");
        assertThat(column(2)).containsExactly("120", "100");
    }

    @Test
    void aTypedPointIsOneUndoableEditThatMovesTheRollCentreAsTheHandConstructionSays() throws Exception {
        open("sprint-roadster");
        GuiActionRunner.execute(() -> probe.setFractionOfLimit(0)); // driving straight: the static roll centre
        settle();
        // sprint-roadster.json front: upper arm (330, 330)-(600, 350), lower arm (250, 125)-(640, 120), track 1410
        double before = handRollCentre(0.330, 0.330, 0.600, 0.350, 0.250, 0.125, 0.640, 0.120, 0.705);
        assertThat(shownRollCentre()).isCloseTo(before, within(HAND_CONSTRUCTION));
        assertThat(GuiActionRunner.execute(() -> page.drawing().drawnText()))
                .contains(String.format(Locale.ROOT, "Roll centre %.0f mm above the ground", before * 1e3));

        // the lower arm's body pivot raised from 125 mm to 200 mm: row 2, column z
        GuiActionRunner.execute(() -> page.table().setValueAt("200", 2, 2));
        settle();
        assertThat(document.value(KeyPath.of("front.linkage.lowerInnerMm[1]")).asInt()).isEqualTo(200);
        double after = handRollCentre(0.330, 0.330, 0.600, 0.350, 0.250, 0.200, 0.640, 0.120, 0.705);
        assertThat(after).isNotCloseTo(before, within(0.01));
        assertThat(shownRollCentre()).isCloseTo(after, within(HAND_CONSTRUCTION));

        GuiActionRunner.execute(document::undo);
        settle();
        assertThat(document.value(KeyPath.of("front.linkage.lowerInnerMm[1]")).asInt()).isEqualTo(125);
        assertThat(shownRollCentre()).isCloseTo(before, within(HAND_CONSTRUCTION));
        assertThat(GuiActionRunner.execute(document::canUndo)).isFalse(); // the edit was one step

        // a value past the file's range is refused with its key path and the range (io.LinkageReader: 0-2000 mm)
        GuiActionRunner.execute(() -> page.table().setValueAt("2500", 0, 2));
        settle();
        assertThat(GuiActionRunner.execute(() -> page.message().getText()))
                .contains("front.linkage.upperInnerMm[1]").contains("2500").contains("2000");
    }

    /**
     * The static roll centre of mirror-image double wishbones by the instant-centre construction, worked here
     * independently of the core: each side's instant centre where its arm lines meet, then the line from the
     * contact point (c, 0) through it crosses the centreline at z = z_ic c / (c - y_ic) (Milliken and Milliken,
     * Race Car Vehicle Dynamics, ch. 17, from memory: the construction, not a number).
     */
    private static double handRollCentre(double uiy, double uiz, double uoy, double uoz, double liy, double liz,
                                         double loy, double loz, double contact) {
        double upperSlope = (uoz - uiz) / (uoy - uiy);
        double lowerSlope = (loz - liz) / (loy - liy);
        double y = (liz - lowerSlope * liy - uiz + upperSlope * uiy) / (upperSlope - lowerSlope);
        double z = uiz + upperSlope * (y - uiy);
        return z * contact / (contact - y);
    }

    private double shownRollCentre() {
        return GuiActionRunner.execute(() -> page.drawing().scene().figure().state().rollCentre().height());
    }

    @Test
    void draggingAPointPreviewsItAndKeepsItAsOneUndoableEditOnRelease() throws Exception {
        open("sprint-roadster");
        GuiActionRunner.execute(() -> probe.setFractionOfLimit(0));
        settle();
        FrontViewPainter.Handle lowerInner = GuiActionRunner.execute(() -> page.drawing().handles().stream()
                .filter(handle -> handle.pickup().index() == 2 && handle.pickup().left()).findFirst().orElseThrow());
        double scale = GuiActionRunner.execute(() -> page.drawing().mappingScale());
        int x = (int) Math.round(lowerInner.at().x);
        int y = (int) Math.round(lowerInner.at().y);
        // pixels: the drag raises the point by some 40 mm (up / scale metres), whatever room the drawing has
        int up = (int) Math.round(0.04 * scale);
        mouse(MouseEvent.MOUSE_MOVED, x, y, 0);
        mouse(MouseEvent.MOUSE_PRESSED, x, y, InputEvent.BUTTON1_DOWN_MASK);
        mouse(MouseEvent.MOUSE_DRAGGED, x, y - up / 2, InputEvent.BUTTON1_DOWN_MASK);
        mouse(MouseEvent.MOUSE_DRAGGED, x, y - up, InputEvent.BUTTON1_DOWN_MASK);
        settle();
        // the preview: the drawn point has moved, the document not yet
        FrontViewPoint previewed = lowerInnerDrawn();
        assertThat(previewed.z()).isCloseTo(0.125 + up / scale, within(1.0e-3)); // rounded to whole mm
        assertThat(document.value(KeyPath.of("front.linkage.lowerInnerMm[1]")).asInt()).isEqualTo(125);
        assertThat(GuiActionRunner.execute(document::canUndo)).isFalse();

        mouse(MouseEvent.MOUSE_RELEASED, x, y - up, 0);
        settle();
        int moved = document.value(KeyPath.of("front.linkage.lowerInnerMm[1]")).asInt();
        assertThat(moved).isCloseTo((int) Math.round(125 + up / scale * 1e3), within(1));
        assertThat(document.value(KeyPath.of("front.linkage.lowerInnerMm[0]")).asInt()).isEqualTo(250);
        assertThat(column(2).get(2)).isEqualTo(Integer.toString(moved));
        GuiActionRunner.execute(document::undo);
        assertThat(document.value(KeyPath.of("front.linkage.lowerInnerMm[1]")).asInt()).isEqualTo(125);
        assertThat(GuiActionRunner.execute(document::canUndo)).isFalse();
    }

    private FrontViewPoint lowerInnerDrawn() {
        return GuiActionRunner.execute(() -> page.drawing().scene().figure().pickups().stream()
                .filter(p -> p.index() == 2 && p.left()).map(FrontViewFigure.Pickup::at).findFirst().orElseThrow());
    }

    private void mouse(int id, int x, int y, int modifiers) {
        GuiActionRunner.execute(() -> page.drawing().dispatchEvent(new MouseEvent(page.drawing(), id,
                System.currentTimeMillis(), modifiers, x, y, 1, false,
                id == MouseEvent.MOUSE_MOVED ? MouseEvent.NOBUTTON : MouseEvent.BUTTON1)));
    }

    @Test
    void theDrawingExportsAsPngAndSvgInTheUnitsShown(@org.junit.jupiter.api.io.TempDir Path folder) throws Exception {
        open("sprint-roadster");
        GuiActionRunner.execute(() -> view.setUnits(UnitSystem.US));
        settle();
        Path png = folder.resolve("front-linkage.png");
        Path svg = folder.resolve("front-linkage.svg");
        GuiActionRunner.execute(() -> {
            page.exportTo(png);
            page.exportTo(svg);
            return null;
        });
        java.awt.image.BufferedImage image = javax.imageio.ImageIO.read(png.toFile());
        assertThat(image.getWidth()).isEqualTo(1200); // the charts' export size (ChartExport)
        assertThat(image.getHeight()).isEqualTo(800);
        String text = java.nio.file.Files.readString(svg);
        assertThat(text).startsWith("<?xml").contains("Roll centre").contains(" in above the ground")
                .contains("double wishbones");
    }

    @Test
    void theUnitSwitchChangesTheTableAtOnce() throws Exception {
        open("sprint-roadster");
        assertThat(column(1).get(0)).isEqualTo("330");
        GuiActionRunner.execute(() -> view.setUnits(UnitSystem.US));
        // no wait: the table is rewritten on the switch itself; 330 mm / 25.4 mm/in (NIST SP 811) = 12.9921 in
        assertThat(column(1).get(0)).isEqualTo("12.9921");
        assertThat(GuiActionRunner.execute(() -> page.table().getColumnName(1))).isEqualTo("y out from centre (in)");
        // a value typed in inches is stored in mm: 13 in = 330.2 mm
        GuiActionRunner.execute(() -> page.table().setValueAt("13", 0, 1));
        assertThat(document.value(KeyPath.of("front.linkage.upperInnerMm[0]")).asDouble()).isEqualTo(330.2);
    }

    @Test
    void anAxleWithoutALinkageSaysSoAndHowToAddOne() throws Exception {
        open("estate-dropped-rear-bar");
        GuiActionRunner.execute(() -> page.showAxle(AxlePosition.FRONT));
        settle();
        String words = GuiActionRunner.execute(() -> page.noLinkageText().getText());
        // estate-dropped-rear-bar.json: front rollCentreHeightMm 60, no linkage
        assertThat(words).contains("The front axle has no linkage").contains("typed roll-centre height, 60 mm")
                .contains("docs/file-format.md");
        assertThat(GuiActionRunner.execute(() -> page.noLinkageText().isShowing())).isTrue();
        assertThat(GuiActionRunner.execute(() -> page.table().getRowCount())).isZero();
        assertThat(GuiActionRunner.execute(() -> page.drawing().isShowing())).isFalse();
    }
}
