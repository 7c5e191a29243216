package barwright.report.work;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;

import java.util.Objects;

/**
 * A key figure whose working can be shown.
 *
 * @param kind which figure
 * @param axle the axle it belongs to, or null
 * @param turn the turn direction it belongs to, or null
 */
public record KeyFigure(Kind kind, AxlePosition axle, TurnDirection turn) {
    public enum Kind {
        SPRING_ROLL_STIFFNESS, BAR_ROLL_STIFFNESS, TYRE_ROLL_STIFFNESS, AXLE_ROLL_STIFFNESS,
        ROLL_GRADIENT, FRONT_LOAD_TRANSFER_SHARE, STATIC_FRONT_WEIGHT, UNDERSTEER_GRADIENT,
        LIMIT, BALANCE, INSIDE_LIFT,
        BAR_LINK_RATE, BAR_MASS, BAR_SAFETY_FACTOR, BAR_BUSHING_LOAD
    }

    public KeyFigure {
        Objects.requireNonNull(kind, "kind");
    }

    public static KeyFigure of(Kind kind) {
        return new KeyFigure(kind, null, null);
    }

    public static KeyFigure of(Kind kind, AxlePosition axle) {
        return new KeyFigure(kind, Objects.requireNonNull(axle), null);
    }

    public static KeyFigure of(Kind kind, TurnDirection turn) {
        return new KeyFigure(kind, null, Objects.requireNonNull(turn));
    }

    public static KeyFigure of(Kind kind, AxlePosition axle, TurnDirection turn) {
        return new KeyFigure(kind, Objects.requireNonNull(axle), Objects.requireNonNull(turn));
    }
}
