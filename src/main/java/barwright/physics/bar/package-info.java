/**
 * One anti-roll bar on its own: section and material to link rate, mass and stresses (model.md 1-2). The
 * closed form lives here; the beam-element model in {@code barwright.physics.beam} returns the same
 * {@link barwright.physics.bar.BarResult}. Units SI; axes x forward, y left, z up.
 */
package barwright.physics.bar;
