package barwright.cli;

import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.report.linkage.GeometryJson;
import barwright.report.linkage.GeometryTables;
import barwright.report.linkage.GeometryText;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * {@code geometry FILE [--json] [--units si|us] [--roll-deg 0,1,2,3] [--travel-mm -40,-20,0,20,40]}: each axle's
 * roll centre and cambers against body roll, camber and instant centre against wheel travel.
 */
final class GeometryCommand implements Command {
    private static final int MAX_VALUES = 50;

    @Override
    public String name() {
        return "geometry";
    }

    @Override
    public String synopsis() {
        return "geometry FILE [--json] [--units si|us] [--roll-deg 0,1,2,3] [--travel-mm -40,-20,0,20,40]";
    }

    @Override
    public String summary() {
        return "roll centres, cambers and instant centres of the suspension linkages against roll and wheel travel";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        Arguments parsed = Arguments.parse(args, Set.of("json"), Set.of("units", "roll-deg", "travel-mm"));
        String file = parsed.onlyPositional("vehicle file");
        var units = parsed.units();
        List<Double> rolls = list(parsed, "roll-deg", "0,1,2,3", 20, Math.PI / 180);
        List<Double> travels = list(parsed, "travel-mm", "-40,-20,0,20,40", 300, 1e-3);
        Vehicle vehicle = VehicleInput.read(file).vehicle();
        GeometryTables front = GeometryTables.of(vehicle, AxlePosition.FRONT, rolls, travels);
        GeometryTables rear = GeometryTables.of(vehicle, AxlePosition.REAR, rolls, travels);
        Printed.jsonOrText(out, parsed, () -> GeometryJson.of(front, rear),
                () -> new GeometryText(units).of(vehicle.name(), front, rear));
        return 0;
    }

    /** @return the comma-separated values of an option, each within +-limit, times the factor to SI */
    private static List<Double> list(Arguments parsed, String option, String fallback, double limit, double toSi)
            throws UsageException {
        String text = parsed.option(option, fallback);
        String[] parts = text.split(",");
        if (parts.length > MAX_VALUES) {
            throw new UsageException("--" + option + " has " + parts.length + " values: give at most " + MAX_VALUES);
        }
        List<Double> values = new ArrayList<>();
        for (String part : parts) {
            double value;
            try {
                value = Double.parseDouble(part.trim());
            } catch (NumberFormatException notANumber) {
                throw new UsageException("--" + option + " = " + text + ": \"" + part.trim() + "\" is not a number; "
                        + "give numbers separated by commas, e.g. " + fallback);
            }
            if (!Double.isFinite(value) || Math.abs(value) > limit) {
                throw new UsageException("--" + option + " = " + part.trim() + ": each value must be between -" + limit
                        + " and " + limit);
            }
            values.add(value * toSi);
        }
        return values;
    }
}
