package barwright.sizing.output;

import barwright.sizing.DiameterSweep;
import barwright.sizing.SetupFigures;
import barwright.sizing.compare.Chart;
import barwright.sizing.compare.Series;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

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
                row.add(point.diameter() * 1e3);
                SetupFigures figures = point.figures();
                if (figures == null) {
                    for (int i = 1; i < DIAMETER_COLUMNS.size(); i++) {
                        row.add("");
                    }
                } else {
                    var bar = axleIsFront ? figures.frontBar() : figures.rearBar();
                    row.add(figures.frontLoadTransferShare());
                    row.add(Json.degPerG(figures.rollGradient()));
                    row.add(Json.inG(figures.limit()));
                    row.add(figures.balance().key());
                    row.add(MapOutput.orEmpty(Json.liftInG(figures.frontInsideLift())));
                    row.add(MapOutput.orEmpty(Json.liftInG(figures.rearInsideLift())));
                    row.add(bar.mass());
                    row.add(bar.safetyFactor());
                    row.add(Json.nmPerDeg(bar.rollStiffness()));
                }
                printer.printRecord(row);
            }
        }
    }

    /**
     * Writes a chart's lines as long-form CSV: one line per point, with the series name, the abscissa and
     * the ordinate in the display units of the SI system (the header names them).
     */
    public static void chartCsv(Chart chart, Appendable out) throws IOException {
        var xUnit = chart.x().unit(barwright.units.UnitSystem.SI);
        var yUnit = chart.y().unit(barwright.units.UnitSystem.SI);
        String xHeader = chart.xLabel() + " (" + xUnit.symbol() + ")";
        String yHeader = chart.yLabel() + " (" + yUnit.symbol() + ")";
        try (CSVPrinter printer = new CSVPrinter(out, CSVFormat.RFC4180.builder()
                .setHeader("series", xHeader, yHeader).get())) {
            for (Series series : chart.series()) {
                double[] x = series.x();
                double[] y = series.y();
                for (int i = 0; i < x.length; i++) {
                    printer.printRecord(series.name(), xUnit.fromSi(x[i]), yUnit.fromSi(y[i]));
                }
            }
        }
    }
}
