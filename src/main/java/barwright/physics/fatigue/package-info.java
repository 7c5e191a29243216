/**
 * "Will the bar last the season?" (docs/model.md 13): a bar's stress history from the quasi-static model,
 * rainflow counting (ASTM E1049), the Basquin S-N line with the Marin factors, Goodman or Gerber mean-stress
 * correction and Palmgren-Miner damage. Computation only: no Swing, no AWT, SI units.
 */
package barwright.physics.fatigue;
