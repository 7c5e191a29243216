package barwright.cli;

import barwright.io.VehicleDocument;
import barwright.model.AxlePosition;
import barwright.report.sizing.PreloadJson;
import barwright.report.sizing.PreloadText;
import barwright.sizing.preload.GainingDiagonal;
import barwright.sizing.preload.LinkPreload;
import barwright.sizing.preload.PreloadResult;

import java.io.PrintStream;
import java.util.List;
import java.util.Set;

/** {@code preload FILE ...}: corner loads and cross weight per mm of one bar link's length (model.md 9). */
final class PreloadCommand implements Command {
    @Override
    public String name() {
        return "preload";
    }

    @Override
    public String synopsis() {
        return "preload FILE --axle front|rear --longer-loads lf-rr|rf-lr [--link-change-mm 1] [--json] [--units si|us]";
    }

    @Override
    public String summary() {
        return "what making one bar link longer does at rest: the locked roll moment, each corner's load and the "
                + "cross weight per mm; --longer-loads names the diagonal that gains (it depends on the link and "
                + "how the bar end sits)";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        Arguments parsed = Arguments.parse(args, Set.of("json"), Set.of("axle", "longer-loads", "link-change-mm",
                "units"));
        VehicleDocument document = VehicleInput.read(parsed.onlyPositional("vehicle file"));
        var units = parsed.units();
        List<AxlePosition> axles = SizeCommand.axles(parsed.option("axle", null));
        if (axles.size() != 1) {
            throw new UsageException("--axle: give the one axle whose link changes, front or rear");
        }
        GainingDiagonal gaining = longerLoads(parsed, null);
        double changeMm = parsed.number("link-change-mm", 1.0);
        AxlePosition axle = axles.get(0);
        SizeCommand.requireBar(document, axle);
        PreloadResult result = LinkPreload.of(document.vehicle(), axle, gaining, changeMm * 1e-3);
        Printed.jsonOrTextWithCaution(out, parsed, () -> PreloadJson.of(result), () -> PreloadText.of(result, units));
        return Cli.OK;
    }

    /**
     * The option {@code --longer-loads lf-rr|rf-lr} of the commands that change a bar link's length.
     *
     * @param fallback the diagonal taken where the option is not given, or null where it is required
     */
    static GainingDiagonal longerLoads(Arguments parsed, GainingDiagonal fallback) throws UsageException {
        String diagonal = parsed.option("longer-loads", null);
        if (diagonal == null && fallback != null) {
            return fallback;
        }
        return switch (diagonal == null ? "" : diagonal) {
            case "lf-rr" -> GainingDiagonal.LEFT_FRONT_RIGHT_REAR;
            case "rf-lr" -> GainingDiagonal.RIGHT_FRONT_LEFT_REAR;
            default -> throw new UsageException("--longer-loads " + (diagonal == null ? "is missing" : diagonal)
                    + ": say which diagonal gains load when the link is made longer, lf-rr (left front and right "
                    + "rear) or rf-lr (right front and left rear)");
        };
    }
}
