package barwright.physics;

/**
 * The two turn directions of one car (model.md 7-8).
 *
 * @param left  the turn to the left
 * @param right the turn to the right
 */
public record TurnPair(TurnResult left, TurnResult right) {
}
