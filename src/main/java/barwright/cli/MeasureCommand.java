package barwright.cli;

import barwright.io.VehicleEdits;
import barwright.io.VehicleDocument;
import barwright.io.VehicleFileWriter;
import barwright.io.csv.CsvFileException;
import barwright.io.csv.CsvReader;
import barwright.io.csv.CsvRow;
import barwright.io.csv.CsvSchema;
import barwright.io.csv.CsvTable;
import barwright.loading.VehicleLoader;
import barwright.measure.BarRateFit;
import barwright.measure.BarRateMeasurement;
import barwright.measure.BarReading;
import barwright.measure.CentreOfMassHeight;
import barwright.measure.CornerWeighing;
import barwright.measure.CornerWeights;
import barwright.measure.MeasurementException;
import barwright.measure.MotionRatioFit;
import barwright.measure.MotionRatioMeasurement;
import barwright.measure.TiltMethod;
import barwright.measure.TiltTest;
import barwright.measure.TravelReading;
import barwright.model.AxlePosition;
import barwright.model.CornerMasses;
import barwright.model.RateCalibration;
import barwright.model.Vehicle;
import barwright.physics.BarAnalysis;
import barwright.report.measure.MeasureJson;
import barwright.report.measure.MeasureText;
import barwright.sizing.preload.GainingDiagonal;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.PrintStream;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * {@code measure bar|motion-ratio|cg|corners ...}: workshop readings turned into the model's inputs
 * (model.md 12); {@code --apply --output OUT.json} writes the result into a copy of the car.
 */
final class MeasureCommand implements Command {
    private static final Set<String> SWITCHES = Set.of("json", "apply");

    @Override
    public String name() {
        return "measure";
    }

    @Override
    public String synopsis() {
        return "measure bar READINGS.csv [--vehicle FILE --axle front|rear] | motion-ratio READINGS.csv "
                + "[--link-angle-deg A] | cg FILE --raised-axle front|rear --raise-mm H --raised-front-axle-kg W "
                + "[--wheel-centre-height-mm R] [--scale-resolution-kg 0.5] | corners FILE --kg LF,RF,LR,RR "
                + "[--target-cross 0.50] [--axle front|rear] [--longer-loads lf-rr|rf-lr]; each [--json] "
                + "[--units si|us]; bar, cg, corners: [--apply --output OUT.json]";
    }

    @Override
    public String summary() {
        return "workshop readings into the model: a bar's rate and free play from load and deflection, a motion "
                + "ratio from travel readings, the centre-of-mass height by raising one axle, corner weights and "
                + "the link change for a target cross weight";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        if (args.isEmpty()) {
            throw new UsageException("say what was measured: bar, motion-ratio, cg or corners");
        }
        List<String> rest = args.subList(1, args.size());
        try {
            return switch (args.get(0)) {
                case "bar" -> bar(rest, out);
                case "motion-ratio" -> motionRatio(rest, out);
                case "cg" -> centreOfMass(rest, out);
                case "corners" -> corners(rest, out);
                default -> throw new UsageException("'" + args.get(0) + "' is not a measurement: use bar, "
                        + "motion-ratio, cg or corners");
            };
        } catch (CsvFileException badFile) {
            err.println("barwright measure: the readings were refused:");
            badFile.problems().forEach(problem -> err.println("  " + problem));
            return Cli.REFUSED;
        } catch (MeasurementException refused) {
            err.println("barwright measure " + args.get(0) + ": " + refused.getMessage());
            return Cli.REFUSED;
        }
    }

