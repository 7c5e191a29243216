package barwright.cli;

import barwright.io.AtomicFileWriter;
import barwright.io.Problem;
import barwright.io.TyreTestCsv;
import barwright.io.TyreWriter;
import barwright.io.VehicleFileWriter;
import barwright.io.csv.CsvFileException;
import barwright.report.tyre.TyreFitJson;
import barwright.report.tyre.TyreFitText;
import barwright.tyrefit.TyreFit;
import barwright.tyrefit.TyreFitException;
import barwright.tyrefit.TyreFitter;
import barwright.tyrefit.TyreMeasurement;
import barwright.ui.chart.TyreFitChart;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

/** {@code tyre-fit DATA.csv}: a tyre for the vehicle file from measured lateral force curves (model.md 8.3). */
final class TyreFitCommand implements Command {
    @Override
    public String name() {
        return "tyre-fit";
    }

    @Override
    public String synopsis() {
        return "tyre-fit DATA.csv [--json] [--output TYRE.json] [--plot OUT.png]";
    }

    @Override
    public String summary() {
        return "fit a tyre to measured lateral force curves (columns loadN,slipAngleDeg,lateralForceN[,camberDeg]): "
                + "peak friction and cornering stiffness against load, camber terms, residuals";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        Arguments parsed = Arguments.parse(args, Set.of("json"), Set.of("output", "plot"));
        String file = parsed.onlyPositional("tyre data file (CSV)");
        List<TyreMeasurement> data;
        try {
            data = TyreTestCsv.read(Path.of(file));
        } catch (CsvFileException refused) {
            err.println("barwright: the tyre data was refused (" + file + "):");
            refused.problems().forEach(problem -> err.println("  " + problem));
            return Cli.REFUSED;
        }
        TyreFit fit;
        try {
            fit = TyreFitter.fit(data);
        } catch (TyreFitException refused) {
            err.println("barwright: the tyre data cannot support a fit (" + file + "):");
            refused.problems().forEach(problem -> err.println("  " + problem));
            return Cli.REFUSED;
        }
        ObjectNode document = TyreFitJson.of(fit);
        List<Problem> outOfRange = TyreWriter.check((ObjectNode) document.get("tyre"));
        if (!outOfRange.isEmpty()) {
            err.println("barwright: the fitted tyre falls outside what a vehicle file allows:");
            outOfRange.forEach(problem -> err.println("  " + problem));
            return Cli.REFUSED;
        }
        String output = parsed.option("output", null);
        if (output != null) {
            AtomicFileWriter.writeText(Path.of(output), VehicleFileWriter.toJson(document));
        }
        String plot = parsed.option("plot", null);
        if (plot != null) {
            TyreFitChart.write(fit, data, Path.of(plot));
        }
        if (parsed.has("json")) {
            out.print(VehicleFileWriter.toJson(document));
        } else {
            out.print(TyreFitText.of(fit, file));
            if (output != null) {
                out.println("The tyre was written to " + output + " (paste its \"tyre\" object into a vehicle file "
                        + "of version 2).");
            }
        }
        return Cli.OK;
    }
}
