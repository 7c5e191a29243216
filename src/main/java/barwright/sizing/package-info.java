/**
 * Sizing bars to a target: the fast evaluator of a car with its bars swapped, the parallel search over
 * materials x stock sizes x arm holes, the exact solid diameter or tube wall (Brent's method), tubes of
 * equal rate to a solid bar, and edits of a vehicle document. SI throughout; no Swing. Their text, JSON and
 * CSV are in {@code barwright.report.sizing}.
 */
package barwright.sizing;
