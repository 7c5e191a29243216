/**
 * Three views on an analysed car that no single number gives: where an inside wheel lifts under braking or
 * power as well as cornering ({@link barwright.insight.LiftEnvelope}), which input a setter can change moves
 * the balance most ({@link barwright.insight.Sensitivity}), and what a flexible chassis costs
 * ({@link barwright.insight.ChassisStudy}). Core code: SI units inside, no Swing or AWT; their text and JSON
 * are in {@code barwright.report.insight}.
 */
package barwright.insight;
