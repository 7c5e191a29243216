package barwright.cli;

import barwright.io.VehicleDocument;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.report.ReportJson;
import barwright.report.TextSummary;

import java.io.PrintStream;
import java.util.List;
import java.util.Set;

/** {@code analyze FILE [--json] [--units si|us]}: the analysis of one vehicle file. */
final class AnalyzeCommand implements Command {
    @Override
    public String name() {
        return "analyze";
    }

    @Override
    public String synopsis() {
        return "analyze FILE [--json] [--units si|us]";
    }

    @Override
    public String summary() {
        return "analyse a vehicle file: a readable summary, or with --json the report for scripts";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        Arguments parsed = Arguments.parse(args, Set.of("json"), Set.of("units"));
        String file = parsed.onlyPositional("vehicle file");
        var units = parsed.units();
        VehicleDocument document = VehicleInput.read(file);
        AnalysisResult result = VehicleAnalysis.analyse(document.vehicle());
        Printed.jsonOrText(out, parsed, () -> ReportJson.of(result), () -> TextSummary.of(result, units));
        return 0;
    }
}
