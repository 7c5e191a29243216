package barwright.report.sheet;

import barwright.io.AtomicFileWriter;
import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.AxleResult;
import barwright.physics.TurnResult;
import barwright.physics.Warning;
import barwright.report.Cautions;
import barwright.physics.curve.Chart;
import barwright.sizing.compare.Comparison;
import barwright.sizing.compare.Configuration;
import barwright.sizing.map.AdjustmentMap;
import barwright.sizing.preload.LinkPreload;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import java.util.logging.Level;
import java.util.logging.Logger;

import static barwright.units.Conversions.fromG;
import static barwright.units.Conversions.toPercent;

/**
 * The setup sheet to take to the track, as PDF (Apache PDFBox). The first page: the car, its warnings, the key
 * figures, both bars drawn to scale and a block for the crew to fill in at the track (pressures, tyre
 * temperatures, ride heights, corner weights, conditions, the driver's comments and notes), which takes the
 * rest of the page. Then the adjustment map with its key, the main charts and the cautions. Charts and drawings are vector
 * lines; the text uses the standard Helvetica fonts, so the sheet needs no font files.
 */
public final class SetupSheet {
    /*
     * PDFBox reports through commons-logging (java.util.logging here) that it maps the standard Helvetica onto
     * a system font and builds a font cache: notes for its developers, noise for a person printing a sheet.
     * Held in a field so the setting is not lost when the logger is collected.
     */
    private static final Logger PDFBOX_LOG = quietPdfBox();
    private static final float MARGIN = 40;
    private static final float PAGE_WIDTH = PDRectangle.A4.getWidth();
    private static final float PAGE_HEIGHT = PDRectangle.A4.getHeight();
    private static final float CONTENT_WIDTH = PAGE_WIDTH - 2 * MARGIN;

    private final SheetContent content;
    private final PDDocument document = new PDDocument();
    private PDPageContentStream stream;
    private PdfCanvas canvas;
    private float y;
    private int pageNumber;
    private final List<List<PdfCanvas.Extent>> pageMarks = new ArrayList<>();
    private BarDrawing.Drawn frontBar = BarDrawing.Drawn.NOTHING;
    private BarDrawing.Drawn rearBar = BarDrawing.Drawn.NOTHING;

    private SetupSheet(SheetContent content) {
        this.content = content;
    }

    /**
     * @return the usual content for a car: its map tinted against its static front weight, and the charts of
     * its analysis
     */
    public static SheetContent contentFor(AnalysisResult result, LocalDate date, UnitSystem units) {
        AdjustmentMap map = AdjustmentMap.of(result.vehicle());
        List<Chart> charts = Comparison.charts(List.of(new Configuration(result.vehicle().name(), result.vehicle())),
                List.of(result));
        return new SheetContent(result, map, result.masses().frontMassFraction(), charts, date, units);
    }

    /** @return the sheet as PDF bytes */
    public static byte[] toPdf(SheetContent content) throws IOException {
        SetupSheet sheet = new SetupSheet(content);
        try (PDDocument pdf = sheet.document) {
            sheet.write();
            ByteArrayOutputStream bytes = new ByteArrayOutputStream();
            pdf.save(bytes);
            return bytes.toByteArray();
        }
    }

    /**
     * How a sheet was laid out, for the tests.
     *
     * @param pages    the vertical extent of everything drawn on each page
     * @param frontBar what the front bar's drawing shows
     * @param rearBar  what the rear bar's drawing shows
     */
    record Layout(List<List<PdfCanvas.Extent>> pages, BarDrawing.Drawn frontBar, BarDrawing.Drawn rearBar) {
        /** @return the tallest band of a page with nothing drawn in it, between its highest and lowest marks (pt) */
        float largestEmptyBand(int page) {
            List<PdfCanvas.Extent> marks = new ArrayList<>(pages.get(page));
            marks.sort(Comparator.comparingDouble(PdfCanvas.Extent::high).reversed());
            float largest = 0;
            float reached = marks.get(0).low();
            for (PdfCanvas.Extent mark : marks) {
                largest = Math.max(largest, reached - mark.high());
                reached = Math.min(reached, mark.low());
            }
            return largest;
        }
    }

    /** @return how the sheet is laid out: what each page holds and what the bar drawings show */
    static Layout layout(SheetContent content) throws IOException {
        SetupSheet sheet = new SetupSheet(content);
        try (PDDocument pdf = sheet.document) {
            sheet.write();
            return new Layout(List.copyOf(sheet.pageMarks), sheet.frontBar, sheet.rearBar);
        }
    }

    /** Writes the sheet to a file atomically ({@link AtomicFileWriter}). */
    public static void save(SheetContent content, Path target) throws IOException {
        AtomicFileWriter.writeBytes(target, toPdf(content));
    }

