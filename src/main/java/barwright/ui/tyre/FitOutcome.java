package barwright.ui.tyre;

import barwright.io.Problem;
import barwright.io.TyreTestCsv;
import barwright.io.TyreWriter;
import barwright.io.csv.CsvFileException;
import barwright.solver.Progress;
import barwright.tyrefit.TyreFit;
import barwright.tyrefit.TyreFitException;
import barwright.tyrefit.TyreFitter;
import barwright.tyrefit.TyreMeasurement;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * What fitting a tyre test file gave: the measurements, the fit and the tyre object ready for the vehicle file; or
 * why there is no fit, each problem naming its line. Made off the event thread by {@link #of}.
 *
 * @param file     the data file
 * @param data     its measurements (empty where the file was refused)
 * @param fit      the fit, or null where refused
 * @param tyre     the fitted tyre as the vehicle file writes it, or null where refused
 * @param refusal  a sentence on why there is no fit, or null
 * @param problems what was refused, each naming its line (or the key of the fitted tyre that a vehicle file
 *                 would refuse); empty where the fit stands
 */
record FitOutcome(Path file, List<TyreMeasurement> data, TyreFit fit, ObjectNode tyre, String refusal,
                  List<String> problems) {
    FitOutcome {
        data = List.copyOf(data);
        problems = List.copyOf(problems);
    }

    boolean succeeded() {
        return fit != null;
    }

    /** Reads and fits the file: the work the dialog runs off the event thread. */
    static FitOutcome of(Path file, Progress progress) {
        List<TyreMeasurement> data;
        try {
            data = TyreTestCsv.read(file);
        } catch (CsvFileException refused) {
            return refused(file, List.of(), "The file was refused as tyre test data (columns loadN, slipAngleDeg, "
                    + "lateralForceN, optional camberDeg):", refused.problems());
        } catch (IOException unreadable) {
            return refused(file, List.of(), "The file could not be read:", List.of(String.valueOf(
                    unreadable.getMessage())));
        }
        progress.checkCancelled();
        TyreFit fit;
        try {
            fit = TyreFitter.fit(data, progress);
        } catch (TyreFitException refused) {
            return refused(file, data, "The data cannot support a fit:", refused.problems());
        }
        ObjectNode tyre = TyreWriter.toJson(fit.tyre());
        List<Problem> outOfRange = TyreWriter.check(tyre);
        if (!outOfRange.isEmpty()) {
            return refused(file, data, "The fitted tyre falls outside what a vehicle file allows:",
                    outOfRange.stream().map(Problem::toString).toList());
        }
        return new FitOutcome(file, data, fit, tyre, null, List.of());
    }

    private static FitOutcome refused(Path file, List<TyreMeasurement> data, String why, List<String> problems) {
        return new FitOutcome(file, data, null, null, why, problems);
    }
}
