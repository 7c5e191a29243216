package barwright.cli;

import barwright.insight.Sensitivity;
import barwright.insight.SensitivityResult;
import barwright.report.insight.InsightJson;
import barwright.report.insight.SensitivityText;

import java.io.PrintStream;
import java.util.List;
import java.util.Set;

/** {@code sensitivity FILE [--json] [--units si|us]}: what moves the balance most. */
final class SensitivityCommand implements Command {
    @Override
    public String name() {
        return "sensitivity";
    }

    @Override
    public String synopsis() {
        return "sensitivity FILE [--json] [--units si|us]";
    }

    @Override
    public String summary() {
        return "what one small change of each setting does to the balance, largest effect first";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        Arguments parsed = Arguments.parse(args, Set.of("json"), Set.of("units"));
        String file = parsed.onlyPositional("vehicle file");
        var units = parsed.units();
        SensitivityResult result = Sensitivity.of(VehicleInput.read(file).vehicle());
        Printed.jsonOrText(out, parsed, () -> InsightJson.sensitivity(result),
                () -> new SensitivityText(units).of(result));
        return 0;
    }
}
