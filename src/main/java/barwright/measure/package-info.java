/**
 * Measurements from the workshop turned into the model's inputs (model.md 12): a bar's rate from load and
 * deflection readings, motion ratios from travel readings, the centre-of-mass height by raising one axle,
 * and corner weights with the link change for a target cross weight. SI throughout; no Swing or AWT.
 */
package barwright.measure;