    private int bar(List<String> args, PrintStream out) throws Exception {
        Arguments parsed = Arguments.parse(args, SWITCHES, Set.of("vehicle", "axle", "units", "output", "note"));
        CsvTable table = CsvReader.read(Path.of(parsed.onlyPositional("readings file")),
                new CsvSchema(List.of("loadN", "deflectionMm"), List.of()));
        List<BarReading> readings = table.rows().stream()
                .map(row -> new BarReading(row.number("deflectionMm") * 1e-3, row.number("loadN"), where(row)))
                .toList();
        BarRateFit fit = BarRateMeasurement.fit(readings);
        String vehicleFile = parsed.option("vehicle", null);
        VehicleDocument document = null;
        AxlePosition axle = null;
        Double modelRate = null;
        if (vehicleFile != null) {
            document = VehicleInput.read(vehicleFile);
            axle = oneAxle(parsed, null);
            SizeCommand.requireBar(document, axle);
            modelRate = BarAnalysis.model(document.vehicle().axle(axle).bar(), 0).linkRate();
        } else if (parsed.has("apply")) {
            throw new UsageException("--apply needs --vehicle FILE and --axle: the car the bar is on");
        }
        print(out, parsed, MeasureJson.bar(fit, modelRate), MeasureText.bar(fit, modelRate, parsed.units()));
        if (parsed.has("apply")) {
            double factor = fit.rate() / modelRate;
            if (!(factor >= RateCalibration.LOWEST && factor <= RateCalibration.HIGHEST)) {
                throw new MeasurementException(String.format(Locale.ROOT, "measured / model = %.3f is outside %.1f "
                        + "to %.1f: the car file's bar (material, section, arms, hole) does not describe this bar; "
                        + "correct it before calibrating", factor, RateCalibration.LOWEST, RateCalibration.HIGHEST));
            }
            String note = parsed.option("note", String.format(Locale.ROOT, "%d readings, R² %.4f, free play %.2f mm",
                    readings.size(), fit.rSquared(), fit.lash() * 1e3));
            ObjectNode tree = document.editableTree();
            VehicleEdits.putRateCalibration(tree, axle, new RateCalibration(factor, LocalDate.now(), note));
            write(parsed, tree, out);
        }
        return Cli.OK;
    }

    private int motionRatio(List<String> args, PrintStream out) throws Exception {
        Arguments parsed = Arguments.parse(args, Set.of("json"), Set.of("link-angle-deg", "units"));
        CsvTable table = CsvReader.read(Path.of(parsed.onlyPositional("readings file")),
                new CsvSchema(List.of("wheelTravelMm", "componentTravelMm"), List.of()));
        List<TravelReading> readings = table.rows().stream().map(row -> new TravelReading(
                row.number("wheelTravelMm") * 1e-3, row.number("componentTravelMm") * 1e-3, where(row))).toList();
        MotionRatioFit fit = MotionRatioMeasurement.fit(readings, Math.toRadians(parsed.number("link-angle-deg", 0)));
        print(out, parsed, MeasureJson.motionRatio(fit), MeasureText.motionRatio(fit, parsed.units()));
        return Cli.OK;
    }

    private int centreOfMass(List<String> args, PrintStream out) throws Exception {
        Arguments parsed = Arguments.parse(args, SWITCHES, Set.of("raised-axle", "raise-mm", "raised-front-axle-kg",
                "wheel-centre-height-mm", "scale-resolution-kg", "raise-resolution-mm", "units", "output"));
        VehicleDocument document = VehicleInput.read(parsed.onlyPositional("vehicle file"));
        Vehicle car = document.vehicle();
        String raised = parsed.option("raised-axle", null);
        if (!"front".equals(raised) && !"rear".equals(raised)) {
            throw new UsageException("--raised-axle " + (raised == null ? "is missing" : raised) + ": front or rear");
        }
        double raisedFront = required(parsed, "raised-front-axle-kg");
        double raise = required(parsed, "raise-mm") * 1e-3;
        double defaultCentre = TiltTest.assumedWheelCentreHeight(car);
        double wheelCentre = parsed.number("wheel-centre-height-mm", defaultCentre * 1e3) * 1e-3;
        TiltTest test = TiltTest.on(car, "front".equals(raised) ? AxlePosition.FRONT : AxlePosition.REAR, raise,
                raisedFront, wheelCentre, parsed.number("scale-resolution-kg", 0.5),
                parsed.number("raise-resolution-mm", 1) * 1e-3);
        CentreOfMassHeight height = TiltMethod.height(test);
        String text = MeasureText.centreOfMass(height, parsed.units());
        if (parsed.option("wheel-centre-height-mm", null) == null) {
            text += String.format(Locale.ROOT, "%nThe wheel centre height was taken as the unsprung centre-of-mass "
                    + "height of the car file (%.0f mm); give --wheel-centre-height-mm to set it.%n", defaultCentre * 1e3);
        }
        print(out, parsed, MeasureJson.centreOfMass(height), text);
        if (parsed.has("apply")) {
            ObjectNode tree = document.editableTree();
            VehicleEdits.putCentreOfMassHeight(tree, height.height());
            write(parsed, tree, out);
        }
        return Cli.OK;
    }

