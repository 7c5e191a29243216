package barwright.report.insight;

import barwright.insight.ChassisPoint;
import barwright.insight.ChassisStudy;
import barwright.insight.ChassisStudyResult;
import barwright.report.Cautions;
import barwright.report.heading.TextHeading;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.Locale;

import static barwright.units.Conversions.toPercent;

/** What a flexible chassis costs, in words and a table, for the command line and the window. */
public final class ChassisText {
    /** The table shows every this many points of the sweep (ten a decade). */
    private static final int TABLE_EVERY = 3;

    private final UnitSystem units;

    public ChassisText(UnitSystem units) {
        this.units = units;
    }

    public String of(ChassisStudyResult study) {
        StringBuilder out = new StringBuilder();
        out.append(TextHeading.of("chassis stiffness", study.vehicleName(), units)).append('\n');
        out.append("Total roll stiffness of the axles (with tyres): ").append(stiffness(study.totalRollStiffness()))
                .append(". Bar change studied: ").append(study.barChange()).append(".\n");
        out.append("Rigid chassis: ").append(figures(study.rigid())).append(".\n");
        if (study.decoupled() != null) {
            out.append("No chassis stiffness (each body end on its own axle): ").append(figures(study.decoupled()))
                    .append(".\n");
        }
        out.append(study.current() == null ? "This car: no chassis stiffness in its file, so analysed as rigid.\n"
                : "This car, chassis " + stiffness(study.current().chassisStiffness()) + ": "
                + figures(study.current()) + ", the bar change delivers "
                + percent(study.current().deliveredShare()) + " of its rigid effect.\n");
        out.append('\n');
        out.append(String.format(Locale.ROOT, "  %20s %9s %12s %14s %16s%n", "chassis stiffness", "x total",
                "front share", "roll gradient", "bar change gets"));
        for (int i = 0; i < study.sweep().size(); i += TABLE_EVERY) {
            ChassisPoint point = study.sweep().get(i);
            out.append(String.format(Locale.ROOT, "  %20s %9.2f %12s %14s %16s%n", stiffness(point.chassisStiffness()),
                    point.chassisStiffness() / study.totalRollStiffness(), percent(point.frontShare()),
                    Figures.format(point.rollGradient(), Quantity.ROLL_GRADIENT, units, 2),
                    percent(point.deliveredShare())));
        }
        out.append('\n').append(statement(study)).append('\n');
        study.notes().forEach(note -> out.append("Note: ").append(note).append('\n'));
        out.append('\n').append(Cautions.SHORT).append('\n');
        return out.toString();
    }

    /** @return the sentence on how stiff the chassis must be, with the source of the rule */
    public String statement(ChassisStudyResult study) {
        // Only the paper's title page was read: cite it for its subject, and the target as the program's own
        // choice (docs/validation.md, sections "Flexible chassis" and "The program's own choices").
        String rule = " The " + wholePercent(ChassisStudy.DELIVERED_TARGET) + " target is this program's own choice, "
                + "not a published figure; sizing the chassis against the suspension's roll stiffness is the subject "
                + "of Deakin et al., SAE 2000-01-3554, cited here for its subject only.";
        if (study.stiffnessForTarget() == null) {
            // the study's notes say why: no stiffness in the range searched reaches it, or every stable one does
            return "No single chassis stiffness is stated for the bar change (" + study.barChange() + ") to deliver "
                    + wholePercent(ChassisStudy.DELIVERED_TARGET) + " of its rigid-chassis effect: see the notes."
                    + rule;
        }
        double target = study.stiffnessForTarget();
        return String.format(Locale.ROOT, "For a bar change (%s) to deliver %s of its rigid-chassis effect on the front share, "
                        + "the chassis must be at least %s, %.2f times the car's total roll stiffness.%s",
                study.barChange(), wholePercent(ChassisStudy.DELIVERED_TARGET), stiffness(target),
                target / study.totalRollStiffness(), rule);
    }

    private String figures(ChassisPoint point) {
        return "front share " + percent(point.frontShare()) + ", roll gradient "
                + Figures.format(point.rollGradient(), Quantity.ROLL_GRADIENT, units, 2);
    }

    private String stiffness(double nmPerRad) {
        return Figures.format(nmPerRad, Quantity.ROLL_STIFFNESS, units, 0);
    }

    private static String wholePercent(double fraction) {
        return String.format(Locale.ROOT, "%.0f %%", toPercent(fraction));
    }

    private static String percent(double fraction) {
        return String.format(Locale.ROOT, "%.1f %%", toPercent(fraction));
    }
}
