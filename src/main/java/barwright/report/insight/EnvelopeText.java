package barwright.report.insight;

import barwright.insight.EnvelopePoint;
import barwright.insight.LiftBoundary;
import barwright.insight.LiftEnvelopeResult;
import barwright.insight.LongitudinalRange;
import barwright.insight.Wheel;
import barwright.model.TurnDirection;
import barwright.report.Cautions;
import barwright.report.ReportJson;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static barwright.units.Conversions.fromG;
import static barwright.units.Conversions.toG;


/** The lift envelope in sentences and a table, for the command line and the window. */
public final class EnvelopeText {
    /** The table lists every this many g of a_x (m/s^2). */
    private static final double TABLE_STEP = fromG(0.1);

    private final UnitSystem units;

    public EnvelopeText(UnitSystem units) {
        this.units = units;
    }

    /** @param compared a second envelope to print beside it, or null */
    public String of(LiftEnvelopeResult envelope, LiftEnvelopeResult compared) {
        StringBuilder out = new StringBuilder();
        out.append("Barwright lift envelope: ").append(envelope.vehicleName()).append('\n');
        out.append("a_x is forward acceleration: braking is negative. A wheel lifts beyond its boundary.\n\n");
        sentences(envelope).forEach(line -> out.append(line).append('\n'));
        if (compared != null) {
            out.append("\nCompared with: ").append(compared.vehicleName()).append('\n');
            sentences(compared).forEach(line -> out.append(line).append('\n'));
        }
        out.append('\n').append(table(envelope, compared));
        out.append('\n');
        envelope.notes().forEach(note -> out.append("Note: ").append(note).append('\n'));
        out.append('\n').append(Cautions.SHORT).append('\n');
        return out.toString();
    }

    /** @return per turn a heading line and one sentence per inside wheel */
    public List<String> sentences(LiftEnvelopeResult envelope) {
        List<String> lines = new ArrayList<>();
        for (TurnDirection turn : TurnDirection.values()) {
            lines.add("Turn to the " + turn.word() + " (lateral limit " + g(envelope.limit(turn)) + " at a_x = 0)");
            for (Wheel wheel : Wheel.values()) {
                if (wheel.insideIn() == turn) {
                    lines.add("  " + sentence(envelope, envelope.boundary(wheel)));
                }
            }
        }
        return lines;
    }

    /** @return e.g. "The inside rear (left rear) lifts at 0.88 g lateral with 0.30 g braking, ..." */
    public String sentence(LiftEnvelopeResult envelope, LiftBoundary boundary) {
        Wheel wheel = boundary.wheel();
        String name = "The inside " + wheel.axle().key() + " (" + wheel.words() + ")";
        boolean allRollover = boundary.quoted().stream().allMatch(EnvelopePoint::rollover);
        List<String> quoted = new ArrayList<>();
        for (EnvelopePoint point : boundary.quoted()) {
            String figure = ReportJson.liftInG(point.lateralAcceleration()) == null ? "past 3 g"
                    : g(point.lateralAcceleration());
            String mark = point.rollover() && !allRollover ? " (as the car rolls over)" : "";
            String lateral = quoted.isEmpty() ? " lateral" : "";
            quoted.add(figure + lateral + mark + " " + longitudinalWords(point.longitudinalAcceleration()));
        }
        String list = String.join(", ", quoted.subList(0, quoted.size() - 1)) + " and " + quoted.get(quoted.size() - 1);
        String first = allRollover ? name + " stays down until the car rolls over: at " + list + "."
                : name + " lifts at " + list + ".";
        double limit = envelope.limit(wheel.insideIn());
        String limitWords = "the lateral limit (" + g(limit) + ")";
        List<LongitudinalRange> spans = boundary.liftsBeforeLimit();
        if (spans.isEmpty()) {
            return first + " It stays down up to " + limitWords + " from " + longitudinal(envelope.mostBraking())
                    + " to " + longitudinal(envelope.mostAcceleration()) + ".";
        }
        List<String> spanWords = new ArrayList<>();
        for (LongitudinalRange span : spans) {
            spanWords.add(spanWords(envelope, span));
        }
        return first + " It lifts below " + limitWords + " " + String.join(" and ", spanWords) + ".";
    }

    private String spanWords(LiftEnvelopeResult envelope, LongitudinalRange span) {
        boolean fromEnd = span.from() <= envelope.mostBraking();
        boolean toEnd = span.to() >= envelope.mostAcceleration();
        if (fromEnd && toEnd) {
            return "everywhere from " + longitudinal(span.from()) + " to " + longitudinal(span.to());
        }
        if (fromEnd && span.to() <= 0) {
            return "with more than " + longitudinal(span.to());
        }
        if (toEnd && span.from() >= 0) {
            return "with more than " + longitudinal(span.from());
        }
        return "from " + longitudinal(span.from()) + " to " + longitudinal(span.to());
    }

    /** @return "with 0.30 g braking", "with no braking or power" or "with 0.30 g acceleration" */
    private String longitudinalWords(double accel) {
        return accel == 0 ? "with no braking or power" : "with " + longitudinal(accel);
    }

    /** @return "0.30 g braking" or "0.30 g acceleration" (or "no braking or power") */
    public String longitudinal(double accel) {
        if (Math.abs(accel) < fromG(0.005)) {
            return "no braking or power";
        }
        return g(Math.abs(accel)) + (accel < 0 ? " braking" : " acceleration");
    }

    private String table(LiftEnvelopeResult envelope, LiftEnvelopeResult compared) {
        StringBuilder out = new StringBuilder();
        out.append("Lateral acceleration at which each wheel lifts (g)")
                .append(compared == null ? "" : ", this car / compared")
                .append("; '-' stays down past 3 g, 'R' the car rolls over there\n");
        out.append(String.format(Locale.ROOT, "  %8s", "a_x (g)"));
        int width = compared == null ? 12 : 16;
        for (Wheel wheel : Wheel.values()) {
            out.append(String.format(Locale.ROOT, " %" + width + "s", wheel.words()));
        }
        out.append('\n');
        for (int i = 0; i < envelope.boundary(Wheel.LEFT_FRONT).points().size(); i++) {
            double ax = envelope.boundary(Wheel.LEFT_FRONT).points().get(i).longitudinalAcceleration();
            double steps = ax / TABLE_STEP;
            if (Math.abs(steps - Math.rint(steps)) > 1e-6) {
                continue;
            }
            out.append(String.format(Locale.ROOT, "  %8.2f", toG(ax)));
            for (Wheel wheel : Wheel.values()) {
                String cell = cell(envelope.boundary(wheel).points().get(i));
                if (compared != null) {
                    cell += " / " + comparedCell(compared.boundary(wheel), ax);
                }
                out.append(String.format(Locale.ROOT, " %" + width + "s", cell));
            }
            out.append('\n');
        }
        return out.toString();
    }

    private static String comparedCell(LiftBoundary boundary, double ax) {
        return boundary.points().stream()
                .filter(point -> Math.abs(point.longitudinalAcceleration() - ax) < 1e-9)
                .findFirst().map(EnvelopeText::cell).orElse("n/a");
    }

    private static String cell(EnvelopePoint point) {
        Double inG = ReportJson.liftInG(point.lateralAcceleration());
        if (inG == null) {
            return "-";
        }
        return String.format(Locale.ROOT, "%.3f%s", inG, point.rollover() ? "R" : "");
    }

    private String g(double accel) {
        return Figures.format(accel, Quantity.ACCELERATION, units, 2);
    }
}
