/**
 * A bar of any shape through a 3-D beam-element frame ({@link barwright.solver.frame}): its link rate, mass,
 * stresses along the centreline, bushing loads and deflected shape. {@link barwright.physics.beam.BeamBar}
 * is the entry point; it returns the same {@link barwright.physics.bar.BarResult} as the closed form, and
 * agrees with it for a plain U-bar with sharp corners.
 *
 * <p>Units SI (m, N, Pa). Vehicle axes: x forward, y to the left, z up. The centreline runs from the left
 * link point to the right one; distances along it are measured from the left link point. The links act
 * along z: +F at the left link point, -F at the right one, and the relative link travel is
 * w_left - w_right (model.md 2).
 */
package barwright.physics.beam;
