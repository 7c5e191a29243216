package barwright.physics;

import barwright.model.TurnDirection;

/**
 * The two turn directions of one car (model.md 7-8).
 *
 * @param left  the turn to the left
 * @param right the turn to the right
 */
public record TurnPair(TurnResult left, TurnResult right) {
    public TurnResult turn(TurnDirection direction) {
        return direction == TurnDirection.LEFT ? left : right;
    }
}