    private int corners(List<String> args, PrintStream out) throws Exception {
        Arguments parsed = Arguments.parse(args, SWITCHES, Set.of("kg", "target-cross", "axle", "longer-loads",
                "units", "output"));
        VehicleDocument document = VehicleInput.read(parsed.onlyPositional("vehicle file"));
        double[] kg = fourReadings(parsed.option("kg", null));
        String target = parsed.option("target-cross", null);
        AxlePosition axle = oneAxle(parsed, document.vehicle());
        GainingDiagonal gaining = PreloadCommand.longerLoads(parsed, GainingDiagonal.LEFT_FRONT_RIGHT_REAR);
        CornerWeights weights = CornerWeighing.of(kg[0], kg[1], kg[2], kg[3], document.vehicle(),
                target == null ? null : parsed.number("target-cross", 0.5), axle, gaining);
        String text = MeasureText.corners(weights, parsed.units());
        if (weights.linkChange() != null && parsed.option("longer-loads", null) == null) {
            text += "(--longer-loads not given: taken as lf-rr. Which diagonal a longer link loads depends on the "
                    + "side and on how the bar end sits: check it on the car.)\n";
        }
        print(out, parsed, MeasureJson.corners(weights), text);
        if (parsed.has("apply")) {
            ObjectNode tree = document.editableTree();
            VehicleEdits.putCornerMasses(tree, new CornerMasses(kg[0], kg[1], kg[2], kg[3]));
            write(parsed, tree, out);
        }
        return Cli.OK;
    }

    private static double[] fourReadings(String text) throws UsageException {
        String[] parts = text == null ? new String[0] : text.split(",");
        if (parts.length != 4) {
            throw new UsageException("--kg " + (text == null ? "is missing" : text) + ": give four scale readings "
                    + "left front, right front, left rear, right rear, e.g. --kg 262.5,248,231,240.5");
        }
        double[] values = new double[4];
        String[] names = {"left front", "right front", "left rear", "right rear"};
        for (int i = 0; i < 4; i++) {
            try {
                values[i] = Double.parseDouble(parts[i].trim());
            } catch (NumberFormatException notANumber) {
                throw new UsageException("--kg: the " + names[i] + " reading '" + parts[i] + "' is not a number");
            }
        }
        return values;
    }

    private static AxlePosition oneAxle(Arguments parsed, Vehicle car) throws UsageException {
        String axle = parsed.option("axle", null);
        if (axle == null) {
            if (car == null) {
                throw new UsageException("--axle: give the axle the bar is on, front or rear");
            }
            return car.front().bar() != null || car.rear().bar() == null ? AxlePosition.FRONT : AxlePosition.REAR;
        }
        return switch (axle) {
            case "front" -> AxlePosition.FRONT;
            case "rear" -> AxlePosition.REAR;
            default -> throw new UsageException("--axle " + axle + ": front or rear");
        };
    }

    private static double required(Arguments parsed, String option) throws UsageException {
        if (parsed.option(option, null) == null) {
            throw new UsageException("--" + option + " is missing");
        }
        return parsed.number(option, 0);
    }

    private static String where(CsvRow row) {
        return "line " + row.line();
    }

    private static void print(PrintStream out, Arguments parsed, ObjectNode json, String text) {
        Printed.jsonOrTextWithCaution(out, parsed, () -> json, () -> text);
    }

    /** Checks the changed tree as a whole car, then writes it atomically to --output. */
    private static void write(Arguments parsed, ObjectNode tree, PrintStream out) throws Exception {
        String output = parsed.option("output", null);
        if (output == null) {
            throw new UsageException("--apply needs --output OUT.json: the car is written to a copy");
        }
        VehicleLoader.fromTree(tree);
        VehicleFileWriter.save(tree, Path.of(output));
        if (!parsed.has("json")) {
            out.println("Written to " + output + ".");
        }
    }
}