    private void write() throws IOException {
        AnalysisResult result = content.result();
        document.getDocumentInformation().setTitle("Barwright setup sheet: " + result.vehicle().name());
        document.getDocumentInformation().setCreator("Barwright");
        newPage();
        carBlock(result);
        warnings(result);
        figuresTable(result);
        bars(result);
        // the crew's block takes what is left of the first page, above the caution at its foot
        float cautionTop = MARGIN + 34;
        if (y - CrewBlock.LEAST_HEIGHT < cautionTop + 12) {
            canvas.paragraph(Cautions.SHORT, MARGIN, cautionTop, CONTENT_WIDTH, PdfCanvas.BOLD, 7.5f);
            newPage();
            CrewBlock.draw(canvas, content.units(), MARGIN, y, CONTENT_WIDTH, y - CrewBlock.LEAST_HEIGHT);
            y -= CrewBlock.LEAST_HEIGHT + 14;
        } else {
            CrewBlock.draw(canvas, content.units(), MARGIN, y, CONTENT_WIDTH, cautionTop + 12);
            canvas.paragraph(Cautions.SHORT, MARGIN, cautionTop, CONTENT_WIDTH, PdfCanvas.BOLD, 7.5f);
            newPage();
        }

        heading("Adjustment map: every front hole against every rear hole");
        float used = MapDrawing.draw(canvas, content.map(), content.referenceShare(), content.referenceText(),
                content.units(), MARGIN, y, CONTENT_WIDTH);
        y -= used + 10;
        charts();
        ensure(120);
        heading("Cautions");
        y = canvas.paragraph(Cautions.SHORT, MARGIN, y, CONTENT_WIDTH, PdfCanvas.REGULAR, 7.5f);
        y = canvas.paragraph(Cautions.NOT_MODELLED, MARGIN, y - 3, CONTENT_WIDTH, PdfCanvas.REGULAR, 7.5f);
        y = canvas.paragraph("Bar links: " + LinkPreload.ADVICE, MARGIN, y - 3, CONTENT_WIDTH, PdfCanvas.REGULAR, 7.5f);
        pageMarks.add(canvas.marks());
        stream.close();
    }

    private void carBlock(AnalysisResult result) throws IOException {
        canvas.text("Barwright setup sheet", MARGIN, y, PdfCanvas.BOLD, 16);
        canvas.textRight(content.date().toString(), PAGE_WIDTH - MARGIN, y, PdfCanvas.REGULAR, 10);
        y -= 18;
        canvas.text(result.vehicle().name(), MARGIN, y, PdfCanvas.BOLD, 11);
        y -= 13;
        y = canvas.paragraph(String.format(Locale.ROOT, "Mass %s, static front weight %.1f %%, CG height %s, "
                        + "wheelbase %s; bar check travel %s (left minus right wheel). Units: %s.",
                f(result.masses().mass(), Quantity.MASS, 1), toPercent(result.masses().frontMassFraction()),
                f(result.vehicle().cgHeight(), Quantity.LENGTH, 0), f(result.vehicle().wheelbase(), Quantity.LENGTH, 0),
                f(result.vehicle().differentialWheelTravel(), Quantity.LENGTH, 0), content.units().label()),
                MARGIN, y, CONTENT_WIDTH, PdfCanvas.REGULAR, 8);
        y -= 6;
    }

    private void warnings(AnalysisResult result) throws IOException {
        if (result.warnings().isEmpty()) {
            canvas.text("Warnings: none.", MARGIN, y, PdfCanvas.REGULAR, 8);
            y -= 16;
            return;
        }
        heading("Warnings");
        for (Warning warning : result.warnings()) {
            y = canvas.paragraph("! " + warning.message(), MARGIN, y, CONTENT_WIDTH, PdfCanvas.REGULAR, 8);
        }
        y -= 6;
    }

    /** The balance figures on the left, the axle figures on the right, side by side. */
    private void figuresTable(AnalysisResult result) throws IOException {
        heading("Key figures");
        float top = y;
        float valueX = MARGIN + 150;
        row("front share of load transfer", percent(result.frontLoadTransferShare()), valueX);
        row("front share of roll stiffness", percent(result.frontRollStiffnessShare()), valueX);
        row("roll gradient", f(result.rollGradient(), Quantity.ROLL_GRADIENT, 2), valueX);
        row("understeer gradient", f(result.understeerGradient(), Quantity.ROLL_GRADIENT, 2), valueX);
        for (TurnDirection direction : TurnDirection.values()) {
            TurnResult turn = result.turn(direction);
            row("limit, " + direction.word() + " turn", f(turn.limit(), Quantity.ACCELERATION, 2) + " "
                    + turn.balance().key(), valueX);
            row("inside lift, " + direction.word() + " (front / rear)", lift(turn.frontInsideLift())
                    + " / " + lift(turn.rearInsideLift()), valueX);
        }
        float left = y;
        y = top;
        float axleX = MARGIN + 262;
        float frontRight = MARGIN + CONTENT_WIDTH - 62;
        float rearRight = MARGIN + CONTENT_WIDTH;
        canvas.textRight("front", frontRight, y, PdfCanvas.BOLD, 8);
        canvas.textRight("rear", rearRight, y, PdfCanvas.BOLD, 8);
        y -= 11;
        axleRow("roll stiffness", a -> f(a.stiffness().rollStiffness(), Quantity.ROLL_STIFFNESS, 0), axleX,
                frontRight, rearRight);
        axleRow("bar roll stiffness", a -> a.bar() == null ? "no bar" : f(a.stiffness().barRollStiffness(),
                Quantity.ROLL_STIFFNESS, 0), axleX, frontRight, rearRight);
        axleRow("spring roll stiffness", a -> f(a.stiffness().springRollStiffness(), Quantity.ROLL_STIFFNESS, 0),
                axleX, frontRight, rearRight);
        axleRow("load transfer per g", a -> f(a.loadTransfer().total(), Quantity.FORCE_PER_G, 0), axleX, frontRight,
                rearRight);
        axleRow("bar link rate", a -> a.bar() == null ? "-" : f(a.bar().linkRate(), Quantity.LINEAR_RATE, 1), axleX,
                frontRight, rearRight);
        axleRow("bar mass", a -> a.bar() == null ? "-" : f(a.bar().mass(), Quantity.MASS, 2), axleX, frontRight,
                rearRight);
        axleRow("bar stress at check travel", a -> a.bar() == null ? "-"
                : f(a.bar().maxVonMisesStress(), Quantity.STRESS, 0), axleX, frontRight, rearRight);
        axleRow("bar safety factor (static, yield)", a -> a.bar() == null ? "-"
                : String.format(Locale.ROOT, "%.2f", a.bar().safetyFactor()), axleX, frontRight, rearRight);
        axleRow("ride frequency", a -> f(a.stiffness().rideFrequency(), Quantity.FREQUENCY, 2), axleX, frontRight,
                rearRight);
        y = Math.min(y, left) - 8;
    }

