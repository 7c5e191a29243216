package barwright.report.sizing;

import barwright.report.ReportJson;
import barwright.sizing.DiameterSweep;
import barwright.sizing.SetupFigures;
import barwright.physics.curve.Chart;
import barwright.physics.curve.Series;
import barwright.units.UnitSystem;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import static barwright.units.Conversions.perDegree;
import static barwright.units.Conversions.toDegreesPerG;
import static barwright.units.Conversions.toG;
import static barwright.units.Conversions.toMillimetres;

/** CSV of sweeps: figures against solid bar diameter, and a chart's lines against their abscissa. */
public final class SweepOutput {
    public static final List<String> DIAMETER_COLUMNS = List.of("diameterMm", "frontLoadTransferShare",
            "rollGradientDegPerG", "limitG", "limitBalance", "frontInsideLiftG", "rearInsideLiftG", "barMassKg",
            "barSafetyFactor", "barRollStiffnessNmPerDeg");

    private SweepOutput() {
    }

    /**
     * @param points a diameter sweep of one axle's bar
     * @param axleIsFront which axle's bar was swept
     */
    public static void diameterCsv(List<DiameterSweep.Point> points, boolean axleIsFront, Appendable out)
            throws IOException {
        try (CSVPrinter printer = new CSVPrinter(out, CSVFormat.RFC4180.builder()
                .setHeader(DIAMETER_COLUMNS.toArray(String[]::new)).get())) {
            for (DiameterSweep.Point point : points) {
                List<Object> row = new ArrayList<>();
                row.add(toMillimetres(point.diameter()));
                SetupFigures figures = point.figures();
                if (figures == null) {
                    for (int i = 1; i < DIAMETER_COLUMNS.size(); i++) {
                        row.add("");
                    }
                } else {
                    var bar = axleIsFront ? figures.frontBar() : figures.rearBar();
                    row.add(figures.frontLoadTransferShare());
                    row.add(toDegreesPerG(figures.rollGradient()));
                    row.add(toG(figures.limit()));
                    row.add(figures.balance().key());
                    row.add(MapOutput.orEmpty(ReportJson.liftInG(figures.frontInsideLift())));
                    row.add(MapOutput.orEmpty(ReportJson.liftInG(figures.rearInsideLift())));
                    row.add(bar.mass());
                    row.add(bar.safetyFactor());
                    row.add(perDegree(bar.rollStiffness()));
                }
                printer.printRecord(row);
            }
        }
    }

    /** The columns of {@link #chartsCsv}. */
    public static final List<String> CHART_COLUMNS = List.of("chart", "series", "xName", "x", "xUnit", "yName", "y",
            "yUnit");

    /**
     * Writes charts' lines as long-form CSV: one line per point, with the chart's title, the series name and
     * each coordinate in the SI display unit named beside it (mm, g, deg, N...).
     */
    public static void chartsCsv(List<Chart> charts, Appendable out) throws IOException {
        try (CSVPrinter printer = new CSVPrinter(out, CSVFormat.RFC4180.builder()
                .setHeader(CHART_COLUMNS.toArray(String[]::new)).get())) {
            for (Chart chart : charts) {
                var xUnit = chart.x().unit(UnitSystem.SI);
                var yUnit = chart.y().unit(UnitSystem.SI);
                for (Series series : chart.series()) {
                    double[] x = series.x();
                    double[] y = series.y();
                    for (int i = 0; i < x.length; i++) {
                        printer.printRecord(chart.title(), series.name(), chart.xLabel(), xUnit.fromSi(x[i]),
                                xUnit.symbol(), chart.yLabel(), yUnit.fromSi(y[i]), yUnit.symbol());
                    }
                }
            }
        }
    }
}
