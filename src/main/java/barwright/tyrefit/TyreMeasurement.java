package barwright.tyrefit;

/**
 * One measured point of a tyre test.
 *
 * @param line         where it came from (the line of the data file), for messages
 * @param load         vertical load F_z (N)
 * @param slipAngle    alpha (rad)
 * @param lateralForce F_y (N), positive for a positive slip angle
 * @param camber       gamma (rad), J670 sense for the wheel on the outside of a turn: negative when the top of
 *                     the tyre leans towards the side the lateral force points to
 */
public record TyreMeasurement(int line, double load, double slipAngle, double lateralForce, double camber) {
}
