/**
 * Chart data as plain records in SI, with no drawing library: {@link barwright.physics.curve.Chart},
 * {@link barwright.physics.curve.Series} and the one producer of the cornering curves
 * ({@link barwright.physics.curve.CorneringCurves}). The window ({@code ui.chart}) and the PDF sheet
 * ({@code report.sheet}) both draw from these.
 */
package barwright.physics.curve;
