package barwright.report.linkage;

import barwright.model.AxlePosition;
import barwright.physics.AnalysisResult;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.LinkageAtLimit;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;

/**
 * The linkage figures of the analysis report, per axle (docs/file-format.md, analysis report): the roll-centre
 * height the analysis uses, and, for an axle with a linkage, the roll centre, cambers and camber change at the
 * grip limit's roll (model.md 12). Null where there is no linkage, no roll centre, or the linkage cannot follow
 * the roll to the limit.
 */
public final class LinkageFigures {
    private final AnalysisResult result;
    private final LinkageAtLimit[] atLimit = new LinkageAtLimit[2];
    private final String[] refused = new String[2];

    private LinkageFigures(AnalysisResult result) {
        this.result = result;
        for (AxlePosition position : AxlePosition.values()) {
            try {
                atLimit[position.ordinal()] = LinkageAtLimit.of(result, position);
            } catch (ImpossibleVehicleException beyond) {
                refused[position.ordinal()] = beyond.getMessage();
            }
        }
    }

    public static LinkageFigures of(AnalysisResult result) {
        return new LinkageFigures(result);
    }

    /** Adds the six keys to an axle's object of the report. */
    public void putInto(ObjectNode axle, AxlePosition position) {
        LinkageAtLimit figures = atLimit[position.ordinal()];
        axle.put("rollCentreHeightMm", result.vehicle().axle(position).rollCentreHeight() * 1e3 + 0.0);
        putMm(axle, "rollCentreHeightAtLimitMm", figures == null ? null : figures.rollCentreHeightAtLimit());
        Double migration = figures == null || figures.rollCentreMigrationPerRoll() == null ? null
                : figures.rollCentreMigrationPerRoll() * Math.PI / 180;
        putMm(axle, "rollCentreMigrationMmPerDeg", migration);
        putDeg(axle, "outsideCamberAtLimitDeg", figures == null ? null : figures.outsideCamberAtLimit());
        putDeg(axle, "insideCamberAtLimitDeg", figures == null ? null : figures.insideCamberAtLimit());
        // a ratio of angles: degrees of camber per degree of roll
        if (figures == null) {
            axle.putNull("camberChangePerDegRollDeg");
        } else {
            axle.put("camberChangePerDegRollDeg", figures.camberChangePerRoll() + 0.0);
        }
    }

    /** @return rows {label, front, rear} for the text report's per-axle table */
    public List<String[]> rows(UnitSystem units) {
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"roll-centre height (at rest)", height(units, AxlePosition.FRONT),
                height(units, AxlePosition.REAR)});
        if (atLimit[0] == null && atLimit[1] == null && refused[0] == null && refused[1] == null) {
            return rows;
        }
        rows.add(new String[] {"roll centre at the limit's roll", text(AxlePosition.FRONT, f -> f.rollCentreHeightAtLimit()
                == null ? "none (lines parallel)" : length(f.rollCentreHeightAtLimit(), units)),
                text(AxlePosition.REAR, f -> f.rollCentreHeightAtLimit() == null ? "none (lines parallel)"
                        : length(f.rollCentreHeightAtLimit(), units))});
        rows.add(new String[] {"outside / inside camber at limit", text(AxlePosition.FRONT, f -> cambers(f, units)),
                text(AxlePosition.REAR, f -> cambers(f, units))});
        rows.add(new String[] {"camber change per deg of roll", text(AxlePosition.FRONT, f -> String.format(
                Locale.ROOT, "%.2f deg", f.camberChangePerRoll() + 0.0)), text(AxlePosition.REAR,
                f -> String.format(Locale.ROOT, "%.2f deg", f.camberChangePerRoll() + 0.0))});
        return rows;
    }

    /** @return notes in words where a linkage cannot follow the roll to the limit */
    public List<String> notes() {
        List<String> notes = new ArrayList<>();
        for (String message : refused) {
            if (message != null) {
                notes.add("Linkage: " + message + ". The figures at the limit are left out.");
            }
        }
        return notes;
    }

    private String height(UnitSystem units, AxlePosition position) {
        String value = length(result.vehicle().axle(position).rollCentreHeight(), units);
        return result.vehicle().axle(position).hasLinkage() ? value + " (linkage)" : value + " (typed)";
    }

    private String text(AxlePosition position, Function<LinkageAtLimit, String> shown) {
        LinkageAtLimit figures = atLimit[position.ordinal()];
        if (figures == null) {
            return refused[position.ordinal()] == null ? "-" : "see note";
        }
        return shown.apply(figures);
    }

    private static String cambers(LinkageAtLimit figures, UnitSystem units) {
        return Figures.format(figures.outsideCamberAtLimit() + 0.0, Quantity.ANGLE, units, 1).replace(" deg", "")
                + " / " + Figures.format(figures.insideCamberAtLimit() + 0.0, Quantity.ANGLE, units, 1);
    }

    private static String length(double metres, UnitSystem units) {
        return Figures.format(metres + 0.0, Quantity.LENGTH, units, units == UnitSystem.US ? 2 : 0);
    }

    private static void putMm(ObjectNode node, String key, Double metres) {
        if (metres == null) {
            node.putNull(key);
        } else {
            node.put(key, metres * 1e3 + 0.0);
        }
    }

    private static void putDeg(ObjectNode node, String key, Double radians) {
        if (radians == null) {
            node.putNull(key);
        } else {
            node.put(key, Math.toDegrees(radians) + 0.0);
        }
    }
}