    private void bars(AnalysisResult result) throws IOException {
        heading("Bars, drawn to scale");
        float boxWidth = (CONTENT_WIDTH - 20) / 2;
        float boxHeight = 180;
        for (AxlePosition axle : AxlePosition.values()) {
            float x = MARGIN + (axle == AxlePosition.FRONT ? 0 : boxWidth + 20);
            BarDrawing.Drawn drawn = BarDrawing.draw(canvas, axle == AxlePosition.FRONT ? "Front bar" : "Rear bar",
                    result.vehicle().axle(axle).bar(), content.units(), x, y - boxHeight, boxWidth, boxHeight);
            if (axle == AxlePosition.FRONT) {
                frontBar = drawn;
            } else {
                rearBar = drawn;
            }
        }
        y -= boxHeight + 16;
    }

    private void charts() throws IOException {
        float width = (CONTENT_WIDTH - 20) / 2;
        float height = 155;
        List<Chart> charts = content.charts();
        for (int i = 0; i < charts.size(); i += 2) {
            ensure(height + 10);
            for (int j = i; j < Math.min(i + 2, charts.size()); j++) {
                ChartDrawing.draw(canvas, charts.get(j), content.units(), MARGIN + (j - i) * (width + 20), y - height,
                        width, height);
            }
            y -= height + 14;
        }
    }

    private void heading(String text) throws IOException {
        ensure(30);
        canvas.black();
        canvas.text(text, MARGIN, y, PdfCanvas.BOLD, 10);
        y -= 14;
    }

    private void row(String label, String value, float valueX) throws IOException {
        canvas.text(label, MARGIN, y, PdfCanvas.REGULAR, 8);
        canvas.text(value, valueX, y, PdfCanvas.BOLD, 8);
        y -= 11;
    }

    private void axleRow(String label, Function<AxleResult, String> figure, float x, float frontRight,
                         float rearRight) throws IOException {
        canvas.text(label, x, y, PdfCanvas.REGULAR, 8);
        canvas.textRight(figure.apply(content.result().front()), frontRight, y, PdfCanvas.REGULAR, 8);
        canvas.textRight(figure.apply(content.result().rear()), rearRight, y, PdfCanvas.REGULAR, 8);
        y -= 11;
    }

    private void ensure(float height) throws IOException {
        if (y - height < MARGIN + 20) {
            newPage();
        }
    }

    private void newPage() throws IOException {
        if (stream != null) {
            pageMarks.add(canvas.marks());
            stream.close();
        }
        PDPage page = new PDPage(PDRectangle.A4);
        document.addPage(page);
        stream = new PDPageContentStream(document, page);
        canvas = new PdfCanvas(stream);
        pageNumber++;
        canvas.black();
        canvas.text("Barwright setup sheet, " + content.result().vehicle().name() + ", " + content.date()
                + ", page " + pageNumber, MARGIN, MARGIN - 16, PdfCanvas.REGULAR, 7);
        y = PAGE_HEIGHT - MARGIN;
    }

    private String f(double si, Quantity quantity, int decimals) {
        return Figures.format(si, quantity, content.units(), decimals);
    }

    private String lift(double accel) {
        return accel <= fromG(3)
                ? f(accel, Quantity.ACCELERATION, 2) : "stays down";
    }

    private static String percent(double share) {
        return String.format(Locale.ROOT, "%.1f %%", toPercent(share));
    }

    private static Logger quietPdfBox() {
        Logger logger = Logger.getLogger("org.apache.pdfbox");
        logger.setLevel(Level.SEVERE);
        return logger;
    }
}
