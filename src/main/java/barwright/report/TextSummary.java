package barwright.report;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.AxleResult;
import barwright.physics.AxleStiffness;
import barwright.physics.GripLostToTransfer;
import barwright.physics.TurnResult;
import barwright.physics.Warning;
import barwright.physics.bar.BarResult;
import barwright.report.heading.TextHeading;
import barwright.report.linkage.LinkageFigures;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.Locale;
import java.util.function.Function;
import java.util.regex.Pattern;

import static barwright.units.Conversions.toPercent;

/** The readable summary the command line prints for {@code analyze FILE}. */
public final class TextSummary {
    private static final Pattern NON_FINITE = Pattern.compile("NaN|Infinity");
    private final UnitSystem units;
    private final StringBuilder out = new StringBuilder();

    private TextSummary(UnitSystem units) {
        this.units = units;
    }

    public static String of(AnalysisResult result, UnitSystem units) {
        return new TextSummary(units).write(result);
    }

    private String write(AnalysisResult result) {
        line(TextHeading.of("analysis", result.vehicle().name(), units));
        line("");
        line("Car");
        row("mass", f(result.masses().mass(), Quantity.MASS, 1));
        row("static front weight", percent(result.masses().frontMassFraction()));
        row("sprung mass", f(result.masses().sprungMass(), Quantity.MASS, 1));
        row("sprung CG height", f(result.masses().sprungCgHeight(), Quantity.LENGTH, units == UnitSystem.US ? 2 : 0));
        row("roll axis under sprung CG", f(result.masses().rollAxisHeightAtCg(), Quantity.LENGTH, units == UnitSystem.US ? 2 : 0));
        row("roll arm", f(result.masses().rollArm(), Quantity.LENGTH, units == UnitSystem.US ? 2 : 0));
        line("");
        line(String.format(Locale.ROOT, "%-34s %18s %18s", "Per axle", "front", "rear"));
        axleRows(result);
        LinkageFigures linkages = LinkageFigures.of(result);
        linkages.rows(units).forEach(row -> pair(row[0], row[1], row[2]));
        linkages.notes().forEach(this::line);
        line("");
        line("Balance");
        row("roll gradient", f(result.rollGradient(), Quantity.ROLL_GRADIENT, 2)
                + "   (springs and bars only: " + f(result.suspensionRollGradient(), Quantity.ROLL_GRADIENT, 2) + ")");
        row("front share of load transfer", percent(result.frontLoadTransferShare())
                + "   (static front weight " + percent(result.masses().frontMassFraction()) + ")");
        row("front share of roll stiffness", percent(result.frontRollStiffnessShare()));
        row("understeer gradient", f(result.understeerGradient(), Quantity.ROLL_GRADIENT, 2));
        for (TurnDirection direction : TurnDirection.values()) {
            TurnResult turn = result.turn(direction);
            line("");
            line("Turn to the " + direction.word() + " (" + direction.word() + " wheels inside)");
            row("inside front lifts at", lift(turn.frontInsideLift()));
            row("inside rear lifts at", lift(turn.rearInsideLift()));
            row("front / rear axle limit", f(turn.frontLimit(), Quantity.ACCELERATION, 3) + " / "
                    + f(turn.rearLimit(), Quantity.ACCELERATION, 3));
            row("limit and balance", f(turn.limit(), Quantity.ACCELERATION, 3) + ", " + turn.balance().key());
            row("grip lost to load transfer", String.format(Locale.ROOT, "front %.1f %% / rear %.1f %%",
                    100 * GripLostToTransfer.atLimit(result, AxlePosition.FRONT, direction),
                    100 * GripLostToTransfer.atLimit(result, AxlePosition.REAR, direction)));
        }
        line("");
        if (result.warnings().isEmpty()) {
            line("Warnings: none");
        } else {
            line("Warnings");
            for (Warning warning : result.warnings()) {
                line("  ! " + warning.message() + " [" + warning.code() + "]");
            }
        }
        line("");
        line(Cautions.SHORT);
        return out.toString();
    }

