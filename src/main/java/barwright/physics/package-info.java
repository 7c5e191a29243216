/**
 * The calculations of the model contract (shared spec model.md, sections 1-9) and their result records.
 *
 * <p>Units: SI base units throughout (m, kg, N, Pa, rad, m/s^2). Axes: x forward, y to the left, z up.
 * Signs: lateral acceleration a_y is positive in either turn; a load transfer dF is the increase of the
 * outside wheel's load (the decrease of the inside one's). A turn to the left has the left wheels inside.
 * A motion ratio is component travel / wheel travel.
 */
package barwright.physics;
