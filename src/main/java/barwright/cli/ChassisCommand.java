package barwright.cli;

import barwright.insight.ChassisStudy;
import barwright.insight.ChassisStudyResult;
import barwright.report.insight.ChassisText;
import barwright.report.insight.InsightJson;

import java.io.PrintStream;
import java.util.List;
import java.util.Set;

/** {@code chassis FILE [--json] [--units si|us]}: what a flexible chassis costs. */
final class ChassisCommand implements Command {
    @Override
    public String name() {
        return "chassis";
    }

    @Override
    public String synopsis() {
        return "chassis FILE [--json] [--units si|us]";
    }

    @Override
    public String summary() {
        return "front share, roll gradient and a bar change's effect against chassis torsional stiffness";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        Arguments parsed = Arguments.parse(args, Set.of("json"), Set.of("units"));
        String file = parsed.onlyPositional("vehicle file");
        var units = parsed.units();
        ChassisStudyResult study = ChassisStudy.compute(VehicleInput.read(file).vehicle());
        Printed.jsonOrText(out, parsed, () -> InsightJson.chassis(study), () -> new ChassisText(units).of(study));
        return 0;
    }
}