    private void axleRows(AnalysisResult result) {
        AxleResult front = result.axle(AxlePosition.FRONT);
        AxleResult rear = result.axle(AxlePosition.REAR);
        AxleStiffness fs = front.stiffness();
        AxleStiffness rs = rear.stiffness();
        pair("spring roll stiffness", f(fs.springRollStiffness(), Quantity.ROLL_STIFFNESS, 0),
                f(rs.springRollStiffness(), Quantity.ROLL_STIFFNESS, 0));
        pair("bar roll stiffness", barFigure(front, fs.barRollStiffness()), barFigure(rear, rs.barRollStiffness()));
        pair("tyre roll stiffness", f(fs.tyreRollStiffness(), Quantity.ROLL_STIFFNESS, 0),
                f(rs.tyreRollStiffness(), Quantity.ROLL_STIFFNESS, 0));
        pair("roll stiffness (with tyres)", f(fs.rollStiffness(), Quantity.ROLL_STIFFNESS, 0),
                f(rs.rollStiffness(), Quantity.ROLL_STIFFNESS, 0));
        pair("wheel rate (heave)", f(fs.heaveRate(), Quantity.LINEAR_RATE, 1), f(rs.heaveRate(), Quantity.LINEAR_RATE, 1));
        pair("single-wheel bump rate", f(fs.singleWheelBumpRate(), Quantity.LINEAR_RATE, 1),
                f(rs.singleWheelBumpRate(), Quantity.LINEAR_RATE, 1));
        pair("ride rate", f(fs.rideRate(), Quantity.LINEAR_RATE, 1), f(rs.rideRate(), Quantity.LINEAR_RATE, 1));
        pair("ride frequency", f(fs.rideFrequency(), Quantity.FREQUENCY, 2), f(rs.rideFrequency(), Quantity.FREQUENCY, 2));
        pair("load transfer per g", f(front.loadTransfer().total(), Quantity.FORCE_PER_G, 0),
                f(rear.loadTransfer().total(), Quantity.FORCE_PER_G, 0));
        pair("  unsprung part", f(front.loadTransfer().unsprung(), Quantity.FORCE_PER_G, 0),
                f(rear.loadTransfer().unsprung(), Quantity.FORCE_PER_G, 0));
        pair("  geometric part", f(front.loadTransfer().geometric(), Quantity.FORCE_PER_G, 0),
                f(rear.loadTransfer().geometric(), Quantity.FORCE_PER_G, 0));
        pair("  elastic part", f(front.loadTransfer().elastic(), Quantity.FORCE_PER_G, 0),
                f(rear.loadTransfer().elastic(), Quantity.FORCE_PER_G, 0));
        pair("cornering stiffness (axle)", f(front.corneringStiffness(), Quantity.CORNERING_STIFFNESS, 0),
                f(rear.corneringStiffness(), Quantity.CORNERING_STIFFNESS, 0));
        pair("bar model", barText(front.bar(), b -> b.model().key()), barText(rear.bar(), b -> b.model().key()));
        pair("bar link rate", barText(front.bar(), b -> f(b.linkRate(), Quantity.LINEAR_RATE, 1)),
                barText(rear.bar(), b -> f(b.linkRate(), Quantity.LINEAR_RATE, 1)));
        AntiRollBar frontBar = result.vehicle().front().bar();
        AntiRollBar rearBar = result.vehicle().rear().bar();
        if (RateCalibrationOutput.anyMeasured(frontBar, rearBar)) {
            pair("bar rate factor", RateCalibrationOutput.text(frontBar), RateCalibrationOutput.text(rearBar));
        }
        pair("bar mass", barText(front.bar(), b -> f(b.mass(), Quantity.MASS, 2)),
                barText(rear.bar(), b -> f(b.mass(), Quantity.MASS, 2)));
        pair("bar max stress at check travel", barText(front.bar(), b -> f(b.maxVonMisesStress(), Quantity.STRESS, 0)),
                barText(rear.bar(), b -> f(b.maxVonMisesStress(), Quantity.STRESS, 0)));
        pair("bar safety factor (static)", barText(front.bar(), b -> String.format(Locale.ROOT, "%.2f", b.safetyFactor())),
                barText(rear.bar(), b -> String.format(Locale.ROOT, "%.2f", b.safetyFactor())));
    }

    private String barFigure(AxleResult axle, double value) {
        return axle.bar() == null ? "no bar" : f(value, Quantity.ROLL_STIFFNESS, 0);
    }

    private static String barText(BarResult bar, Function<BarResult, String> text) {
        return bar == null ? "-" : text.apply(bar);
    }

    private String lift(double accel) {
        Double inG = ReportJson.liftInG(accel);
        return inG == null ? "stays down (past 3 g)" : f(accel, Quantity.ACCELERATION, 3);
    }

    private String f(double si, Quantity quantity, int decimals) {
        return Figures.format(si, quantity, units, decimals);
    }

    private static String percent(double fraction) {
        return String.format(Locale.ROOT, "%.1f %%", toPercent(fraction));
    }

    private void row(String label, String value) {
        requireDefined(label, value);
        line(String.format(Locale.ROOT, "  %-32s %s", label, value));
    }

    private void pair(String label, String front, String rear) {
        requireDefined(label + " (front)", front);
        requireDefined(label + " (rear)", rear);
        line(String.format(Locale.ROOT, "  %-32s %18s %18s", label, front, rear));
    }

    /**
     * Every figure passes here: Java formats a non-finite number as "NaN" or "Infinity", which must never
     * reach a reader, so the summary is refused naming the row (the JSON report has the same guard,
     * {@code io.FiniteNumbers}).
     */
    private static void requireDefined(String label, String value) {
        if (NON_FINITE.matcher(value).find()) {
            throw new IllegalStateException("nothing was printed: '" + label + "' came out as " + value
                    + ", not a number; this is a fault in Barwright, not in your file");
        }
    }

    private void line(String text) {
        out.append(text).append('\n');
    }
}
