/**
 * Suspension linkages seen from the front (docs/model.md, "Suspension linkages"): each side's loop closure
 * for a wheel travel, instant centres, camber and track against travel, kinematic roll with both tyres on the
 * ground, and the roll centre.
 *
 * <p>Axes: y to the car's left, z up from the ground; a side's points are given for the left side and the
 * right side is their mirror image. Wheel travel is the contact point's rise relative to the body (bump
 * positive). Positive roll is the roll of a left turn: the body leans to the right and the right wheel is in
 * bump. Camber follows SAE J670: the top of the wheel leaning away from the car's centre is positive.
 * SI units: m, rad.
 */
package barwright.physics.linkage;
