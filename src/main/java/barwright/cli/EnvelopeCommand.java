package barwright.cli;

import barwright.insight.LiftEnvelope;
import barwright.insight.LiftEnvelopeResult;
import barwright.physics.VehicleAnalysis;
import barwright.report.insight.EnvelopeText;
import barwright.report.insight.InsightJson;

import java.io.PrintStream;
import java.util.List;
import java.util.Set;

/** {@code envelope FILE [--compare FILE] [--json] [--units si|us]}: where each inside wheel lifts. */
final class EnvelopeCommand implements Command {
    @Override
    public String name() {
        return "envelope";
    }

    @Override
    public String synopsis() {
        return "envelope FILE [--compare OTHER_FILE] [--json] [--units si|us]";
    }

    @Override
    public String summary() {
        return "where each wheel lifts against braking (to 1.2 g) and power (to 0.6 g) as well as cornering";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        Arguments parsed = Arguments.parse(args, Set.of("json"), Set.of("units", "compare"));
        String file = parsed.onlyPositional("vehicle file");
        var units = parsed.units();
        LiftEnvelopeResult envelope = envelopeOf(file);
        String other = parsed.option("compare", null);
        LiftEnvelopeResult compared = other == null ? null : envelopeOf(other);
        Printed.jsonOrText(out, parsed, () -> InsightJson.envelope(envelope, compared),
                () -> new EnvelopeText(units).of(envelope, compared));
        return 0;
    }

    private static LiftEnvelopeResult envelopeOf(String file) throws Exception {
        return LiftEnvelope.of(VehicleAnalysis.analyse(VehicleInput.read(file).vehicle()));
    }
}
